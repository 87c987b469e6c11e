import { feConstantSet, type FeConstantSet } from "./feConstantSets.ts";
import {
  FE_SPECIES,
  FE_SPECIES_LABELS,
  feConditionalConstants,
  speciateWith,
  type FeSpeciationOptions,
} from "./feHydrolysis.ts";
import { checkGrid } from "./grid.ts";
import type { SeriesSet } from "./plotSeries.ts";
import type { PredominanceBoundary } from "./predominance.ts";
import type { WaterConditions } from "./waterConditions.ts";

/** Fe(III) speciation along a pH axis, ready to plot. */
export interface FeSpeciationSeries extends SeriesSet {
  /** pH where the dominant species changes (species indices into FE_SPECIES). */
  boundaries: PredominanceBoundary[];
  /** log10 of total dissolved Fe(III) at saturation with `solid` [log mol/kg], per pH. */
  logSolubilityMolKg: number[];
  solid: string;
}

/**
 * Percent of dissolved inorganic Fe(III) as Fe³⁺, FeOH²⁺, Fe(OH)₂⁺, Fe(OH)₃⁰ and Fe(OH)₄⁻ over a pH grid,
 * with the solubility curve and the predominance boundaries (see feSpeciation for the formulas).
 * @param constantSet set object or id ("baesMesmer1976", "stefansson2007", "liuMillero2002")
 * @param conditions salinity, temperature [°C] and optional ionic strength [mol/kg-H2O]
 * @param pHGrid pH values (0…14)
 * @param options Davies and mixing options
 * @returns x = pH, one series per species in %, warnings and source
 * @throws {RangeError} for an unknown set, a bad grid value or invalid conditions
 * @see Baes & Mesmer (1976); Liu & Millero (2002) Mar. Chem. 77, 43–54; Stefánsson (2007) ES&T 41, 6117–6123.
 */
export function feSpeciationVsPh(
  constantSet: FeConstantSet | string,
  conditions: WaterConditions,
  pHGrid: readonly number[],
  options: FeSpeciationOptions = {},
): FeSpeciationSeries {
  const set = typeof constantSet === "string" ? feConstantSet(constantSet) : constantSet;
  checkGrid("feSpeciationVsPh", "pHGrid", pHGrid, 0, 14);
  const constants = feConditionalConstants(set, conditions, options);
  const points = pHGrid.map((pH) => speciateWith(pH, constants));
  const series = FE_SPECIES.map((key, n) => ({
    key,
    label: FE_SPECIES_LABELS[n],
    unit: "%",
    values: points.map((p) => 100 * p.fractions[key]),
  })).filter((_, n) => constants.logBeta[n] !== undefined);
  return {
    x: [...pHGrid],
    xLabel: set.medium === "seawater" ? "pH (constants' scale, likely free)" : "pH (−log a_H⁺)",
    xUnit: "",
    series,
    warnings: constants.warnings,
    source: set.source,
    boundaries: points[0].boundaries,
    logSolubilityMolKg: points.map((p) => p.logSolubilityMolKg),
    solid: set.solid,
  };
}
