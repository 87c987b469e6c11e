/** Gas constant [J/(mol·K)] (CODATA). */
export const GAS_CONSTANT_J_MOL_K = 8.314462618;
/** Thermochemical calorie [J]. */
export const JOULES_PER_KCAL = 4184;
/** 25 °C in kelvin. */
export const T25_K = 298.15;

/**
 * van 't Hoff extrapolation of log K from 25 °C with a constant reaction enthalpy:
 * log K(T) = log K(298.15) − ΔH/(R ln 10)·(1/T − 1/298.15).
 * @param logK25 log10 K at 25 °C
 * @param deltaHKcalMol reaction enthalpy [kcal/mol]
 * @param temperatureC temperature [°C]
 * @returns log10 K at temperatureC
 * @see Stumm, W., Morgan, J.J., 1996. Aquatic Chemistry, 3rd ed. (van 't Hoff equation; from memory).
 */
export function vantHoffLogK(logK25: number, deltaHKcalMol: number, temperatureC: number): number {
  const t = temperatureC + 273.15;
  return logK25 - ((deltaHKcalMol * JOULES_PER_KCAL) / (GAS_CONSTANT_J_MOL_K * Math.LN10)) * (1 / t - 1 / T25_K);
}
