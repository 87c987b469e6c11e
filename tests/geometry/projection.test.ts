import { describe, expect, it } from "vitest";
import { randomLcg } from "d3-random";
import { expectWithin } from "../helpers/tolerance.ts";
import { buildChannelNetwork } from "../../analysis/geometry/buildNetwork.ts";
import { projectLonLatArrays } from "../../analysis/geometry/projectBulk.ts";
import { projectStations } from "../../analysis/geometry/projectStations.ts";
import { NearestSegmentTracker } from "../../analysis/geometry/segmentKernel.ts";
import { direct, geodesicLine, inverseM, meanderLine } from "./fixtures.ts";

describe("projection onto a straight geodesic channel (geographiclib reference, Karney 2013)", () => {
  for (const [lat0, az] of [
    [51, 60],
    [0.2, 135],
    [-33, 10],
    [70, 250],
  ] as const) {
    it(`projectLonLatArrays() at ${lat0}° latitude, azimuth ${az}°: chainage, |offset| and nearest point within 1 m of geographiclib Direct for offsets up to 2 km`, () => {
      const mouth: [number, number] = [10, lat0];
      const coords = geodesicLine(mouth, az, 30_000, 250);
      const net = buildChannelNetwork({ type: "LineString", coordinates: coords }, { mouth: "start" });
      const rng = randomLcg(lat0 + 100);
      const n = 200;
      const lon = new Float64Array(n);
      const lat = new Float64Array(n);
      const cases = Array.from({ length: n }, (_, i) => {
        const s = 500 + 29_000 * rng();
        const h = -2000 + 4000 * rng();
        const foot = direct(mouth, az, s);
        // positive offset = right bank looking seaward = azimuth (upstream direction) − 90°
        const p = direct(foot.lonLat, foot.azi - 90 * Math.sign(h), Math.abs(h)).lonLat;
        [lon[i], lat[i]] = p;
        return { s, h, foot: foot.lonLat };
      });
      const r = projectLonLatArrays(net, lon, lat);
      cases.forEach((c, i) => {
        expectWithin(r.alongChannelKm[i]! * 1000, c.s, 1, `chainage of case ${i}`);
        expectWithin(r.offsetM[i], c.h, 1, `signed offset of case ${i}`);
        expectWithin(inverseM([r.nearestLon[i]!, r.nearestLat[i]!], c.foot), 0, 1, `nearest point of case ${i}`);
        expect(r.branchIndex[i]).toBe(0);
      });
    });
  }
});

describe("projection properties on a seeded meander (seeded points, common practice)", () => {
  const coords = meanderLine(randomLcg(5), [-76.5, 35.0], 1500, 40);
  const net = buildChannelNetwork({ type: "LineString", coordinates: coords }, { mouth: "start" });
  const km = net.branches[0]!.vertexKm;

  it("projectLonLatArrays(): a point ON the line projects to its own chainage (within 1 mm) with |offset| < 1 mm", () => {
    const rng = randomLcg(8);
    const n = 500;
    const lon = new Float64Array(n);
    const lat = new Float64Array(n);
    const want: number[] = [];
    for (let i = 0; i < n; i++) {
      const j = Math.floor(rng() * (coords.length - 1));
      const t = rng();
      const [a, b] = [coords[j]!, coords[j + 1]!];
      lon[i] = a[0] + t * (b[0] - a[0]);
      lat[i] = a[1] + t * (b[1] - a[1]);
      want.push(km[j]! + t * (km[j + 1]! - km[j]!));
    }
    const r = projectLonLatArrays(net, lon, lat);
    for (let i = 0; i < n; i++) {
      expectWithin(r.alongChannelKm[i]! * 1e6, want[i]! * 1e6, 1, `chainage [mm] of on-line point ${i}`);
      expectWithin(r.offsetM[i], 0, 1e-3, `offset of on-line point ${i}`);
    }
  });

  it("projectLonLatArrays(): the offset sign flips across the line (right bank looking seaward is positive)", () => {
    const rng = randomLcg(9);
    for (let k = 0; k < 200; k++) {
      const j = 1 + Math.floor(rng() * (coords.length - 3));
      const [a, b] = [coords[j]!, coords[j + 1]!];
      const m: [number, number] = [(a[0] + b[0]) / 2, (a[1] + b[1]) / 2];
      const upAz = (Math.atan2((b[0] - a[0]) * Math.cos((a[1] * Math.PI) / 180), b[1] - a[1]) * 180) / Math.PI;
      const right = direct(m, upAz - 90, 5).lonLat;
      const left = direct(m, upAz + 90, 5).lonLat;
      const r = projectLonLatArrays(net, Float64Array.of(right[0], left[0]), Float64Array.of(right[1], left[1]));
      expect(r.offsetM[0], `right-bank point ${k}`).toBeGreaterThan(0);
      expect(r.offsetM[1], `left-bank point ${k}`).toBeLessThan(0);
      expectWithin(r.offsetM[0]! - r.offsetM[1]!, 10, 0.05, `offset difference across the line at ${k}`);
    }
  });

  it("projectLonLatArrays() finds the same nearest distance as a brute-force scan of every segment for seeded points up to 20 km away", () => {
    const rng = randomLcg(21);
    const n = 2000;
    const lon = new Float64Array(n);
    const lat = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      const c = coords[Math.floor(rng() * coords.length)]!;
      const spread = i < 1000 ? 0.005 : 0.2;
      lon[i] = c[0] + (rng() - 0.5) * spread;
      lat[i] = c[1] + (rng() - 0.5) * spread;
    }
    const r = projectLonLatArrays(net, lon, lat);
    const brute = new NearestSegmentTracker(net.segments);
    for (let i = 0; i < n; i++) {
      brute.reset(lon[i]!, lat[i]!);
      for (let s = 0; s < net.segments.lon0.length; s++) brute.test(s);
      expectWithin(Math.abs(r.offsetM[i]!), Math.sqrt(brute.bestD2), 1e-6, `nearest distance of point ${i}`);
    }
  });
});

describe("projectStations() flags and keeps every station", () => {
  const coords = geodesicLine([-1, 50], 90, 20_000, 500);
  const net = buildChannelNetwork({ type: "LineString", coordinates: coords }, { mouth: "start" });
  const on = direct([-1, 50], 90, 5000).lonLat;
  const foot8 = direct([-1, 50], 90, 8000);
  const far = direct(foot8.lonLat, foot8.azi - 90, 3000).lonLat; // geodesic perpendicular, right bank
  const sea = direct([-1, 50], 270, 400).lonLat;

  it("projectStations() warns for an off-channel station (3 km > 2 km default) naming it and its offset, and keeps it", () => {
    const r = projectStations(net, [
      { id: "S1", lonLat: on },
      { id: "S9", lonLat: far },
    ]);
    expect(r.projections.map((p) => p.offChannel)).toEqual([false, true]);
    const w = r.warnings.find((x) => x.code === "offChannel");
    expect(w?.message).toContain("S9");
    expect(w?.message).toMatch(/300\d m/);
    expectWithin(r.projections[1]!.alongChannelKm, 8, 0.001, "chainage of the off-channel station");
    expectWithin(r.projections[1]!.offsetM, 3000, 1, "offset of the off-channel station");
  });

  it("projectStations() honours the user threshold (5 km keeps the 3 km station on channel)", () => {
    const r = projectStations(net, [{ id: "S9", lonLat: far }], { offChannelThresholdM: 5000 });
    expect(r.projections[0]!.offChannel).toBe(false);
    expect(r.warnings).toEqual([]);
  });

  it("projectStations() returns a station without position with a noPosition warning, and one beyond ±85° with invalidPosition", () => {
    const r = projectStations(net, [{ id: "NP" }, { id: "POLE", lonLat: [0, 88] }]);
    expect(r.projections).toHaveLength(2);
    expect(r.projections[0]).toMatchObject({ id: "NP", alongChannelKm: undefined, offChannel: true });
    expect(r.warnings.map((w) => w.code)).toEqual(["noPosition", "invalidPosition"]);
    expect(r.warnings[1]!.message).toContain("POLE");
  });

  it("projectStations() warns for a station seaward of the mouth (400 m) and gives it km 0", () => {
    const r = projectStations(net, [{ id: "OUT", lonLat: sea }]);
    expectWithin(r.projections[0]!.alongChannelKm, 0, 1e-12, "chainage of a station beyond the mouth");
    expect(r.warnings[0]?.code).toBe("beyondChannelEnd");
    expect(r.warnings[0]?.message).toMatch(/OUT.*40\d m seaward of the mouth/);
  });

  it("projectStations() rejects a non-positive threshold with a RangeError naming the option", () => {
    expect(() => projectStations(net, [], { offChannelThresholdM: 0 })).toThrow(/offChannelThresholdM/);
  });

  it("projectLonLatArrays() rejects arrays of different length and latitudes beyond ±85°", () => {
    expect(() => projectLonLatArrays(net, new Float64Array(2), new Float64Array(1))).toThrow(RangeError);
    expect(() => projectLonLatArrays(net, Float64Array.of(0), Float64Array.of(86))).toThrow(/point 0.*85/);
  });
});
