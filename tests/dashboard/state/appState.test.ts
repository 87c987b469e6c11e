import { beforeAll, describe, expect, it } from "vitest";
import { AppState } from "../../../dashboard/src/state/app.svelte.ts";
import { analyse, readFiles } from "../../../dashboard/src/worker/engine.ts";
import { channelOverlay } from "../../../analysis/index.ts";
import { demoFile } from "./demoFiles.ts";
import { expectWithin } from "../../helpers/tolerance.ts";

describe("AppState derives what the map shows from analysis/ without computing science (DESIGN.md wall)", () => {
  const app = new AppState();

  beforeAll(() => {
    const inputs = readFiles([demoFile("surveys/both-surveys.csv")], demoFile("centerline.geojson"));
    const { surveys, issues } = inputs;
    const network = inputs.channel?.network;
    app.results.receive({ type: "loaded", surveys, issues, channel: network && channelOverlay(network) });
    surveys.forEach((survey, i) => {
      const { analysis, overlay } = analyse(inputs, survey, app.settings.analysis);
      app.results.receive({ type: "analysis", surveyIndex: i, analysis, overlay });
    });
  });

  it("mapStations carry each station's deviation and km exactly as analyzeSurvey() returned them", () => {
    app.selection.constituent = "Fe";
    const fe = app.analysis?.constituents.find((c) => c.name === "Fe");
    expect(fe?.deviations.length).toBeGreaterThan(10);
    for (const d of fe?.deviations ?? []) {
      const st = app.mapStations.find((s) => s.id === d.stationId);
      expectWithin(st?.deviation, d.deviation, 0, `deviation of ${d.stationId}`);
    }
    for (const p of app.analysis?.stations ?? []) {
      const st = app.mapStations.find((s) => s.id === p.id);
      if (p.alongChannelKm !== undefined) expectWithin(st?.alongChannelKm, p.alongChannelKm, 0, `km of ${p.id}`);
    }
  });

  it("the map overlay places the selected constituent's reaction zone on the channel (Fe removal in the demo)", () => {
    app.selection.constituent = "Fe";
    expect(app.mapData.zone?.zoneKind).toBe("removal");
    expect(app.mapData.zone?.zonePaths.length).toBeGreaterThan(0);
    expect(app.mapData.channel?.ticks.length).toBeGreaterThan(50);
  });

  it("switching constituent and survey keeps the selected station ids", () => {
    app.selection.selectStations(["W05", "W09"]);
    app.selection.constituent = "Ba";
    app.selection.surveyIndex = 1;
    expect([...app.selection.stationIds]).toEqual(["W05", "W09"]);
    expect(app.survey?.name).toBe("dry-2025-09");
    expect(app.unit).toBe("nmol/L");
    app.selection.surveyIndex = 0;
    expect(app.mapStations.some((s) => app.selection.isSelected(s.id))).toBe(true);
  });

  it("panelAnalysis adds every observation, QC-rejected ones included (the flagged wet-season Cu value)", () => {
    app.selection.surveyIndex = 0;
    const cu = app.panelAnalysis?.constituents.find((c) => c.name === "Cu");
    expect(cu?.observations?.some((o) => o.kind === "rejected")).toBe(true);
  });
});
