/**
 * The speciation panel's settings and their defaults. Kept apart from speciation.ts (the worker's
 * computation) so the panel, which only needs the defaults, does not pull the speciation code into
 * the chunks the main thread loads.
 */
import { DEFAULT_CD_CHLORIDE_SET_ID, type CarbonateEndmember } from "../../../analysis/index.ts";

export interface SpeciationSettings {
  feSetId: string;
  cdSetId: string;
  /** Temperature [°C] used when the station has none. */
  defaultTemperatureC: number;
  /** TA/DIC end-members for the expected pH along the mixing line, when known. */
  carbonate?: { river: CarbonateEndmember; sea: CarbonateEndmember };
  /** pH axis of the Fe(III) chart. */
  pHRange: [number, number];
  /** Salinity axis of the Cd and major-ion charts (within the major-ion mixing model's end-members). */
  salinityRange: [number, number];
}

export const defaultSpeciationSettings: SpeciationSettings = {
  feSetId: "baesMesmer1976",
  cdSetId: DEFAULT_CD_CHLORIDE_SET_ID,
  defaultTemperatureC: 25,
  pHRange: [3, 10],
  salinityRange: [0, 35],
};
