/**
 * Chlorinity, Knudsen salinity and Reference Salinity, each related to practical salinity SP.
 */

/** SP/Cl ratio 1.80655 (Wooster, Lee & Dietrich 1969; GSW-C `gsw_soncl`). */
export const SALINITY_PER_CHLORINITY = 1.80655;
/** Reference Salinity of SP = 35 seawater, 35.16504 g/kg (Millero et al. 2008; GSW-C `gsw_sso`). */
export const REFERENCE_SALINITY_35_G_KG = 35.16504;
/** u_PS = 35.16504/35 g/kg, Reference Salinity per unit practical salinity. */
export const U_PS_G_KG = REFERENCE_SALINITY_35_G_KG / 35;

function check(fn: string, name: string, v: number, min: number): void {
  if (typeof v !== "number" || !Number.isFinite(v))
    throw new TypeError(`${fn}: ${name} must be a finite number, got ${String(v)}`);
  if (v < min) throw new RangeError(`${fn}: ${name} must be ≥ ${min}, got ${v}`);
}

/**
 * Practical salinity from chlorinity, S = 1.80655·Cl.
 * @param chlorinityGKg chlorinity [g/kg, ‰]
 * @returns practical salinity
 * @throws {TypeError|RangeError} for non-finite or negative input
 * @see Wooster, W.S., Lee, A.J., Dietrich, G., 1969. Redefinition of salinity. Deep-Sea Res. 16, 321 (from memory); GSW-C `gsw_soncl`.
 */
export function salinityFromChlorinity(chlorinityGKg: number): number {
  check("salinityFromChlorinity", "chlorinityGKg", chlorinityGKg, 0);
  return SALINITY_PER_CHLORINITY * chlorinityGKg;
}

/**
 * Chlorinity from practical salinity, Cl = S/1.80655.
 * @param salinity practical salinity
 * @returns chlorinity [g/kg, ‰]
 * @throws {TypeError|RangeError} for non-finite or negative input
 * @see Wooster, Lee & Dietrich (1969); GSW-C `gsw_soncl`.
 */
export function chlorinityFromSalinity(salinity: number): number {
  check("chlorinityFromSalinity", "salinity", salinity, 0);
  return salinity / SALINITY_PER_CHLORINITY;
}

/**
 * Reference Salinity SR = (35.16504/35)·SP, the absolute salinity of Reference-Composition seawater.
 * @param salinity practical salinity SP
 * @returns Reference Salinity [g/kg]
 * @throws {TypeError|RangeError} for non-finite or negative input
 * @see Millero, F.J., Feistel, R., Wright, D.G., McDougall, T.J., 2008. Deep-Sea Res. I 55, 50–72 (eq. 7.2).
 */
export function referenceSalinityFromPractical(salinity: number): number {
  check("referenceSalinityFromPractical", "salinity", salinity, 0);
  return U_PS_G_KG * salinity;
}

/**
 * Practical salinity from Knudsen salinity, SP = (SK − 0.03)·1.80655/1.805.
 * @param knudsenSalinityPermil Knudsen salinity [‰]
 * @returns practical salinity
 * @throws {TypeError|RangeError} for non-finite input or SK < 0.03
 * @see IOC, SCOR, IAPSO, 2010. TEOS-10 Manual (GSW `gsw_SP_from_SK`).
 */
export function practicalSalinityFromKnudsen(knudsenSalinityPermil: number): number {
  check("practicalSalinityFromKnudsen", "knudsenSalinityPermil", knudsenSalinityPermil, 0.03);
  return ((knudsenSalinityPermil - 0.03) * SALINITY_PER_CHLORINITY) / 1.805;
}
