/**
 * Speciation context for the speciation panel. Every value comes from
 * analysis/seawater; this file only chooses grids, picks the station and
 * catches the analysis' errors so the panel can show them as text.
 */
import {
  carbonatePhAlongMixingLine,
  DEFAULT_CD_CHLORIDE_SET_ID,
  cdSpeciationVsSalinity,
  feSpeciationVsPh,
  linearGrid,
  majorIonsVsSalinity,
  stationSpeciation,
  type CarbonateEndmember,
  type CarbonateMixingSeries,
  type FeSpeciationSeries,
  type SeriesSet,
  type StationSpeciationResult,
} from "../../../../analysis/index.ts";
import type { StationPlacement, SurveyAnalysisView } from "./types.ts";

/** A value, or the message of the error the analysis raised. */
export type Outcome<T> = { ok: true; value: T } | { ok: false; error: string };

function attempt<T>(f: () => T): Outcome<T> {
  try {
    return { ok: true, value: f() };
  } catch (e) {
    return { ok: false, error: e instanceof Error ? e.message : String(e) };
  }
}

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

export interface SpeciationModel {
  /** The station whose conditions are used, if one with salinity is selected. */
  station?: StationPlacement;
  salinity: number;
  temperatureC: number;
  temperatureAssumed: boolean;
  fe: Outcome<FeSpeciationSeries>;
  cd: Outcome<SeriesSet>;
  ions: Outcome<SeriesSet>;
  carbonate?: Outcome<CarbonateMixingSeries>;
  /** Speciation at the selected station (needs its pH). */
  atStation?: Outcome<StationSpeciationResult>;
  /** Stations with measured pH and salinity. */
  measuredPh: Array<{ stationId: string; salinity: number; pH: number }>;
}

/** The station speciation is shown for: the first selected (or else hovered) station with a salinity. */
export function focusStation(
  analysis: SurveyAnalysisView,
  selectedIds: Iterable<string>,
  hoveredId: string | null,
): StationPlacement | undefined {
  const byId = new Map(analysis.stations.map((s) => [s.id, s]));
  for (const id of [...selectedIds, ...(hoveredId ? [hoveredId] : [])]) {
    const s = byId.get(id);
    if (s && s.salinity !== undefined && Number.isFinite(s.salinity)) return s;
  }
  return undefined;
}

/** Runs the speciation functions of analysis/seawater for the panel. */
export function speciationModel(
  analysis: SurveyAnalysisView,
  station: StationPlacement | undefined,
  settings: SpeciationSettings,
): SpeciationModel {
  const salinity = station?.salinity ?? settings.salinityRange[0];
  const temperatureAssumed = station?.temperatureC === undefined || !Number.isFinite(station.temperatureC);
  const temperatureC = temperatureAssumed ? settings.defaultTemperatureC : (station?.temperatureC as number);
  const sGrid = linearGrid(settings.salinityRange[0], settings.salinityRange[1], 71);
  const mixing = { riverSalinity: settings.salinityRange[0], seaSalinity: settings.salinityRange[1] };
  const model: SpeciationModel = {
    station,
    salinity,
    temperatureC,
    temperatureAssumed,
    fe: attempt(() =>
      feSpeciationVsPh(
        settings.feSetId,
        { salinity, temperatureC },
        linearGrid(settings.pHRange[0], settings.pHRange[1], 141),
        { mixing },
      ),
    ),
    cd: attempt(() => cdSpeciationVsSalinity(settings.cdSetId, sGrid, temperatureC, { mixing })),
    ions: attempt(() => majorIonsVsSalinity(sGrid, mixing)),
    measuredPh: analysis.stations
      .filter(
        (s) => s.pH !== undefined && s.salinity !== undefined && Number.isFinite(s.pH) && Number.isFinite(s.salinity),
      )
      .map((s) => ({ stationId: s.id, salinity: s.salinity as number, pH: s.pH as number })),
  };
  const carb = settings.carbonate;
  if (carb) {
    model.carbonate = attempt(() =>
      carbonatePhAlongMixingLine({
        river: carb.river,
        sea: carb.sea,
        salinityGrid: linearGrid(carb.river.salinity, carb.sea.salinity, 71),
        temperatureC:
          carb.river.temperatureC === undefined || carb.sea.temperatureC === undefined ? temperatureC : undefined,
      }),
    );
  }
  if (station && station.pH !== undefined && Number.isFinite(station.pH)) {
    const pH = station.pH;
    model.atStation = attempt(() =>
      stationSpeciation(
        { pH, salinity, temperatureC },
        { feConstantSet: settings.feSetId, cdConstantSet: settings.cdSetId, mixing },
      ),
    );
  }
  return model;
}
