/**
 * The comparison section of the briefing: intrusion against discharge, the apparent exponent,
 * constituent shifts with their intervals, and plain statements of what exceeds the uncertainty.
 */
import type { ComparableSurvey, EstimateDifference, SurveyComparison } from "../compare/types.ts";
import { formatSignificant } from "../output/formatNumber.ts";
import type { BriefingComparison, BriefingFigure } from "./briefingTypes.ts";
import { classWords, constituentWords } from "./wording.ts";
import { zoneStripSvg } from "./zoneStripSvg.ts";

const s2 = (x: number, signed = false): string => formatSignificant(x, 2, signed);

function diffCell(d: EstimateDifference | undefined, unit = ""): string {
  if (!d) return "—";
  const u = unit ? ` ${unit}` : "";
  if (d.method === "no-interval") return `${s2(d.value, true)}${u} (no interval)`;
  return `${s2(d.value, true)}${u} (${s2(d.lower, true)} to ${s2(d.upper, true)})${d.exceedsUncertainty ? " *" : ""}`;
}

function shiftWords(name: string, what: string, d: EstimateDifference | undefined, later: string): string | undefined {
  if (!d || d.method === "no-interval") return undefined;
  const dir = d.value >= 0 ? "farther up the channel (landward)" : "nearer the mouth (seaward)";
  const verdict = d.exceedsUncertainty
    ? "larger than the uncertainty"
    : "a shift that cannot be distinguished from none";
  return `The ${constituentWords(name)} ${what} lies ${s2(Math.abs(d.value))} km ${dir} in ${later} (km ${s2(d.reference)} → ${s2(d.later)}; approx. 95 % interval of the shift ${s2(d.lower, true)} to ${s2(d.upper, true)} km): ${verdict}.`;
}

/**
 * Builds the comparison section.
 *
 * @param c the comparison (compareSurveys)
 * @param analyses the compared analyses (for the zone chart), reference first as in c.surveys
 * @param maxKm right end of the km axis [km]
 * @returns the section
 */
export function comparisonSection(
  c: SurveyComparison,
  analyses: readonly ComparableSurvey[],
  maxKm: number,
): BriefingComparison {
  const findings: string[] = [];
  const byQ = c.intrusion.filter((r) => r.saltIntrusionKm !== undefined);
  if (byQ.length >= 2) {
    const parts = byQ.map(
      (r) =>
        `about ${formatSignificant(r.saltIntrusionKm!, 2)} km in ${r.survey}${r.dischargeM3s !== undefined ? ` (${formatSignificant(r.dischargeM3s, 3)} m³/s)` : ""}`,
    );
    findings.push(`Salt (S = ${byQ[0]!.saltIntrusionSalinity}) reached ${parts.join(", against ")}.`);
  }
  const main = c.scaling[0];
  if (main) findings.push(main.note);
  for (const s of c.shifts) {
    for (const t of [
      shiftWords(
        s.name,
        `${s.zone?.kind === "addition" ? "addition" : "removal"} zone (its seaward end)`,
        s.zone?.kmSeaward,
        s.survey,
      ),
      shiftWords(s.name, "maximum", s.maximum?.km, s.survey),
    ])
      if (t) findings.push(t);
    const e = s.effectiveEndmember;
    if (e && e.method !== "no-interval" && e.exceedsUncertainty) {
      const r0 = analyses.find((a) => a.survey.name === s.referenceSurvey)?.constituents.find((k) => k.name === s.name)
        ?.endmembers?.river.conc;
      const r1 = analyses.find((a) => a.survey.name === s.survey)?.constituents.find((k) => k.name === s.name)
        ?.endmembers?.river.conc;
      const river =
        r0 !== undefined && r1 !== undefined
          ? ` The river end-member itself went from ${formatSignificant(r0, 3)} to ${formatSignificant(r1, 3)} ${e.unit}.`
          : "";
      findings.push(
        `The effective river end-member C*₀ of ${s.name} went from ${formatSignificant(e.reference, 3)} to ${formatSignificant(e.later, 3)} ${e.unit} (${s2(e.value, true)} ${e.unit}; approx. 95 % interval ${s2(e.lower, true)} to ${s2(e.upper, true)}): larger than the uncertainty.${river}`,
      );
    }
  }
  for (const later of c.surveys.filter((n) => n !== c.referenceSurvey)) {
    const same = c.shifts
      .filter(
        (s) =>
          s.survey === later &&
          s.percentChange &&
          s.percentChange.method !== "no-interval" &&
          !s.percentChange.exceedsUncertainty,
      )
      .map((s) => s.name);
    const diff = c.shifts
      .filter((s) => s.survey === later && s.percentChange?.exceedsUncertainty)
      .map((s) => `${s.name} (${s2(s.percentChange!.reference, true)} % → ${s2(s.percentChange!.later, true)} %)`);
    if (same.length)
      findings.push(
        `The net change between river and sea (in %) did not differ between ${c.referenceSurvey} and ${later} beyond the uncertainty for ${same.join(", ")}.`,
      );
    if (diff.length) findings.push(`The net change (in %) differed beyond the uncertainty for ${diff.join(", ")}.`);
  }
  for (const ch of c.classChanges)
    findings.push(
      `${ch.name} changed behaviour from “${classWords(ch.from)}” to “${classWords(ch.to)}” in ${ch.survey}.`,
    );
  const iso = [...new Set(c.intrusion.flatMap((r) => r.isohalinesKm.map((h) => h.salinity)))].sort((a, b) => a - b);
  const intrusionTable = {
    caption: "Salt intrusion and isohaline positions against river discharge",
    header: [
      "Survey",
      "Date",
      "River discharge (m³/s)",
      `Salt intrusion, S = ${c.intrusion[0]?.saltIntrusionSalinity ?? 2} (km)`,
      ...iso.map((s) => `S = ${s} (km)`),
    ],
    rows: c.intrusion.map((r) => [
      r.survey,
      r.startDate?.slice(0, 10) ?? "—",
      r.dischargeM3s !== undefined ? formatSignificant(r.dischargeM3s, 3) : "—",
      r.saltIntrusionKm !== undefined ? formatSignificant(r.saltIntrusionKm, 3) : "—",
      ...iso.map((s) => {
        const km = r.isohalinesKm.find((h) => h.salinity === s)?.km;
        return km !== undefined ? formatSignificant(km, 3) : "—";
      }),
    ]),
  };
  const shiftTable = {
    caption: `Changes from ${c.referenceSurvey} (later − reference; approximate 95 % intervals; * = larger than the uncertainty)`,
    header: [
      "Constituent",
      "Survey",
      "Behaviour (reference → survey)",
      "Zone seaward end (km)",
      "Maximum (km)",
      "Maximum (salinity)",
      "C*₀",
      "Net change (percentage points)",
    ],
    rows: c.shifts.map((s) => [
      `${s.name} (${s.unit})`,
      s.survey,
      `${classWords(s.classReference)} → ${classWords(s.classSurvey)}`,
      diffCell(s.zone?.kmSeaward),
      diffCell(s.maximum?.km),
      diffCell(s.maximum?.salinity),
      diffCell(s.effectiveEndmember, s.unit),
      diffCell(s.percentChange),
    ]),
    note: "Positive km = landward (away from the mouth). Intervals of km positions carry only the salinity uncertainty mapped through each survey's salinity profile.",
  };
  const rows = analyses[0]!.constituents.flatMap((c0) =>
    analyses.map((a) => {
      const x = a.constituents.find((k) => k.name === c0.name);
      return {
        label: `${c0.name}, ${a.survey.name}`,
        ...(x?.reactionZone ? { kind: x.reactionZone.kind } : {}),
        km: x?.reactionZone?.km ?? [],
        maximumKm: x?.maximum?.km ?? [],
      };
    }),
  );
  const figures: BriefingFigure[] = [
    {
      id: "cmp-zones",
      size: "wide",
      title: "Reaction zones of the compared surveys",
      caption:
        "Each constituent's reaction zones (bars) and maxima (diamonds) per survey, with each survey's salt intrusion (dashed).",
      svg: zoneStripSvg(
        rows,
        maxKm,
        c.intrusion.flatMap((r) =>
          r.saltIntrusionKm !== undefined
            ? [{ km: r.saltIntrusionKm, label: `S = ${r.saltIntrusionSalinity}, ${r.survey}` }]
            : [],
        ),
        "cmp-zones",
      ),
    },
  ];
  return {
    findings,
    intrusionTable,
    scalingNotes: c.scaling.map((s) => s.note),
    shiftTable,
    figures,
    intervalMethod: c.intervalMethod,
  };
}
