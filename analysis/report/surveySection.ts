/**
 * One survey's section of the briefing: facts, findings, map, zone chart, key plots and the
 * results table.
 */
import type { ChannelNetwork } from "../geometry/types.ts";
import type { ConstituentAnalysis } from "../mixing/result.ts";
import type { ComparableSurvey } from "../compare/types.ts";
import { formatSignificant } from "../output/formatNumber.ts";
import type { BasemapShape } from "./basemap.ts";
import type { BriefingFigure, BriefingSurvey } from "./briefingTypes.ts";
import { datePart, resultsTable } from "./resultsTable.ts";
import { constituentFindings } from "./findings.ts";
import { mapSvg } from "./mapSvg.ts";
import { mixingPlotSvg } from "./mixingPlotSvg.ts";
import { profilePlotSvg } from "./profilePlotSvg.ts";
import { PALETTE } from "./svgFrame.ts";
import { constituentWords } from "./wording.ts";
import { zoneColor, zoneStripSvg } from "./zoneStripSvg.ts";

/** Shared context of the survey sections. */
export interface SectionContext {
  network?: ChannelNetwork;
  basemap: BasemapShape[];
  keyConstituents: string[];
  /** Unique prefix for SVG ids in this section. */
  idPrefix: string;
}

/**
 * Builds one survey's section from its analysis.
 *
 * @param a the survey analysis
 * @param ctx network, basemap, key constituents, id prefix
 * @returns the section
 */
export function surveySection(a: ComparableSurvey, ctx: SectionContext): BriefingSurvey {
  const f = a.survey;
  const placed = a.stations.filter((s) => s.alongChannelKm !== undefined).length;
  const off = a.stations.filter((s) => s.offChannel).map((s) => s.id);
  const dates = [datePart(f.startDate), datePart(f.endDate)].filter((d): d is string => !!d);
  const facts: Array<[string, string]> = [
    ["Sampling dates", dates.length ? [...new Set(dates)].join(" to ") : "not given"],
    [
      "River discharge",
      f.riverDischargeM3s !== undefined
        ? `${formatSignificant(f.riverDischargeM3s, 3)} m³/s${f.dischargeSource ? ` (${f.dischargeSource.statement})` : ""}`
        : "not given (no fluxes)",
    ],
    [
      "Stations",
      `${a.stations.length} samples, ${placed} placed on the channel${off.length ? `, off the channel: ${off.join(", ")}` : ""}`,
    ],
    [
      "Salinity range",
      f.salinityRange
        ? `${formatSignificant(f.salinityRange[0], 3)} to ${formatSignificant(f.salinityRange[1], 3)} (PSS-78)`
        : "—",
    ],
    [
      "Salt intrusion",
      f.saltIntrusionKm !== undefined
        ? `S = ${f.saltIntrusionSalinity} at ${formatSignificant(f.saltIntrusionKm, 3)} km from the mouth`
        : "not located",
    ],
    [
      "Isohalines",
      f.isohalines
        .filter((h) => h.km.length)
        .map((h) => `S ${h.salinity}: km ${h.km.map((k) => formatSignificant(k, 3)).join(", ")}`)
        .join("; ") || "—",
    ],
  ];
  const all = a.constituents.flatMap(constituentFindings);
  // C*₀ sentences are in the results table; a low-confidence reason shared by several constituents is said once.
  const lowBy = new Map<string, string[]>();
  for (const x of all)
    if (x.text.startsWith("Confidence is low: "))
      lowBy.set(x.text, [...(lowBy.get(x.text) ?? []), x.constituent ?? ""]);
  const findings = all.filter((x) => x.strength !== "context" && !x.text.startsWith("Confidence is low: "));
  for (const [text, names] of lowBy)
    findings.push({
      strength: "uncertain",
      text: `Confidence is low for ${names.join(", ")}: ${text.slice("Confidence is low: ".length)}`,
    });
  if (f.saltIntrusionKm !== undefined)
    findings.unshift({
      strength: "context",
      text: `Salt (S = ${f.saltIntrusionSalinity}) reached ${formatSignificant(f.saltIntrusionKm, 3)} km up the channel from the mouth${f.riverDischargeM3s !== undefined ? ` at a river discharge of ${formatSignificant(f.riverDischargeM3s, 3)} m³/s` : ""}.`,
    });
  const figures: BriefingFigure[] = [];
  const id = ctx.idPrefix;
  const key = ctx.keyConstituents
    .map((n) => a.constituents.find((c) => c.name === n))
    .filter((c): c is ConstituentAnalysis => !!c);
  if (ctx.network) {
    const zones = key
      .filter((c) => c.reactionZone?.km.length)
      .map((c, i) => ({
        label: `${c.name} ${c.reactionZone!.kind} zone`,
        color: PALETTE[(i + 2) % PALETTE.length]!,
        km: c.reactionZone!.km,
      }));
    figures.push({
      id: `${id}-map`,
      size: "wide",
      title: `Map of the estuary, survey ${f.name}`,
      caption:
        "Channel centerline with distance marks from the mouth, stations (red ring: off the channel), the salt-intrusion point and reaction zones of the key constituents as coloured stretches of the main channel. Local equirectangular projection, north up.",
      svg: mapSvg(
        {
          network: ctx.network,
          basemap: ctx.basemap,
          stations: a.stations,
          zones,
          ...(f.saltIntrusionKm !== undefined
            ? { intrusion: { km: f.saltIntrusionKm, salinity: f.saltIntrusionSalinity } }
            : {}),
        },
        `${id}-map`,
      ),
      legend: zones.map((z) => ({ label: z.label, color: z.color })),
    });
  }
  const maxKm = ctx.network?.branches[0]?.kmEnd ?? Math.max(1, ...a.stations.map((s) => s.alongChannelKm ?? 0));
  figures.push({
    id: `${id}-zones`,
    size: "wide",
    title: "Where each constituent reacts along the channel",
    caption:
      "Bars: reaction zones placed on the channel through the salinity profile; diamonds: mid-estuarine maxima; dashed line: salt intrusion.",
    svg: zoneStripSvg(
      a.constituents.map((c) => ({
        label: `${c.name} (${c.class === "insufficient-data" ? "too little data" : (c.reactionZone?.kind ?? c.class)})`,
        ...(c.reactionZone ? { kind: c.reactionZone.kind } : {}),
        km: c.reactionZone?.km ?? [],
        maximumKm: c.maximum?.km ?? [],
      })),
      maxKm,
      f.saltIntrusionKm !== undefined ? [{ km: f.saltIntrusionKm, label: `S = ${f.saltIntrusionSalinity}` }] : [],
      `${id}-zones`,
    ),
    legend: [
      { label: "removal zone", color: zoneColor("removal") },
      { label: "addition zone", color: zoneColor("addition") },
    ],
  });
  key.forEach((c, i) => {
    const m = mixingPlotSvg(c, `${id}-mix${i}`);
    const p = profilePlotSvg(c, a.stations, `${id}-prof${i}`);
    const name = constituentWords(c.name).replace(/^./, (ch) => ch.toUpperCase());
    if (m)
      figures.push({
        id: `${id}-mix${i}`,
        size: "half",
        svg: m,
        title: `${name} against salinity`,
        caption:
          "Dashed: theoretical dilution line; blue: fitted curve with 95 % band; orange: seaward tangent and C*₀ with its interval; shaded: reaction zone; open circles: below detection.",
      });
    if (p)
      figures.push({
        id: `${id}-prof${i}`,
        size: "half",
        svg: p,
        title: `${name} along the channel`,
        caption:
          "Concentration (dots, left axis) and salinity (grey, right axis) against distance from the mouth; shaded: reaction zone.",
      });
  });
  const warnings = (a.warnings ?? [])
    .map((w) => w.message)
    .filter((m, i, all) => all.indexOf(m) === i)
    .slice(0, 12);
  return { name: f.name, heading: `Survey ${f.name}`, facts, findings, figures, table: resultsTable(a), warnings };
}
