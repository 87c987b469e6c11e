import { describe, it } from "vitest";
import { expectWithin, expectWithinRel } from "../helpers/tolerance.ts";
import { reactionRate } from "../../analysis/mixing/reactionRate.ts";
import { analyzeConstituent } from "../../analysis/mixing/analyzeConstituent.ts";
import { CASES, samplesOf } from "./helpers/cases.ts";

const C = CASES.caseC;
const { dischargeM3s: Q, crossSectionM2: A, dispersionM2s: K, a, b, c } = C.inputs as Record<string, number>;
const U = Q! / A!;
/** Salinity profile of case C: S = 35·exp(U·x/K), x ≤ 0 seaward-positive, mouth at 0. */
const gradient = (s: number): number => (U * s) / K!;

describe("reaction rate from curvature (Boyle et al. 1974; Officer 1979, Eqs. 4–5)", () => {
  it("reactionRate() at S = 17.5 is −1.5313e-4 mmol m⁻³ s⁻¹ in all three forms (derived steady 1-D case C = 150 − 5.892857·S + 0.05·S², Boyle et al. 1974 Eqs. 3–5)", () => {
    const d2 = 2 * c!;
    const forms = [
      reactionRate({ salinity: 17.5, d2, dischargeM3s: Q, crossSectionM2: A, dispersionM2s: K }),
      reactionRate({ salinity: 17.5, d2, dischargeM3s: Q, crossSectionM2: A, gradientPerM: gradient(17.5) }),
      reactionRate({ salinity: 17.5, d2, dispersionM2s: K, gradientPerM: gradient(17.5) }),
    ];
    forms.forEach((r, i) => expectWithin(r, C.expected.rateAt17_5!, C.tol.rate!, `form ${i + 1}`));
    expectWithin(forms[0]! * 86400, C.expected.rateAt17_5PerDay!, 0.01, "per day");
  });

  it("reactionRate() is negative (removal) for d²C/dS² > 0 and positive (production) for d²C/dS² < 0 (Boyle et al. 1974 Eq. 4 sign: R > 0 production)", () => {
    expectWithin(
      Math.sign(reactionRate({ salinity: 10, d2: 0.1, dispersionM2s: 500, gradientPerM: 1e-3 })),
      -1,
      0,
      "concave up",
    );
    expectWithin(
      Math.sign(reactionRate({ salinity: 10, d2: -0.1, dispersionM2s: 500, gradientPerM: 1e-3 })),
      1,
      0,
      "concave down",
    );
  });

  it("∫A·R dx over the case C estuary = Q·(C*₀(35) − C₀) = −6125 mmol/s by quadrature along x (derived steady 1-D case C = 150 − 5.892857·S + 0.05·S², Boyle et al. 1974 Eqs. 3–5)", () => {
    const xLand = (K! / U) * Math.log(1e-6 / 35);
    const N = 200000;
    let integral = 0;
    for (let i = 0; i < N; i++) {
      const x = xLand + ((i + 0.5) * -xLand) / N;
      const s = 35 * Math.exp((U * x) / K!);
      integral +=
        A! * reactionRate({ salinity: s, d2: 2 * c!, dispersionM2s: K, gradientPerM: gradient(s) }) * (-xLand / N);
    }
    expectWithin(integral, C.expected.integratedMmolS!, C.tol.integrated!, "∫A·R dx [mmol/s]");
    expectWithin(Q! * (C.expected.effectiveAt35! - a!), C.expected.integratedMmolS!, 1e-9, "Q·ΔC*₀ [mmol/s]");
    expectWithin((K! / U) * Math.log(2 / 35), C.expected.xAtS2M!, 1, "x(S = 2) [m]");
  });

  it("analyzeConstituent() rate profile on dense case C data: R(17.5) within 3 %, Q·ΔC*₀ within 1 % and ∫A·R dx within 8 % of −6125 mmol/s (natural-spline end effect) (derived steady 1-D case C = 150 − 5.892857·S + 0.05·S², Boyle et al. 1974 Eqs. 3–5)", () => {
    const s = Array.from({ length: 141 }, (_, i) => i * 0.25);
    const r = analyzeConstituent(
      samplesOf(
        s,
        s.map((v) => a! + b! * v + c! * v * v),
      ),
      {
        name: "Si",
        unit: "µmol/L",
        precision: { relative: 0.001, absolute: 0 },
        river: { conc: a!, salinity: 0 },
        riverDischargeM3s: Q,
        crossSectionM2: A,
        dispersionM2s: K,
        bootstrapDraws: 0,
      },
    );
    const p = r.rateProfile!;
    const i = p.salinity.findIndex((v) => Math.abs(v - 17.5) < 1e-9);
    expectWithinRel(p.rate[i], C.expected.rateAt17_5!, 0.03, "R(17.5) from the fitted curve");
    expectWithinRel(p.expectedMolS * 1000, C.expected.integratedMmolS!, 0.01, "Q·(C*₀ − C₀) [mmol/s] vs −6125");
    expectWithinRel(p.integratedMolS * 1000, C.expected.integratedMmolS!, 0.08, "∫A·R dx [mmol/s] vs −6125");
    expectWithin(p.relativeDifference, 0, 0.08, "Eq. 5 integrated check");
  });

  it("analyzeConstituent() derives dS/dx from the salinityToKmPoint callback when only K is given (Boyle et al. 1974; Officer 1979, Eq. 4, K form)", () => {
    const s = Array.from({ length: 141 }, (_, i) => i * 0.25);
    const toKm = (sal: number): number[] => [-((K! / U) * Math.log(Math.max(sal, 1e-9) / 35)) / 1000];
    const r = analyzeConstituent(
      samplesOf(
        s,
        s.map((v) => a! + b! * v + c! * v * v),
      ),
      {
        name: "Si",
        unit: "µmol/L",
        precision: { relative: 0.001, absolute: 0 },
        riverDischargeM3s: Q,
        dispersionM2s: K,
        salinityToKmPoint: toKm,
        bootstrapDraws: 0,
      },
    );
    const p = r.rateProfile!;
    const i = p.salinity.findIndex((v) => Math.abs(v - 17.5) < 1e-9);
    expectWithinRel(p.rate[i], C.expected.rateAt17_5!, 0.03, "R(17.5), K and dS/dx from km");
    expectWithin(p.formula === "K,dS/dx" ? 1 : 0, 1, 0, `formula ${p.formula}`);
  });

  it("reactionRate() throws a RangeError naming the function when neither K nor A is given", () => {
    let msg = "";
    try {
      reactionRate({ salinity: 10, d2: 0.1, dischargeM3s: 100 });
    } catch (e) {
      msg = (e as Error).message;
    }
    expectWithin(msg.startsWith("reactionRate:") ? 1 : 0, 1, 0, `message "${msg}"`);
  });
});
