import { U_PS_G_KG } from "./salinityScales.ts";

/** Mean molar mass of sea salt, 31.4038218 g/mol (GSW-C `gsw_atomic_weight`; Millero et al. 2008). */
export const SEA_SALT_MOLAR_MASS_G_MOL = 31.4038218;
/** Valence factor Z² = Σ x z² of Reference-Composition sea salt, 1.2452898 (GSW-C `gsw_valence_factor`). */
export const SEA_SALT_VALENCE_FACTOR = 1.2452898;

function checkSp(fn: string, salinity: number): void {
  if (typeof salinity !== "number" || !Number.isFinite(salinity))
    throw new TypeError(`${fn}: salinity must be a finite number, got ${String(salinity)}`);
  if (salinity < 0 || salinity > 50) throw new RangeError(`${fn}: salinity must be within 0…50, got ${salinity}`);
}

/**
 * Ionic strength of Reference-Composition seawater diluted with pure water (TEOS-10 form):
 * I = ½·Z²·SA/(M_S·(1000 − SA)) with SA = SR = (35.16504/35)·SP, Z² = 1.2452898, M_S = 31.4038218 g/mol;
 * algebraically I ≈ 19.92054·SP/(1000 − 1.004715·SP).
 * River water does not have this composition; for brackish water use majorIonsAtSalinity().
 * @param salinity practical salinity (0…50)
 * @returns ionic strength [mol/kg-H2O]
 * @throws {TypeError|RangeError} for a non-finite or out-of-range salinity
 * @see IOC, SCOR, IAPSO, 2010. TEOS-10 Manual, Table L.1 (GSW `gsw_ionic_strength_from_SA`); Millero et al. (2008) eqs 5.9, 5.12.
 */
export function ionicStrengthFromSalinity(salinity: number): number {
  checkSp("ionicStrengthFromSalinity", salinity);
  const sa = U_PS_G_KG * salinity;
  return (0.5 * SEA_SALT_VALENCE_FACTOR * sa) / ((SEA_SALT_MOLAR_MASS_G_MOL / 1000) * (1000 - sa));
}

/**
 * Ionic strength by the DOE (1994)/Dickson (1990) form, I = 19.924·S/(1000 − 1.005·S); use it inside the
 * KHSO4 constant of Dickson (1990), which was fitted with it.
 * @param salinity practical salinity (0…50)
 * @returns ionic strength [mol/kg-H2O]
 * @throws {TypeError|RangeError} for a non-finite or out-of-range salinity
 * @see DOE, 1994. Handbook of methods for the analysis of the various parameters of the carbon dioxide system in sea water, v. 2.
 */
export function ionicStrengthDoe(salinity: number): number {
  checkSp("ionicStrengthDoe", salinity);
  return (19.924 * salinity) / (1000 - 1.005 * salinity);
}
