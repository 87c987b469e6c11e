import { readFileSync, statSync } from "node:fs";
import {
  booleanPointInPolygon,
  booleanValid,
  featureCollection,
  intersect,
  length,
  lineString,
  point,
} from "@turf/turf";
import type { Feature, MultiPolygon, Polygon } from "geojson";
import { describe, expect, it } from "vitest";
import { expectWithin } from "../helpers/tolerance.ts";

const url = (rel: string) => new URL(`../../data-demo/${rel}`, import.meta.url);
interface Fc {
  type: string;
  disclaimer: string;
  features: Array<{
    type: string;
    properties: Record<string, unknown>;
    geometry: { type: string; coordinates: unknown };
  }>;
}
const centerline = JSON.parse(readFileSync(url("centerline.geojson"), "utf8")) as Fc;
const basemap = JSON.parse(readFileSync(url("basemap.geojson"), "utf8")) as Fc;
const byRole = (role: string) => centerline.features.filter((f) => f.properties.role === role);
const mainCoords = byRole("main")[0].geometry.coordinates as [number, number][];
const tribCoords = byRole("tributary")[0].geometry.coordinates as [number, number][];
const water = basemap.features.find((f) => f.properties.kind === "water") as unknown as Feature<Polygon | MultiPolygon>;
const land = basemap.features.find((f) => f.properties.kind === "land") as unknown as Feature<Polygon | MultiPolygon>;

describe("demo GeoJSON files (RFC 7946, invented geography)", () => {
  it("centerline.geojson has one main LineString (mouth: start), one tributary and mouth/head Points at its ends", () => {
    expect(centerline.type).toBe("FeatureCollection");
    expect(byRole("main").length).toBe(1);
    expect(byRole("tributary").length).toBe(1);
    expect(byRole("main")[0].properties.mouth).toBe("start");
    expect(byRole("mouth")[0].geometry.coordinates).toEqual(mainCoords[0]);
    expect(byRole("head")[0].geometry.coordinates).toEqual(mainCoords[mainCoords.length - 1]);
  });

  it("the main stem is ≥ 50 km long (turf length, haversine) with a few hundred vertices, and lengthKm matches", () => {
    const km = length(lineString(mainCoords), { units: "kilometers" });
    expect(km >= 50).toBe(true);
    expectWithin(km, Number(byRole("main")[0].properties.lengthKm), 0.01, "lengthKm property vs turf length");
    expectWithin(mainCoords.length, 350, 150, "main-stem vertices");
  });

  it("the tributary starts exactly on a main-stem vertex at joinsAtKm from the mouth", () => {
    const i = mainCoords.findIndex((c) => c[0] === tribCoords[0][0] && c[1] === tribCoords[0][1]);
    expect(i > 0).toBe(true);
    const km = length(lineString(mainCoords.slice(0, i + 1)), { units: "kilometers" });
    expectWithin(km, Number(byRole("tributary")[0].properties.joinsAtKm), 0.01, "joinsAtKm");
  });

  it("coordinates are [lon, lat] in the open North Atlantic box 44–46.5° N, 37–34° W (no real land there)", () => {
    for (const c of [...mainCoords, ...tribCoords]) {
      expectWithin(c[0], -35.5, 1.5, "longitude");
      expectWithin(c[1], 45.25, 1.25, "latitude");
    }
  });

  it("basemap.geojson is < 300 kB, has valid land and water polygons that do not overlap, and places with kind 'place'", () => {
    expect(statSync(url("basemap.geojson")).size < 300_000).toBe(true);
    expect(booleanValid(land)).toBe(true);
    expect(booleanValid(water)).toBe(true);
    expect(intersect(featureCollection([land, water]))).toBeNull();
    const places = basemap.features.filter((f) => f.properties.kind === "place");
    expect(places.length >= 3).toBe(true);
    expect(places.every((p) => p.geometry.type === "Point" && typeof p.properties.name === "string")).toBe(true);
    expect(basemap.features.some((f) => f.properties.kind === "marsh")).toBe(true);
  });

  it("the water polygon contains every vertex of the main stem and the tributary", () => {
    const outside = [...mainCoords, ...tribCoords].filter((c) => !booleanPointInPolygon(point(c), water));
    expect(outside).toEqual([]);
  });

  it("every feature carries the invented-data note and each collection a disclaimer", () => {
    for (const fc of [centerline, basemap]) {
      expect(fc.disclaimer).toMatch(/INVENTED DEMO DATA/);
      for (const f of fc.features) expect(String(f.properties.note)).toMatch(/INVENTED DEMO DATA/);
    }
  });
});
