import type { Endmember, MixingWarning } from "./result.ts";
import type { AnalyzeOptions } from "./options.ts";
import { minOf, maxOf } from "../survey/arrayExtent.ts";

/** River variability counts when it exceeds this fraction of C₀ (and 2σ analytical). */
export const RIVER_VARIABILITY_FRACTION = 0.1;
/** Lowest station salinity above which the river end is called unsampled. */
export const RIVER_END_MAX_S = 1;
/** Highest station salinity below which the seaward end is called unsampled. */
export const SEA_END_MIN_S = 20;

/** Warning codes that set the analysis confidence to "low". */
export const LOW_CONFIDENCE_CODES = new Set([
  "endmember-variability",
  "river-extrapolation-unstable",
  "few-stations-in-zone",
  "salinity-range",
  "non-monotonic-salinity",
  "few-stations",
]);

/**
 * End-member variability against flushing time (Loder & Reichard 1981): a conservative
 * constituent gives a curved C–S plot when the river concentration changes within about one
 * flushing time; a falling river value mimics addition, a rising one removal
 * (@see bibliography keys loderReichard1981, cifuentes1990). Checks (a) several river samples that disagree and
 * (b) a river history within the flushing time.
 *
 * @param river river end-member (with its samples' sd)
 * @param sigma analytical σ at C₀
 * @param opts options (riverHistory, flushingTimeDays)
 * @returns warnings and a widened river sd (the spread within the flushing time), or undefined
 * @see Loder, T.C. & Reichard, R.P. (1981) Estuaries 4, 64–69 (from memory); Cifuentes et al. (1990) ECSS 30, 411–427.
 */
export function riverVariability(
  river: Endmember,
  sigma: number,
  opts: AnalyzeOptions,
): { warnings: MixingWarning[]; widenedSd?: number } {
  const warnings: MixingWarning[] = [];
  const limit = Math.max(2 * sigma, RIVER_VARIABILITY_FRACTION * Math.abs(river.conc));
  let widenedSd: number | undefined;
  const u = opts.unit;
  if (river.source === "data" && river.n >= 2 && river.concSd > limit / 2) {
    warnings.push({
      code: "endmember-variability",
      message: `The ${river.n} river samples disagree (sd ${fmt(river.concSd)} ${u} on a mean of ${fmt(river.conc)} ${u}). If the river concentration changed within about one flushing time, a conservative constituent can look removed or added (Loder & Reichard 1981); treat the class and % change with caution.`,
    });
  }
  const hist = opts.riverHistory ?? [];
  if (hist.length > 0) {
    const tf = opts.flushingTimeDays;
    const inWindow = hist.filter((h) => h.daysBeforeSurvey >= 0 && (tf === undefined || h.daysBeforeSurvey <= tf));
    const values = [river.conc, ...inWindow.map((h) => h.conc)];
    const range = maxOf(values) - minOf(values);
    if (range > limit) {
      const mean = values.reduce((a, b) => a + b, 0) / values.length;
      widenedSd = Math.sqrt(values.reduce((a, b) => a + (b - mean) ** 2, 0) / Math.max(1, values.length - 1));
      warnings.push({
        code: "endmember-variability",
        message: `The river concentration changed by ${fmt(range)} ${u} (${fmt((100 * range) / Math.abs(river.conc))} % of C₀) within ${tf !== undefined ? `the flushing time of ${fmt(tf)} d` : "the supplied history"}. The C–S curve then records the river's history, not only reactions: a falling river value mimics addition, a rising one removal (Loder & Reichard 1981). The % change interval includes this spread; do not read it as a confident reaction.`,
      });
    }
  } else if (opts.flushingTimeDays !== undefined && river.n < 2) {
    warnings.push({
      code: "endmember-history-unknown",
      message: `Flushing time ${fmt(opts.flushingTimeDays)} d given but no river history or repeated river samples: river variability over that time cannot be checked.`,
    });
  }
  return { warnings, widenedSd };
}

/**
 * Survey-design pitfalls: salinity range, station count, non-monotonic S(x), and the
 * always-present reminder that one survey is a snapshot (Officer 1979; Regnier et al. 1998).
 *
 * @param sMin lowest station salinity; sMax highest; n number of stations
 * @param opts options (salinityNonMonotonic flag)
 * @returns warnings
 * @see Regnier, P., Mouchet, A., Wollast, R., Ronday, F. (1998) Cont. Shelf Res. 18, 1543–1571.
 */
export function surveyPitfalls(sMin: number, sMax: number, n: number, opts: AnalyzeOptions): MixingWarning[] {
  const w: MixingWarning[] = [];
  if (sMin > RIVER_END_MAX_S || sMax < SEA_END_MIN_S)
    w.push({
      code: "salinity-range",
      message: `Stations span S = ${fmt(sMin)}–${fmt(sMax)}, which does not cover the estuary from river (S < ${RIVER_END_MAX_S}) to sea (S ≥ ${SEA_END_MIN_S}); end-members are extrapolated and reactions outside the range are missed.`,
    });
  if (n < 8)
    w.push({
      code: "few-stations",
      message: `Only ${n} stations: curvature and reaction zones are poorly constrained.`,
    });
  if (opts.salinityNonMonotonic)
    w.push({
      code: "non-monotonic-salinity",
      message:
        "Salinity does not increase monotonically seaward along the channel (side inputs, a second branch or a tidal snapshot); a salinity interval can map to several channel stretches and the two-end-member model may not apply.",
    });
  w.push({
    code: "steady-state-assumed",
    message:
      "One survey is a snapshot: the mixing analysis assumes steady river flow, end-members and reactions over at least one flushing time, which a single survey cannot prove (Officer 1979; Regnier et al. 1998). Screening analysis, not a compliance assessment.",
  });
  return w;
}

function fmt(v: number): string {
  return Math.abs(v) >= 100 ? v.toFixed(0) : Math.abs(v) >= 1 ? v.toFixed(2) : v.toPrecision(3);
}
