/**
 * Turns planned stations into survey rows: model values at each station, seeded analytical
 * noise (1 σ = sqrt((rel·C)² + floor²), normal), detection limits, one deliberately wrong
 * Cu value flagged 4, temperature, pH and sampling time.
 *
 * Temperature mixes linearly with salinity between the river and sea values. pH follows
 * pH_r + (pH_s − pH_r)·S/S0 − dip·(S/2)·exp(1 − S/2): a low-salinity minimum near S ≈ 2
 * (invented, common practice for a CO₂-rich river meeting seawater).
 */
import type { SurveyModel } from "./forwardModel.ts";
import { fixed } from "./format.ts";
import type { SeededRandom } from "./random.ts";
import { profileAt } from "./salinityModel.ts";
import { CONSTITUENTS } from "./scenario.ts";
import type { StationPlan } from "./stations.ts";

/** One survey row as text cells keyed by CSV column, plus the model truth at the station. */
export interface SampleRow {
  cells: Record<string, string>;
  /** Model (noise-free) salinity at the station. */
  trueSalinity: number;
  /** Model (noise-free) concentrations at the station. */
  trueConc: Record<string, number>;
}

/** Factor applied to the true Cu at the flagged station (a simulated contamination). */
export const CU_OUTLIER_FACTOR = 3.2;

/** Column header of a constituent, e.g. "Fe (nmol/L)". */
export function constituentHeader(name: string, unit: string): string {
  return `${name} (${unit})`;
}

/** The CSV columns in order. */
export const SURVEY_COLUMNS: string[] = [
  "survey",
  "station",
  "date_time",
  "latitude",
  "longitude",
  "depth_m",
  "salinity",
  "temperature_C",
  "pH",
  "discharge (m³/s)",
  ...CONSTITUENTS.map((c) => constituentHeader(c.name, c.unit)),
  "Cu_flag",
];

function timeText(date: string, minutes: number, zone: string): string {
  const h = Math.floor(minutes / 60);
  const m = minutes % 60;
  return `${date}T${String(h).padStart(2, "0")}:${String(m).padStart(2, "0")}:00${zone}`;
}

/**
 * Builds the rows of one survey.
 *
 * @param model forward model of the survey
 * @param plans stations, mouth first
 * @param rng seeded randomness (consumed in a fixed order)
 */
export function sampleSurvey(model: SurveyModel, plans: StationPlan[], rng: SeededRandom): SampleRow[] {
  const spec = model.spec;
  const x = model.salt.grid.xKm;
  let minutes = spec.startMinutes;
  return plans.map((plan, i) => {
    const sTrue = profileAt(x, model.salt.salinity, plan.alongChannelKm);
    const sObs = Math.max(0.01, sTrue + rng.normal() * Math.hypot(0.001 * sTrue, 0.01));
    const frac = (sTrue - spec.riverSalinity) / (spec.seaSalinity - spec.riverSalinity);
    const temp = spec.temperatureRiverC + (spec.temperatureSeaC - spec.temperatureRiverC) * frac + rng.normal() * 0.05;
    const ph =
      spec.pHRiver +
      (spec.pHSea - spec.pHRiver) * frac -
      spec.pHDip * (sTrue / 2) * Math.exp(1 - sTrue / 2) +
      rng.normal() * 0.01;
    const cells: Record<string, string> = {
      survey: spec.id,
      station: plan.id,
      date_time: timeText(spec.date, minutes, spec.zone),
      latitude: fixed(plan.lonLat[1], 5),
      longitude: fixed(plan.lonLat[0], 5),
      depth_m: fixed(0.5 + 1.5 * rng.uniform(), 1),
      salinity: fixed(sObs, 3),
      temperature_C: fixed(temp, 2),
      pH: fixed(ph, 3),
      "discharge (m³/s)": fixed(spec.dischargeM3s, 0),
      Cu_flag: "1",
    };
    const trueConc: Record<string, number> = {};
    for (const c of CONSTITUENTS) {
      const truth = profileAt(x, model.profiles[c.name].conc, plan.alongChannelKm);
      trueConc[c.name] = truth;
      let v = truth + rng.normal() * Math.hypot(c.relNoise * truth, c.absNoise);
      if (c.name === "Cu" && i === spec.cuOutlierIndex) {
        v = truth * CU_OUTLIER_FACTOR;
        cells.Cu_flag = "4";
      }
      const header = constituentHeader(c.name, c.unit);
      cells[header] =
        c.detectionLimit !== undefined && v < c.detectionLimit
          ? `<${fixed(c.detectionLimit, c.detectionLimit < 1 ? 2 : 1)}`
          : fixed(Math.max(v, 0), c.decimals);
    }
    minutes += 11 + Math.floor(rng.uniform() * 6);
    return { cells, trueSalinity: sTrue, trueConc };
  });
}
