import { describe, expect, it } from "vitest";
import { expectWithin } from "../helpers/tolerance.ts";
import { SHAPES, survey } from "../../bench/calibration/forwardModel.ts";
import { analyzeConstituent } from "../../analysis/mixing/analyzeConstituent.ts";
import { analyzeSynthetic, scoreCell } from "../../bench/calibration/cell.ts";

// Regression guards from the calibration suite (`npm run calibrate`, issue 14): a few fixed-seed
// cells with bounds, not timings. Forward model: bench/calibration/forwardModel.ts (invented surveys).
const shape = (name: string) => SHAPES.find((s) => s.name === name)!;

describe("mixing calibration guards (seeded synthetic surveys; Boyle et al. 1974 tangent method)", () => {
  it("removal ending at S 5, 20 km-even stations, 2 % noise: % change unbiased within 3 pp against the river at S = 0, class right, break within ±2", () => {
    const s = scoreCell(shape("removal→S5"), { stations: 20, spacing: "km", noise: 0.02 }, 12, 150);
    expectWithin(s.percentBiasPp, 0, 3, "bias of % change [pp]");
    expectWithin(s.referenceSalinity, 0, 0, "river reference salinity");
    expectWithin(s.classAccuracy >= 0.9 ? 1 : 0, 1, 0, `class accuracy ${s.classAccuracy}`);
    expectWithin((s.breakWithin2 ?? 0) >= 0.75 ? 1 : 0, 1, 0, `break within ±2 in ${s.breakWithin2}`);
    expectWithin(s.outsideOwnInterval, 0, 0, "estimates outside their own interval");
  });

  it("conservative, 20 salinity-even stations: C*₀ within 2 % and the 95 % interval covers the truth in ≥ 10 of 12 surveys", () => {
    const s = scoreCell(shape("conservative"), { stations: 20, spacing: "salinity", noise: 0.02 }, 12, 150);
    expectWithin(s.effectiveBiasPct, 0, 2, "C*₀ bias [%]");
    expectWithin(s.effectiveCoverage >= 10 / 12 ? 1 : 0, 1, 0, `coverage ${s.effectiveCoverage}`);
  });

  it("exact data (no noise, 35 km-even stations): C*₀ within 1 %, rate integral within 5 % of Q·(C*₀ − C₀) (Boyle et al. 1974 integrated form, Eq. 5)", () => {
    for (const name of ["removal→S5", "desorption→S10"]) {
      const s = scoreCell(shape(name), { stations: 35, spacing: "km", noise: 0 }, 1, 0, 1, true);
      expectWithin(s.effectiveBiasPct, 0, 1, `${name} C*₀ error [%]`);
      expectWithin(s.rateIntegralError!, 0, 0.05, `${name} rate integral error`);
    }
  });

  it("desorption ending at S 10, 20 salinity-even stations, 2 % noise: % change bias within 2 pp (bootstrap bias correction, Efron & Tibshirani 1993 §10) and the 95 % BC interval (Efron 1987) covers the truth in ≥ 85 % of 40 surveys", () => {
    const s = scoreCell(shape("desorption→S10"), { stations: 20, spacing: "salinity", noise: 0.02 }, 40, 150);
    expectWithin(s.percentBiasPp, 0, 2, "bias of % change [pp]");
    expectWithin(s.percentCoverage >= 0.85 ? 1 : 0, 1, 0, `coverage of % change ${s.percentCoverage}`);
    expectWithin(s.outsideOwnInterval, 0, 0, "estimates outside their own interval");
  });

  it("reported break = profile-likelihood average over breaks (Akaike weights of the grid breaks, Buckland et al. 1997; two-phase regression, Hinkley 1969, from memory): removal fading out at S 20, 20 salinity-even stations, 2 % noise, within ±2 in ≥ 40 % of 30 surveys and median error ≤ 2.2 (the best break alone: 23 %, 2.8), within ±2 or warned in ≥ 90 %", () => {
    const s = scoreCell(shape("removal→S20"), { stations: 20, spacing: "salinity", noise: 0.02 }, 30, 100);
    expectWithin((s.breakWithin2 ?? 0) >= 0.4 ? 1 : 0, 1, 0, `break within ±2 in ${s.breakWithin2}`);
    expectWithin((s.breakMedianError ?? 99) <= 2.2 ? 1 : 0, 1, 0, `median break error ${s.breakMedianError}`);
    expectWithin((s.breakWithin2OrWarned ?? 0) >= 0.9 ? 1 : 0, 1, 0, `within ±2 or warned ${s.breakWithin2OrWarned}`);
    expectWithin(s.outsideOwnInterval, 0, 0, "estimates outside their own interval");
  });

  const analyse = (name: string, stations: number, seed: number, draws = 200) =>
    analyzeSynthetic(survey(shape(name), { stations, spacing: "km", noise: 0.02 }, seed), 0.02, {
      bootstrapDraws: draws,
      seed,
    });

  it("conservative surveys: the % change interval carries model-selection uncertainty (bootstrap from the two-phase alternative, selection re-run per replicate; Efron 2014, from memory) instead of a degenerate 0 [0, 0]", () => {
    let widths = 0;
    for (let k = 0; k < 8; k++) {
      const r = analyse("conservative", 20, 11 + 7919 * k);
      if (r.class !== "conservative") continue;
      const p = r.percentChange!;
      expectWithin(p.value, 0, 1e-9, "% change of the kept straight line");
      if (p.upper - p.lower > 0) widths++;
    }
    expectWithin(widths >= 6 ? 1 : 0, 1, 0, `non-degenerate intervals in ${widths} of 8`);
  });

  it("removal and desorption surveys with a positive river value never carry a river-nonpositive warning (regression)", () => {
    for (const name of ["removal→S5", "desorption→S10", "removal→mouth"]) {
      const r = analyse(name, 20, 5, 50);
      expect(r.warnings.map((w) => w.code)).not.toContain("river-nonpositive");
    }
  });

  it("two near-tied freshest stations that disagree (river variability) do not set a break or an extrapolated river value: no negative C₀, river from the freshest stations when the extrapolation is unstable (Hudson 1966: each phase needs its own points)", () => {
    // Invented transect shaped like a humic-rich river reach: 556 and 710 at S 0.06 and 0.08, then a slow decline.
    const pts: Array<[number, number]> = [
      [0.06, 556],
      [0.08, 710],
      [0.88, 665],
      [2.76, 674],
      [5.21, 624],
      [5.94, 625],
      [10.14, 554],
      [11.68, 516],
      [13.42, 531],
      [16.01, 478],
      [17.96, 461],
    ];
    const r = analyzeConstituent(
      pts.map(([salinity, conc], i) => ({ stationId: `s${i}`, salinity, conc, censored: false, accepted: true })),
      { name: "DOC", unit: "µmol/L", bootstrapDraws: 300, seed: 1 },
    );
    const river = r.endmembers!.river;
    expectWithin(river.conc > 400 ? 1 : 0, 1, 0, `river C₀ ${river.conc}`);
    expectWithin(
      r.breakSalinity === undefined || r.breakSalinity.value > 0.88 ? 1 : 0,
      1,
      0,
      "break landward of 3 stations",
    );
    const e = r.effectiveEndmember;
    if (e) expectWithin(e.lower <= e.value && e.value <= e.upper ? 1 : 0, 1, 0, "C*₀ inside its interval");
  });
});
