import { describe, expect, it } from "vitest";
import { randomLcg, randomNormal } from "d3-random";
import { mergeKnotResponses, mergeKnots } from "../../analysis/stats/knotData.ts";

const z = randomNormal.source(randomLcg(31))(0, 1);

describe("merged knot responses (ties merged as in mergeKnots)", () => {
  it("mergeKnotResponses() gives mergeKnots()'s merged y bit for bit for a new response, ties and dropped points included", () => {
    const xt = [0, 1, 1 + 1e-12, 2, 3, 3, 4, 5];
    const wt = [1, 2, 0.5, 0, 1.5, 3, 1, 2];
    const knotOf = new Int32Array(xt.length);
    const first = mergeKnots(xt, xt.map(Math.sin), wt, 1e-9, undefined, knotOf);
    const knotW = Float64Array.from(first.w.subarray(0, first.n));
    const y = xt.map(() => z());
    const out = new Float64Array(xt.length);
    mergeKnotResponses(knotOf, wt, y, knotW, first.n, out);
    const direct = mergeKnots(xt, y, wt, 1e-9);
    expect(Array.from(out.subarray(0, first.n))).toEqual(Array.from(direct.y.subarray(0, direct.n)));
    expect(Array.from(knotOf)).toEqual([0, 1, 1, -1, 2, 2, 3, 4]);
  });
});
