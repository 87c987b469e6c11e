/**
 * Where the invented stations are: along-channel distance, lateral offset and position.
 *
 * Estuarine stations are spread over the salinity gradient with extra density at low
 * salinity: two stations at S0 − 0.12 and S0 − 0.5, the others at target salinities
 * S_k = 0.3 + (S0 − 1.8)·u_k^1.8 with u_k evenly spaced and jittered, each mapped to the along-channel distance where the model salinity equals S_k.
 * Four river stations lie between the fresh-water limit and the head. Each station sits a
 * random 20–300 m (and < 40 % of the half-width) to either side of the centerline; one
 * station per survey may be placed ~3 km off the channel on purpose.
 */
import { DEMO_CHANNEL, widthM } from "./channel.ts";
import { pointAlong, type ChannelLine } from "./centerline.ts";
import { roundLonLat, toLonLat } from "./localFrame.ts";
import type { SeededRandom } from "./random.ts";
import type { SurveyModel } from "./forwardModel.ts";

/** One planned station. */
export interface StationPlan {
  id: string;
  /** Along-channel distance from the mouth [km] (of the station's foot on the centerline). */
  alongChannelKm: number;
  /** Signed perpendicular offset from the centerline [m] (+ = right of the landward direction). */
  offsetM: number;
  /** Position [lon, lat], 5 decimals as written to the CSV. */
  lonLat: [number, number];
  /** True when placed off the channel on purpose. */
  offChannel: boolean;
}

const RIVER_STATIONS = 4;

/** Distance [km] where the model salinity first falls to `target` (linear between nodes). */
function kmOfSalinity(model: SurveyModel, target: number): number {
  const s = model.salt.salinity;
  const x = model.salt.grid.xKm;
  for (let i = 0; i + 1 < s.length; i++) {
    if (s[i] >= target && s[i + 1] < target) return x[i] + ((s[i] - target) / (s[i] - s[i + 1])) * (x[i + 1] - x[i]);
  }
  return x[x.length - 1];
}

/**
 * Plans the stations of one survey, ordered from the mouth (first) to the head.
 *
 * @param model forward model of the survey
 * @param main main-stem centerline (mouth first)
 * @param rng seeded randomness
 */
export function planStations(model: SurveyModel, main: ChannelLine, rng: SeededRandom): StationPlan[] {
  const spec = model.spec;
  const lengthKm = main.cumKm[main.cumKm.length - 1];
  const nEst = spec.stationCount - RIVER_STATIONS;
  const xs: number[] = [];
  // two stations at the seaward end, the rest dense toward low salinity
  xs.push(kmOfSalinity(model, spec.seaSalinity - 0.12), kmOfSalinity(model, spec.seaSalinity - 0.5));
  const nGradient = nEst - 2;
  for (let k = 0; k < nGradient; k++) {
    const jitter = k === 0 ? 0 : (rng.uniform() - 0.5) * 0.6;
    const u = (k + jitter) / (nGradient - 1);
    const target = 0.3 + (spec.seaSalinity - 1.8) * u ** 1.8;
    xs.push(kmOfSalinity(model, target));
  }
  const freshKm = kmOfSalinity(model, spec.riverSalinity + 0.02);
  const riverFrom = Math.min(freshKm + 2, lengthKm - 8);
  for (let k = 0; k < RIVER_STATIONS; k++) {
    xs.push(riverFrom + ((lengthKm - 0.4 - riverFrom) * (k + 0.5 * rng.uniform())) / RIVER_STATIONS);
  }
  xs.sort((a, b) => a - b);
  return xs.map((xKm, i) => {
    const offChannel = i === spec.offChannelIndex;
    const halfWidth = widthM(DEMO_CHANNEL, xKm) / 2;
    const side = rng.uniform() < 0.5 ? -1 : 1;
    const magnitude = offChannel ? 3000 : Math.min(20 + rng.uniform() * 280, 0.4 * halfWidth);
    const offsetM = side * magnitude;
    const { local, tangent } = pointAlong(main, xKm);
    const normal: [number, number] = [tangent[1], -tangent[0]];
    const lonLat = roundLonLat(
      toLonLat(local[0] + (normal[0] * offsetM) / 1000, local[1] + (normal[1] * offsetM) / 1000),
      5,
    );
    return {
      id: `${spec.stationPrefix}${String(i + 1).padStart(2, "0")}`,
      alongChannelKm: xKm,
      offsetM,
      lonLat,
      offChannel,
    };
  });
}
