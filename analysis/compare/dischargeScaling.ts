import jStat from "jstat";
import type { DischargeScaling, ReferenceScaling } from "./types.ts";
import { formatFixed } from "../output/formatNumber.ts";
import { minOf, maxOf } from "../survey/arrayExtent.ts";

/** Published discharge scalings of the salt-intrusion length L ∝ Q^n (@see bibliography keys hansenRattray1965, chatwin1976, monismith2002). */
export const REFERENCE_SCALINGS: readonly ReferenceScaling[] = [
  {
    exponent: -1,
    label: "classical, constant dispersion K (steady 1-D advection–dispersion)",
    source: "derived: steady 1-D advection–dispersion with constant dispersion, L = (K/U)·ln(S₀/S*) ∝ 1/Q",
  },
  {
    exponent: -1 / 3,
    label: "classical, dispersion from gravitational circulation",
    source: "method after Hansen & Rattray (1965); Chatwin (1976) (bibliography keys hansenRattray1965, chatwin1976)",
  },
  {
    exponent: -1 / 7,
    label: "observed, X2 in northern San Francisco Bay (stratified)",
    source: "method after Monismith et al. (2002) J. Phys. Oceanogr. 32, 3003–3019 (bibliography key monismith2002)",
  },
];

function describe(n: number): string {
  const [k1, k3, k7] = [-1, -1 / 3, -1 / 7];
  if (n > 0)
    return "Intrusion grew with discharge here, opposite to every steady scaling: other differences between the surveys (tide, wind, sampling) dominate.";
  if (n < k1) return "Steeper than even the constant-dispersion −1 scaling.";
  if (n <= k3) return "Between the constant-dispersion −1 and the gravitational-circulation −1/3 scalings.";
  if (n <= k7) return "Between the classical −1/3 and the −1/7 observed in northern San Francisco Bay.";
  return "Weaker than the −1/7 observed in northern San Francisco Bay.";
}

/**
 * Apparent exponent n of L ∝ Q^n from two or more surveys: least-squares slope of ln L on ln Q
 * (with two surveys n = ln(L₂/L₁)/ln(Q₂/Q₁) exactly). With three or more surveys the 95 % interval
 * is slope ± t₀.₉₇₅,ₙ₋₂·SE. The result is set beside the classical −1 (constant K) and −1/3
 * (gravitational circulation) scalings and the observed −1/7 (northern San Francisco Bay).
 *
 * @param points per survey: discharge Q [m³/s] (> 0) and length L [km] (> 0)
 * @param quantity what L is, for the note (e.g. "salt intrusion (S = 2)")
 * @param salinity isohaline salinity of L
 * @returns the scaling, or undefined with fewer than 2 usable points or a single discharge
 * @throws RangeError for non-positive discharge or length
 * @see bibliography keys hansenRattray1965, chatwin1976, monismith2002.
 */
export function dischargeScaling(
  points: ReadonlyArray<{ dischargeM3s: number; lengthKm: number }>,
  quantity: string,
  salinity: number,
): DischargeScaling | undefined {
  for (const p of points) {
    if (!(p.dischargeM3s > 0))
      throw new RangeError(`dischargeScaling: dischargeM3s must be > 0 m³/s, got ${p.dischargeM3s}`);
    if (!(p.lengthKm > 0)) throw new RangeError(`dischargeScaling: lengthKm must be > 0 km, got ${p.lengthKm}`);
  }
  const n = points.length;
  if (n < 2) return undefined;
  const x = points.map((p) => Math.log(p.dischargeM3s));
  const y = points.map((p) => Math.log(p.lengthKm));
  const mx = x.reduce((a, b) => a + b, 0) / n;
  const my = y.reduce((a, b) => a + b, 0) / n;
  let sxx = 0;
  let sxy = 0;
  for (let i = 0; i < n; i++) {
    sxx += (x[i]! - mx) ** 2;
    sxy += (x[i]! - mx) * (y[i]! - my);
  }
  if (!(sxx > 1e-12)) return undefined;
  const slope = sxy / sxx;
  const qs = points.map((p) => p.dischargeM3s);
  const out: DischargeScaling = {
    quantity,
    salinity,
    exponent: slope,
    nSurveys: n,
    dischargeRangeM3s: [minOf(qs), maxOf(qs)],
    references: [...REFERENCE_SCALINGS],
    note: "",
  };
  let limits: string;
  if (n >= 3) {
    let rss = 0;
    for (let i = 0; i < n; i++) rss += (y[i]! - my - slope * (x[i]! - mx)) ** 2;
    const se = Math.sqrt(rss / (n - 2) / sxx);
    const t = jStat.studentt.inv(0.975, n - 2);
    out.lower = slope - t * se;
    out.upper = slope + t * se;
    limits = `Fitted to ${n} surveys; 95 % interval ${formatFixed(out.lower, 2)} to ${formatFixed(out.upper, 2)}.`;
  } else {
    limits = "Two surveys fix n exactly and give no estimate of its uncertainty.";
  }
  out.note =
    `Apparent n = ${formatFixed(slope, 2)} for ${quantity} (L ∝ Qⁿ). ${describe(slope)} ${limits} ` +
    "Surveys also differ in tide, wind and season, so n is descriptive of these surveys, not a property of the estuary. " +
    "Reference scalings: −1 and −1/3 are classical theory; −1/7 is an observation from one estuary.";
  return out;
}
