/**
 * The two invented demo surveys (data-demo/, wet and dry season) analysed end to end, for the
 * comparison and briefing tests. Invented data: never measurements.
 */
import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { buildChannelNetwork } from "../../../analysis/geometry/buildNetwork.ts";
import type { CenterlineGeoJson } from "../../../analysis/geometry/geojsonInput.ts";
import type { ChannelNetwork } from "../../../analysis/geometry/types.ts";
import { readSurveyText } from "../../../analysis/io/readSurvey.ts";
import { analyzeSurvey } from "../../../analysis/pipeline/analyzeSurvey.ts";
import type { SurveyAnalysis } from "../../../analysis/pipeline/surveyAnalysis.ts";

export const DEMO_DIR = fileURLToPath(new URL("../../../data-demo/", import.meta.url));

/** truth.json of the demo generator. */
export interface DemoTruth {
  surveys: Record<
    string,
    {
      dischargeM3s: number;
      date: string;
      stationCount: number;
      saltIntrusionKm: { S2: number; S1: number; S10: number };
      constituents: Record<
        string,
        {
          effectiveRiverEndmember: number;
          riverEndmember: number;
          percentChange: number;
          behaviour: string;
          reactionZoneSalinity: [number, number] | null;
          maximumSalinity: number | null;
        }
      >;
    }
  >;
}

export const truth = JSON.parse(readFileSync(DEMO_DIR + "truth.json", "utf8")) as DemoTruth;

/** Centerline GeoJSON (lines only: the mouth and head points are markers, not channel lines). */
export function demoCenterline(): {
  geojson: { type: string; features: Array<{ geometry: { type: string } }> };
  network: ChannelNetwork;
} {
  const geojson = JSON.parse(readFileSync(DEMO_DIR + "centerline.geojson", "utf8")) as {
    type: string;
    features: Array<{ geometry: { type: string } }>;
  };
  const lines = { ...geojson, features: geojson.features.filter((f) => f.geometry.type !== "Point") };
  return { geojson, network: buildChannelNetwork(lines as unknown as CenterlineGeoJson, { mouth: "start" }) };
}

export function demoBasemap(): unknown {
  return JSON.parse(readFileSync(DEMO_DIR + "basemap.geojson", "utf8"));
}

/** Analyses of the wet (reference) and dry demo surveys with the generator's discharges. */
export function demoAnalyses(draws = 200, constituents?: string[]): SurveyAnalysis[] {
  const { network } = demoCenterline();
  return (["wet-2025-03", "dry-2025-09"] as const).map((name) => {
    const text = readFileSync(`${DEMO_DIR}surveys/${name}.csv`, "utf8");
    const read = readSurveyText(text, {
      fileName: `${name}.csv`,
      riverDischargeM3s: truth.surveys[name]!.dischargeM3s,
    });
    return analyzeSurvey(read.surveys[0]!, {
      network,
      bootstrapDraws: draws,
      seed: 1,
      ...(constituents ? { constituents } : {}),
    });
  });
}
