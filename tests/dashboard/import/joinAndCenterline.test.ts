import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { memoryStore } from "../../../dashboard/src/state/workspaceStore.ts";
import { expectWithin } from "../../helpers/tolerance.ts";
import { DataState, fakeApp, file } from "./fixtures.ts";

const STATIONS = "station,latitude,longitude\nA1,45.05,-35.30\nA2,45.06,-35.31\n";
const SURVEY =
  "survey,station,date_time,salinity,Fe (nmol/L)\ns1,A1,2025-11-04T08:00:00Z,30.5,4.0\ns1,A2,2025-11-04T09:00:00Z,12.0,20.0\n";

describe("ImportFlow.importFiles() with several files at once (common practice: positions from a station table)", () => {
  it("a station table dropped with a survey is read first and joined by station id, giving positions [lon, lat]", async () => {
    const app = fakeApp();
    const data = new DataState(app, memoryStore());
    await data.boot();
    const done = data.flow.importFiles([file("survey.csv", SURVEY), file("stations.csv", STATIONS)]);
    for (let i = 0; i < 50 && !data.flow.question; i++) await new Promise((r) => setTimeout(r, 5));
    expect(data.flow.question?.inspection.fileName).toBe("survey.csv");
    data.flow.question?.answer(data.flow.question.mapping);
    await done;
    expect(data.flow.report.map((e) => e.outcome.kind)).toEqual(["stationTable", "surveyText"]);
    const a2 = app.results.surveys[0].stations.find((s) => s.id === "A2");
    expectWithin(a2?.lonLat?.[0] ?? NaN, -35.31, 1e-12, "A2 longitude from the station table");
    expectWithin(a2?.lonLat?.[1] ?? NaN, 45.06, 1e-12, "A2 latitude from the station table");
  });

  it("a centerline GeoJSON replaces the channel and drops the invented demo basemap; an unknown file is reported", async () => {
    const app = fakeApp();
    const data = new DataState(app, memoryStore());
    await data.boot();
    const line = readFileSync(new URL("../../../data-demo/centerline.geojson", import.meta.url), "utf8");
    await data.flow.importFiles([file("my-line.geojson", line), file("notes.json", '{"hello": 1}')]);
    expect(data.demoBasemap).toBe(false);
    expect(JSON.parse(data.centerline?.text ?? "null")).toEqual(JSON.parse(line));
    const unknown = data.flow.report.find((e) => e.outcome.fileName === "notes.json");
    expect(unknown?.outcome.issues[0].expected).toMatch(/without GeoJSON point or line features/);
  });
});
