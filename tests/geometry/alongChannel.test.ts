import { describe, expect, it } from "vitest";
import { expectWithin } from "../helpers/tolerance.ts";
import { buildChannelNetwork } from "../../analysis/geometry/buildNetwork.ts";
import { pointAtKm } from "../../analysis/geometry/alongChannel.ts";
import { channelStretch } from "../../analysis/geometry/channelStretch.ts";
import { kmTicks } from "../../analysis/geometry/kmTicks.ts";
import { channelLengthKm } from "../../analysis/geometry/channelLength.ts";
import type { LineFeatureCollection } from "../../analysis/geometry/geojsonInput.ts";
import { azimuthDeg, direct, geodesicLine, inverseM } from "./fixtures.ts";

const mouth: [number, number] = [-9.2, 38.7];
const main = geodesicLine(mouth, 70, 30_000, 300);
const conf = direct(mouth, 70, 12_000).lonLat;
const trib = geodesicLine(conf, 0, 6000, 300);
const fc: LineFeatureCollection = {
  type: "FeatureCollection",
  features: [
    { type: "Feature", geometry: { type: "LineString", coordinates: main }, properties: { id: "main" } },
    { type: "Feature", geometry: { type: "LineString", coordinates: trib }, properties: { id: "T" } },
  ],
};
const net = buildChannelNetwork(fc, { mouth: "start" });

describe("positions by chainage on a geodesic network (geographiclib reference, Karney 2013)", () => {
  it("pointAtKm() on the main stem lies within 1 m of geographiclib Direct at 0, 7.5 and 30 km", () => {
    for (const km of [0, 7.5, 30])
      expectWithin(inverseM(pointAtKm(net, km), direct(mouth, 70, km * 1000).lonLat), 0, 1, `pointAtKm(${km})`);
  });

  it("pointAtKm() on a tributary: above the confluence on the tributary, below it on the main stem", () => {
    expectWithin(inverseM(pointAtKm(net, 15, "T"), direct(conf, 0, 3000).lonLat), 0, 1, "15 km via T");
    expectWithin(inverseM(pointAtKm(net, 5, "T"), direct(mouth, 70, 5000).lonLat), 0, 1, "5 km via T (main stem)");
  });

  it("pointAtKm() throws a RangeError for km beyond the branch head or an unknown branch", () => {
    expect(() => pointAtKm(net, 18.5, "T")).toThrow(/km must lie in \[0, 18\.000\]/);
    expect(() => pointAtKm(net, 1, "X")).toThrow(/branchId 'X'/);
  });

  it("channelLengthKm() gives the whole network (36 km) and the path to a branch head (18 km) within 1 m", () => {
    expectWithin(channelLengthKm(net) * 1000, 36_000, 1, "whole network");
    expectWithin(channelLengthKm(net, "T") * 1000, 18_000, 1, "mouth to head of T");
  });
});

describe("channelStretch() and kmTicks() for the map (GeoJSON RFC 7946)", () => {
  it("channelStretch() with a branch follows the path through the confluence as one LineString with ends at pointAtKm", () => {
    const g = channelStretch(net, [10, 14], "T")!;
    expect(g.type).toBe("LineString");
    const c = g.coordinates as [number, number][];
    expectWithin(inverseM(c[0]!, pointAtKm(net, 10)), 0, 1e-3, "start at 10 km");
    expectWithin(inverseM(c[c.length - 1]!, pointAtKm(net, 14, "T")), 0, 1e-3, "end at 14 km on T");
    expect(c.some((p) => inverseM(p, conf) < 1)).toBe(true);
  });

  it("channelStretch() without a branch returns a MultiLineString of every branch's reach in range, undefined outside the channel", () => {
    const g = channelStretch(net, [11, 20])!;
    expect(g.type).toBe("MultiLineString");
    expect(g.coordinates).toHaveLength(2);
    expect(channelStretch(net, [40, 50])).toBeUndefined();
    expect(() => channelStretch(net, [5, 1])).toThrow(/km1 ≤ km2/);
  });

  it("kmTicks() places a tick every 5 km (main 0–30, T 15) with labels and bearings within 0.1° of the geodesic azimuth", () => {
    const t = kmTicks(net, 5);
    expect(t.features.map((f) => `${f.properties.branchId}:${f.properties.label}`)).toEqual([
      "main:0 km",
      "main:5 km",
      "main:10 km",
      "main:15 km",
      "main:20 km",
      "main:25 km",
      "main:30 km",
      "T:15 km",
    ]);
    const f5 = t.features[1]!;
    expectWithin(inverseM(f5.geometry.coordinates, direct(mouth, 70, 5000).lonLat), 0, 1, "tick at 5 km");
    const az = direct(mouth, 70, 5000).azi;
    expectWithin(f5.properties.bearingDeg, az, 0.1, "bearing at 5 km");
    expectWithin(
      t.features[7]!.properties.bearingDeg,
      (azimuthDeg(conf, trib[trib.length - 1]!) + 360) % 360,
      0.1,
      "bearing on T",
    );
  });

  it("kmTicks() labels fractional spacing without rounding (0.25 km) and rejects spacing ≤ 0", () => {
    const labels = kmTicks(net, 0.25)
      .features.slice(0, 4)
      .map((f) => f.properties.label);
    expect(labels).toEqual(["0 km", "0.25 km", "0.5 km", "0.75 km"]);
    expect(() => kmTicks(net, 0)).toThrow(/spacingKm must be a positive number/);
  });
});
