/** A set of Cd chloro-complex constants: log β_n for Cd²⁺ + n Cl⁻ ⇌ CdCl_n^(2−n), I = 0, 25 °C. */
export interface CdChlorideSet {
  id: string;
  label: string;
  /** Full citation. */
  source: string;
  /** log10 β°_1…β°_N at 25 °C (N = 3 or 4). */
  logBeta25: readonly number[];
  /** Reaction enthalpies [kcal/mol] per n for a van 't Hoff correction; absent: constants used at 25 °C values. */
  deltaHKcalMol?: readonly number[];
}

/** Built-in Cd chloride sets. The databases disagree (llnl.dat gives 2.71/3.34/2.71); choose knowingly. */
export const CD_CHLORIDE_SETS: Readonly<Record<"wateq4f" | "thermoChimieSit", CdChlorideSet>> = Object.freeze({
  wateq4f: {
    id: "wateq4f",
    label: "WATEQ4F (CdCl⁺, CdCl₂⁰, CdCl₃⁻), I = 0",
    source:
      "Ball, J.W., Nordstrom, D.K., 1991. User's manual for WATEQ4F. USGS OFR 91-183 (database wateq4f.dat: log β 1.98, 2.60, 2.40; ΔH 0.59, 1.24, 3.9 kcal/mol)",
    logBeta25: [1.98, 2.6, 2.4],
    deltaHKcalMol: [0.59, 1.24, 3.9],
  },
  thermoChimieSit: {
    id: "thermoChimieSit",
    label: "ThermoChimie sit.dat (with CdCl₄²⁻), I = 0",
    source:
      "ThermoChimie SIT database as distributed with PHREEQC (sit.dat; entries tagged Baes & Mesmer 1976): log β 1.97, 2.59, 2.40, 1.47",
    logBeta25: [1.97, 2.59, 2.4, 1.47],
  },
});
