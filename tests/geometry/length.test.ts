import { describe, it } from "vitest";
import { randomLcg } from "d3-random";
import { expectWithin, expectWithinRel } from "../helpers/tolerance.ts";
import { buildChannelNetwork } from "../../analysis/geometry/buildNetwork.ts";
import { channelLengthKm } from "../../analysis/geometry/channelLength.ts";
import { localSegmentLengthM } from "../../analysis/geometry/ellipsoid.ts";
import ref from "../reference/geometry.json";
import { geodesicLengthM, inverseM, meanderLine } from "./fixtures.ts";

describe("channel length on the WGS84 ellipsoid", () => {
  for (const key of ["equatorDegree", "meridianDegree", "meridian0to85"] as const) {
    const c = ref[key];
    it(`channelLengthKm() matches ${key} (${c.source.slice(0, 60)}…) within ${c.tol} ${c.unit}`, () => {
      const net = buildChannelNetwork({ type: "LineString", coordinates: c.inputs.coordinates }, { mouth: "start" });
      expectWithin(channelLengthKm(net) * 1000, c.expected, c.tol, key);
    });
  }

  it("localSegmentLengthM() matches geographiclib (Karney 2013) Inverse within 1e-6 relative for seeded 10 m–2 km segments at 0–80° latitude", () => {
    const rng = randomLcg(11);
    for (let k = 0; k < 500; k++) {
      const lat = -80 + 160 * rng();
      const lon = -180 + 360 * rng();
      const dist = 10 + 1990 * rng();
      const az = 360 * rng();
      const b = (() => {
        const r = {
          lon: lon + ((dist / 111000) * Math.sin((az * Math.PI) / 180)) / Math.cos((lat * Math.PI) / 180),
          lat: lat + (dist / 111000) * Math.cos((az * Math.PI) / 180),
        };
        return [r.lon, r.lat] as [number, number];
      })();
      if (Math.abs(b[1]) > 85) continue;
      const ours = localSegmentLengthM(lon, lat, b[0], b[1]);
      expectWithinRel(ours, inverseM([lon, lat], b), 1e-6, `segment ${k} at lat ${lat.toFixed(2)}`);
    }
  });

  it("buildChannelNetwork() length of a seeded 5,000-vertex meander matches the geographiclib (Karney 2013) sum within 1e-6 relative (target ≤ 0.1 %)", () => {
    const coords = meanderLine(randomLcg(3), [-76.5, 35.0], 5000, 20);
    const net = buildChannelNetwork({ type: "LineString", coordinates: coords }, { mouth: "start" });
    expectWithinRel(net.totalLengthKm * 1000, geodesicLengthM(coords), 1e-6, "meander length");
    expectWithinRel(
      net.branches[0]!.vertexKm[2500]! * 1000,
      geodesicLengthM(coords.slice(0, 2501)),
      1e-6,
      "chainage of vertex 2500",
    );
  });

  it("buildChannelNetwork() length of a 300 km line with 30 km segments at 60° N matches geographiclib (Karney 2013) within 0.1 % (long segments are densified)", () => {
    const coords: [number, number][] = Array.from({ length: 11 }, (_, i) => [5 + i * 0.5, 60 + i * 0.05]);
    const net = buildChannelNetwork({ type: "LineString", coordinates: coords }, { mouth: "start" });
    expectWithinRel(net.totalLengthKm * 1000, geodesicLengthM(coords), 1e-3, "long-segment line");
  });
});
