import { daviesLogGamma, daviesValidityWarning, type DaviesOptions } from "./davies.ts";
import type { CdChlorideSet } from "./cdChlorideSets.ts";
import { majorIonsAtSalinity, type MajorIonOptions } from "./majorIons.ts";
import { vantHoffLogK } from "./vantHoff.ts";
import { checkConditions, resolveIonicStrength, type WaterConditions } from "./waterConditions.ts";

/** A further 1:1 ligand of Cd²⁺ (e.g. SO4²⁻, HCO3⁻, CO3²⁻): Cd²⁺ + L ⇌ CdL, log K° at I = 0. */
export interface CdExtraLigand {
  /** Complex key, e.g. "CdSO4". */
  key: string;
  /** Charge of the free ligand (e.g. −2 for SO4²⁻). */
  ligandCharge: number;
  /** log10 K° (I = 0). */
  logK0: number;
  /** Free ligand concentration [mol/kg-H2O]. */
  molKgH2O: number;
}

/** Options of the Cd speciation. */
export interface CdSpeciationOptions {
  davies?: DaviesOptions;
  mixing?: MajorIonOptions;
  /** Free chloride [mol/kg-H2O]; default: Cl⁻ of the major-ion mixing model (ion pairing of Cl⁻ neglected). */
  chlorideMolKgH2O?: number;
  extraLigands?: readonly CdExtraLigand[];
}

/** Cd speciation at one water. */
export interface CdSpeciation {
  /** Fractions (0…1) keyed "Cd+2", "CdCl+", "CdCl2", "CdCl3-", "CdCl4-2" (as present in the set) and extra ligand keys. */
  fractions: Record<string, number>;
  /** Fraction of free Cd²⁺. */
  freeFraction: number;
  /** Inorganic side-reaction coefficient α = [Cd′]/[Cd²⁺]. */
  sideReactionCoefficient: number;
  /** Conditional log β_c,n of the chloro-complexes. */
  logBetaConditional: number[];
  ionicStrength: number;
  chlorideMolKgH2O: number;
  warnings: string[];
}

const CL_KEYS = ["CdCl+", "CdCl2", "CdCl3-", "CdCl4-2"];

/**
 * Inorganic Cd speciation with chloride (and optional further 1:1 ligands): conditional constants
 * log β_c,n = log β°_n(T) + log γ(Cd²⁺) + n·log γ(Cl⁻) − log γ(CdCl_n) (Davies), and fractions
 * α_n = β_c,n [Cl⁻]ⁿ / (1 + Σ β_c,k [Cl⁻]ᵏ + Σ K_c,L [L]). Organic complexation is not included.
 * @param set chloro-complex constant set
 * @param conditions salinity, temperature [°C], optional ionic strength [mol/kg-H2O]
 * @param options Davies, mixing, chloride and extra-ligand options
 * @returns fractions, free fraction, side-reaction coefficient and warnings
 * @throws {TypeError|RangeError} for invalid conditions or a negative chloride/ligand concentration
 * @see Turner, D.R., Whitfield, M., Dickson, A.G., 1981. Geochim. Cosmochim. Acta 45, 855–881 (method; from memory).
 * @see Powell, K.J. et al., 2011. Pure Appl. Chem. 83, 1163–1214 (chloro-complexes dominate Cd in seawater).
 */
export function cdChlorideSpeciation(
  set: CdChlorideSet,
  conditions: WaterConditions,
  options: CdSpeciationOptions = {},
): CdSpeciation {
  checkConditions("cdChlorideSpeciation", conditions);
  const t = conditions.temperatureC;
  const warnings: string[] = [];
  const ionicStrength = resolveIonicStrength(conditions, options.mixing);
  const w = daviesValidityWarning(ionicStrength);
  if (w) warnings.push(w);
  if (!set.deltaHKcalMol && Math.abs(t - 25) > 0.5)
    warnings.push(`${set.label}: no enthalpies; 25 °C constants used at ${t} °C`);
  let cl = options.chlorideMolKgH2O;
  if (cl === undefined) {
    const sea = options.mixing?.seaSalinity ?? 35;
    const s = Math.min(Math.max(conditions.salinity, options.mixing?.riverSalinity ?? 0), sea);
    cl =
      majorIonsAtSalinity(s, options.mixing).molalityKgH2O["Cl-"] *
      (conditions.salinity > sea ? conditions.salinity / sea : 1);
  }
  if (!Number.isFinite(cl) || cl < 0)
    throw new RangeError(`cdChlorideSpeciation: chlorideMolKgH2O must be ≥ 0, got ${cl}`);
  const davies: DaviesOptions = { temperatureC: t, ...options.davies };
  const lg = (z: number): number => daviesLogGamma(z, ionicStrength, davies);
  const logBetaConditional = set.logBeta25.map((lb, i) => {
    const n = i + 1;
    const lbT = set.deltaHKcalMol ? vantHoffLogK(lb, set.deltaHKcalMol[i], t) : lb;
    return lbT + lg(2) + n * lg(-1) - lg(2 - n);
  });
  const terms: Record<string, number> = { "Cd+2": 1 };
  logBetaConditional.forEach((lb, i) => (terms[CL_KEYS[i]] = Math.pow(10, lb) * Math.pow(cl, i + 1)));
  for (const l of options.extraLigands ?? []) {
    if (!Number.isFinite(l.molKgH2O) || l.molKgH2O < 0)
      throw new RangeError(`cdChlorideSpeciation: ligand ${l.key} molKgH2O must be ≥ 0, got ${l.molKgH2O}`);
    terms[l.key] = Math.pow(10, l.logK0 + lg(2) + lg(l.ligandCharge) - lg(2 + l.ligandCharge)) * l.molKgH2O;
  }
  const sum = Object.values(terms).reduce((a, b) => a + b, 0);
  const fractions = Object.fromEntries(Object.entries(terms).map(([k, v]) => [k, v / sum]));
  return {
    fractions,
    freeFraction: 1 / sum,
    sideReactionCoefficient: sum,
    logBetaConditional,
    ionicStrength,
    chlorideMolKgH2O: cl,
    warnings,
  };
}
