/**
 * Equilibrium constants of the seawater CO2 system, each as a function of practical salinity S and
 * temperature T [K]. Scales as stated. Formulas FROM MEMORY of Dickson, Sabine & Christian (2007) and the
 * original papers, reproduced numerically against the check values in tests/reference/carbonate.json.
 * @see bibliography keys dicksonSabineChristian2007 (ch. 5), lueker2000, millero2010, dickson1990KHSO4,
 *   dickson1990boric, millero1995, perezFraga1987, weiss1974, uppstrom1974.
 */

/** Which K1, K2 set: Millero (2010) estuarine S = 0–50 (SWS, converted), or Lueker et al. (2000), S ≈ 19–43 (total). */
export type CarbonateK1K2Set = "millero2010" | "lueker2000";

/** All constants at one (S, T), on the total scale unless named otherwise. */
export interface CarbonateConstants {
  salinity: number;
  temperatureC: number;
  k1Total: number;
  k2Total: number;
  kbTotal: number;
  kwTotal: number;
  /** KHSO4 on the free scale [mol/kg-soln]. */
  ksFree: number;
  /** KHF on the free scale. */
  kfFree: number;
  /** CO2 solubility K0 [mol kg⁻¹ atm⁻¹]. */
  k0: number;
  /** Total boron, sulfate and fluoride [mol/kg], scaled with salinity. */
  borateTotalMolKg: number;
  sulfateTotalMolKg: number;
  fluorideTotalMolKg: number;
  /** K_total = K_SWS · this factor: (1 + S_T/KS)/(1 + S_T/KS + F_T/KF). */
  swsToTotal: number;
  /** h_free = h_total · this factor: 1/(1 + S_T/KS). */
  totalToFree: number;
  k1k2Set: CarbonateK1K2Set;
}

/**
 * Millero (2010) pK1, pK2 on the seawater scale, S = 0–50.
 * @param s practical salinity
 * @param tK temperature [K]
 * @returns [pK1, pK2] (SWS, mol/kg-soln)
 * @see Millero, F.J., 2010. Mar. Freshwater Res. 61, 139–142, Tables 2–3 (from memory).
 */
export function millero2010PkSws(s: number, tK: number): [number, number] {
  const sq = Math.sqrt(s);
  const lnT = Math.log(tK);
  const pk10 = -126.34048 + 6320.813 / tK + 19.568224 * lnT;
  const a1 = 13.4038 * sq + 0.03206 * s - 5.242e-5 * s * s;
  const b1 = -530.659 * sq - 5.821 * s;
  const c1 = -2.0664 * sq;
  const pk20 = -90.18333 + 5143.692 / tK + 14.613358 * lnT;
  const a2 = 21.3728 * sq + 0.1218 * s - 3.688e-4 * s * s;
  const b2 = -788.289 * sq - 19.189 * s;
  const c2 = -3.374 * sq;
  return [pk10 + a1 + b1 / tK + c1 * lnT, pk20 + a2 + b2 / tK + c2 * lnT];
}

/**
 * Lueker, Dickson & Keeling (2000) pK1, pK2 on the total scale, valid S ≈ 19–43.
 * @param s practical salinity
 * @param tK temperature [K]
 * @returns [pK1, pK2] (total, mol/kg-soln)
 * @see Lueker, T.J., Dickson, A.G., Keeling, C.D., 2000. Mar. Chem. 70, 105–119 (from memory).
 */
export function lueker2000PkTotal(s: number, tK: number): [number, number] {
  const lnT = Math.log(tK);
  return [
    3633.86 / tK - 61.2172 + 9.6777 * lnT - 0.011555 * s + 0.0001152 * s * s,
    471.78 / tK + 25.929 - 3.16967 * lnT - 0.01781 * s + 0.0001122 * s * s,
  ];
}

/**
 * ln KB (boric acid), total scale.
 * @param s practical salinity
 * @param tK temperature [K]
 * @returns ln KB [ln mol/kg-soln]
 * @see Dickson, A.G., 1990. Deep-Sea Res. 37, 755–766 (from memory).
 */
export function lnKbDickson1990(s: number, tK: number): number {
  const sq = Math.sqrt(s);
  return (
    (-8966.9 - 2890.53 * sq - 77.942 * s + 1.728 * s * sq - 0.0996 * s * s) / tK +
    148.0248 +
    137.1942 * sq +
    1.62142 * s -
    (24.4344 + 25.085 * sq + 0.2474 * s) * Math.log(tK) +
    0.053105 * sq * tK
  );
}

/**
 * ln KW (water), total scale, with the DOE (1994) constant 148.96502 (Millero 1995 printed 148.9802).
 * @param s practical salinity
 * @param tK temperature [K]
 * @returns ln KW [ln (mol/kg-soln)²]
 * @see Millero, F.J., 1995. Geochim. Cosmochim. Acta 59, 661–677; DOE, 1994 (from memory).
 */
export function lnKwMillero1995(s: number, tK: number): number {
  return (
    148.96502 -
    13847.26 / tK -
    23.6521 * Math.log(tK) +
    (118.67 / tK - 5.977 + 1.0495 * Math.log(tK)) * Math.sqrt(s) -
    0.01615 * s
  );
}

/**
 * ln KS (HSO4⁻), free scale, mol/kg-soln, with I = 19.924 S/(1000 − 1.005 S) (the form it was fitted with).
 * @param s practical salinity
 * @param tK temperature [K]
 * @returns ln KS
 * @see Dickson, A.G., 1990. J. Chem. Thermodyn. 22, 113–127 (from memory).
 */
export function lnKsDickson1990(s: number, tK: number): number {
  const i = (19.924 * s) / (1000 - 1.005 * s);
  const lnT = Math.log(tK);
  return (
    -4276.1 / tK +
    141.328 -
    23.093 * lnT +
    (-13856 / tK + 324.57 - 47.986 * lnT) * Math.sqrt(i) +
    (35474 / tK - 771.54 + 114.723 * lnT) * i -
    (2698 / tK) * Math.pow(i, 1.5) +
    (1776 / tK) * i * i +
    Math.log(1 - 0.001005 * s)
  );
}

/**
 * ln KF (HF), free scale.
 * @param s practical salinity
 * @param tK temperature [K]
 * @returns ln KF [ln mol/kg-soln]
 * @see Perez, F.F., Fraga, F., 1987. Mar. Chem. 21, 161–168 (from memory).
 */
export function lnKfPerezFraga1987(s: number, tK: number): number {
  return 874 / tK - 9.68 + 0.111 * Math.sqrt(s);
}

/**
 * ln K0, CO2 solubility.
 * @param s practical salinity
 * @param tK temperature [K]
 * @returns ln K0 [ln mol kg⁻¹ atm⁻¹]
 * @see Weiss, R.F., 1974. Mar. Chem. 2, 203–215 (from memory).
 */
export function lnK0Weiss1974(s: number, tK: number): number {
  const t = tK / 100;
  return -60.2409 + 93.4517 / t + 23.3585 * Math.log(t) + s * (0.023517 - 0.023656 * t + 0.0047036 * t * t);
}
