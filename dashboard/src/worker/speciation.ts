/**
 * Speciation context, computed in the worker (`WorkerApi.speciation`): Fe(III) species against pH,
 * Cd chloro-complexes and major ions against salinity, the pH expected along the conservative
 * mixing line of alkalinity and inorganic carbon, and the speciation at the focus station. Every
 * value comes from analysis/seawater; this file only chooses grids and turns the analysis' errors
 * into text the panel shows. Request and snapshot are plain, structured-clone-safe data.
 */
import {
  carbonatePhAlongMixingLine,
  cdSpeciationVsSalinity,
  feSpeciationVsPh,
  linearGrid,
  majorIonsVsSalinity,
  stationSpeciation,
  type CarbonateMixingSeries,
  type FeSpeciationSeries,
  type SeriesSet,
  type StationSpeciationResult,
} from "../../../analysis/index.ts";
import type { SpeciationSettings } from "./speciationSettings.ts";

/** A value, or the message of the error the analysis raised. */
export type Outcome<T> = { ok: true; value: T } | { ok: false; error: string };

function attempt<T>(f: () => T): Outcome<T> {
  try {
    return { ok: true, value: f() };
  } catch (e) {
    return { ok: false, error: e instanceof Error ? e.message : String(e) };
  }
}

export { defaultSpeciationSettings, type SpeciationSettings } from "./speciationSettings.ts";

/** The conditions of the station speciation is shown for (values as measured). */
export interface FocusStation {
  id: string;
  salinity: number;
  temperatureC?: number;
  pH?: number;
}

/** A station's measured pH and salinity (for the measured-pH chart). */
export interface MeasuredPh {
  stationId: string;
  salinity: number;
  pH: number;
}

/** What the panel asks the worker for. */
export interface SpeciationRequest {
  station?: FocusStation;
  measuredPh: MeasuredPh[];
  settings: SpeciationSettings;
}

/** The worker's answer: what the panel draws. */
export interface SpeciationModel {
  /** The station whose conditions are used, if one with salinity is selected. */
  station?: FocusStation;
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
  measuredPh: MeasuredPh[];
}

const finite = (x: number | undefined): x is number => x !== undefined && Number.isFinite(x);

/** Runs the speciation functions of analysis/seawater for one request (in the worker). */
export function speciationModel(request: SpeciationRequest): SpeciationModel {
  const { station, settings } = request;
  const salinity = station?.salinity ?? settings.salinityRange[0];
  const temperatureAssumed = !finite(station?.temperatureC);
  const temperatureC = finite(station?.temperatureC) ? station.temperatureC : settings.defaultTemperatureC;
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
    measuredPh: request.measuredPh,
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
  const pH = station?.pH;
  if (station && finite(pH)) {
    model.atStation = attempt(() =>
      stationSpeciation(
        { pH, salinity, temperatureC },
        { feConstantSet: settings.feSetId, cdConstantSet: settings.cdSetId, mixing },
      ),
    );
  }
  return model;
}
