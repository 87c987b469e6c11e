import { REFERENCE_COMPOSITION } from "./referenceComposition.ts";
import { RIVER_ION_MOLAR_MASS_G_MOL, WORLD_AVERAGE_RIVER, type RiverComposition } from "./riverComposition.ts";
import { U_PS_G_KG } from "./salinityScales.ts";

/** Options of the major-ion mixing model. */
export interface MajorIonOptions {
  /** River end-member (default {@link WORLD_AVERAGE_RIVER}, from memory). */
  river?: RiverComposition;
  /** Practical salinity of the river end-member (default 0). */
  riverSalinity?: number;
  /** Practical salinity of the sea end-member, taken as Reference-Composition seawater (default 35). */
  seaSalinity?: number;
}

/** Major ions of a water on the conservative mixing line. */
export interface MajorIonState {
  salinity: number;
  /** Seawater mass fraction f = (S − S_river)/(S_sea − S_river). */
  seawaterFraction: number;
  /** Concentrations [mol/kg of solution] per species ("Na+", "Cl-", "SO4-2", ...). */
  molKg: Record<string, number>;
  /** Molalities [mol/kg-H2O]. */
  molalityKgH2O: Record<string, number>;
  /** Ionic strength ½Σ z² m [mol/kg-H2O]. */
  ionicStrength: number;
  /** Σ z·m [mol/kg]; non-zero when the river composition is not balanced. */
  chargeBalanceMolKg: number;
}

const CHARGE: Record<string, number> = Object.fromEntries(REFERENCE_COMPOSITION.map((s) => [s.species, s.charge]));

/**
 * Major-ion composition at a salinity on the conservative mixing line between a river and
 * Reference-Composition seawater: m_j = f·m_j,RC(35)·S_sea/35 + (1 − f)·m_j,river, f = (S − S_r)/(S_s − S_r)
 * (mass-based units mix linearly). Molalities use the water content 1 − (dissolved salt g/kg)/1000;
 * ionic strength I = ½ Σ z_j² m_j. At S = 35 with S_sea = 35 this is exactly the Millero et al. (2008) composition.
 *
 * @param salinity practical salinity between riverSalinity and seaSalinity
 * @param options river composition and end-member salinities
 * @returns concentrations [mol/kg], molalities [mol/kg-H2O] and ionic strength [mol/kg-H2O]
 * @throws {RangeError} when salinity is outside the end-members or the end-member salinities are not increasing
 * @see Millero, F.J., Feistel, R., Wright, D.G., McDougall, T.J., 2008. Deep-Sea Res. I 55, 50–72, Table 4.
 */
export function majorIonsAtSalinity(salinity: number, options: MajorIonOptions = {}): MajorIonState {
  const river = options.river ?? WORLD_AVERAGE_RIVER;
  const sR = options.riverSalinity ?? 0;
  const sS = options.seaSalinity ?? 35;
  if (!Number.isFinite(sR) || !Number.isFinite(sS) || !(sS > sR) || sR < 0) {
    throw new RangeError(`majorIonsAtSalinity: need 0 ≤ riverSalinity < seaSalinity, got ${sR} and ${sS}`);
  }
  if (!Number.isFinite(salinity) || salinity < sR - 1e-12 || salinity > sS + 1e-12) {
    throw new RangeError(`majorIonsAtSalinity: salinity must be within the end-members ${sR}…${sS}, got ${salinity}`);
  }
  const f = (salinity - sR) / (sS - sR);
  const molKg: Record<string, number> = {};
  let saltGKg = f * U_PS_G_KG * sS;
  for (const s of REFERENCE_COMPOSITION) molKg[s.species] = (f * s.molKg * sS) / 35;
  for (const [ion, m] of Object.entries(river.molKg)) {
    if (CHARGE[ion] === undefined)
      throw new RangeError(`majorIonsAtSalinity: river ion "${ion}" is not a reference species`);
    molKg[ion] = (molKg[ion] ?? 0) + (1 - f) * m;
    saltGKg += (1 - f) * m * (RIVER_ION_MOLAR_MASS_G_MOL[ion] ?? 0);
  }
  const water = 1 - saltGKg / 1000;
  const molalityKgH2O: Record<string, number> = {};
  let ionic = 0;
  let balance = 0;
  for (const [ion, m] of Object.entries(molKg)) {
    molalityKgH2O[ion] = m / water;
    ionic += 0.5 * CHARGE[ion] * CHARGE[ion] * molalityKgH2O[ion];
    balance += CHARGE[ion] * m;
  }
  return { salinity, seawaterFraction: f, molKg, molalityKgH2O, ionicStrength: ionic, chargeBalanceMolKg: balance };
}
