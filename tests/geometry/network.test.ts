import { describe, expect, it } from "vitest";
import { expectWithin } from "../helpers/tolerance.ts";
import { buildChannelNetwork } from "../../analysis/geometry/buildNetwork.ts";
import { projectLonLatArrays } from "../../analysis/geometry/projectBulk.ts";
import { projectStations } from "../../analysis/geometry/projectStations.ts";
import type { LineFeatureCollection } from "../../analysis/geometry/geojsonInput.ts";
import { direct, geodesicLengthM, geodesicLine } from "./fixtures.ts";

// Hand-built network (common practice geometry): main stem 20 km from the mouth at azimuth 45°,
// tributary "Creek" joining at main km 8 and running 5 km at azimuth 135°, given head-first,
// and "Ditch" joining Creek 2 km above its confluence, running 1 km at azimuth 200°.
const mouth: [number, number] = [-1.2, 50.7];
const main = geodesicLine(mouth, 45, 20_000, 500);
const confluence = direct(mouth, 45, 8000).lonLat;
const creek = geodesicLine(confluence, 135, 5000, 250);
const ditchStart = direct(confluence, 135, 2000).lonLat;
const ditch = geodesicLine(ditchStart, 200, 1000, 100);
const fc: LineFeatureCollection = {
  type: "FeatureCollection",
  features: [
    {
      type: "Feature",
      geometry: { type: "LineString", coordinates: [...creek].reverse() },
      properties: { name: "Creek" },
    },
    { type: "Feature", geometry: { type: "LineString", coordinates: main }, properties: { id: "main", role: "main" } },
    { type: "Feature", geometry: { type: "LineString", coordinates: ditch }, properties: { id: "Ditch" } },
  ],
};

describe("buildChannelNetwork() with tributaries (hand-built geodesic network, geographiclib reference)", () => {
  const net = buildChannelNetwork(fc, { mouth: "start" });

  it("buildChannelNetwork() places the main stem first and orients the head-first tributary from its confluence", () => {
    expect(net.branches.map((b) => [b.id, b.role, b.parentId])).toEqual([
      ["main", "main", undefined],
      ["Creek", "tributary", "main"],
      ["Ditch", "tributary", "Creek"],
    ]);
    expect(net.branches[1]!.reversed).toBe(true);
    expect(net.warnings).toEqual([]);
  });

  it("tributary chainage = distance along the tributary to its confluence + confluence chainage on the main stem (8 km), within 1 m", () => {
    const creekB = net.branches[1]!;
    expectWithin(creekB.kmStart * 1000, 8000, 1, "Creek confluence km");
    expectWithin(creekB.kmEnd * 1000, 8000 + geodesicLengthM(creek), 1, "Creek head km");
    const p = direct(confluence, 135, 3000).lonLat;
    const r = projectLonLatArrays(net, Float64Array.of(p[0]), Float64Array.of(p[1]));
    expect(net.branches[r.branchIndex[0]!]!.id).toBe("Creek");
    expectWithin(r.alongChannelKm[0]! * 1000, 11_000, 1, "point 3 km up Creek");
  });

  it("a tributary of a tributary adds both confluence chainages (8 + 2 km), within 1 m", () => {
    const p = direct(ditchStart, 200, 600).lonLat;
    const r = projectStations(net, [{ id: "D1", lonLat: p }]);
    expect(r.projections[0]!.branchId).toBe("Ditch");
    expectWithin(r.projections[0]!.alongChannelKm! * 1000, 10_600, 1, "point 600 m up Ditch");
  });

  it("buildChannelNetwork() without role picks the longest line as main stem and numbers unnamed lines", () => {
    const n2 = buildChannelNetwork({ type: "MultiLineString", coordinates: [creek, main] }, { mouth: "start" });
    expect(n2.branches.map((b) => b.id)).toEqual(["branch-0#1", "branch-0#0"]);
  });

  it("buildChannelNetwork() throws a RangeError naming a branch that joins nothing", () => {
    const stray = geodesicLine(direct(mouth, 135, 5000).lonLat, 135, 2000, 500);
    const bad: LineFeatureCollection = {
      type: "FeatureCollection",
      features: [
        fc.features[1]!,
        { type: "Feature", geometry: { type: "LineString", coordinates: stray }, properties: { id: "Stray" } },
      ],
    };
    expect(() => buildChannelNetwork(bad, { mouth: "start" })).toThrow(/'Stray'.*does not join/);
  });

  it("buildChannelNetwork() rejects duplicate ids, an unknown mainBranchId and two main stems", () => {
    const dup: LineFeatureCollection = { type: "FeatureCollection", features: [fc.features[1]!, fc.features[1]!] };
    expect(() => buildChannelNetwork(dup)).toThrow(/'main' occurs more than once/);
    expect(() => buildChannelNetwork(fc, { mainBranchId: "Nope" })).toThrow(/mainBranchId 'Nope'/);
    const twoMains: LineFeatureCollection = {
      type: "FeatureCollection",
      features: [fc.features[1]!, { ...fc.features[0]!, properties: { name: "Creek", role: "main" } }],
    };
    expect(() => buildChannelNetwork(twoMains)).toThrow(/2 lines have properties.role "main"/);
  });
});

describe("buildChannelNetwork() mouth options", () => {
  it("mouth: 'end' measures chainage from the last vertex", () => {
    const net = buildChannelNetwork({ type: "LineString", coordinates: main }, { mouth: "end" });
    expect(net.branches[0]!.reversed).toBe(true);
    expect(net.mouthLonLat).toEqual(main[main.length - 1]);
    expect(net.mouthSource).toBe("end");
  });

  it("mouth: [lon, lat] picks the nearer end and warns when the point is far from both ends", () => {
    const near = buildChannelNetwork(
      { type: "LineString", coordinates: main },
      { mouth: [main[main.length - 1]![0] + 0.001, main[main.length - 1]![1]] },
    );
    expect(near.branches[0]!.reversed).toBe(true);
    expect(near.warnings).toEqual([]);
    const far = buildChannelNetwork({ type: "LineString", coordinates: main }, { mouth: [mouth[0] - 0.2, mouth[1]] });
    expect(far.branches[0]!.reversed).toBe(false);
    expect(far.warnings[0]?.code).toBe("mouthFar");
  });

  it("an unstated mouth is assumed at the first vertex with a mouthAssumed warning", () => {
    const net = buildChannelNetwork({ type: "LineString", coordinates: main });
    expect(net.mouthSource).toBe("assumed");
    expect(net.warnings.map((w) => w.code)).toEqual(["mouthAssumed"]);
  });
});

describe("antimeridian and high-latitude handling", () => {
  const start: [number, number] = [179.8, -17];
  const line = geodesicLine(start, 80, 50_000, 1000).map(([lon, lat]): [number, number] => [
    lon > 180 ? lon - 360 : lon,
    lat,
  ]);

  it("buildChannelNetwork() unwraps a line crossing ±180° and matches the geographiclib length (Karney 2013) within 1e-6 relative", () => {
    expect(line.some(([lon]) => lon < 0)).toBe(true);
    const net = buildChannelNetwork({ type: "LineString", coordinates: line }, { mouth: "start" });
    expectWithin(net.totalLengthKm * 1000, geodesicLengthM(line), 0.05, "antimeridian line length [m]");
    const p = direct(start, 80, 30_000);
    const q = direct(p.lonLat, p.azi - 90, 500).lonLat;
    const r = projectLonLatArrays(net, Float64Array.of(q[0] > 180 ? q[0] - 360 : q[0]), Float64Array.of(q[1]));
    expectWithin(r.alongChannelKm[0]! * 1000, 30_000, 1, "chainage across the antimeridian");
    expectWithin(r.offsetM[0], 500, 1, "offset across the antimeridian");
    expect(r.nearestLon[0]).toBeLessThan(180);
    expect(r.nearestLon[0]).toBeGreaterThanOrEqual(-180);
  });

  it("buildChannelNetwork() joins a MultiLineString split at the antimeridian (RFC 7946 §3.1.9) into one branch", () => {
    const split = {
      type: "MultiLineString" as const,
      coordinates: [
        [
          [179.5, -17],
          [180, -16.9],
        ],
        [
          [-180, -16.9],
          [-179.5, -16.8],
        ],
      ],
    };
    const net = buildChannelNetwork(split, { mouth: "start" });
    expect(net.branches).toHaveLength(1);
    expect(net.branches[0]!.coordinates.map((c) => c[0])).toEqual([179.5, 180, 180.5]);
  });

  it("buildChannelNetwork() rejects latitudes beyond ±85° with a RangeError naming the position", () => {
    expect(() =>
      buildChannelNetwork({
        type: "LineString",
        coordinates: [
          [0, 84],
          [1, 86],
        ],
      }),
    ).toThrow(/position 1 has latitude 86°, beyond ±85°/);
  });

  it("buildChannelNetwork() rejects malformed input with a TypeError", () => {
    expect(() => buildChannelNetwork({ type: "Feature", geometry: null, properties: {} })).toThrow(TypeError);
    // @ts-expect-error a Point is not a centerline
    expect(() => buildChannelNetwork({ type: "Point", coordinates: [0, 0] })).toThrow(/LineString or MultiLineString/);
  });
});
