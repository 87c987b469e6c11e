import { ATOMIC_WEIGHTS } from "./atomicWeights.ts";

/** Major-ion composition of a river end-member [mol/kg of water], keyed like REFERENCE_COMPOSITION species. */
export interface RiverComposition {
  name: string;
  /** Full citation, with "from memory" where applicable. */
  source: string;
  /** Concentrations [mol/kg], e.g. { "Ca+2": 3.75e-4 }; missing ions count as 0. */
  molKg: Readonly<Record<string, number>>;
}

const w = (s: string): number => ATOMIC_WEIGHTS[s].gPerMol;
const MOLAR_MASS_G_MOL: Record<string, number> = {
  "Ca+2": w("Ca"),
  "Mg+2": w("Mg"),
  "Na+": w("Na"),
  "K+": w("K"),
  "Cl-": w("Cl"),
  "SO4-2": w("S") + 4 * w("O"),
  "HCO3-": w("H") + w("C") + 3 * w("O"),
};

/** Density of fresh water at 20 °C used for mg/L → mol/kg of the default river: 998.2 kg/m³ (EOS-80, S = 0). */
const RIVER_DENSITY_KG_L = 0.9982;

/**
 * Builds a river composition from mass concentrations [mg/L].
 * @param name label
 * @param source citation
 * @param mgL mass concentrations of "Ca+2", "Mg+2", "Na+", "K+", "Cl-", "SO4-2", "HCO3-" [mg/L]
 * @param densityKgL water density [kg/L] (default 0.9982, fresh water at 20 °C)
 * @returns composition in mol/kg
 * @throws {RangeError} for an unknown ion key or a negative/non-finite concentration
 * @see CIAAW, 2021. Standard atomic weights (molar masses of the ions).
 */
export function riverCompositionFromMgL(
  name: string,
  source: string,
  mgL: Readonly<Record<string, number>>,
  densityKgL = RIVER_DENSITY_KG_L,
): RiverComposition {
  const molKg: Record<string, number> = {};
  for (const [ion, c] of Object.entries(mgL)) {
    const m = MOLAR_MASS_G_MOL[ion];
    if (m === undefined)
      throw new RangeError(
        `riverCompositionFromMgL: unknown ion "${ion}" (known: ${Object.keys(MOLAR_MASS_G_MOL).join(", ")})`,
      );
    if (!Number.isFinite(c) || c < 0)
      throw new RangeError(`riverCompositionFromMgL: ${ion} must be a finite concentration ≥ 0, got ${c}`);
    molKg[ion] = c / 1000 / m / densityKgL;
  }
  return { name, source, molKg: Object.freeze(molKg) };
}

/**
 * Default river end-member: world-average river water (mg/L: Ca²⁺ 15, Mg²⁺ 4.1, Na⁺ 6.3, K⁺ 2.3, Cl⁻ 7.8,
 * SO4²⁻ 11.2, HCO3⁻ 58.4). Values FROM MEMORY (Livingstone 1963; Meybeck 1979 gives similar numbers);
 * replace them with the estuary's own river data whenever available.
 * @see Livingstone, D.A., 1963. Chemical composition of rivers and lakes. USGS Prof. Pap. 440-G (from memory).
 */
export const WORLD_AVERAGE_RIVER: RiverComposition = riverCompositionFromMgL(
  "World-average river (Livingstone 1963, from memory)",
  "Livingstone, D.A., 1963. Chemical composition of rivers and lakes. USGS Prof. Pap. 440-G (values from memory)",
  { "Ca+2": 15, "Mg+2": 4.1, "Na+": 6.3, "K+": 2.3, "Cl-": 7.8, "SO4-2": 11.2, "HCO3-": 58.4 },
);

/** Molar masses [g/mol] of the river ions (CIAAW 2021 atomic weights). */
export const RIVER_ION_MOLAR_MASS_G_MOL: Readonly<Record<string, number>> = Object.freeze(MOLAR_MASS_G_MOL);
