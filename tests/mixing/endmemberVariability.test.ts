import { describe, it } from "vitest";
import { expectWithin } from "../helpers/tolerance.ts";
import { analyzeConstituent } from "../../analysis/mixing/analyzeConstituent.ts";
import { polyFit } from "../../analysis/stats/polyFit.ts";
import { stepProfile } from "./helpers/transient.ts";
import { CASES, samplesOf } from "./helpers/cases.ts";

const F = CASES.caseF;
// The sheet gives U, K and the step; the river boundary position is not stated: 60 km from the
// mouth (S ≈ 0.09 there) is used here and reproduces the sheet's table.
const profile = (days: number): ((s: number) => number) =>
  stepProfile({
    velocityMs: F.inputs.velocityMs!,
    dispersionM2s: F.inputs.dispersionM2s!,
    before: F.inputs.riverBefore!,
    after: F.inputs.riverAfter!,
    sea: 0,
    seconds: days * 86400,
    lengthM: 60_000,
  });
const salinities = [0.1, 0.3, 0.6, 1, 2, 3, 4, 5, 6.5, 8, 10, 12, 14, 16, 18, 20, 22.5, 25, 27.5, 30, 32.5, 35];

describe("river end-member variability mimics reactions (Loder & Reichard 1981; derived river-step case 100 → 50)", () => {
  it("an independent Crank–Nicolson transient solve reproduces the apparent C*₀ table 100.2 / 92.1 / 67.2 / 52.0 / 50.1 from a line fitted at S ≥ 20 (Loder & Reichard 1981, derived river-step case: 100 → 50)", () => {
    F.expected.days.forEach((d, i) => {
      const f = profile(d);
      const s = Array.from({ length: 16 }, (_, k) => F.inputs.fitFromSalinity! + k);
      const line = polyFit(
        s,
        s.map(f),
        s.map(() => 1),
        1,
      )!;
      expectWithin(
        line.coef[0],
        F.expected.apparentEffective[i]!,
        F.tol.apparentEffective!,
        `apparent C*₀ after ${d} d`,
      );
    });
  });

  it("analyzeConstituent() on the 2-day profile with a river history inside the flushing time warns (endmember-variability), lowers confidence and gives a % change interval spanning 0 instead of a confident +100 % (Loder & Reichard 1981, derived river-step case: 100 → 50)", () => {
    const f = profile(2);
    const r = analyzeConstituent(samplesOf(salinities, salinities.map(f)), {
      name: "tracer",
      unit: "µmol/L",
      precision: { relative: 0.02, absolute: 0 },
      flushingTimeDays: 20,
      riverHistory: [{ daysBeforeSurvey: 3, conc: F.inputs.riverBefore! }],
      seed: 5,
      bootstrapDraws: 500,
    });
    expectWithin(
      r.warnings.some((w) => w.code === "endmember-variability") ? 1 : 0,
      1,
      0,
      "endmember-variability warning",
    );
    expectWithin(r.confidence === "low" ? 1 : 0, 1, 0, `confidence ${r.confidence}`);
    expectWithin(
      r.percentChange!.lower < 0 && r.percentChange!.upper > 0 ? 1 : 0,
      1,
      0,
      `% change interval [${r.percentChange!.lower}, ${r.percentChange!.upper}] spans 0`,
    );
  });

  it("analyzeConstituent() warns when several river samples disagree (Loder & Reichard 1981)", () => {
    const f = profile(2);
    const s = [0.05, 0.1, 0.2, ...salinities.slice(3)];
    const c = [50, 75, 100, ...s.slice(3).map(f)];
    const r = analyzeConstituent(samplesOf(s, c), {
      name: "tracer",
      unit: "µmol/L",
      precision: { relative: 0.02, absolute: 0 },
      bootstrapDraws: 0,
    });
    expectWithin(r.endmembers!.river.n, 3, 0, "river group size (S within 0.5 of the lowest)");
    expectWithin(
      r.warnings.some((w) => w.code === "endmember-variability") ? 1 : 0,
      1,
      0,
      "endmember-variability warning",
    );
  });

  it("analyzeConstituent() always reminds that one survey cannot prove steady state, even for a clean conservative line (Officer 1979; Regnier et al. 1998)", () => {
    const s = salinities;
    const r = analyzeConstituent(
      samplesOf(
        s,
        s.map((v) => 100 - 2 * v),
      ),
      { name: "Si", unit: "µmol/L", bootstrapDraws: 0 },
    );
    expectWithin(r.warnings.some((w) => w.code === "steady-state-assumed") ? 1 : 0, 1, 0, "steady-state notice");
    expectWithin(r.class === "conservative" ? 1 : 0, 1, 0, `class ${r.class}`);
  });
});
