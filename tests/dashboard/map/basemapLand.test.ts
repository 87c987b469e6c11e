import { readFileSync } from "node:fs";
import { join } from "node:path";
import { booleanPointInPolygon } from "@turf/turf";
import type { Position } from "geojson";
import { feature } from "topojson-client";
import { describe, expect, it } from "vitest";
import { landFeatures, roundPosition, roundRing } from "../../../dashboard/src/map/basemapLand.ts";
import { expectWithin } from "../../helpers/tolerance.ts";

/**
 * A two-polygon topology written by hand (TopoJSON specification 2.1.3: quantized, delta-encoded arcs):
 * a unit square at (10, 20) and a triangle at (-5, 0), transform scale 0.5°, as one MultiPolygon "land".
 */
const TINY = {
  type: "Topology",
  transform: { scale: [0.5, 0.5], translate: [-10, -10] },
  objects: {
    land: {
      type: "GeometryCollection",
      geometries: [{ type: "MultiPolygon", arcs: [[[0]], [[1]]] }],
    },
  },
  arcs: [
    // (10, 20) → (11, 20) → (11, 21) → (10, 21) → (10, 20): quantized 40,60 then deltas of 2.
    [
      [40, 60],
      [2, 0],
      [0, 2],
      [-2, 0],
      [0, -2],
    ],
    // (-5, 0) → (-4, 0) → (-5, 1) → (-5, 0)
    [
      [10, 20],
      [2, 0],
      [-2, 2],
      [0, -2],
    ],
  ],
};

const WORLD_ATLAS = join(process.cwd(), "node_modules", "world-atlas");
const land50m = JSON.parse(readFileSync(join(WORLD_ATLAS, "land-50m.json"), "utf8")) as unknown;

describe("roundPosition() / roundRing() keep [lon, lat] to a stated number of decimals (common practice)", () => {
  it("rounds each coordinate and keeps the order", () => {
    expect(roundPosition([-122.123456, 37.987654], 4)).toEqual([-122.1235, 37.9877]);
    expect(roundPosition([1.23456, -0.00004], 4)).toEqual([1.2346, -0]);
  });

  it("drops a vertex that rounding made equal to the one before, keeps the ring closed", () => {
    const ring: Position[] = [
      [0, 0],
      [0.00001, 0.00001],
      [1, 0],
      [1, 1],
      [0, 0],
    ];
    expect(roundRing(ring, 4)).toEqual([
      [0, 0],
      [1, 0],
      [1, 1],
      [0, 0],
    ]);
  });
});

describe("landFeatures() decodes a Natural Earth land topology into one polygon per land mass", () => {
  it("decodes the hand-made topology exactly (TopoJSON specification 2.1.3, delta-encoded quantized arcs)", () => {
    const land = landFeatures(TINY);
    expect(land.features).toHaveLength(2);
    expect(land.features.every((f) => f.properties.kind === "land" && f.geometry.type === "Polygon")).toBe(true);
    expect(land.features[0]!.geometry.coordinates).toEqual([
      [
        [10, 20],
        [11, 20],
        [11, 21],
        [10, 21],
        [10, 20],
      ],
    ]);
    expect(land.features[1]!.geometry.coordinates[0]).toEqual([
      [-5, 0],
      [-4, 0],
      [-5, 1],
      [-5, 0],
    ]);
    expect(land.vertexCount).toBe(9);
  });

  it("drops a polygon that rounding shrinks below a triangle", () => {
    const land = landFeatures(TINY, "land", 0);
    // At 0 decimals the triangle (-5, 0), (-4, 0), (-5, 1) survives and so does the square: both are whole degrees.
    expect(land.features).toHaveLength(2);
    const tinyScale = { ...TINY, transform: { scale: [0.0001, 0.0001], translate: [0, 0] } };
    expect(landFeatures(tinyScale, "land", 2).features).toHaveLength(0);
  });

  it("moves no vertex of world-atlas land-50m by more than half the last decimal kept (0.5e-4°)", () => {
    const land = landFeatures(land50m);
    const topology = land50m as Parameters<typeof feature>[0];
    const raw = feature(topology, topology.objects.land!);
    const rawPolygons = (raw.type === "FeatureCollection" ? raw.features : [raw]).flatMap((f) =>
      f.geometry?.type === "MultiPolygon"
        ? f.geometry.coordinates
        : f.geometry?.type === "Polygon"
          ? [f.geometry.coordinates]
          : [],
    );
    expect(land.features.length).toBe(rawPolygons.length);
    let worst = 0;
    for (const [i, f] of land.features.entries()) {
      const a = f.geometry.coordinates[0]!;
      const b = rawPolygons[i]![0]!;
      // Quantized Natural Earth vertices are ≥ 0.0017° apart, so rounding to 1e-4° removes none of them.
      expect(a.length).toBe(b.length);
      for (const [j, p] of a.entries())
        worst = Math.max(worst, Math.abs(p[0]! - b[j]![0]!), Math.abs(p[1]! - b[j]![1]!));
    }
    expectWithin(worst, 0, 0.5e-4 + 1e-12, "largest rounding shift in degrees");
  });

  it("puts San Francisco and Oakland on land and the bay and the open North Atlantic in water (Natural Earth 1:50m)", () => {
    const land = landFeatures(land50m);
    const onLand = (p: [number, number]) => land.features.some((f) => booleanPointInPolygon(p, f));
    // Common practice: positions read off any chart of San Francisco Bay.
    expect(onLand([-122.44, 37.76])).toBe(true); // San Francisco
    expect(onLand([-122.22, 37.8])).toBe(true); // Oakland
    expect(onLand([-122.36, 37.8])).toBe(false); // central bay
    expect(onLand([-122.38, 38.05])).toBe(false); // San Pablo Bay
    // The invented demo estuary lies in the open North Atlantic: no real land there to clash with it.
    expect(onLand([-40, 45])).toBe(false);
  });

  it("names the argument and value of a caller mistake", () => {
    expect(() => landFeatures({ type: "FeatureCollection" })).toThrow(TypeError);
    expect(() => landFeatures(null)).toThrow(/topology/);
    expect(() => landFeatures(TINY, "countries")).toThrow(/objectName.*"countries".*land/);
    expect(() => landFeatures(TINY, "land", 2.5)).toThrow(RangeError);
    expect(() => landFeatures(TINY, "land", -1)).toThrow(/decimals.*-1/);
  });
});
