/**
 * Runs the real analysis (analysis/io → geometry → mixing) on the invented
 * demo survey shipped in data-demo/, for panel tests that check the panels
 * show exactly what the analysis returned. The demo data are invented.
 */
import { readFileSync } from "node:fs";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";
import {
  analyzeSurvey,
  buildChannelNetwork,
  plottedObservations,
  readSurveyText,
  type CenterlineGeoJson,
} from "../../../analysis/index.ts";
import type { Survey } from "../../../analysis/survey/survey.ts";
import { withObservations } from "../../../dashboard/src/panels/lib/observations.ts";
import type { SurveyAnalysisView } from "../../../dashboard/src/panels/lib/types.ts";

const root = join(dirname(fileURLToPath(import.meta.url)), "../../..");

interface GeoFeature {
  geometry: { type: string; coordinates: unknown };
  properties?: { role?: string };
}

/** The wet-season demo survey analysed for Fe, Ba, Si and Cu (200 bootstrap draws, seed 1). */
export function demoAnalysis(): { survey: Survey; analysis: SurveyAnalysisView } {
  const text = readFileSync(join(root, "data-demo/surveys/wet-2025-03.csv"), "utf8");
  const survey = readSurveyText(text, { fileName: "wet-2025-03.csv" }).surveys[0];
  const fc = JSON.parse(readFileSync(join(root, "data-demo/centerline.geojson"), "utf8")) as {
    type: string;
    features: GeoFeature[];
  };
  const mouth = fc.features.find((f) => f.geometry.type === "Point" && f.properties?.role === "mouth")?.geometry
    .coordinates as [number, number] | undefined;
  const lines = {
    ...fc,
    features: fc.features.filter((f) => f.geometry.type !== "Point"),
  } as unknown as CenterlineGeoJson;
  const network = buildChannelNetwork(lines, { mouth: mouth ?? "start" });
  const analysis = analyzeSurvey(survey, {
    network,
    bootstrapDraws: 200,
    seed: 1,
    constituents: ["Fe", "Ba", "Si", "Cu"],
  });
  analysis.observations = plottedObservations(survey, analysis);
  return { survey, analysis: withObservations(analysis) };
}
