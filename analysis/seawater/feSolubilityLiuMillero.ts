/**
 * Ionic strength of seawater as used by Liu & Millero (2002): I = 19.9225·S/(1000 − 1.005·S).
 * @param salinity practical salinity (0…50)
 * @returns ionic strength [mol/kg-H2O]
 * @throws {RangeError} for salinity outside 0…50
 * @see Liu, X., Millero, F.J., 2002. Mar. Chem. 77, 43–54 (abstract).
 */
export function ionicStrengthLiuMillero2002(salinity: number): number {
  if (!Number.isFinite(salinity) || salinity < 0 || salinity > 50) {
    throw new RangeError(`ionicStrengthLiuMillero2002: salinity must be within 0…50, got ${salinity}`);
  }
  return (19.9225 * salinity) / (1000 - 1.005 * salinity);
}

/**
 * Solubility of Fe(III) in seawater near pH 8 by the empirical fit of Liu & Millero (2002):
 * log[Fe(III)] = −10.53 + 322.5/T − 2.524·I^½ + 2.921·I (T in K, I from {@link ionicStrengthLiuMillero2002}).
 * About 0.33 nmol/kg at S = 35 and 25 °C (the paper reports 0.3–0.5 nM in seawater at pH ≈ 8).
 * Fitted in seawater; in brackish water it is an extrapolation.
 * @param salinity practical salinity
 * @param temperatureC temperature [°C] (fit range 5–50 °C, from memory)
 * @returns dissolved Fe(III) at saturation [nmol/kg]
 * @throws {RangeError} for salinity outside 0…50 or a non-finite temperature
 * @see Liu, X., Millero, F.J., 2002. The solubility of iron in seawater. Mar. Chem. 77, 43–54, doi:10.1016/S0304-4203(01)00074-3.
 */
export function feSolubilityLiuMillero2002NmolKg(salinity: number, temperatureC: number): number {
  if (!Number.isFinite(temperatureC)) {
    throw new RangeError(`feSolubilityLiuMillero2002NmolKg: temperatureC must be finite, got ${temperatureC}`);
  }
  const i = ionicStrengthLiuMillero2002(salinity);
  const log = -10.53 + 322.5 / (temperatureC + 273.15) - 2.524 * Math.sqrt(i) + 2.921 * i;
  return Math.pow(10, log) * 1e9;
}
