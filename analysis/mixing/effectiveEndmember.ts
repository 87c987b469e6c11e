/**
 * Local effective river end-member (apparent zero end-member): the intercept, at
 * the river salinity S_r, of the tangent to the C–S curve at salinity S,
 * C*₀(S) = C(S) − (S − S_r)·dC/dS. The net flux through that section is Q·C*₀(S).
 *
 * @param conc C at S [unit]
 * @param dcds dC/dS at S [unit per salinity unit]
 * @param salinity S
 * @param riverSalinity S_r (default 0)
 * @returns C*₀(S) [unit]
 * @throws RangeError for non-finite input
 * @see Boyle, E., Collier, R., Dengler, A.T., Edmond, J.M., Ng, A.C., Stallard, R.F. (1974)
 *      On the chemical mass-balance in estuaries. GCA 38, 1719–1728 (bibliography key boyle1974).
 */
export function effectiveEndmemberAt(conc: number, dcds: number, salinity: number, riverSalinity = 0): number {
  for (const [k, v] of Object.entries({ conc, dcds, salinity, riverSalinity }))
    if (!Number.isFinite(v)) throw new RangeError(`effectiveEndmemberAt: ${k} must be finite, got ${v}`);
  return conc - (salinity - riverSalinity) * dcds;
}

/**
 * Percent change of the river input across the estuary, 100·(C*₀ − C₀)/C₀.
 * NEGATIVE = net removal, POSITIVE = net addition.
 *
 * @param effective C*₀ [unit]
 * @param river C₀ [unit], > 0
 * @returns percent change [%]
 * @throws RangeError when C₀ ≤ 0 or an input is not finite
 * @see bibliography key boyle1974.
 */
export function percentChange(effective: number, river: number): number {
  if (!Number.isFinite(effective)) throw new RangeError(`percentChange: effective must be finite, got ${effective}`);
  if (!(river > 0)) throw new RangeError(`percentChange: river end-member must be > 0, got ${river}`);
  return (100 * (effective - river)) / river;
}
