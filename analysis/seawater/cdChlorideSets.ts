/** A set of Cd chloro-complex constants: log β_n for Cd²⁺ + n Cl⁻ ⇌ CdCl_n^(2−n), I = 0, 25 °C. */
export interface CdChlorideSet {
  id: string;
  /** Plain label: literature, complexes, ionic strength. */
  label: string;
  /** Full citation, with how far it was checked. */
  source: string;
  /** log10 β°_1…β°_N at 25 °C (N = 3 or 4). */
  logBeta25: readonly number[];
  /** Reaction enthalpies [kcal/mol] per n for a van 't Hoff correction; absent: constants used at 25 °C values. */
  deltaHKcalMol?: readonly number[];
}

/** Identifier of a built-in Cd chloride set. */
export type CdChlorideSetId = "cdCl3WithEnthalpy" | "cdCl4At25C";

/**
 * What the activity model used with these I = 0 constants is valid for; shown beside the Cd chart.
 * @see bibliography keys davies1962, stumm1996 (validity I ≲ 0.5 mol/kg; from memory).
 */
export const CD_ACTIVITY_MODEL_NOTE =
  "Activity model: Davies equation (I = 0 constants corrected to the sample's ionic strength). Valid to an ionic strength of about 0.5 mol/kg and accurate to a few per cent only below about 0.1 mol/kg; seawater (S = 35) is at 0.72 mol/kg, so fractions above S ≈ 25 are indicative only.";

/**
 * Built-in Cd chloride sets. Published I = 0 constants disagree by up to ≈ 0.7 log units for CdCl⁺;
 * choose knowingly and compare with the IUPAC critical review.
 * @see bibliography keys baesMesmer1976, powell2011.
 */
export const CD_CHLORIDE_SETS: Readonly<Record<CdChlorideSetId, CdChlorideSet>> = Object.freeze({
  cdCl3WithEnthalpy: {
    id: "cdCl3WithEnthalpy",
    label: "Baes & Mesmer 1976 (as compiled): CdCl⁺, CdCl₂⁰, CdCl₃⁻ at I = 0, with reaction enthalpies",
    source:
      "Compiled thermodynamic values attributed to Baes, C.F., Mesmer, R.E., 1976. The Hydrolysis of Cations. Wiley, New York (attribution as given in a public compilation; not checked against the book): log β° 1.98, 2.60, 2.40 at 25 °C, I = 0; ΔH 0.59, 1.24, 3.9 kcal/mol. Compare Powell, K.J. et al., 2011. Pure Appl. Chem. 83, 1163–1214, doi:10.1351/PAC-REP-10-08-09 (IUPAC critical review).",
    logBeta25: [1.98, 2.6, 2.4],
    deltaHKcalMol: [0.59, 1.24, 3.9],
  },
  cdCl4At25C: {
    id: "cdCl4At25C",
    label: "Baes & Mesmer 1976 (as compiled): CdCl⁺ to CdCl₄²⁻ at I = 0, 25 °C values only",
    source:
      "Compiled values attributed to Baes, C.F., Mesmer, R.E., 1976. The Hydrolysis of Cations. Wiley, New York (attribution as given in a public compilation for the specific-ion-interaction method; not checked against the book): log β° 1.97, 2.59, 2.40, 1.47 at 25 °C, I = 0; no enthalpies.",
    logBeta25: [1.97, 2.59, 2.4, 1.47],
  },
});

/** Id of the Cd chloride set used when none is chosen. */
export const DEFAULT_CD_CHLORIDE_SET_ID: CdChlorideSetId = "cdCl3WithEnthalpy";
