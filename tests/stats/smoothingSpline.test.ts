import { describe, expect, it } from "vitest";
import { randomLcg, randomNormal } from "d3-random";
import { expectWithin } from "../helpers/tolerance.ts";
import { fitPreparedSpline, prepareSmoothingSpline, reinschFit } from "../../analysis/stats/smoothingSpline.ts";
import { mergeKnots } from "../../analysis/stats/knotData.ts";
import { evaluateSpline } from "../../analysis/stats/naturalSpline.ts";
import { minimiseGcv, splinePath } from "../../analysis/stats/splineGcv.ts";
import { polyFit } from "../../analysis/stats/polyFit.ts";

const rnd = randomLcg(11);
const z = randomNormal.source(randomLcg(12))(0, 1);
const x = Array.from({ length: 15 }, (_, i) => i + 0.3 * rnd());
const y = x.map((v) => Math.sin(v / 3) + 0.1 * z());
const w = x.map(() => 0.5 + rnd());
const k = mergeKnots(x, y, w, 1e-9);

describe("smoothing spline (Reinsch 1967; Green & Silverman 1994 §2.3)", () => {
  it("reinschFit() tr H equals Σ_i H_ii built column by column from unit responses (linearity of the smoother) within 1e-9", () => {
    const lambda = 0.7;
    const fit = reinschFit(k, lambda, true);
    let trace = 0;
    for (let i = 0; i < k.n; i++) {
      const e = Array.from({ length: k.n }, (_, j) => (j === i ? 1 : 0));
      trace += reinschFit({ x: k.x, y: e, w: k.w, n: k.n }, lambda, false).spline.values[i]!;
    }
    expectWithin(fit.edf, trace, 1e-9, "tr H, band-of-inverse vs explicit");
  });

  it("reinschFit() with λ → 0 interpolates the data (natural cubic interpolant, Green & Silverman 1994 §2.1) within 1e-8", () => {
    const fit = reinschFit(k, 1e-12, true);
    for (let i = 0; i < k.n; i++) expectWithin(fit.spline.values[i], k.y[i]!, 1e-8, `value at knot ${i}`);
    expectWithin(fit.edf, k.n, 1e-6, "edf of the interpolant");
  });

  it("reinschFit() with λ → ∞ tends to the weighted least-squares straight line (null space of the penalty) within 1e-5", () => {
    const fit = reinschFit(k, 1e12, true);
    const line = polyFit(
      Array.from(k.x.subarray(0, k.n)),
      Array.from(k.y.subarray(0, k.n)),
      Array.from(k.w.subarray(0, k.n)),
      1,
    )!;
    for (let i = 0; i < k.n; i++)
      expectWithin(fit.spline.values[i], line.coef[0]! + line.coef[1]! * k.x[i]!, 1e-5, `knot ${i}`);
    expectWithin(fit.edf, 2, 1e-5, "edf of a straight line");
  });

  it("reinschFit() minimises Σw(y−f)² + λ∫f''²: perturbing a fitted value raises the objective (common practice: first-order optimality)", () => {
    const lambda = 0.5;
    const fit = reinschFit(k, lambda, false);
    const objective = (vals: number[]): number => {
      const f = reinschFit({ x: k.x, y: vals, w: k.w.map(() => 1e12), n: k.n }, 0, false).spline; // natural interpolant of vals
      let pen = 0;
      for (let i = 0; i < k.n - 1; i++) {
        const h = k.x[i + 1]! - k.x[i]!;
        const g0 = f.secondDerivs[i]!,
          g1 = f.secondDerivs[i + 1]!;
        pen += (h * (g0 * g0 + g0 * g1 + g1 * g1)) / 3;
      }
      return vals.reduce((s, v, i) => s + k.w[i]! * (k.y[i]! - v) ** 2, 0) + lambda * pen;
    };
    const base = objective(Array.from(fit.spline.values));
    for (const i of [0, 5, k.n - 1]) {
      const v = Array.from(fit.spline.values);
      v[i]! += 1e-3;
      const up = objective(v);
      const ok = up > base;
      expectWithin(ok ? 1 : 0, 1, 0, `objective rises when value ${i} moves`);
    }
  });

  it("evaluateSpline() reproduces an exact quadratic's first and second derivative between knots of a dense interpolant (calculus) within 1e-3", () => {
    const xs = Array.from({ length: 36 }, (_, i) => i);
    const q = (s: number): number => 150 - 5.892857 * s + 0.05 * s * s;
    const kk = mergeKnots(
      xs,
      xs.map(q),
      xs.map(() => 1),
      1e-9,
    );
    const sp = reinschFit(kk, 1e-10, false).spline;
    const p = evaluateSpline(sp, 17.5);
    expectWithin(p.value, q(17.5), 1e-3, "value");
    expectWithin(p.d1, -5.892857 + 0.1 * 17.5, 1e-3, "dC/dS");
    expectWithin(p.d2, 0.1, 1e-3, "d²C/dS²");
  });

  it("minimiseGcv() chooses a smoother (edf between 2 and n) for noisy sine data (Craven & Wahba 1979)", () => {
    const g = minimiseGcv(splinePath(k), 1);
    expectWithin(g.edf > 2 && g.edf < k.n ? 1 : 0, 1, 0, `edf ${g.edf} in (2, ${k.n})`);
    expectWithin(Number.isFinite(g.lambda) && g.lambda > 0 ? 1 : 0, 1, 0, "λ finite and positive");
  });

  it("fitPreparedSpline() gives reinschFit()'s knot values and second derivatives bit for bit (one factorisation, many responses)", () => {
    const prepared = prepareSmoothingSpline(k, 0.7);
    for (let r = 0; r < 5; r++) {
      const y2 = Array.from({ length: k.n }, (_, i) => k.y[i]! + (r === 0 ? 0 : 0.2 * z()));
      const direct = reinschFit({ x: k.x, y: y2, w: k.w, n: k.n }, 0.7).spline;
      const fast = fitPreparedSpline(prepared, y2);
      expect(Array.from(fast.values)).toEqual(Array.from(direct.values));
      expect(Array.from(fast.secondDerivs)).toEqual(Array.from(direct.secondDerivs));
    }
  });
});
