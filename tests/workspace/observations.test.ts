/**
 * The plotted observations are decided by the analysis (analysis/workspace plottedObservations,
 * filled by analyzeInputs): every value read, rejected and below-detection ones included, off-channel
 * stations left out unless kept. The dashboard only renders them.
 */
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { analyzeInputs, readInputs, surveyObservations, type InputChoices } from "../../analysis/index.ts";

const WET = "data-demo/surveys/wet-2025-03.csv";
const LINE = "data-demo/centerline.geojson";

function analysed(choices: InputChoices) {
  const files = [WET, LINE].map((p) => ({ name: p, content: new Uint8Array(readFileSync(p)) }));
  const inputs = readInputs(files, choices);
  return { inputs, result: analyzeInputs(inputs, { bootstrapDraws: 50, seed: 1 }).surveys[0]! };
}

describe("plottedObservations() through analyzeInputs (off-channel stations left out of the plots, common practice)", () => {
  it("with every station on the channel the plotted Fe observations are every Fe value of the survey", () => {
    const { inputs, result } = analysed({});
    const all = surveyObservations(inputs.surveys[0]!, "Fe");
    expect(result.analysis.offChannelStations ?? []).toEqual([]);
    expect(result.analysis.observations?.Fe).toEqual(all);
    expect(all.some((o) => o.kind === "belowDetection")).toBe(true);
  });

  it("stations beyond a tight off-channel limit are not plotted; kept by the user, they are plotted again", () => {
    const { inputs, result } = analysed({ offChannelM: 245 });
    const off = new Set((result.analysis.offChannelStations ?? []).map((s) => s.id));
    expect(off.size).toBeGreaterThan(0);
    const all = surveyObservations(inputs.surveys[0]!, "Fe");
    const drawn = result.analysis.observations!.Fe!;
    expect(drawn.some((o) => off.has(o.stationId))).toBe(false);
    expect(drawn).toEqual(all.filter((o) => !off.has(o.stationId)));
    // Every station the fit used (the deviations') is plotted.
    const fe = result.analysis.constituents.find((c) => c.name === "Fe")!;
    const plotted = new Set(drawn.map((o) => o.stationId));
    expect(fe.deviations.length).toBeGreaterThan(0);
    for (const d of fe.deviations) expect(plotted.has(d.stationId)).toBe(true);

    const kept = analysed({ offChannelM: 245, keepOffChannel: true }).result;
    expect(kept.analysis.observations!.Fe).toEqual(all);
  });
});
