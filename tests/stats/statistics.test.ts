import { randomLcg } from "d3-random";
import { describe, expect, it } from "vitest";
import { expectWithin } from "../helpers/tolerance.ts";
import { runsTest, runsCritical } from "../../analysis/stats/runsTest.ts";
import { chiSquareUpperP, fUpperP, normalCdf } from "../../analysis/stats/distributions.ts";
import { interval95, percentileSelect, percentileSorted } from "../../analysis/stats/percentile.ts";
import { polyFit } from "../../analysis/stats/polyFit.ts";

/** Brute force: all arrangements of n1 '+' and n2 '−', counted by number of runs. */
function bruteRunsP(n1: number, n2: number, rObs: number): number {
  let total = 0;
  let hit = 0;
  const n = n1 + n2;
  for (let mask = 0; mask < 1 << n; mask++) {
    let ones = 0;
    for (let i = 0; i < n; i++) ones += (mask >> i) & 1;
    if (ones !== n1) continue;
    let runs = 1;
    for (let i = 1; i < n; i++) if (((mask >> i) & 1) !== ((mask >> (i - 1)) & 1)) runs++;
    total++;
    if (runs <= rObs) hit++;
  }
  return hit / total;
}

describe("runs test (Wald & Wolfowitz 1940)", () => {
  it.each([
    [[1, 1, 1, -1, -1, -1, 1, 1, -1, -1, -1, -1]],
    [[1, -1, 1, -1, 1, -1, 1, -1]],
    [[2, 3, 1, 4, -1, -2, -3, -1, -2, 5, 1]],
  ])("runsTest() exact p equals brute-force enumeration of all arrangements for %j within 1e-12", (res) => {
    const r = runsTest(res);
    expectWithin(r.pTooFew, bruteRunsP(r.nPositive, r.nNegative, r.runs), 1e-12, "P(R ≤ r)");
  });

  it("runsCritical() is the largest r with P(R ≤ r) ≤ α, matching brute force for n1 = n2 = 7, α = 0.05 (Wald & Wolfowitz 1940)", () => {
    const c = runsCritical(7, 7, 0.05);
    expectWithin(bruteRunsP(7, 7, c) <= 0.05 ? 1 : 0, 1, 0, `P(R ≤ ${c})`);
    expectWithin(bruteRunsP(7, 7, c + 1) > 0.05 ? 1 : 0, 1, 0, `P(R ≤ ${c + 1})`);
  });
});

describe("runs test for large samples (Wald & Wolfowitz 1940 normal limit)", () => {
  /** n1 positives and n2 negatives in blocks of `block`, so the number of runs is set by the block length. */
  function blocks(n1: number, n2: number, block: number): number[] {
    const out: number[] = [];
    let pos = n1;
    let neg = n2;
    while (pos > 0 || neg > 0) {
      for (let i = 0; i < block && pos > 0; i++, pos--) out.push(1);
      for (let i = 0; i < block && neg > 0; i++, neg--) out.push(-1);
    }
    return out;
  }
  it.each([1, 3, 5])(
    "runsTest() in the tails just above the exact-sum limit (n1 = n2 = 201, blocks of %i) agrees with the exact sum just below it (n1 = n2 = 200) within 0.03",
    (block) => {
      const exact = runsTest(blocks(200, 200, block));
      const normal = runsTest(blocks(201, 201, block));
      expectWithin(normal.pTooFew, exact.pTooFew, 0.03, `block ${block}: runs ${exact.runs} vs ${normal.runs}`);
    },
  );
});

describe("distribution functions via jStat against handbook tables (from memory: standard F and χ² tables)", () => {
  it("fUpperP(4.96, 1, 10) ≈ 0.05 and chiSquareUpperP(3.841, 1) ≈ 0.05 (95 % critical values of F(1,10) and χ²(1))", () => {
    expectWithin(fUpperP(4.96, 1, 10), 0.05, 5e-4, "F(1,10)");
    expectWithin(chiSquareUpperP(3.841, 1), 0.05, 1e-4, "χ²(1)");
    expectWithin(chiSquareUpperP(18.307, 10), 0.05, 1e-4, "χ²(10)");
    expectWithin(normalCdf(1.96), 0.975, 1e-4, "Φ(1.96)");
    expectWithin(fUpperP(Number.POSITIVE_INFINITY, 1, 3), 0, 0, "F = ∞");
  });
});

describe("percentiles (Hyndman & Fan 1996 definition 7)", () => {
  it("percentileSorted() and percentileSelect() agree with the definition-7 value 1.75 for [1,2,3,4] at p = 0.25", () => {
    expectWithin(percentileSorted([1, 2, 3, 4], 0.25), 1.75, 1e-15, "sorted");
    expectWithin(percentileSelect(Float64Array.from([4, 1, 3, 2]), 4, 0.25), 1.75, 1e-15, "selection");
    const v = Array.from({ length: 1001 }, (_, i) => (i * 7919) % 1001);
    const iv = interval95(v)!;
    expectWithin(iv[0], 25, 1e-9, "2.5 % of 0…1000");
    expectWithin(iv[1], 975, 1e-9, "97.5 % of 0…1000");
  });

  it("percentileSelect() equals percentileSorted() bit for bit in both tails, with ties, small and large samples (definition 7)", () => {
    const u = randomLcg(5);
    for (const n of [1, 2, 3, 7, 40, 1001, 2000]) {
      for (const ties of [false, true]) {
        const v = Array.from({ length: n }, () => (ties ? Math.floor(10 * u()) : u() - 0.5));
        const sorted = [...v].sort((a, b) => a - b);
        for (const p of [0, 0.01, 0.025, 0.3, 0.5, 0.7, 0.975, 0.99, 1]) {
          expect(percentileSelect(Float64Array.from(v), n, p)).toBe(percentileSorted(sorted, p));
        }
      }
    }
  });
});

describe("weighted polynomial fit (Draper & Smith 1998)", () => {
  it("polyFit() recovers an exact quadratic and weights a point out with weight 0 (least squares, common practice)", () => {
    const x = [0, 1, 2, 3, 4, 5];
    const y = x.map((v) => 2 - 3 * v + 0.5 * v * v);
    y[5] = 1000;
    const w = [1, 2, 1, 3, 1, 0];
    const q = polyFit(x, y, w, 2)!;
    expectWithin(q.coef[0], 2, 1e-9, "a");
    expectWithin(q.coef[1], -3, 1e-9, "b");
    expectWithin(q.coef[2], 0.5, 1e-10, "c");
    expectWithin(q.n, 5, 0, "points with weight");
    expectWithin(
      polyFit([1, 1, 1], [1, 2, 3], [1, 1, 1], 1) === undefined ? 1 : 0,
      1,
      0,
      "undefined without distinct x",
    );
  });
});
