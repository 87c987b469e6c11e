import path from "node:path";
import { describe, expect, it } from "vitest";
import { createWorkspace, exportWorkspace, importWorkspace } from "../../analysis/io/workspace.ts";
import { readSurveyText } from "../../analysis/io/readSurvey.ts";
import { WORKSPACE_VERSION } from "../../analysis/io/workspaceSchema.ts";
import { readIfExists, repoRoot } from "./helpers/paths.ts";

const csv = `survey,station,date_time,latitude,longitude,depth_m,salinity,temperature_C,pH,Fe (nmol/L),Fe_flag,Si (µmol/L)
wet,A1,2025-03-01T10:00:00-02:00,45.1,-1.5,0.5,0.10,12.1,7.9,120.50,1,<0.05
wet,A2,2025-03-01T11:00:00Z,45.2,-1.4,1.0,5.2,12.5,8.0,80,4,BDL
dry,B1,2025-09-01T10:00:00Z,45.1,-1.5,0.5,abc,18,,NA,,3.3
`;

function sampleWorkspace() {
  const r = readSurveyText(csv, { fileName: "s.csv" });
  const ws = createWorkspace("Test estuary");
  ws.surveys = r.surveys;
  ws.mappings = [r.mapping];
  ws.imports = [
    {
      file: "s.csv",
      shape: r.mapping.shape,
      rowsRead: r.summary.rowsRead,
      rowsAccepted: r.summary.rowsAccepted,
      rowsRejected: r.summary.rowsRejected,
      issues: r.issues,
    },
  ];
  const centerline = readIfExists(path.join(repoRoot, "data-demo/centerline.geojson"));
  ws.centerline =
    centerline === undefined
      ? {
          type: "Feature",
          geometry: {
            type: "LineString",
            coordinates: [
              [-1.5, 45],
              [-1.4, 45.3],
            ],
          },
          properties: {},
        }
      : JSON.parse(centerline);
  ws.settings = {
    layer: { kind: "depthRange", minM: 0, maxM: 2 },
    grouping: { by: "dateGap", gapDays: 3 },
    colouring: "deviation",
    useTiles: false,
  };
  ws.analysis = {
    endmemberOverrides: { Fe: { river: { salinity: 0, conc: 120.5, concSd: 3 } } },
    precisionPercent: { Fe: 5 },
    riverDischargeM3s: 450,
    constantSet: "default",
    saltIntrusionSalinity: 2,
    futureChoice: { nested: [1, "two"] },
  };
  return ws;
}

describe("workspace document (schema, versions, migrations)", () => {
  it("exportWorkspace() → importWorkspace() is a lossless round trip (surveys with censored/flagged/invalid cells, centerline, mappings, settings, analysis choices)", () => {
    const ws = sampleWorkspace();
    const text = exportWorkspace(ws);
    const back = importWorkspace(text);
    expect(back.issues).toEqual([]);
    expect(back.workspace).toEqual(ws);
    expect(exportWorkspace(back.workspace!)).toBe(text);
    expect(back.workspace?.version).toBe(WORKSPACE_VERSION);
  });

  it("importWorkspace() migrates a version 1 document (centerline list, mappings by shape, survey gap) to version 2", () => {
    const v1 = {
      version: 1,
      name: "old",
      surveys: sampleWorkspace().surveys,
      centerline: [
        [-1.5, 45],
        [-1.45, 45.1],
        [-1.4, 45.3],
      ],
      mappings: {
        "shape-2-0000abcd": {
          columns: [
            { header: "stn", role: "station" },
            { header: "sal", role: "salinity" },
          ],
        },
      },
      surveyGapDays: 5,
      analysis: { constantSet: "default" },
    };
    const r = importWorkspace(JSON.stringify(v1));
    expect(r.workspace).toBeDefined();
    expect(r.issues).toEqual([expect.objectContaining({ column: "version", value: "1", severity: "warning" })]);
    const ws = r.workspace!;
    expect(ws.version).toBe(2);
    expect(ws.centerline).toEqual({
      type: "Feature",
      geometry: { type: "LineString", coordinates: v1.centerline },
      properties: {},
    });
    expect(ws.mappings).toEqual([{ shape: "shape-2-0000abcd", columns: v1.mappings["shape-2-0000abcd"].columns }]);
    expect(ws.settings).toEqual({ grouping: { by: "dateGap", gapDays: 5 } });
    expect(ws.surveys).toEqual(v1.surveys);
    expect(ws.imports).toEqual([]);
  });

  it("importWorkspace() leaves out an invalid survey with an issue naming its path and keeps the rest", () => {
    const ws = JSON.parse(exportWorkspace(sampleWorkspace()));
    ws.surveys[1].stations[0].salinity.status = "great";
    const r = importWorkspace(JSON.stringify(ws));
    expect(r.workspace?.surveys.map((s) => s.name)).toEqual(["wet"]);
    expect(r.issues.some((i) => i.column.startsWith("surveys.1.stations.0.salinity.status"))).toBe(true);
  });

  it("importWorkspace() reports bad JSON, a newer version and a broken centerline without throwing; exportWorkspace() refuses NaN", () => {
    expect(importWorkspace("{").workspace).toBeUndefined();
    expect(importWorkspace(JSON.stringify({ version: 99 })).issues[0].expected).toContain("newer");
    const ws = JSON.parse(exportWorkspace(sampleWorkspace()));
    ws.centerline = { type: "Feature", geometry: { type: "LineString", coordinates: [[1]] }, properties: {} };
    const r = importWorkspace(JSON.stringify(ws));
    expect(r.workspace).toBeUndefined();
    expect(r.issues.some((i) => i.column.startsWith("centerline"))).toBe(true);
    const bad = sampleWorkspace();
    bad.surveys[0].stations[0].salinity.value = Number.NaN;
    expect(() => exportWorkspace(bad)).toThrow(TypeError);
  });
});
