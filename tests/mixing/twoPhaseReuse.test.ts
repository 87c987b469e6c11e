import { describe, expect, it } from "vitest";
import { randomLcg, randomNormal } from "d3-random";
import {
  alternativeFit,
  fitTwoPhase,
  fitTwoPhaseReplicate,
  newTwoPhaseFit,
  twoPhaseDesign,
  type TwoPhaseFit,
} from "../../analysis/mixing/twoPhase.ts";
import {
  dominantZoneSign,
  zoneFromCurve,
  zoneInto,
  type ReactionZoneBounds,
} from "../../analysis/mixing/zoneAndMaximum.ts";
import { stationSalinities, trueConc } from "./helpers/synthetic.ts";

/** The fit's numbers as a plain object (undefined properties left out), for comparing fits of different origin. */
function numbers(f: TwoPhaseFit | undefined): Record<string, unknown> | undefined {
  return f && (JSON.parse(JSON.stringify({ ...f, coef: [...f.coef] })) as Record<string, unknown>);
}

// The bootstrap's reusable outputs must give the numbers of the general entry points, bit for bit
// (structure for speed only). Synthetic surveys (tests/mixing/helpers/synthetic.ts; invented, not
// measurements) with seeded noise: removal ending at S 12, conservative mixing, removal to the mouth.
describe("two-phase fit and reaction zone written into reused objects", () => {
  const x = stationSalinities(20);
  const specs = [
    { c0: 150, cStar: 120, cSea: 30, sBreak: 12 },
    { c0: 120, cStar: 120, cSea: 30, sBreak: 12 },
    { c0: 150, cStar: 110, cSea: 30, sBreak: 40 },
  ];

  it("fitTwoPhaseReplicate into one reused fit equals fitTwoPhase(…, exactP false) of each replicate", () => {
    const out = newTwoPhaseFit();
    let compared = 0;
    for (const [k, spec] of specs.entries()) {
      const w = x.map((s) => 1 / (0.03 * trueConc(spec, s)) ** 2);
      const design = twoPhaseDesign(x, w)!;
      const z = randomNormal.source(randomLcg(17 + k))(0, 1);
      for (let r = 0; r < 40; r++) {
        const y = Float64Array.from(x, (s) => trueConc(spec, s) * (1 + 0.03 * z()));
        const fresh = fitTwoPhase(x, y, w, false, twoPhaseDesign(x, w));
        const reused = fitTwoPhaseReplicate(design, x, y, w, out);
        expect(reused === undefined || reused === out).toBe(true);
        expect(numbers(reused)).toEqual(numbers(fresh));
        compared++;
      }
    }
    expect(compared).toBe(120);
  });

  it("every fit has one property list in one order (undefined where there is no value)", () => {
    const w = x.map(() => 1);
    const linear = fitTwoPhase(
      x,
      x.map((s) => 100 - 2 * s),
      w,
    )!;
    const curved = fitTwoPhase(
      x,
      x.map((s) => trueConc(specs[0]!, s)),
      w,
    )!;
    expect(linear.linear).toBe(true);
    expect(curved.linear).toBe(false);
    expect(Object.keys(linear)).toEqual(Object.keys(newTwoPhaseFit()));
    expect(Object.keys(curved)).toEqual(Object.keys(newTwoPhaseFit()));
    // An undefined property never reaches JSON output.
    expect(JSON.stringify(linear)).not.toContain("breakAveraged");
  });

  it("alternativeFit gives the numbers of { ...fit, ...fit.alternative, linear: false }", () => {
    const spec = { c0: 124, cStar: 120, cSea: 30, sBreak: 12 };
    const z = randomNormal.source(randomLcg(5))(0, 1);
    const y = x.map((s) => trueConc(spec, s) * (1 + 0.03 * z()));
    const fit = fitTwoPhase(
      x,
      y,
      y.map((c) => 1 / (0.03 * c) ** 2),
    )!;
    expect(fit.linear && fit.alternative !== undefined).toBe(true);
    const spread: TwoPhaseFit = { ...fit, ...fit.alternative!, linear: false };
    expect(numbers(alternativeFit(fit, fit.alternative!))).toEqual(numbers(spread));
  });

  it("zoneInto into one reused object equals zoneFromCurve (sign given or dominant, with and without a seaward segment)", () => {
    const grid = Float64Array.from({ length: 41 }, (_, i) => (30 * i) / 40);
    const out: ReactionZoneBounds = { from: Number.NaN, to: Number.NaN, kind: "removal" };
    const rho = new Float64Array(grid.length);
    for (const bump of [-1, 1])
      for (const seg of [undefined, 12])
        for (const sign of [undefined, -1, 1] as const) {
          // d²C/dS² of a bump centred at S 8 (invented curve).
          const d2 = grid.map((s) => bump * Math.exp(-((s - 8) ** 2) / 8));
          const ref = zoneFromCurve(grid, d2, 0, undefined, seg, sign);
          const found = zoneInto(grid, d2, 0, rho, seg, sign ?? dominantZoneSign(grid, d2, 0, seg), out);
          expect(found).toBe(ref !== undefined);
          if (ref) expect({ ...out }).toEqual(ref);
        }
  });
});
