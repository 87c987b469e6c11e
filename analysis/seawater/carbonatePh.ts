import { carbonateConstantsAt } from "./carbonateConstantsAt.ts";
import type { CarbonateConstants, CarbonateK1K2Set } from "./carbonateConstants.ts";

/** Carbonate-system state solved from TA and DIC. */
export interface CarbonateState {
  /** pH on the total scale (−log([H⁺]_F + [HSO4⁻])). */
  pHTotal: number;
  /** pH on the free and seawater scales (same water). */
  pHFree: number;
  pHSws: number;
  /** Carbonate species [µmol/kg]. */
  co2UmolKg: number;
  hco3UmolKg: number;
  co3UmolKg: number;
  constants: CarbonateConstants;
  warnings: string[];
}

/**
 * Total alkalinity implied by [H⁺]_T for a given DIC: carbonate + borate + hydroxide − free H⁺ − HSO4⁻ − HF
 * (no phosphate, silicate or organic alkalinity).
 * @param hTotal [H⁺] on the total scale [mol/kg]
 * @param dicMolKg dissolved inorganic carbon [mol/kg]
 * @param c constants from carbonateConstantsAt
 * @returns total alkalinity [mol/kg]
 * @see Dickson, A.G., Sabine, C.L., Christian, J.R., 2007. PICES Spec. Publ. 3, ch. 2 (TA definition; from memory).
 */
export function alkalinityAt(hTotal: number, dicMolKg: number, c: CarbonateConstants): number {
  const h = hTotal;
  const hFree = h * c.totalToFree;
  const carb = (dicMolKg * c.k1Total * (h + 2 * c.k2Total)) / (h * h + c.k1Total * h + c.k1Total * c.k2Total);
  const borate = (c.borateTotalMolKg * c.kbTotal) / (c.kbTotal + h);
  const hso4 = c.sulfateTotalMolKg / (1 + c.ksFree / hFree);
  const hf = c.fluorideTotalMolKg / (1 + c.kfFree / hFree);
  return carb + borate + c.kwTotal / h - hFree - hso4 - hf;
}

/**
 * Solves pH (total scale) from total alkalinity and dissolved inorganic carbon by bisection on pH in
 * [2, 12] to 1e-10: TA = DIC·K1(h + 2K2)/(h² + K1h + K1K2) + B_T·KB/(KB + h) + KW/h − h_F − S_T/(1 + KS/h_F)
 * − F_T/(1 + KF/h_F). Phosphate, silicate, ammonia and organic alkalinity are neglected (organic alkalinity
 * can dominate TA in humic rivers). At S → 0 the constants are thermodynamic (I = 0); real river water needs
 * activity corrections of ≈ 0.02–0.05 in pK.
 * @param salinity practical salinity (0…50)
 * @param temperatureC temperature [°C]
 * @param taUmolKg total alkalinity [µmol/kg]
 * @param dicUmolKg dissolved inorganic carbon [µmol/kg]
 * @param k1k2Set K1, K2 set (default "millero2010")
 * @returns pH on three scales, CO2 species [µmol/kg] and warnings; undefined when no pH in 2…12 fits
 * @throws {RangeError} for non-finite or negative TA/DIC and the ranges of carbonateConstantsAt
 * @see Dickson, A.G., Sabine, C.L., Christian, J.R., 2007. Guide to Best Practices for Ocean CO2 Measurements. PICES Spec. Publ. 3.
 */
export function carbonatePhFromTaDic(
  salinity: number,
  temperatureC: number,
  taUmolKg: number,
  dicUmolKg: number,
  k1k2Set: CarbonateK1K2Set = "millero2010",
): CarbonateState | undefined {
  if (!Number.isFinite(taUmolKg) || taUmolKg < 0)
    throw new RangeError(`carbonatePhFromTaDic: taUmolKg must be ≥ 0, got ${taUmolKg}`);
  if (!Number.isFinite(dicUmolKg) || dicUmolKg < 0)
    throw new RangeError(`carbonatePhFromTaDic: dicUmolKg must be ≥ 0, got ${dicUmolKg}`);
  const c = carbonateConstantsAt(salinity, temperatureC, k1k2Set);
  const ta = taUmolKg * 1e-6;
  const dic = dicUmolKg * 1e-6;
  const f = (pH: number): number => alkalinityAt(Math.pow(10, -pH), dic, c) - ta;
  let lo = 2;
  let hi = 12;
  if (f(lo) > 0 || f(hi) < 0) return undefined;
  while (hi - lo > 1e-11) {
    const mid = 0.5 * (lo + hi);
    if (f(mid) < 0) lo = mid;
    else hi = mid;
  }
  const pHTotal = 0.5 * (lo + hi);
  const h = Math.pow(10, -pHTotal);
  const den = h * h + c.k1Total * h + c.k1Total * c.k2Total;
  const warnings: string[] = [];
  if (k1k2Set === "lueker2000" && (salinity < 19 || salinity > 43))
    warnings.push(`Lueker et al. (2000) K1, K2 used at S = ${salinity}, outside their range (≈ 19–43)`);
  return {
    pHTotal,
    pHFree: pHTotal - Math.log10(c.totalToFree),
    pHSws: pHTotal - Math.log10(1 / c.swsToTotal),
    co2UmolKg: (dicUmolKg * h * h) / den,
    hco3UmolKg: (dicUmolKg * c.k1Total * h) / den,
    co3UmolKg: (dicUmolKg * c.k1Total * c.k2Total) / den,
    constants: c,
    warnings,
  };
}
