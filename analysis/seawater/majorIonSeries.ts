import { checkGrid } from "./grid.ts";
import { majorIonsAtSalinity, type MajorIonOptions } from "./majorIons.ts";
import type { SeriesSet } from "./plotSeries.ts";
import { WORLD_AVERAGE_RIVER } from "./riverComposition.ts";

const IONS: ReadonlyArray<[string, string]> = [
  ["Na+", "Na⁺"],
  ["Mg+2", "Mg²⁺"],
  ["Ca+2", "Ca²⁺"],
  ["Cl-", "Cl⁻"],
  ["SO4-2", "SO₄²⁻"],
];

/**
 * Ca²⁺, Mg²⁺, Na⁺, Cl⁻, SO₄²⁻ [mmol/kg] and ionic strength [mol/kg-H2O] along the conservative mixing line
 * between a river and Reference-Composition seawater (see majorIonsAtSalinity).
 * @param salinityGrid practical salinities within the end-members
 * @param options river composition and end-member salinities
 * @returns x = salinity; series "Na+", "Mg+2", "Ca+2", "Cl-", "SO4-2" [mmol/kg] and "ionicStrength" [mol/kg-H2O]
 * @throws {RangeError} for a grid value outside the end-members
 * @see Millero et al. (2008) Deep-Sea Res. I 55, 50–72, Table 4.
 */
export function majorIonsVsSalinity(salinityGrid: readonly number[], options: MajorIonOptions = {}): SeriesSet {
  checkGrid("majorIonsVsSalinity", "salinityGrid", salinityGrid, options.riverSalinity ?? 0, options.seaSalinity ?? 35);
  const states = salinityGrid.map((s) => majorIonsAtSalinity(s, options));
  const river = options.river ?? WORLD_AVERAGE_RIVER;
  const warnings =
    river === WORLD_AVERAGE_RIVER
      ? ["River end-member is a world-average composition (from memory), not this river's data"]
      : [];
  return {
    x: [...salinityGrid],
    xLabel: "Practical salinity",
    xUnit: "",
    series: [
      ...IONS.map(([key, label]) => ({
        key,
        label,
        unit: "mmol/kg",
        values: states.map((st) => 1000 * st.molKg[key]),
      })),
      {
        key: "ionicStrength",
        label: "Ionic strength",
        unit: "mol/kg-H2O",
        values: states.map((st) => st.ionicStrength),
      },
    ],
    warnings,
    source: `Millero, F.J., Feistel, R., Wright, D.G., McDougall, T.J., 2008. Deep-Sea Res. I 55, 50–72 (Table 4), mixed with: ${river.source}`,
  };
}
