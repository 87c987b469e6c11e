/**
 * Volumetric reaction rate from the curvature of the C–S curve in a steady 1-D
 * estuary (positive = production/addition, negative = removal):
 *
 * R = −K·(dS/dx)²·C'' = −[Q·(S − S_r)/A]·(dS/dx)·C'' = −[Q²·(S − S_r)²/(K·A²)]·C''.
 *
 * Give any two of {A, K, dS/dx} (with Q where needed); the salt balance
 * K·A·dS/dx = Q·(S − S_r) (Eq. 2′) links them.
 *
 * @param p.salinity S; p.riverSalinity S_r
 * @param p.d2 d²C/dS² [unit per salinity²]
 * @param p.dischargeM3s Q [m³/s]
 * @param p.crossSectionM2 A [m²]
 * @param p.dispersionM2s K [m²/s]
 * @param p.gradientPerM |dS/dx| [per m]
 * @returns R [unit/s] (µmol/L/s = mmol m⁻³ s⁻¹)
 * @throws RangeError when too few physical inputs are given or an input is not positive
 * @see bibliography keys boyle1974, officer1979.
 */
export function reactionRate(p: {
  salinity: number;
  riverSalinity?: number;
  d2: number;
  dischargeM3s?: number;
  crossSectionM2?: number;
  dispersionM2s?: number;
  gradientPerM?: number;
}): number {
  const sr = p.riverSalinity ?? 0;
  const ds = p.salinity - sr;
  for (const [k, v] of Object.entries({
    dischargeM3s: p.dischargeM3s,
    crossSectionM2: p.crossSectionM2,
    dispersionM2s: p.dispersionM2s,
    gradientPerM: p.gradientPerM,
  }))
    if (v !== undefined && !(v > 0 && Number.isFinite(v)))
      throw new RangeError(`reactionRate: ${k} must be > 0, got ${v}`);
  if (!Number.isFinite(p.d2)) throw new RangeError(`reactionRate: d2 must be finite, got ${p.d2}`);
  const { dischargeM3s: q, crossSectionM2: a, dispersionM2s: k, gradientPerM: g } = p;
  if (k !== undefined && g !== undefined) return -k * g * g * p.d2;
  if (q !== undefined && a !== undefined && g !== undefined) return -((q * ds) / a) * g * p.d2;
  if (q !== undefined && a !== undefined && k !== undefined) return -((q * q * ds * ds) / (k * a * a)) * p.d2;
  throw new RangeError(
    "reactionRate: give dispersionM2s + gradientPerM, or dischargeM3s + crossSectionM2 with gradientPerM or dispersionM2s",
  );
}
