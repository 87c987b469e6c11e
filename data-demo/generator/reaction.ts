/**
 * Prescribed reactions, written as the effective river end-member C*₀(S).
 *
 * By the flux relation of Boyle et al. (1974) §1.2 the net seaward flux through the section at salinity S
 * is F = Q·C*₀(S) with C*₀(S) = C − (S − S_r)·dC/dS, and by Eq. 5 the reaction integrated between
 * two sections equals Q·[C*₀(S₂) − C*₀(S₁)]. The generator therefore prescribes each reaction as
 *   C*₀(S) = C_r + Δ·G(S),
 * with G rising smoothly from 0 at the landward end of the reaction zone (S_from) to 1 at its
 * seaward end (S_to), and feeds the solver the matching production per control volume
 *   P_i = Q·[C*₀(S_{i−1/2}) − C*₀(S_{i+1/2})],
 * which is the discrete form of A·R = −Q·dC*₀/dx (x landward). The rate follows Eq. 4,
 * R = −K·(dS/dx)²·d²C/dS²: removal where the C–S curve is concave up, addition where concave down.
 * Beyond S_to the constituent mixes conservatively and C*₀ is constant = C_r + Δ.
 *
 * @see Boyle, E. et al. (1974) Geochim. Cosmochim. Acta 38, 1719–1728
 */

/** One prescribed reaction. */
export interface ReactionSpec {
  /** Net change of the effective river end-member, C*₀(mouth) − C_r (concentration units). */
  deltaConc: number;
  /** Salinity where the reaction starts (landward end of the zone). */
  fromSalinity: number;
  /** Salinity where the reaction is complete (seaward end of the zone). */
  toSalinity: number;
  /**
   * Shape exponent p: G uses u^p with u the position in the zone; p < 1 front-loads the
   * reaction toward low salinity (as for Fe flocculation), p = 1 is symmetric.
   */
  shape: number;
}

/** Smooth 0→1 step (C²: 6u⁵ − 15u⁴ + 10u³) of the position in the reaction zone. */
export function reactionProgress(spec: ReactionSpec, salinity: number): number {
  const u = (salinity - spec.fromSalinity) / (spec.toSalinity - spec.fromSalinity);
  if (u <= 0) return 0;
  if (u >= 1) return 1;
  const v = u ** spec.shape;
  return v * v * v * (v * (6 * v - 15) + 10);
}

/** C*₀(S) = C_r + Δ·G(S) for a river end-member C_r and an optional reaction (none = conservative). */
export function effectiveEndmemberAt(riverConc: number, spec: ReactionSpec | undefined, salinity: number): number {
  return spec ? riverConc + spec.deltaConc * reactionProgress(spec, salinity) : riverConc;
}

/**
 * Production per control volume for the solver, P_i = Q·[C*₀(Ŝ_{i−1/2}) − C*₀(Ŝ_{i+1/2})],
 * where Ŝ at a face is the mean of the two adjacent nodal salinities.
 *
 * @param salinity nodal salinity (N+1 values, mouth first)
 * @param dischargeM3s river discharge [m³/s]
 * @param riverConc river end-member
 * @param spec the reaction
 */
export function productionPerNode(
  salinity: number[],
  dischargeM3s: number,
  riverConc: number,
  spec: ReactionSpec,
): number[] {
  const n = salinity.length - 1;
  const faceStar: number[] = [];
  for (let i = 0; i < n; i++) {
    faceStar.push(effectiveEndmemberAt(riverConc, spec, (salinity[i] + salinity[i + 1]) / 2));
  }
  const p = new Array<number>(n + 1).fill(0);
  for (let i = 1; i < n; i++) p[i] = dischargeM3s * (faceStar[i - 1] - faceStar[i]);
  return p;
}
