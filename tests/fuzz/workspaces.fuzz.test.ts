import { describe, expect, it } from "vitest";
import { createWorkspace, exportWorkspace, importWorkspace } from "../../analysis/io/workspace.ts";
import { readSurveyText } from "../../analysis/io/readSurvey.ts";
import { WORKSPACE_LIMITS } from "../../analysis/io/workspaceSchema.ts";
import type { WorkspaceDocument } from "../../analysis/io/workspaceSchema.ts";
import { DEMO_SURVEY } from "./generators/surveys.ts";
import { DEMO_CENTERLINE } from "./generators/centerlines.ts";
import { tamperedWorkspace, TAMPERINGS } from "./generators/workspaces.ts";
import { int, seeded } from "./generators/random.ts";
import { cases, LARGE } from "./scale.ts";

function baseWorkspace(): WorkspaceDocument {
  const ws = createWorkspace("fuzz");
  ws.surveys = readSurveyText(DEMO_SURVEY, { fileName: "wet.csv" }).surveys;
  ws.centerline = DEMO_CENTERLINE as WorkspaceDocument["centerline"];
  ws.settings = { useTiles: false };
  return ws;
}

describe("fuzz: tampered workspaces (item 8: the reader checks values, not only types)", () => {
  const base = exportWorkspace(baseWorkspace());

  it("the untampered workspace reads back whole", () => {
    const r = importWorkspace(base);
    expect(r.workspace?.surveys[0]?.stations.length).toBeGreaterThan(20);
    expect(r.issues.filter((i) => i.severity === "error")).toEqual([]);
  });

  it.each(TAMPERINGS.map((t) => [t.name, t] as const))("%s is refused or reported, never accepted silently", (_, t) => {
    const doc = JSON.parse(base) as Record<string, unknown>;
    t.apply(doc);
    const r = importWorkspace(JSON.stringify(doc));
    const reported = r.issues.some((i) => i.column.startsWith(t.path) || i.expected.includes(t.path));
    expect(reported, JSON.stringify(r.issues.slice(0, 3))).toBe(true);
    if (r.workspace !== undefined) expect(JSON.stringify(r.workspace)).not.toContain(t.marker);
  });

  const N = cases(100);
  it(`${N} seeded random tamperings never throw, and an accepted workspace exports again`, () => {
    const r = seeded(88);
    for (let n = 0; n < N; n += 1) {
      const text = tamperedWorkspace(r, base);
      const res = importWorkspace(text);
      if (res.workspace !== undefined) expect(() => exportWorkspace(res.workspace as WorkspaceDocument)).not.toThrow();
      for (const i of res.issues) expect(i.file).toBe("workspace");
    }
  });

  it(`caps the size with a clear message: ${LARGE ? "300,000" : "100,001"} stations`, () => {
    const doc = JSON.parse(base) as { surveys: Array<{ stations: unknown[] }> };
    const one = {};
    const n = LARGE ? 300_000 : WORKSPACE_LIMITS.maxStations + 1;
    (doc.surveys[0] as { stations: unknown[] }).stations = Array.from({ length: n }, () => one);
    const r = importWorkspace(JSON.stringify(doc));
    expect(r.workspace).toBeUndefined();
    expect(r.issues[0]?.expected).toContain(`at most ${WORKSPACE_LIMITS.maxStations} stations`);
  });

  it("caps the text length before parsing it", () => {
    const r = importWorkspace(" ".repeat(WORKSPACE_LIMITS.maxChars + 1 + int(seeded(1), 3)));
    expect(r.workspace).toBeUndefined();
    expect(r.issues[0]?.expected).toContain(`at most ${WORKSPACE_LIMITS.maxChars} characters`);
  });
});
