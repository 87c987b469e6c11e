import { describe, expect, it } from "vitest";
import { randomLcg, randomNormal } from "d3-random";
import { reinschFit } from "../../analysis/stats/smoothingSpline.ts";
import { mergeKnots } from "../../analysis/stats/knotData.ts";
import { evaluateSplineGrid } from "../../analysis/stats/naturalSpline.ts";
import { evaluatePlannedGrid, planSplineGrid } from "../../analysis/stats/splineGridPlan.ts";

const rnd = randomLcg(21);
const z = randomNormal.source(randomLcg(22))(0, 1);
const x = Array.from({ length: 20 }, (_, i) => i + 0.4 * rnd());
const w = x.map(() => 0.5 + rnd());

describe("planned spline-grid evaluation (Green & Silverman 1994 §2.1)", () => {
  it("evaluatePlannedGrid() gives the values and second derivatives of evaluateSplineGrid() bit for bit", () => {
    const y = x.map((v) => Math.cos(v / 4) + 0.1 * z());
    const k = mergeKnots(x, y, w, 1e-9);
    const spline = reinschFit(k, 0.5).spline;
    const G = 41;
    const grid = Float64Array.from({ length: G }, (_, i) => k.x[0]! + ((k.x[k.n - 1]! - k.x[0]!) * i) / (G - 1));
    const plan = planSplineGrid(k.x, k.n, grid);
    expect(plan).toBeDefined();
    const f1 = new Float64Array(G),
      d1 = new Float64Array(G),
      f2 = new Float64Array(G),
      d2 = new Float64Array(G);
    evaluateSplineGrid(spline, grid, f1, undefined, d1);
    evaluatePlannedGrid(plan!, spline.values, spline.secondDerivs, f2, d2);
    expect(Array.from(f2)).toEqual(Array.from(f1));
    expect(Array.from(d2)).toEqual(Array.from(d1));
  });

  it("planSplineGrid() declines a grid reaching outside the knots (the caller extrapolates linearly instead)", () => {
    expect(planSplineGrid(x, x.length, [x[0]! - 1, x[1]!])).toBeUndefined();
    expect(planSplineGrid([0], 1, [0])).toBeUndefined();
  });
});
