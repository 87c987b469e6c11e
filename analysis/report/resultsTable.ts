/**
 * The results table of one survey's section (one row per constituent) and date helpers.
 */
import type { ConstituentAnalysis } from "../mixing/result.ts";
import type { ComparableSurvey } from "../compare/types.ts";
import { formatSignificant } from "../output/formatNumber.ts";
import type { BriefingTable } from "./briefingTypes.ts";
import { estimateText } from "./estimateText.ts";
import { classWords } from "./wording.ts";

const f2 = (x: number): string => formatSignificant(x, 2);
const kmRange = (km: Array<[number, number]>): string =>
  km.map(([a, b]) => `${formatSignificant(a, 3)}–${formatSignificant(b, 3)}`).join(", ");

/** Date part (YYYY-MM-DD) of an ISO 8601 time. */
export const datePart = (iso: string | undefined): string | undefined => (iso ? iso.slice(0, 10) : undefined);

/**
 * Results table: class, net change and C*₀ with 95 % intervals, zone in salinity and km, maximum, confidence.
 *
 * @param a the survey analysis
 * @returns the table
 */
export function resultsTable(a: ComparableSurvey): BriefingTable {
  const rows = a.constituents.map((c: ConstituentAnalysis) => [
    `${c.name} (${c.unit})`,
    classWords(c.class),
    c.percentChange ? estimateText(c.percentChange, 2, true) : "—",
    c.effectiveEndmember ? estimateText(c.effectiveEndmember, 3) : "—",
    c.reactionZone
      ? `${f2(c.reactionZone.salinity[0])}–${f2(c.reactionZone.salinity[1])} (${c.reactionZone.kind})`
      : "—",
    c.reactionZone && c.reactionZone.km.length ? kmRange(c.reactionZone.km) : "—",
    c.maximum
      ? `S ${f2(c.maximum.salinity.value)}${c.maximum.km.length ? `, km ${c.maximum.km.map((k) => formatSignificant(k, 3)).join(", ")}` : ""}`
      : "—",
    c.confidence,
  ]);
  return {
    caption: `Results by constituent, survey ${a.survey.name}`,
    header: [
      "Constituent (unit)",
      "Behaviour",
      "Net change, % (95 % interval)",
      "C*₀ (95 % interval)",
      "Reaction zone, salinity",
      "Zone, km from mouth",
      "Maximum",
      "Confidence",
    ],
    rows,
    note: "Net change = 100·(C*₀ − C₀)/C₀: negative = removal in the estuary, positive = addition. Salinity is practical salinity (PSS-78, no unit).",
  };
}
