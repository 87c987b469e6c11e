import { describe, expect, it } from "vitest";
import { color } from "d3-color";
import { createWorkerApi } from "../../../dashboard/src/worker/api.ts";
import type { RemoteApi } from "../../../dashboard/src/worker/client.ts";
import { MAX_UNDERWAY_POINTS, underwayAttributes, underwayLayer } from "../../../dashboard/src/map/underwayLayer.ts";
import { UnderwayState } from "../../../dashboard/src/state/underway.svelte.ts";
import { salinityColour } from "../../../dashboard/src/panels/lib/palette.ts";
import { inventedChannel, underwayCsv } from "../../../bench/fixtures/underwayLog.ts";

/** The invented channel as a centerline file (mouth at its first vertex, as `properties.mouth` says). */
const centerline = {
  name: "channel.geojson",
  text: JSON.stringify({
    type: "Feature",
    properties: { mouth: "start" },
    geometry: { type: "LineString", coordinates: inventedChannel().coordinates },
  }),
};

describe("the worker API's underway() (run in-process)", () => {
  it("reads a 30,000-record invented log, bins it by km along the channel and returns at most maxPoints map points carrying every record", async () => {
    const stages: string[] = [];
    const loaded = await createWorkerApi().underway(
      { file: underwayCsv(30_000, 3), name: "log.csv", maxPoints: 2000, centerline, bin: { by: "km", width: 1 } },
      (_fraction, stage) => stages.push(stage),
    );
    expect(loaded.summary.rowsAccepted).toBe(30_000);
    expect(loaded.bins.by).toBe("km");
    expect(loaded.points.lonDeg.length).toBeLessThanOrEqual(2000);
    expect(loaded.points.count.reduce((a, b) => a + b, 0)).toBe(30_000);
    expect(stages.length).toBeGreaterThan(0);
  });
});

describe("UnderwayState", () => {
  it("keeps the worker's result in its fields, and a worker failure as an error", async () => {
    const api = createWorkerApi() as unknown as RemoteApi;
    const state = new UnderwayState(
      () => api,
      () => centerline,
    );
    await state.load({ name: "log.csv", text: underwayCsv(2000, 4) }, { by: "km", width: 1 });
    expect(state.status).toBe("ready");
    expect(state.progress).toBe(1);
    expect(state.summary?.rowsRead).toBe(2000);
    expect(state.bins?.by).toBe("km");
    expect(state.bounds?.[0]).toBeLessThan(state.bounds![2]);
    // Zoomed in around one part of the log: the worker re-aggregates only there, on a finer grid.
    const overview = state.points!;
    const [w, s, e, n] = state.bounds!;
    const [cx, cy, hx, hy] = [overview.lonDeg[0]!, overview.latDeg[0]!, (e - w) / 8, (n - s) / 8];
    const view: [number, number, number, number] = [cx - hx, cy - hy, cx + hx, cy + hy];
    const coarse = (await api.underwayView({ bounds: [w, s, e, n], minCellM: 500, maxPoints: 20_000 }))!;
    const detail = (await api.underwayView({ bounds: view, minCellM: 5, maxPoints: 20_000 }))!;
    expect(coarse.cellM).toBeGreaterThanOrEqual(500);
    expect(detail.cellM).toBeLessThan(coarse.cellM);
    const [pw, ps, pe, pn] = [
      view[0] - (view[2] - view[0]) / 2,
      view[1] - (view[3] - view[1]) / 2,
      view[2] + (view[2] - view[0]) / 2,
      view[3] + (view[3] - view[1]) / 2,
    ];
    for (let i = 0; i < detail.lonDeg.length; i++) {
      expect(
        detail.lonDeg[i]! >= pw && detail.lonDeg[i]! <= pe && detail.latDeg[i]! >= ps && detail.latDeg[i]! <= pn,
      ).toBe(true);
    }
    expect(detail.lonDeg.length).toBeGreaterThan(0);
    const failing = new UnderwayState(
      () => ({ underway: () => Promise.reject(new Error("boom")) }) as unknown as RemoteApi,
      () => undefined,
    );
    await failing.load({ name: "log.csv", text: "" });
    expect(failing.status).toBe("error");
    expect(failing.error).toBe("boom");
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
