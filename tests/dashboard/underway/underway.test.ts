import { describe, expect, it } from "vitest";
import { color } from "d3-color";
import { handleUnderway } from "../../../dashboard/src/worker/underwayEngine.ts";
import type { UnderwayResponse } from "../../../dashboard/src/worker/underwayProtocol.ts";
import { MAX_UNDERWAY_POINTS, underwayAttributes, underwayLayer } from "../../../dashboard/src/map/underwayLayer.ts";
import { UnderwayState, centerlineOf } from "../../../dashboard/src/state/underway.svelte.ts";
import { salinityColour } from "../../../dashboard/src/panels/lib/palette.ts";
import { inventedChannel, underwayCsv } from "../../../bench/fixtures/underwayLog.ts";

const channel = { paths: [{ branchId: "main", path: inventedChannel().coordinates }], ticks: [] };

async function runWorker(text: string, maxPoints: number): Promise<UnderwayResponse[]> {
  const out: UnderwayResponse[] = [];
  await handleUnderway(
    {
      type: "underway",
      id: 7,
      file: text,
      name: "log.csv",
      maxPoints,
      centerline: centerlineOf(channel),
      bin: { by: "km", width: 1 },
    },
    (m) => out.push(m),
  );
  return out;
}

describe("underway worker handler", () => {
  it("reads a 30,000-record invented log, bins it by km along the channel and sends at most maxPoints map points carrying every record", async () => {
    const replies = await runWorker(underwayCsv(30_000, 3), 2000);
    const loaded = replies.find((r) => r.type === "underwayLoaded");
    expect(loaded?.type).toBe("underwayLoaded");
    if (loaded?.type !== "underwayLoaded") return;
    expect(loaded.id).toBe(7);
    expect(loaded.summary.rowsAccepted).toBe(30_000);
    expect(loaded.bins.by).toBe("km");
    expect(loaded.points.lonDeg.length).toBeLessThanOrEqual(2000);
    expect(loaded.points.count.reduce((a, b) => a + b, 0)).toBe(30_000);
    expect(replies.some((r) => r.type === "underwayProgress")).toBe(true);
  });
});

describe("UnderwayState", () => {
  it("folds progress and the loaded result into its fields", async () => {
    const state = new UnderwayState();
    for (const m of await runWorker(underwayCsv(2000, 4), 500)) state.receive(m);
    expect(state.status).toBe("ready");
    expect(state.progress).toBe(1);
    expect(state.summary?.rowsRead).toBe(2000);
    expect(state.bounds?.[0]).toBeLessThan(state.bounds![2]);
    state.receive({ type: "error", id: 1, message: "boom" });
    expect(state.status).toBe("error");
  });
});

describe("underwayLayer()", () => {
  const points = {
    lonDeg: new Float64Array([-76, -76.1, -76.2]),
    latDeg: new Float64Array([35, 35.1, 35.2]),
    salinity: new Float64Array([0, 18, Number.NaN]),
    count: new Uint32Array([1, 2, 3]),
    cellM: 10,
  };

  it("colours points with the shared cividis salinity colour (palette.ts) and grey where salinity is missing", () => {
    const { positions, colours } = underwayAttributes(points);
    expect(Array.from(positions.slice(0, 2))).toEqual([Math.fround(-76), Math.fround(35)]);
    const c0 = color(salinityColour(0))!.rgb();
    expect(Array.from(colours.slice(0, 3))).toEqual([Math.round(c0.r), Math.round(c0.g), Math.round(c0.b)]);
    expect(Array.from(colours.slice(8, 11))).toEqual([150, 150, 150]);
  });

  it("builds a ScatterplotLayer with binary attributes and refuses more than the drawing budget", () => {
    const layer = underwayLayer(points);
    expect(layer.id).toBe("underway");
    const n = MAX_UNDERWAY_POINTS + 1;
    const big = { ...points, lonDeg: new Float64Array(n), latDeg: new Float64Array(n), salinity: new Float64Array(n) };
    expect(() => underwayLayer(big)).toThrow(/aggregate/);
  });
});
