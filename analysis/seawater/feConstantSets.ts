import { vantHoffLogK } from "./vantHoff.ts";

/** Identifier of a built-in Fe(III) hydrolysis constant set. */
export type FeConstantSetId = "baesMesmer1976" | "stefansson2007" | "liuMillero2002";

/** A Fe(III) hydrolysis constant set: *β_n for Fe³⁺ + n H2O ⇌ Fe(OH)n^(3−n) + n H⁺, and a solubility product. */
export interface FeConstantSet {
  id: FeConstantSetId;
  label: string;
  /** Full citation. */
  source: string;
  /** "infiniteDilution": thermodynamic (I = 0), corrected to the sample with Davies; "seawater": stoichiometric. */
  medium: "infiniteDilution" | "seawater";
  /** Solid whose solubility {@link logKs0} describes. */
  solid: string;
  /** log10 *β_1…*β_4 at temperatureC (undefined where the set has no value). */
  logBeta(temperatureC: number): [number, number, number, number | undefined];
  /** log10 *Ks0 for solid + 3H⁺ ⇌ Fe³⁺ + 3H2O at temperatureC. */
  logKs0(temperatureC: number): number;
  /** Temperatures [°C] where the set's temperature dependence is known; outside: warning. */
  temperatureRangeC: [number, number];
  /** The pH scale the constants belong to, in plain words (shown in the speciation panel). */
  pHScale: string;
  /** Limits of the set a user should know (e.g. a constant that is only an upper limit); shown in the panel. */
  notes: readonly string[];
}

const BM = [-2.19, -5.67, -12.56, -21.6] as const;
const BM_DH_KCAL = [10.4, 17.1, 24.8, 31.9] as const;

const SETS: Record<FeConstantSetId, FeConstantSet> = {
  baesMesmer1976: {
    id: "baesMesmer1976",
    label: "Baes & Mesmer 1976: FeOH²⁺ to Fe(OH)₄⁻ at I = 0, with enthalpies (Fe(OH)₃⁰ an upper limit)",
    source:
      "Baes, C.F., Mesmer, R.E., 1976. The Hydrolysis of Cations. Wiley, New York; values as adopted by Nordstrom, D.K. et al., 1990. ACS Symp. Ser. 416, 398–413 (adoption checked in a public compilation; attribution to the book not checked): log*β 25 °C −2.19, −5.67, −12.56, −21.6, ΔH 10.4, 17.1, 24.8, 31.9 kcal/mol; Fe(OH)3(a) log*Ks0 4.891. Baes & Mesmer give only an upper limit for Fe(OH)3⁰; −12.56 is the value later compilations adopted.",
    medium: "infiniteDilution",
    solid: "Fe(OH)3(a)",
    logBeta: (t) => [0, 1, 2, 3].map((i) => vantHoffLogK(BM[i], BM_DH_KCAL[i], t)) as [number, number, number, number],
    logKs0: () => 4.891,
    temperatureRangeC: [0, 60],
    pHScale: "activity scale (pH = −log a_H⁺), constants at I = 0 corrected with Davies",
    notes: [
      "log*β₃ for Fe(OH)₃⁰ (−12.56) is only an upper limit in Baes & Mesmer (1976); the Fe(OH)₃⁰ share near pH 7–9 may be overstated. Compare Stefánsson (2007), log*β₃ = −14.30.",
    ],
  },
  stefansson2007: {
    id: "stefansson2007",
    label: "Stefánsson 2007: FeOH²⁺ to Fe(OH)₄⁻ at I = 0, 25 °C only",
    source:
      "Stefánsson, A., 2007. Iron(III) hydrolysis and solubility at 25 °C. Environ. Sci. Technol. 41, 6117–6123, doi:10.1021/es070174h (abstract: log*β −2.19, −5.76, −14.30, −21.71; 2-line ferrihydrite log*Ks0 3.50)",
    medium: "infiniteDilution",
    solid: "2-line ferrihydrite",
    logBeta: () => [-2.19, -5.76, -14.3, -21.71],
    logKs0: () => 3.5,
    temperatureRangeC: [25, 25],
    pHScale: "activity scale (pH = −log a_H⁺), constants at I = 0 corrected with Davies",
    notes: ["25 °C constants only; used unchanged at other temperatures (with a warning)."],
  },
  liuMillero2002: {
    id: "liuMillero2002",
    label: "Liu & Millero 2002: FeOH²⁺ to Fe(OH)₃⁰ in seawater (S ≈ 36, I ≈ 0.74), 5–50 °C",
    source:
      "Liu, X., Millero, F.J., 2002. The solubility of iron in seawater. Mar. Chem. 77, 43–54, doi:10.1016/S0304-4203(01)00074-3 (log*β1 = 1.86 − 1300/T, log*β2 = 0.18 − 1997/T, log*β3 = −2.47 − 3185/T, log*Ks0 = −9.17 + 3993/T; no Fe(OH)4⁻; measured at 5–50 °C and S 0–36, as the abstract states; pH scale not stated in the abstract)",
    medium: "seawater",
    solid: "Fe(OH)3(s)",
    logBeta: (t) => {
      const k = t + 273.15;
      return [1.86 - 1300 / k, 0.18 - 1997 / k, -2.47 - 3185 / k, undefined];
    },
    logKs0: (t) => -9.17 + 3993 / (t + 273.15),
    temperatureRangeC: [5, 50],
    pHScale:
      "concentration scale of the seawater medium, most likely free [H⁺] (not verified against the paper); a total-scale pH reads ≈ 0.1 lower than free",
    notes: [
      "Stoichiometric constants for seawater of S ≈ 36; no Fe(OH)₄⁻; applied unchanged at lower salinity (with a warning).",
      "The authors attribute the larger Fe(OH)₃⁰ constant in seawater than in NaCl to Fe(III) bound to natural organic matter, so this set is not purely inorganic.",
    ],
  },
};

/** Fe(III) constant sets, keyed by id. */
export const FE_CONSTANT_SETS: Readonly<Record<FeConstantSetId, FeConstantSet>> = Object.freeze(SETS);

/**
 * Looks up a built-in Fe(III) constant set.
 * @param id set id ("baesMesmer1976", "stefansson2007", "liuMillero2002")
 * @returns the constant set
 * @throws {RangeError} naming the id when unknown
 * @see FE_CONSTANT_SETS for the citation of each set; bibliography keys baesMesmer1976, stefansson2007, liuMillero2002.
 */
export function feConstantSet(id: string): FeConstantSet {
  const set = Object.hasOwn(FE_CONSTANT_SETS, id) ? FE_CONSTANT_SETS[id as FeConstantSetId] : undefined;
  if (!set)
    throw new RangeError(`feConstantSet: unknown set "${id}" (known: ${Object.keys(FE_CONSTANT_SETS).join(", ")})`);
  return set;
}
