import type { MixingWarning } from "./result.ts";
import type { MixingSample, Precision } from "./options.ts";
import { sigmaOf } from "./precision.ts";

/** Largest |concentration| accepted: beyond it no unit gives a physical value and sums overflow. */
export const MAX_ABS_CONC = 1e100;

/** Smallest σ as a fraction of the largest |concentration| (keeps weights finite). */
export const SIGMA_FLOOR_FRACTION = 1e-6;

/** A sample ready for fitting, sorted by salinity. */
export interface PreparedSample {
  stationId: string;
  salinity: number;
  /** Value used (the substitute for censored values). */
  conc: number;
  censored: boolean;
  /** Standard deviation used for weights and significance [unit]. */
  sigma: number;
}

/**
 * Cleans the samples for the mixing analysis: drops QC-rejected and non-finite
 * entries (with a warning), substitutes below-detection values and sorts by salinity.
 *
 * Below detection (documented rule): when the detection limit DL is known the value
 * used is `censoredFraction`·DL (default DL/2) with σ = max(σ_analytical, DL/√12), the
 * standard deviation of a value spread evenly over [0, DL]; otherwise the caller's
 * substitute is used. A "censored-substituted" warning always says which.
 *
 * @param fn name of the public function (for error messages)
 * @param samples observations
 * @param precision analytical precision
 * @param censoredFraction substitute as a fraction of DL (0 < f ≤ 1)
 * @returns prepared samples (ascending salinity), counts and warnings
 * @throws TypeError when samples is not an array; RangeError for a bad censoredFraction
 */
export function prepareSamples(
  fn: string,
  samples: readonly MixingSample[],
  precision: Precision,
  censoredFraction: number,
): {
  used: PreparedSample[];
  nCensored: number;
  nRejected: number;
  warnings: MixingWarning[];
} {
  if (!Array.isArray(samples)) throw new TypeError(`${fn}: samples must be an array, got ${typeof samples}`);
  if (!(censoredFraction > 0 && censoredFraction <= 1))
    throw new RangeError(`${fn}: censoredFraction must be in (0, 1], got ${censoredFraction}`);
  const warnings: MixingWarning[] = [];
  const used: PreparedSample[] = [];
  let nRejected = 0;
  let nCensored = 0;
  let nCallerSubstitute = 0;
  const invalid: string[] = [];
  for (const s of samples) {
    if (!s.accepted) {
      nRejected++;
      continue;
    }
    let conc = s.conc;
    let sigma = 0;
    if (s.censored) {
      nCensored++;
      if (s.detectionLimit !== undefined && Number.isFinite(s.detectionLimit) && s.detectionLimit > 0) {
        conc = censoredFraction * s.detectionLimit;
        sigma = s.detectionLimit / Math.sqrt(12);
      } else nCallerSubstitute++;
    }
    if (!Number.isFinite(s.salinity) || !Number.isFinite(conc) || s.salinity < 0 || Math.abs(conc) > MAX_ABS_CONC) {
      invalid.push(`${s.stationId} (S = ${s.salinity}, C = ${s.conc})`);
      continue;
    }
    used.push({
      stationId: s.stationId,
      salinity: s.salinity,
      conc,
      censored: s.censored,
      sigma: Math.max(sigma, sigmaOf(precision, conc)),
    });
  }
  used.sort((a, b) => a.salinity - b.salinity);
  // σ floor: a zero σ (zero concentration with no absolute precision) would give an infinite weight.
  const scale = used.reduce((m, s) => Math.max(m, Math.abs(s.conc)), 0);
  const floor = scale > 0 && Number.isFinite(scale) ? SIGMA_FLOOR_FRACTION * scale : 1;
  for (const s of used) if (!(s.sigma >= floor)) s.sigma = floor;
  if (invalid.length > 0)
    warnings.push({
      code: "invalid-sample",
      message: `${invalid.length} sample(s) left out because salinity or concentration is not a valid number (or |C| > 1e100): ${invalid.slice(0, 5).join(", ")}${invalid.length > 5 ? ", …" : ""}.`,
    });
  if (nCensored > 0) {
    const rule = `${Math.round(censoredFraction * 100)} % of the detection limit (DL${censoredFraction === 0.5 ? "/2" : ""}), weighted with σ = DL/√12`;
    warnings.push({
      code: "censored-substituted",
      message: `${nCensored} value(s) below detection were replaced by ${rule}${nCallerSubstitute > 0 ? `; ${nCallerSubstitute} without a stated limit keep the substitute supplied with the data` : ""}. They were never treated as zero.`,
    });
  }
  return { used, nCensored, nRejected, warnings };
}
