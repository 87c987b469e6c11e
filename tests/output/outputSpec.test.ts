import { describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import {
  analyzeInputs,
  BEHAVIOUR_STYLE,
  DEVIATION_COLUMNS,
  MARK_STYLE,
  mixingPlotModel,
  readInputs,
  RESULT_COLUMNS,
  resultRows,
  tableCsv,
} from "../../analysis/index.ts";

const results = analyzeInputs(
  readInputs(
    ["data-demo/surveys/wet-2025-03.csv", "data-demo/centerline.geojson"].map((p) => ({
      name: p.split("/").pop()!,
      content: readFileSync(p),
    })),
  ),
  { bootstrapDraws: 100, seed: 2 },
);
const analysis = results.surveys[0]!.analysis;

describe("output spec (analysis/output)", () => {
  it("mixingPlotModel() draws the seaward tangent and C*0 for a non-conservative constituent and never for a conservative one (Boyle et al. 1974: C*0 is the tangent's intercept at the river salinity)", () => {
    const removed = analysis.constituents.find((c) => c.class.startsWith("removal"))!;
    const m = mixingPlotModel(removed);
    expect(m.tangent).toBeDefined();
    expect(m.effective?.value).toBe(removed.effectiveEndmember?.value);
    expect(m.tangent!.c0).toBeCloseTo(removed.tangent!.intercept + removed.tangent!.slope * m.tangent!.s0, 12);
    const conservative = { ...removed, class: "conservative" as const };
    expect(mixingPlotModel(conservative).tangent).toBeUndefined();
    expect(mixingPlotModel(conservative).effective).toBeUndefined();
    expect(m.points.length).toBe(removed.deviations.length);
  });

  it("results table: one row per constituent with the documented columns, same as analyzeInputs().tables (common practice: one spec, several renderings)", () => {
    const csv = tableCsv(RESULT_COLUMNS, resultRows([analysis]));
    const [header, ...rows] = csv.trimEnd().split("\r\n");
    expect(header!.split(",")).toEqual(RESULT_COLUMNS.map((c) => c.name));
    expect(rows).toHaveLength(analysis.constituents.length);
    expect(Object.keys(results.tables.results[0]!)).toEqual(RESULT_COLUMNS.map((c) => c.name));
    expect(Object.keys(results.tables.deviations[0]!)).toEqual(DEVIATION_COLUMNS.map((c) => c.name));
    expect(results.tables.results[0]!["effective_river_endmember"]).toBe(
      analysis.constituents[0]!.effectiveEndmember?.value ?? null,
    );
  });

  it("colour-and-symbol code: every behaviour class and mark has a distinct colour or symbol for removal, addition, conservative", () => {
    const key = (s: { colour: string; symbol: string }) => `${s.colour}/${s.symbol}`;
    const keys = [BEHAVIOUR_STYLE.removal, BEHAVIOUR_STYLE.addition, BEHAVIOUR_STYLE.conservative].map(key);
    expect(new Set(keys).size).toBe(3);
    for (const s of [...Object.values(BEHAVIOUR_STYLE), ...Object.values(MARK_STYLE)])
      expect(s.colour).toMatch(/^#[0-9A-Fa-f]{6}$/);
  });
});
