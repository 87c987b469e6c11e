import {
  lnK0Weiss1974,
  lnKbDickson1990,
  lnKfPerezFraga1987,
  lnKsDickson1990,
  lnKwMillero1995,
  lueker2000PkTotal,
  millero2010PkSws,
  type CarbonateConstants,
  type CarbonateK1K2Set,
} from "./carbonateConstants.ts";

/**
 * All CO2-system constants at (S, t) on the total pH scale. Millero (2010) K1, K2 (SWS) are converted
 * with K_T = K_SWS·(1 + S_T/KS)/(1 + S_T/KS + F_T/KF). Totals scale with salinity: B_T = 0.000232/10.811·S/1.80655
 * (Uppström 1974), S_T = 0.14/96.062·S/1.80655, F_T = 0.000067/18.998·S/1.80655 [mol/kg]; river
 * contributions are neglected.
 * @param salinity practical salinity (0…50)
 * @param temperatureC temperature [°C] (0…40)
 * @param k1k2Set "millero2010" (default) or "lueker2000"
 * @returns constants (see {@link CarbonateConstants})
 * @throws {RangeError} for salinity outside 0…50, temperature outside −2…40 °C, or an unknown set
 * @see Millero, F.J., 2010. Carbonate constants for estuarine waters. Mar. Freshwater Res. 61, 139–142.
 * @see Dickson, A.G., Sabine, C.L., Christian, J.R., 2007. PICES Spec. Publ. 3, ch. 5.
 */
export function carbonateConstantsAt(
  salinity: number,
  temperatureC: number,
  k1k2Set: CarbonateK1K2Set = "millero2010",
): CarbonateConstants {
  const fn = "carbonateConstantsAt";
  if (!Number.isFinite(salinity) || salinity < 0 || salinity > 50)
    throw new RangeError(`${fn}: salinity must be within 0…50, got ${salinity}`);
  if (!Number.isFinite(temperatureC) || temperatureC < -2 || temperatureC > 40)
    throw new RangeError(`${fn}: temperatureC must be within −2…40, got ${temperatureC}`);
  if (k1k2Set !== "millero2010" && k1k2Set !== "lueker2000")
    throw new RangeError(`${fn}: unknown k1k2Set "${String(k1k2Set)}"`);
  const s = salinity;
  const tK = temperatureC + 273.15;
  const ksFree = Math.exp(lnKsDickson1990(s, tK));
  const kfFree = Math.exp(lnKfPerezFraga1987(s, tK));
  const chl = s / 1.80655;
  const borateTotalMolKg = (0.000232 / 10.811) * chl;
  const sulfateTotalMolKg = (0.14 / 96.062) * chl;
  const fluorideTotalMolKg = (0.000067 / 18.998) * chl;
  const sOverKs = sulfateTotalMolKg / ksFree;
  const swsToTotal = (1 + sOverKs) / (1 + sOverKs + fluorideTotalMolKg / kfFree);
  let k1Total: number;
  let k2Total: number;
  if (k1k2Set === "millero2010") {
    const [pk1, pk2] = millero2010PkSws(s, tK);
    k1Total = Math.pow(10, -pk1) * swsToTotal;
    k2Total = Math.pow(10, -pk2) * swsToTotal;
  } else {
    const [pk1, pk2] = lueker2000PkTotal(s, tK);
    k1Total = Math.pow(10, -pk1);
    k2Total = Math.pow(10, -pk2);
  }
  return {
    salinity,
    temperatureC,
    k1Total,
    k2Total,
    kbTotal: Math.exp(lnKbDickson1990(s, tK)),
    kwTotal: Math.exp(lnKwMillero1995(s, tK)),
    ksFree,
    kfFree,
    k0: Math.exp(lnK0Weiss1974(s, tK)),
    borateTotalMolKg,
    sulfateTotalMolKg,
    fluorideTotalMolKg,
    swsToTotal,
    totalToFree: 1 / (1 + sOverKs),
    k1k2Set,
  };
}
