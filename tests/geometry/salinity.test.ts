import { describe, expect, it } from "vitest";
import { randomLcg, randomNormal } from "d3-random";
import { expectWithin } from "../helpers/tolerance.ts";
import { buildChannelNetwork } from "../../analysis/geometry/buildNetwork.ts";
import { projectStations } from "../../analysis/geometry/projectStations.ts";
import { fitSalinityProfile } from "../../analysis/geometry/salinityProfile.ts";
import { isohalinePositions, saltIntrusionLengthKm } from "../../analysis/geometry/isohalines.ts";
import { salinityIntervalToKm } from "../../analysis/geometry/salinityToKm.ts";
import { isotonicDecreasing } from "../../analysis/geometry/isotonic.ts";
import type { SalinityPoint } from "../../analysis/geometry/salinityTypes.ts";
import ref from "../reference/geometry.json";
import { direct, geodesicLine } from "./fixtures.ts";

const exp = ref.exponentialIsohaline;
const { S0, eFoldingKm } = exp.inputs;

/** Stations every stationSpacingKm on a straight 60 km geodesic channel, 150 m off alternately left and right. */
function exponentialSurvey(noise?: () => number): SalinityPoint[] {
  const mouth: [number, number] = [4.0, 52.0];
  const net = buildChannelNetwork(
    { type: "LineString", coordinates: geodesicLine(mouth, 100, 65_000, 500) },
    { mouth: "start" },
  );
  const stations = Array.from({ length: exp.inputs.reachKm / exp.inputs.stationSpacingKm + 1 }, (_, i) => {
    const foot = direct(mouth, 100, i * exp.inputs.stationSpacingKm * 1000);
    return { id: `E${i}`, lonLat: direct(foot.lonLat, foot.azi + (i % 2 ? 90 : -90), 150).lonLat };
  });
  const { projections } = projectStations(net, stations);
  return projections.map((p) => {
    const km = p.alongChannelKm!;
    return { id: p.id, km, salinity: S0 * Math.exp(-km / eFoldingKm) + (noise ? noise() : 0) };
  });
}

describe("salinity profile and isohalines on the exponential profile of the steady 1-D advection–dispersion closed form, derived", () => {
  it(`saltIntrusionLengthKm() gives x2 = ${exp.expected} km (steady 1-D advection–dispersion closed form, derived) within ${exp.tol} km from stations every 1 km`, () => {
    const profile = fitSalinityProfile(exponentialSurvey())!;
    expect(profile.method).toBe("isotonic");
    expect(profile.monotone).toBe(true);
    const r = saltIntrusionLengthKm(profile);
    expectWithin(r.km, exp.expected, exp.tol, "x2");
    expect(r.warnings).toEqual([]);
  });

  it("isohalinePositions() places S = 1, 5, 10, 20 at (K/U)·ln(S0/S*) (steady 1-D advection–dispersion closed form, derived) within 0.03 km", () => {
    const profile = fitSalinityProfile(exponentialSurvey())!;
    const { positions, warnings } = isohalinePositions(profile, [1, 5, 10, 20]);
    for (const p of positions) {
      expect(p.km).toHaveLength(1);
      expectWithin(p.km[0], eFoldingKm * Math.log(S0 / p.salinity), 0.03, `isohaline S = ${p.salinity}`);
    }
    expect(warnings).toEqual([]);
  });

  it("saltIntrusionLengthKm() with seeded noise (σ = 0.1) stays within 1 km of x2 = 28.62 km (steady 1-D advection–dispersion closed form, derived); noise/gradient ≈ 0.5 km", () => {
    const profile = fitSalinityProfile(exponentialSurvey(randomNormal.source(randomLcg(4))(0, 0.1)))!;
    expect(profile.method).toBe("isotonic");
    expectWithin(saltIntrusionLengthKm(profile).km, exp.expected, 1, "x2 from noisy stations");
  });

  it("salinityIntervalToKm() maps S in [5, 10] to [10·ln 3.5, 10·ln 7] km (steady 1-D advection–dispersion closed form, derived) within 0.03 km", () => {
    const profile = fitSalinityProfile(exponentialSurvey())!;
    const r = salinityIntervalToKm(profile, [10, 5]);
    expect(r.intervalsKm).toHaveLength(1);
    expectWithin(r.intervalsKm[0]![0], 10 * Math.log(3.5), 0.03, "seaward edge (S = 10)");
    expectWithin(r.intervalsKm[0]![1], 10 * Math.log(7), 0.03, "landward edge (S = 5)");
    expect(r.warnings).toEqual([]);
  });
});

describe("non-monotonic salinity (tributary or tide change): every crossing plus a warning", () => {
  // hand-worked: a 3-unit bump at km 4 (common practice illustration)
  const pts: SalinityPoint[] = [30, 25, 20, 12, 15, 8, 3, 1].map((s, i) => ({ km: i, salinity: s, id: `N${i}` }));

  it("fitSalinityProfile() falls back to joining the data and warns nonMonotonic naming the station", () => {
    const p = fitSalinityProfile(pts)!;
    expect(p.method).toBe("piecewiseLinear");
    expect(p.monotone).toBe(false);
    expectWithin(p.maxIsotonicResidual, 1.5, 1e-12, "largest PAVA residual (12 and 15 pool to 13.5)");
    expect(p.warnings[0]?.code).toBe("nonMonotonic");
    expect(p.warnings[0]?.message).toMatch(/N[34]/);
  });

  it("isohalinePositions() reports the 3 crossings of S = 13 (hand-worked 2 + 7/8, 3 + 1/3, 4 + 2/7 km) with a multipleCrossings warning", () => {
    const { positions, warnings } = isohalinePositions(fitSalinityProfile(pts)!, [13]);
    const km = positions[0]!.km;
    expect(km).toHaveLength(3);
    [2 + 7 / 8, 3 + 1 / 3, 4 + 2 / 7].forEach((x, i) => expectWithin(km[i], x, 1e-9, `crossing ${i}`));
    expect(warnings.map((w) => w.code)).toEqual(["multipleCrossings"]);
  });

  it("salinityIntervalToKm() maps [12.5, 14] to three stretches (hand-worked 2.75–2.9375, 3.1667–3.6667, 4.1429–4.3571 km) with a multipleStretches warning", () => {
    const r = salinityIntervalToKm(fitSalinityProfile(pts)!, [12.5, 14]);
    const want = [
      [2.75, 2.9375],
      [3 + 0.5 / 3, 3 + 2 / 3],
      [4 + 1 / 7, 4 + 2.5 / 7],
    ];
    expect(r.intervalsKm).toHaveLength(3);
    want.forEach(([a, b], i) => {
      expectWithin(r.intervalsKm[i]![0], a!, 1e-9, `stretch ${i} start`);
      expectWithin(r.intervalsKm[i]![1], b!, 1e-9, `stretch ${i} end`);
    });
    expect(r.warnings.map((w) => w.code)).toContain("multipleStretches");
  });

  it("saltIntrusionLengthKm() is undefined with a reason when salt reaches beyond the surveyed reach", () => {
    const p = fitSalinityProfile([
      { km: 0, salinity: 30 },
      { km: 5, salinity: 10 },
    ])!;
    const r = saltIntrusionLengthKm(p, 2);
    expect(r.km).toBeUndefined();
    expect(r.warnings[0]?.message).toMatch(/beyond the surveyed reach/);
    expect(isohalinePositions(p, [35]).warnings[0]?.code).toBe("isohalineNotReached");
  });

  it("fitSalinityProfile() returns undefined with fewer than 2 distinct km and warns for invalid points", () => {
    expect(
      fitSalinityProfile([
        { km: 1, salinity: 3 },
        { km: 1, salinity: 4 },
      ]),
    ).toBeUndefined();
    const p = fitSalinityProfile([
      { km: 0, salinity: 9 },
      { km: 1, salinity: Number.NaN, id: "BAD" },
      { km: 2, salinity: 4 },
    ])!;
    expect(p.warnings[0]?.message).toContain("BAD");
    expect(p.nPoints).toBe(2);
  });

  it("fitSalinityProfile() warns salinityRisesLandward when the mouth is probably at the other end", () => {
    const p = fitSalinityProfile([0, 1, 2, 3].map((km) => ({ km, salinity: 5 * km })))!;
    expect(p.warnings.map((w) => w.code)).toContain("salinityRisesLandward");
  });
});

describe("isotonicDecreasing() (PAVA, Barlow et al. 1972)", () => {
  it("isotonicDecreasing() pools the violating pair of [10, 8, 9, 5] to 8.5 (hand-worked)", () => {
    const b = isotonicDecreasing([0, 1, 2, 3], [10, 8, 9, 5]);
    expect(b.map((x) => x.yMean)).toEqual([10, 8.5, 5]);
    expect(b.map((x) => x.xMean)).toEqual([0, 1.5, 3]);
  });

  it("isotonicDecreasing() pools ties in x so one km has one fitted value", () => {
    const b = isotonicDecreasing([0, 1, 1, 2], [9, 4, 6, 1]);
    expect(b.map((x) => x.yMean)).toEqual([9, 5, 1]);
  });
});
