import { daviesLogGamma, daviesValidityWarning, type DaviesOptions } from "./davies.ts";
import type { FeConstantSet } from "./feConstantSets.ts";
import type { MajorIonOptions } from "./majorIons.ts";
import { predominanceBoundaries, type PredominanceBoundary } from "./predominance.ts";
import { checkConditions, resolveIonicStrength, type WaterConditions } from "./waterConditions.ts";

/** Mononuclear Fe(III) hydrolysis species, in order n = 0…4. */
export const FE_SPECIES = ["Fe+3", "FeOH+2", "Fe(OH)2+", "Fe(OH)3", "Fe(OH)4-"] as const;
/** Legend labels of {@link FE_SPECIES}. */
export const FE_SPECIES_LABELS = ["Fe³⁺", "FeOH²⁺", "Fe(OH)₂⁺", "Fe(OH)₃⁰", "Fe(OH)₄⁻"] as const;
const FE_CHARGES = [3, 2, 1, 0, -1] as const;

/** Options of the Fe(III) speciation. */
export interface FeSpeciationOptions {
  /** Davies options (A pinned or temperature-dependent); used only for I = 0 constant sets. */
  davies?: DaviesOptions;
  /** Major-ion mixing model used to find I from salinity. */
  mixing?: MajorIonOptions;
}

/** Conditional constants of a set at given water conditions. */
export interface FeConditionalConstants {
  /** log10 *β_0…*β_4 (β_0 = 1) as used with the pH; undefined where the set has no species. */
  logBeta: (number | undefined)[];
  /** log10 of [Fe³⁺] per (a_H)³ at saturation with the set's solid. */
  logKs0: number;
  /** log10 γ(Fe³⁺) applied to the solubility (0 for seawater sets). */
  logGammaFe: number;
  /** Ionic strength of the water [mol/kg-H2O] (applied through Davies only for I = 0 sets). */
  ionicStrength: number;
  warnings: string[];
}

/**
 * Conditional Fe(III) hydrolysis constants for a water: for I = 0 sets log*β_n,c = log*β_n° + log γ(Fe³⁺)
 * − log γ(Fe(OH)n) (Davies; pH read as −log a_H⁺); seawater sets are used as published (stoichiometric,
 * pH on their concentration scale, most likely free — not verified).
 * @param set constant set
 * @param conditions salinity, temperature [°C], optional ionic strength [mol/kg-H2O]
 * @param options Davies and mixing options
 * @returns conditional constants with the warnings that apply
 * @throws {TypeError|RangeError} for invalid conditions
 * @see Baes & Mesmer (1976); Liu & Millero (2002), Mar. Chem. 77, 43–54; Stefánsson (2007), ES&T 41, 6117.
 */
export function feConditionalConstants(
  set: FeConstantSet,
  conditions: WaterConditions,
  options: FeSpeciationOptions = {},
): FeConditionalConstants {
  checkConditions("feConditionalConstants", conditions);
  const t = conditions.temperatureC;
  const warnings: string[] = [];
  const [tMin, tMax] = set.temperatureRangeC;
  if (t < tMin - 1e-9 || t > tMax + 1e-9) {
    warnings.push(
      `${set.label}: constants known for ${tMin === tMax ? `${tMin} °C only` : `${tMin}…${tMax} °C`}; used unchanged at ${t} °C`,
    );
  }
  const raw = set.logBeta(t);
  const ionicStrength = resolveIonicStrength(conditions, options.mixing);
  if (set.medium === "seawater") {
    if (conditions.salinity < 30) {
      warnings.push(`${set.label}: constants measured in seawater (S ≈ 36) applied at S = ${conditions.salinity}`);
    }
    warnings.push(
      `${set.label}: pH must be on the constants' concentration scale (most likely free [H⁺]; not verified)`,
    );
    return { logBeta: [0, ...raw], logKs0: set.logKs0(t), logGammaFe: 0, ionicStrength, warnings };
  }
  const davies: DaviesOptions = { temperatureC: t, ...options.davies };
  const w = daviesValidityWarning(ionicStrength);
  if (w) warnings.push(w);
  const lgFe = daviesLogGamma(3, ionicStrength, davies);
  const logBeta = [0, ...raw].map((lb, n) =>
    lb === undefined ? undefined : lb + lgFe - daviesLogGamma(FE_CHARGES[n], ionicStrength, davies),
  );
  return { logBeta, logKs0: set.logKs0(t), logGammaFe: lgFe, ionicStrength, warnings };
}

/** Fe(III) speciation at one pH. */
export interface FeSpeciation {
  pH: number;
  /** Fraction (0…1) of dissolved inorganic Fe(III) per species of {@link FE_SPECIES}; 0 where absent from the set. */
  fractions: Record<(typeof FE_SPECIES)[number], number>;
  /** log10 of total dissolved Fe(III) at saturation with the set's solid [mol/kg]. */
  logSolubilityMolKg: number;
  /** pH where the dominant species changes, ascending. */
  boundaries: PredominanceBoundary[];
  constants: FeConditionalConstants;
}

/**
 * Mononuclear Fe(III) hydrolysis speciation: α_n = β_n h⁻ⁿ / Σ_k β_k h⁻ᵏ (h = 10^−pH); solubility
 * [Fe(III)]_T = Ks0·h³/γ(Fe³⁺)·Σ_k β_k h⁻ᵏ. Polynuclear species are neglected (valid at nM–µM Fe).
 * @param pH pH (activity scale for I = 0 sets; the set's scale for seawater sets)
 * @param set constant set
 * @param conditions salinity, temperature [°C], optional ionic strength
 * @param options Davies and mixing options
 * @returns fractions, solubility [log mol/kg], predominance boundaries [pH] and warnings
 * @throws {RangeError} for a pH outside 0…14; TypeError/RangeError for invalid conditions
 * @see Baes, C.F., Mesmer, R.E., 1976. The Hydrolysis of Cations. Wiley.
 */
export function feSpeciation(
  pH: number,
  set: FeConstantSet,
  conditions: WaterConditions,
  options: FeSpeciationOptions = {},
): FeSpeciation {
  if (!Number.isFinite(pH) || pH < 0 || pH > 14)
    throw new RangeError(`feSpeciation: pH must be within 0…14, got ${pH}`);
  const constants = feConditionalConstants(set, conditions, options);
  return speciateWith(pH, constants);
}

/**
 * Speciation at one pH for precomputed conditional constants (used by the series functions so the
 * constants are computed once per chart); formulas as {@link feSpeciation}.
 * @param pH pH on the scale of the constants
 * @param constants result of {@link feConditionalConstants}
 * @returns fractions, solubility [log mol/kg] and predominance boundaries
 * @see Baes, C.F., Mesmer, R.E., 1976. The Hydrolysis of Cations. Wiley.
 */
export function speciateWith(pH: number, constants: FeConditionalConstants): FeSpeciation {
  const terms = constants.logBeta.map((lb, n) => (lb === undefined ? Number.NEGATIVE_INFINITY : lb + n * pH));
  const top = Math.max(...terms);
  const weights = terms.map((x) => Math.pow(10, x - top));
  const sum = weights.reduce((a, b) => a + b, 0);
  const fractions = Object.fromEntries(FE_SPECIES.map((s, n) => [s, weights[n] / sum])) as FeSpeciation["fractions"];
  const logSolubilityMolKg = constants.logKs0 - 3 * pH - constants.logGammaFe + top + Math.log10(sum);
  return { pH, fractions, logSolubilityMolKg, boundaries: predominanceBoundaries(constants.logBeta), constants };
}
