import type { MixingWarning } from "../mixing/result.ts";
import type { ComparableSurvey, DischargeScaling, IntrusionRow, SurveyComparison } from "./types.ts";
import { DIFFERENCE_INTERVAL_METHOD } from "./differenceOfEstimates.ts";
import { dischargeScaling } from "./dischargeScaling.ts";
import { constituentShift } from "./constituentShift.ts";
import { surveyProfile } from "./salinityKm.ts";
import { maxOf } from "../survey/arrayExtent.ts";

/** Options of {@link compareSurveys}. */
export interface CompareOptions {
  /** Index of the reference survey in the input (default 0). */
  referenceIndex?: number;
}

function intrusionRow(a: ComparableSurvey): IntrusionRow {
  const f = a.survey;
  return {
    survey: f.name,
    ...(f.startDate !== undefined ? { startDate: f.startDate } : {}),
    ...(f.riverDischargeM3s !== undefined ? { dischargeM3s: f.riverDischargeM3s } : {}),
    ...(f.saltIntrusionKm !== undefined ? { saltIntrusionKm: f.saltIntrusionKm } : {}),
    saltIntrusionSalinity: f.saltIntrusionSalinity,
    isohalinesKm: f.isohalines.map((h) =>
      h.km.length ? { salinity: h.salinity, km: maxOf(h.km) } : { salinity: h.salinity },
    ),
  };
}

function scalings(rows: IntrusionRow[], warnings: MixingWarning[]): DischargeScaling[] {
  const withQ = rows.filter((r) => r.dischargeM3s !== undefined && r.dischargeM3s > 0);
  const missing = rows.filter((r) => !withQ.includes(r)).map((r) => r.survey);
  if (missing.length)
    warnings.push({
      code: "no-discharge",
      message: `River discharge not given for ${missing.join(", ")}: ${missing.length === 1 ? "it is" : "they are"} left out of the discharge scaling.`,
    });
  const out: DischargeScaling[] = [];
  const s0 = rows[0]?.saltIntrusionSalinity ?? 2;
  const intr = withQ.filter((r) => r.saltIntrusionKm !== undefined && r.saltIntrusionKm > 0);
  const main = dischargeScaling(
    intr.map((r) => ({ dischargeM3s: r.dischargeM3s!, lengthKm: r.saltIntrusionKm! })),
    `salt intrusion (S = ${s0})`,
    s0,
  );
  if (main) out.push(main);
  else if (withQ.length >= 2)
    warnings.push({
      code: "no-scaling",
      message: "Fewer than two surveys with distinct discharges and a salt-intrusion length: no discharge exponent.",
    });
  const shared = (rows[0]?.isohalinesKm ?? []).map((h) => h.salinity).filter((s) => s !== s0);
  for (const s of shared) {
    const pts = withQ.flatMap((r) => {
      const km = r.isohalinesKm.find((h) => h.salinity === s)?.km;
      return km !== undefined && km > 0 ? [{ dischargeM3s: r.dischargeM3s!, lengthKm: km }] : [];
    });
    if (pts.length < withQ.length) continue;
    const sc = dischargeScaling(pts, `isohaline S = ${s}`, s);
    if (sc) out.push(sc);
  }
  return out;
}

/**
 * Compares two or more analysed surveys of the same estuary: salt-intrusion length and
 * isohaline positions against river discharge (with the apparent exponent n of L ∝ Q^n
 * beside the classical −1 and −1/3 and the observed −1/7 scalings), and, for every
 * constituent, the shift of its reaction zone and maximum (salinity and km), the change in
 * C*₀, % change and fluxes with approximate 95 % intervals, and class changes. Every later
 * survey is compared with the reference survey.
 *
 * @param analyses analysed surveys (≥ 2), e.g. the pipeline's SurveyAnalysis objects
 * @param options reference survey index (default 0)
 * @returns the comparison, with warnings for missing discharges, constituents or unit mismatches
 * @throws RangeError with fewer than two surveys or a bad reference index
 * @see bibliography keys hansenRattray1965, chatwin1976, monismith2002 (scalings); boyle1974 (C*₀, fluxes).
 */
export function compareSurveys(analyses: readonly ComparableSurvey[], options: CompareOptions = {}): SurveyComparison {
  if (!Array.isArray(analyses) || analyses.length < 2)
    throw new RangeError(
      `compareSurveys: analyses must hold at least 2 surveys, got ${Array.isArray(analyses) ? analyses.length : typeof analyses}`,
    );
  const refIndex = options.referenceIndex ?? 0;
  if (!Number.isInteger(refIndex) || refIndex < 0 || refIndex >= analyses.length)
    throw new RangeError(
      `compareSurveys: options.referenceIndex must be an integer 0…${analyses.length - 1}, got ${refIndex}`,
    );
  const warnings: MixingWarning[] = [];
  const ordered: ComparableSurvey[] = [analyses[refIndex]!, ...analyses.filter((_, i) => i !== refIndex)];
  const rows = ordered.map(intrusionRow);
  const ref = ordered[0]!;
  const refProfile = surveyProfile(ref);
  const shifts: SurveyComparison["shifts"] = [];
  const classChanges: SurveyComparison["classChanges"] = [];
  for (const later of ordered.slice(1)) {
    const laterProfile = surveyProfile(later);
    for (const ca of ref.constituents) {
      const cb = later.constituents.find((c) => c.name === ca.name);
      if (!cb) {
        warnings.push({
          code: "constituent-missing",
          message: `${ca.name} is in ${ref.survey.name} but not in ${later.survey.name}: not compared.`,
        });
        continue;
      }
      const shift = constituentShift(
        { survey: ref.survey.name, profile: refProfile, analysis: ca },
        { survey: later.survey.name, profile: laterProfile, analysis: cb },
      );
      shifts.push(shift);
      if (shift.classChanged)
        classChanges.push({ name: ca.name, survey: later.survey.name, from: ca.class, to: cb.class });
    }
    for (const cb of later.constituents)
      if (!ref.constituents.some((c) => c.name === cb.name))
        warnings.push({
          code: "constituent-missing",
          message: `${cb.name} is in ${later.survey.name} but not in ${ref.survey.name}: not compared.`,
        });
  }
  return {
    surveys: analyses.map((a) => a.survey.name),
    referenceSurvey: ref.survey.name,
    intrusion: rows,
    scaling: scalings(rows, warnings),
    shifts,
    classChanges,
    intervalMethod: DIFFERENCE_INTERVAL_METHOD,
    warnings,
  };
}
