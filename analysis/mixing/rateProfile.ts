import type { MixingWarning, RateProfile } from "./result.ts";
import type { AnalyzeOptions } from "./options.ts";
import { reactionRate } from "./reactionRate.ts";
import { toMolPerM3 } from "./units.ts";

/** Salinity step for the numerical dS/dx from the km callback. */
const DS = 0.25;

/** |dS/dx| [per m] at S from the salinity→km callback (first crossing), or undefined. */
function gradientFromKm(toKm: (s: number) => number[], s: number, sMin: number, sMax: number): number | undefined {
  const a = Math.max(sMin, s - DS);
  const b = Math.min(sMax, s + DS);
  const xa = toKm(a)[0];
  const xb = toKm(b)[0];
  if (xa === undefined || xb === undefined || xa === xb) return undefined;
  return (b - a) / (Math.abs(xb - xa) * 1000);
}

/**
 * Reaction-rate profile R(S) on a grid from the river reference salinity S_r (Eq. 4) with the
 * integrated check ∫A·R dx = Q·(C*₀ − C₀) (Eq. 5): the rates from the curve's curvature, integrated
 * from S_r (where the integrand vanishes) to the seaward end, against the net change from the
 * tangent-method C*₀ and the river value C₀. The integral is taken over salinity,
 * A·R·(dx/dS), with A from the option or, when only K is given, from Eq. 2′
 * (A = Q·(S − S_r)/(K·dS/dx)).
 *
 * @param grid salinity grid starting at or above S_r; d2 C'' on the grid
 * @param riverSalinity S_r
 * @param opts analysis options (Q, A or K, gradient source, unit)
 * @param effective tangent-method C*₀ (seaward end of Eq. 5)
 * @param riverConc C₀ at S_r
 * @returns the profile, or undefined (with a warning) when inputs are missing
 * @see bibliography keys officer1979, kaulFroelich1984 (curvature–rate relation; derived and checked numerically in tests/mixing).
 */
export function rateProfile(
  grid: Float64Array,
  d2: Float64Array,
  riverSalinity: number,
  opts: AnalyzeOptions,
  effective: number,
  riverConc: number,
): { profile?: RateProfile; warnings: MixingWarning[] } {
  const q = opts.riverDischargeM3s;
  const { crossSectionM2: aOpt, dispersionM2s: kOpt } = opts;
  if (q === undefined || (aOpt === undefined && kOpt === undefined)) return { warnings: [] };
  const G = grid.length;
  const sMin = grid[0]!;
  const sMax = grid[G - 1]!;
  const val = (v: number | ((s: number) => number) | undefined, s: number): number | undefined =>
    typeof v === "function" ? v(s) : v;
  const gradAt = (s: number): number | undefined =>
    opts.salinityGradientPerM?.(s) ??
    (opts.salinityToKmPoint ? gradientFromKm(opts.salinityToKmPoint, s, sMin, sMax) : undefined);
  const bothAK = aOpt !== undefined && kOpt !== undefined;
  if (!bothAK && gradAt(0.5 * (sMin + sMax)) === undefined)
    return {
      warnings: [
        {
          code: "rate-needs-gradient",
          message:
            "The reaction-rate profile needs dS/dx (a salinity-gradient function or the channel geometry) when only one of cross-section and dispersion is given; no profile computed.",
        },
      ],
    };
  const fac = toMolPerM3(opts.unit, 1000);
  const salinity: number[] = [];
  const rate: number[] = [];
  let integral = 0;
  // The integrand A·R·dx/dS = −Q·(S − S_r)·C'' vanishes at S_r: the integral starts there.
  let prevS = riverSalinity;
  let prevAR = 0;
  let first = -1;
  let last = -1;
  for (let i = 0; i < G; i++) {
    const s = grid[i]!;
    if (s - riverSalinity <= 1e-9) continue;
    const a = val(aOpt, s);
    const k = val(kOpt, s);
    const g = bothAK ? undefined : gradAt(s);
    const r = reactionRate({
      salinity: s,
      riverSalinity,
      d2: d2[i]!,
      dischargeM3s: q,
      crossSectionM2: a,
      dispersionM2s: k,
      gradientPerM: g,
    });
    salinity.push(s);
    rate.push(r);
    // A·R·dx/dS; by Eq. 2′ this equals −Q·(S − S_r)·C'' whichever inputs were given.
    const gUse = g ?? (q * (s - riverSalinity)) / (k! * a!);
    const aUse = a ?? (q * (s - riverSalinity)) / (k! * gUse);
    const ar = (aUse * r) / gUse;
    if (first < 0) first = i;
    if (prevS >= riverSalinity && s > prevS) integral += 0.5 * (ar + prevAR) * (s - prevS);
    prevS = s;
    prevAR = ar;
    last = i;
  }
  if (first < 0 || last <= first) return { warnings: [] };
  const toMol = fac ?? 1;
  const integratedMolS = integral * toMol;
  const expectedMolS = q * (effective - riverConc) * toMol;
  return {
    profile: {
      salinity,
      rate,
      unit: `${opts.unit}/s`,
      formula: bothAK ? "Q,A,K" : aOpt !== undefined ? "Q,A,dS/dx" : "K,dS/dx",
      integratedMolS,
      expectedMolS,
      relativeDifference: Math.abs(integratedMolS - expectedMolS) / Math.max(Math.abs(expectedMolS), 1e-30),
    },
    warnings:
      fac === undefined
        ? [
            {
              code: "rate-unit",
              message: `"${opts.unit}" is not a molar unit; the integrated check is in ${opts.unit}·m³/s, not mol/s.`,
            },
          ]
        : [],
  };
}
