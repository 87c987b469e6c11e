import { describe, expect, it } from "vitest";
import { randomLcg, randomNormal } from "d3-random";
import { expectWithin } from "../helpers/tolerance.ts";
import {
  breakRss,
  gridTerms,
  loadResponse,
  putNormal,
  solveNormal,
  solveNormal2,
  termsRss,
  TERMS,
} from "../../analysis/mixing/twoPhaseSearch.ts";
import { twoPhaseDesign } from "../../analysis/mixing/twoPhase.ts";
import { stationSalinities, trueConc } from "./helpers/synthetic.ts";

/** Weighted least squares RSS of C = α₀ + α₁t + β₂h² (+ β₃h³) at break b by direct sums (the reference). */
function directRss(x: number[], y: number[], w: number[], b: number, k: number): number {
  const sMin = x[0]!;
  const R = x[x.length - 1]! - sMin;
  const cols = (xi: number): number[] => {
    const t = (xi - sMin) / R;
    const h = Math.max(0, b - xi) / R;
    return [1, t, h * h, h * h * h].slice(0, k);
  };
  const A = Array.from({ length: k }, () => new Array<number>(k + 1).fill(0));
  x.forEach((xi, i) => {
    const c = cols(xi);
    for (let r = 0; r < k; r++) {
      for (let s = 0; s < k; s++) A[r]![s]! += w[i]! * c[r]! * c[s]!;
      A[r]![k]! += w[i]! * c[r]! * y[i]!;
    }
  });
  for (let col = 0; col < k; col++) {
    let piv = col;
    for (let r = col + 1; r < k; r++) if (Math.abs(A[r]![col]!) > Math.abs(A[piv]![col]!)) piv = r;
    [A[col], A[piv]] = [A[piv]!, A[col]!];
    for (let r = 0; r < k; r++) {
      if (r === col) continue;
      const f = A[r]![col]! / A[col]![col]!;
      for (let s = col; s <= k; s++) A[r]![s]! -= f * A[col]![s]!;
    }
  }
  const beta = A.map((row, i) => row[k]! / row[i]!);
  return x.reduce((acc, xi, i) => {
    const c = cols(xi);
    const e = y[i]! - c.reduce((a, v, j) => a + v * beta[j]!, 0);
    return acc + w[i]! * e * e;
  }, 0);
}

// Synthetic removal survey (tests/mixing/helpers/synthetic.ts; invented, not measurements), seeded noise.
describe("two-phase break search from prefix sums of the fixed design", () => {
  const z = randomNormal.source(randomLcg(11))(0, 1);
  const spec = { c0: 150, cStar: 120, cSea: 30, sBreak: 12 };
  const x = stationSalinities(30);
  const w = x.map((s) => 1 / (0.03 * trueConc(spec, s)) ** 2);
  const design = twoPhaseDesign(x, w)!;

  it("gives the RSS of a direct weighted least-squares fit at any break (common practice: normal equations)", () => {
    const coef = new Float64Array(4);
    for (let rep = 0; rep < 20; rep++) {
      const y = x.map((s) => trueConc(spec, s) * (1 + 0.02 * z()));
      loadResponse(design, y);
      for (const b of [x[1]! + 1e-6, 3.3, 7.77, 15, 21.5, 34.9]) {
        const k = x[2]! < b ? 4 : 3;
        const ref = directRss(x, y, w, b, k);
        expectWithin(breakRss(design, b, k, coef), ref, 1e-7 * (ref + design.ryy * 1e-9), `rss at S_b ${b}`);
      }
    }
  });

  it("cached grid terms give the same RSS (or the same singular verdict) as terms computed per break", () => {
    const coef = new Float64Array(4);
    // A mild and a strongly skewed weighting (the Fe-like one makes the lowest breaks singular).
    for (const sp of [spec, { c0: 1000, cStar: 75, cSea: 2, sBreak: 15 }]) {
      const ww = x.map((s) => 1 / (0.03 * trueConc(sp, s)) ** 2);
      const d = twoPhaseDesign(x, ww)!;
      const y = x.map((s) => trueConc(sp, s) * (1 + 0.02 * z()));
      loadResponse(d, y);
      const lo = x[1]! + 1e-9 * 35;
      const grid = gridTerms(d, lo, 24, x[2]!);
      for (let g = 0; g <= 24; g++) {
        const b = lo + ((35 - lo) * g) / 24;
        const viaGrid = termsRss(d, grid, g * TERMS, coef);
        const direct = breakRss(d, b, x[2]! < b ? 4 : 3, coef);
        if (!Number.isFinite(viaGrid)) expect(direct).toBe(Number.POSITIVE_INFINITY);
        else expectWithin(viaGrid, direct, 1e-9 * d.ryy, `grid break ${g}`);
      }
    }
  });

  it("rejects salinities that are not ascending", () => {
    expect(() => twoPhaseDesign([0, 5, 3, 10], [1, 1, 1, 1])).toThrow(RangeError);
  });

  it("solveNormal2() gives solveNormal()'s k = 2 solution bit for bit, with and without a row swap, and its singular verdicts", () => {
    const u = randomLcg(77);
    const cases: number[][] = [
      [0, 0, 1, 1, 1],
      [1, 1, 1, 2, 3],
      [1e-20, 1e-20, 1e-20, 1, 1],
    ];
    for (let i = 0; i < 200; i++) {
      const a00 = 0.1 + 10 * u(),
        a01 = (u() - 0.5) * 20,
        a11 = 0.1 + 10 * u();
      cases.push([a00, a01, a11, (u() - 0.5) * 100, (u() - 0.5) * 100]);
    }
    for (const [a00, a01, a11, r0, r1] of cases) {
      putNormal(2, a00!, a01!, a11!, 0, 0, 0, 0, 0, 0, 0, r0!, r1!, 0, 0);
      const general = new Float64Array(4);
      const okGeneral = solveNormal(2, general);
      const fast = new Float64Array(4);
      const okFast = solveNormal2(a00!, a01!, a11!, r0!, r1!, fast);
      expect(okFast).toBe(okGeneral);
      if (okGeneral) expect(Array.from(fast)).toEqual(Array.from(general));
    }
  });
});
