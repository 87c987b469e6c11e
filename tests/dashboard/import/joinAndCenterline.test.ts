import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import type { Survey } from "../../../analysis/index.ts";
import type { AppState } from "../../../dashboard/src/state/app.svelte.ts";
import { Selection } from "../../../dashboard/src/state/selection.svelte.ts";
import { Settings } from "../../../dashboard/src/state/settings.svelte.ts";
import { DataState } from "../../../dashboard/src/import/dataState.svelte.ts";
import { memoryStore } from "../../../dashboard/src/import/workspaceStore.ts";
import { expectWithin } from "../../helpers/tolerance.ts";
import { directClient, file } from "./fixtures.ts";

function fakeApp(): AppState {
  const app = {
    workspace: { surveys: [] as Survey[], status: "ready" },
    settings: new Settings(),
    selection: new Selection(),
    get survey() {
      return app.workspace.surveys[app.selection.surveyIndex];
    },
    loadSurveys(surveys: Survey[]) {
      app.workspace.surveys = surveys;
    },
    start() {
      app.workspace.surveys = [];
    },
  };
  return app as unknown as AppState;
}

const STATIONS = "station,latitude,longitude\nA1,45.05,-35.30\nA2,45.06,-35.31\n";
const SURVEY =
  "survey,station,date_time,salinity,Fe (nmol/L)\ns1,A1,2025-11-04T08:00:00Z,30.5,4.0\ns1,A2,2025-11-04T09:00:00Z,12.0,20.0\n";

describe("DataState.importFiles() with several files at once (common practice: positions from a station table)", () => {
  it("a station table dropped with a survey is read first and joined by station id, giving positions [lon, lat]", async () => {
    const app = fakeApp();
    const data = new DataState(app, directClient(), memoryStore());
    await data.boot();
    const done = data.importFiles([file("survey.csv", SURVEY), file("stations.csv", STATIONS)]);
    for (let i = 0; i < 50 && !data.question; i++) await new Promise((r) => setTimeout(r, 5));
    expect(data.question?.inspection.fileName).toBe("survey.csv");
    data.question?.answer(data.question.mapping);
    await done;
    expect(data.report.map((e) => e.outcome.kind)).toEqual(["stationTable", "surveyText"]);
    const a2 = app.workspace.surveys[0].stations.find((s) => s.id === "A2");
    expectWithin(a2?.lonLat?.[0] ?? NaN, -35.31, 1e-12, "A2 longitude from the station table");
    expectWithin(a2?.lonLat?.[1] ?? NaN, 45.06, 1e-12, "A2 latitude from the station table");
  });

  it("a centerline GeoJSON replaces the channel and drops the invented demo basemap; an unknown file is reported", async () => {
    const app = fakeApp();
    const data = new DataState(app, directClient(), memoryStore());
    await data.boot();
    const line = readFileSync(new URL("../../../data-demo/centerline.geojson", import.meta.url), "utf8");
    await data.importFiles([file("my-line.geojson", line), file("notes.json", '{"hello": 1}')]);
    expect(data.demoBasemap).toBe(false);
    expect(data.centerline).toEqual(JSON.parse(line));
    const unknown = data.report.find((e) => e.outcome.fileName === "notes.json");
    expect(unknown?.outcome.issues[0].expected).toMatch(/without point or line features/);
  });
});
