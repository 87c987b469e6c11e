/**
 * Brackline demo-data generator: the INVENTED Caldrevin estuary.
 *
 * Everything this module produces is invented: the estuary, its names, its coastline (placed in
 * the open North Atlantic near 45.2° N, 35.5° W, where there is no land) and both surveys. The
 * numbers come from a steady 1-D advection–dispersion–reaction model with prescribed reactions
 * (Boyle et al. 1974, Geochim. Cosmochim. Acta 38, 1719–1728)
 * plus seeded analytical noise; they are not measurements.
 *
 * Deterministic: the only randomness is d3-random `randomLcg(seed)`, so the same seed gives
 * byte-identical files.
 */
import { basemapGeojson } from "./basemap.ts";
import { buildMainStem, buildTributary } from "./centerline.ts";
import { centerlineGeojson } from "./centerlineGeojson.ts";
import { csvField } from "./format.ts";
import { runSurveyModel } from "./forwardModel.ts";
import { stableJson } from "./json.ts";
import { seededRandom } from "./random.ts";
import { sampleSurvey, SURVEY_COLUMNS, type SampleRow } from "./samples.ts";
import { SURVEYS } from "./scenario.ts";
import { planStations } from "./stations.ts";
import { surveysReadme } from "./surveysReadme.ts";
import { truthDocument } from "./truth.ts";

/** Seed of the committed demo files. */
export const DEFAULT_SEED = 1974;

function csv(rows: SampleRow[]): string {
  const lines = [SURVEY_COLUMNS.map(csvField).join(",")];
  for (const r of rows) lines.push(SURVEY_COLUMNS.map((c) => csvField(r.cells[c])).join(","));
  return `${lines.join("\n")}\n`;
}

/**
 * Generates every demo file.
 *
 * @param seed integer seed of the d3-random LCG (0 ≤ seed < 2³¹)
 * @returns map from path relative to the output directory (e.g. "surveys/wet-2025-03.csv") to file text
 * @throws RangeError when the seed is not an integer in [0, 2³¹)
 */
export function generateDemo(seed: number = DEFAULT_SEED): Map<string, string> {
  if (!Number.isInteger(seed) || seed < 0 || seed >= 2 ** 31) {
    throw new RangeError(`generateDemo(): seed must be an integer in [0, 2^31), got ${String(seed)}`);
  }
  const rng = seededRandom(seed);
  const main = buildMainStem();
  const tributary = buildTributary(main);
  const lengthKm = main.cumKm[main.cumKm.length - 1];
  const models = SURVEYS.map((s) => runSurveyModel(s, lengthKm));
  const plans = models.map((m) => planStations(m, main, rng));
  const rows = models.map((m, i) => sampleSurvey(m, plans[i], rng));
  const files = new Map<string, string>();
  files.set("centerline.geojson", stableJson(centerlineGeojson(main, tributary)));
  files.set("basemap.geojson", stableJson(basemapGeojson(main, tributary)));
  SURVEYS.forEach((s, i) => files.set(`surveys/${s.id}.csv`, csv(rows[i])));
  files.set("surveys/both-surveys.csv", csv(rows.flat()));
  files.set("surveys/README.md", surveysReadme(seed));
  files.set("truth.json", stableJson(truthDocument(seed, main, tributary, models, plans, rows)));
  return files;
}
