import { describe, expect, it } from "vitest";
import { decimateStations } from "../../../dashboard/src/map/decimate.ts";
import { deviationScale, salinityScale } from "../../../dashboard/src/map/colour.ts";
import { FAR_GAP_FACTOR, anchorsFor, labelLayers, sectorOf } from "../../../dashboard/src/map/labels.ts";
import { buildStyle } from "../../../dashboard/src/map/style.ts";
import type { MapStation } from "../../../dashboard/src/map/mapData.ts";
import { expectWithin } from "../../helpers/tolerance.ts";
import { randomLcg, randomUniform } from "d3-random";

function stations(n: number): MapStation[] {
  const u = randomUniform.source(randomLcg(42))(0, 1);
  return Array.from({ length: n }, (_, i) => ({ id: `S${i}`, lonLat: [u(), u()] as [number, number] }));
}

describe("decimateStations() thins dense data for software WebGL (TOOLCHAIN.md: ~100k points is too slow)", () => {
  it("returns small sets unchanged", () => {
    const few = stations(100);
    expect(decimateStations(few, new Set())).toBe(few);
  });

  it("keeps at most one station per grid cell and never drops a selected one", () => {
    const many = stations(50_000);
    const keep = new Set(["S123", "S45678"]);
    const out = decimateStations(many, keep, 2500);
    expect(out.length).toBeLessThanOrEqual(2500 + keep.size);
    expect(out.length).toBeGreaterThan(1000);
    for (const id of keep) expect(out.some((s) => s.id === id)).toBe(true);
  });
});

describe("map colour scales state their units and stay symmetric (common practice)", () => {
  it("salinityScale() spans 0 to at least 35 and names PSS-78", () => {
    const s = salinityScale(33.5);
    expect(s.domain).toEqual([0, 35]);
    expect(s.title).toContain("PSS-78");
    expect(s.rgba(undefined)).toEqual([150, 150, 150, 200]);
  });

  it("deviationScale() is symmetric about zero and carries the constituent's unit", () => {
    const s = deviationScale(12.5, "Ba", "nmol/L");
    expect(s.domain).toEqual([-12.5, 12.5]);
    expect(s.title).toBe("Ba observed − dilution line (nmol/L)");
    expect(s.rgba(-12.5)).not.toEqual(s.rgba(12.5));
  });
});

describe("map labels sit beside the channel and are placed by priority (labels.ts)", () => {
  it("a channel running north has its right side east: km labels want sector E, isohalines sector W", () => {
    expect(sectorOf(0 + 90)).toBe(2);
    expect(sectorOf(0 - 90)).toBe(6);
    expect(sectorOf(359)).toBe(0);
    expect(sectorOf(-135)).toBe(5);
  });

  it("the preferred anchor comes first, the other side of the channel after its neighbours", () => {
    const anchors = anchorsFor(2, 1) as unknown as Array<string | [number, number]>;
    expect(anchors[0]).toBe("left");
    expectWithin((anchors[1] as [number, number])[0], 1, 1e-12, "offset x toward east");
    expect(anchors.filter((a) => typeof a === "string")).toEqual([
      "left",
      "top-left",
      "bottom-left",
      "right",
      "top-right",
      "bottom-right",
      "top",
      "bottom",
    ]);
  });

  it("the last two anchors put the label straight out on its own side, then on the other, FAR_GAP_FACTOR gaps away", () => {
    const anchors = anchorsFor(2, 0.75) as unknown as Array<string | [number, number]>;
    const far = 0.75 * FAR_GAP_FACTOR;
    expect(anchors[13]).toEqual([far, 0]);
    expect(anchors[15]).toEqual([-far, 0]);
  });

  it("stations outrank km ticks, which outrank isohalines, which outrank place names (top layer placed first)", () => {
    const ids = buildStyle({ basemap: undefined }).layers.map((l) => l.id);
    const order = ["place-labels", ...labelLayers().map((l) => l.id)];
    const at = order.map((id) => ids.indexOf(id));
    expect(at.every((i) => i >= 0)).toBe(true);
    expect([...at].sort((a, b) => a - b)).toEqual(at);
    expect(order.indexOf("label-stations")).toBeGreaterThan(order.indexOf("label-km"));
    expect(order.indexOf("label-km")).toBeGreaterThan(order.indexOf("label-isohalines"));
  });
});

describe("buildStyle() is offline unless the user turns tiles on (rules: no internet)", () => {
  it("the default style has no remote tiles, glyphs or sprites", () => {
    const style = buildStyle({ basemap: undefined });
    const text = JSON.stringify(style);
    expect(text).not.toMatch(/https?:\/\//);
    expect(style.glyphs).toBeUndefined();
    expect(style.sprite).toBeUndefined();
    expect(Object.keys(style.sources)).toEqual(["basemap", "overlay-labels"]);
  });

  it("a user tile URL adds one raster source drawn under the basemap's labels", () => {
    const style = buildStyle({ basemap: undefined, tileUrl: " https://tiles.example.invalid/{z}/{x}/{y}.png " });
    expect(style.sources.userTiles).toEqual({
      type: "raster",
      tiles: ["https://tiles.example.invalid/{z}/{x}/{y}.png"],
      tileSize: 256,
    });
    const ids = style.layers.map((l) => l.id);
    expect(ids.indexOf("user-tiles")).toBeLessThan(ids.indexOf("place-labels"));
  });
});
