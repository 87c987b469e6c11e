import { describe, it } from "vitest";
import { expectWithin } from "../helpers/tolerance.ts";
import { SHAPES, WEAK_SHAPES, curveOf, survey, type Shape } from "../../bench/calibration/forwardModel.ts";
import { analyzeConstituent } from "../../analysis/mixing/analyzeConstituent.ts";
import { scoreCell } from "../../bench/calibration/cell.ts";

// Intervals when the straight line is kept (analyzeShape.ts): replicates drawn around the two-phase
// alternative with the selection re-run in each (bootstrap from the larger model, Efron 2014, JASA 109,
// 991–1007; from memory), read as plain percentile intervals, not bias-corrected about the kept line's
// estimate (BC, Efron 1987, assumes the replicates come from the fit that gave the estimate).
// Seeded synthetic surveys (bench/calibration/forwardModel.ts), 200 draws.
const shape = (name: string): Shape => [...SHAPES, ...WEAK_SHAPES].find((s) => s.name === name)!;

describe("intervals of a kept straight line", () => {
  it("weak removal (−5 % ending at S 5, 20 km-even stations, 2 % noise) that the line test misses: the kept line's C*₀ interval still covers the true C*₀ in ≥ 85 % of those surveys (77 % with BC about the line, 50 % drawing around the line)", () => {
    const s = shape("weak removal→S5");
    const truth = curveOf(s).effective;
    let kept = 0,
      covered = 0;
    for (let k = 0; k < 100; k++) {
      const seed = 1 + 7919 * k + 200 + 131 * 20;
      const r = analyzeConstituent(
        survey(s, { stations: 20, spacing: "km", noise: 0.02 }, seed).map((st) => ({
          stationId: st.stationId,
          salinity: st.salinity,
          conc: st.conc,
          censored: false,
          accepted: true,
        })),
        {
          name: "X",
          unit: "µmol/L",
          precision: { relative: 0.02, absolute: 1e-9 },
          bootstrapDraws: 200,
          seed: seed + 1,
        },
      );
      const e = r.effectiveEndmember;
      if (r.class !== "conservative" || !e) continue;
      kept++;
      if (e.lower <= truth && truth <= e.upper) covered++;
    }
    expectWithin(kept >= 20 ? 1 : 0, 1, 0, `line kept in ${kept} of 100 surveys`);
    expectWithin(covered / kept >= 0.85 ? 1 : 0, 1, 0, `C*₀ covered in ${covered} of ${kept} kept-line surveys`);
  });

  it("conservative mixing, 20 km-even stations, 2 % noise, 100 surveys: C*₀ coverage within the 90–98 % goal (issue 14; 99 % with BC intervals about the kept line)", () => {
    const s = scoreCell(shape("conservative"), { stations: 20, spacing: "km", noise: 0.02 }, 100, 200);
    expectWithin(
      s.effectiveCoverage >= 0.9 && s.effectiveCoverage <= 0.98 ? 1 : 0,
      1,
      0,
      `coverage ${s.effectiveCoverage}`,
    );
    expectWithin(s.outsideOwnInterval, 0, 0, "estimates outside their own interval");
  });
});
