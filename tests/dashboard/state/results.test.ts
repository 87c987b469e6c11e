import { describe, expect, it } from "vitest";
import { AnalysisResults } from "../../../dashboard/src/state/results.svelte.ts";
import { analyse, readFiles } from "../../../dashboard/src/worker/engine.ts";
import { channelOverlay } from "../../../analysis/index.ts";
import { Settings } from "../../../dashboard/src/state/settings.svelte.ts";
import { demoFile } from "./demoFiles.ts";

describe("AnalysisResults.receive() folds worker events into state (common practice: one reducer per message)", () => {
  it("progress, loaded, analysis and done move the status from reading to ready", () => {
    const ws = new AnalysisResults();
    ws.begin(true);
    expect(ws.status).toBe("reading");
    ws.receive({ type: "progress", stage: "Reading files", done: 0, total: 1 });
    expect(ws.progress).toEqual({ stage: "Reading files", done: 0, total: 1 });

    const inputs = readFiles([demoFile("surveys/both-surveys.csv")], demoFile("centerline.geojson"));
    const { surveys, issues } = inputs;
    const network = inputs.channel?.network;
    ws.receive({ type: "loaded", surveys, issues, channel: network && channelOverlay(network) });
    expect(ws.surveys.map((s) => s.name)).toEqual(["wet-2025-03", "dry-2025-09"]);
    expect(ws.analyses).toEqual([undefined, undefined]);
    expect(ws.status).toBe("analysing");

    const settings = new Settings();
    const { analysis, overlay } = analyse(inputs, surveys[1], settings.analysis);
    ws.receive({ type: "analysis", surveyIndex: 1, analysis, overlay });
    expect(ws.analyses[0]).toBeUndefined();
    expect(ws.analyses[1]?.survey.name).toBe("dry-2025-09");

    ws.receive({ type: "done" });
    expect(ws.status).toBe("ready");
    expect(ws.progress).toBeNull();
  });

  it("an error message is kept for display and leaves loaded surveys usable", () => {
    const ws = new AnalysisResults();
    ws.receive({ type: "error", message: "centerline.geojson: TypeError: bad" });
    expect(ws.status).toBe("error");
    expect(ws.errors).toEqual(["centerline.geojson: TypeError: bad"]);
  });

  it("replaces arrays instead of mutating them ($state.raw contract)", () => {
    const ws = new AnalysisResults();
    const inputs = readFiles([demoFile("surveys/both-surveys.csv")], undefined);
    const { surveys, issues } = inputs;
    ws.receive({ type: "loaded", surveys, issues, channel: undefined });
    const before = ws.analyses;
    const { analysis, overlay } = analyse(inputs, surveys[0], new Settings().analysis);
    ws.receive({ type: "analysis", surveyIndex: 0, analysis, overlay });
    expect(ws.analyses).not.toBe(before);
    expect(before).toEqual([undefined, undefined]);
  });

  it("an overlay event gives a survey its marks before its analysis, and never replaces a complete one", () => {
    const ws = new AnalysisResults();
    const inputs = readFiles([demoFile("surveys/both-surveys.csv")], demoFile("centerline.geojson"));
    const { surveys, issues } = inputs;
    ws.receive({ type: "loaded", surveys, issues, channel: undefined });
    const settings = new Settings().analysis;
    const head = analyse(inputs, surveys[0], settings, undefined, { names: ["Fe"] });
    ws.receive({ type: "overlay", surveyIndex: 0, overlay: head.overlay });
    expect(ws.overlays[0]).toBe(head.overlay);
    expect(ws.analyses[0]).toBeUndefined();
    const whole = analyse(inputs, surveys[0], settings);
    ws.receive({ type: "analysis", surveyIndex: 0, analysis: whole.analysis, overlay: whole.overlay });
    ws.receive({ type: "overlay", surveyIndex: 0, overlay: head.overlay });
    expect(ws.overlays[0]).toBe(whole.overlay);
  });
});
