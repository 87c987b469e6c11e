import { describe, expect, it } from "vitest";
import { expectWithin } from "../helpers/tolerance.ts";
import { buildChannelNetwork } from "../../analysis/geometry/buildNetwork.ts";
import { spearmanRho, suggestMouth } from "../../analysis/geometry/suggestMouth.ts";
import { direct, geodesicLine } from "./fixtures.ts";

// The channel is given head first: its sea end is the LAST vertex.
const head: [number, number] = [145.0, -38.0];
const coords = geodesicLine(head, 200, 25_000, 500);
const stations = [2, 6, 10, 14, 18, 22].map((kmFromHead) => ({
  lonLat: direct(head, 200, kmFromHead * 1000).lonLat,
  salinity: 1 + 1.4 * kmFromHead, // saltier towards the sea end
}));

describe("suggestMouth() from projected station salinity (higher salinity = seaward, common practice)", () => {
  it("suggestMouth() on a network built without a mouth suggests the 'end' vertex with a stated notice", () => {
    const net = buildChannelNetwork({ type: "LineString", coordinates: coords });
    expect(net.mouthSource).toBe("assumed");
    const s = suggestMouth(net, stations)!;
    expect(s.mouth).toBe("end");
    expect(s.mouthLonLat).toEqual(coords[coords.length - 1]);
    expectWithin(s.spearmanRho, 1, 1e-12, "rank correlation with km from the assumed mouth");
    expect(s.notice).toMatch(/^Suggested mouth: the last vertex .* suggestion from the survey data/);
    expect(s.nStations).toBe(6);
  });

  it("suggestMouth() agrees with an explicit mouth: 'end' (ρ = −1 from the true mouth)", () => {
    const net = buildChannelNetwork({ type: "LineString", coordinates: coords }, { mouth: "end" });
    const s = suggestMouth(net, stations)!;
    expect(s.mouth).toBe("end");
    expectWithin(s.spearmanRho, -1, 1e-12, "rank correlation from the stated mouth");
  });

  it("suggestMouth() returns undefined with fewer than 3 stations having position and salinity", () => {
    const net = buildChannelNetwork({ type: "LineString", coordinates: coords }, { mouth: "start" });
    expect(
      suggestMouth(net, [
        stations[0]!,
        stations[1]!,
        { lonLat: undefined, salinity: 30 },
        { lonLat: stations[2]!.lonLat },
      ]),
    ).toBeUndefined();
  });

  it("spearmanRho() uses mid-ranks for ties: x = [1, 2, 2, 3], y = [1, 3, 2, 4] gives 0.9487 (hand-worked, Spearman 1904)", () => {
    // ranks x = [1, 2.5, 2.5, 4], y = [1, 3, 2, 4]; Pearson of ranks = 4.5 / √(4.5·5) = 0.948683
    expectWithin(spearmanRho([1, 2, 2, 3], [1, 3, 2, 4]), 4.5 / Math.sqrt(4.5 * 5), 1e-12, "rho with ties");
  });
});
