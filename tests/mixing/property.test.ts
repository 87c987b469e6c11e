import { describe, it } from "vitest";
import { randomLcg } from "d3-random";
import { expectWithin } from "../helpers/tolerance.ts";
import { analyzeConstituent } from "../../analysis/mixing/analyzeConstituent.ts";
import type { ConstituentAnalysis, Estimate } from "../../analysis/mixing/result.ts";
import type { MixingSample } from "../../analysis/mixing/options.ts";

// Seeded property test over random small sample sets (issue 15 items 3 and 11): zeros, ties,
// negatives, huge and tiny values. Properties (common practice for numerical code): no throw,
// every promised number finite, every point estimate inside its own interval.
function randomSet(seed: number): MixingSample[] {
  const r = randomLcg(seed);
  const n = 3 + Math.floor(r() * 12);
  const kind = Math.floor(r() * 5);
  const out: MixingSample[] = [];
  for (let i = 0; i < n; i++) {
    const salinity = r() < 0.2 && i > 0 ? out[i - 1]!.salinity : Math.round(r() * 350) / 10;
    let conc = 1 + 100 * r();
    if (kind === 0 && r() < 0.6) conc = 0;
    if (kind === 1) conc = r() < 0.5 ? -conc : conc;
    if (kind === 2) conc *= r() < 0.5 ? 1e300 : 1e-300;
    if (kind === 3) conc = Math.round(conc / 50) * 50;
    out.push({ stationId: `s${i}`, salinity, conc, censored: kind === 0 && conc === 0, accepted: true });
  }
  return out;
}

const estimates = (r: ConstituentAnalysis): Array<[string, Estimate | undefined]> => [
  ["effectiveEndmember", r.effectiveEndmember],
  ["percentChange", r.percentChange],
  ["breakSalinity", r.breakSalinity],
  ["maximum.salinity", r.maximum?.salinity],
  ["maximum.excess", r.maximum?.excess],
  ["zone lower", r.reactionZone?.salinityLower],
  ["zone upper", r.reactionZone?.salinityUpper],
  ["flux.netChange", r.flux?.netChange],
];

describe("mixing engine on random small sample sets (seeded property test)", () => {
  it("never throws, gives finite estimates and every estimate inside its own interval (200 sets)", () => {
    const bad: string[] = [];
    for (let seed = 1; seed <= 200; seed++) {
      let r: ConstituentAnalysis;
      try {
        r = analyzeConstituent(randomSet(seed), {
          name: "X",
          unit: "µmol/L",
          bootstrapDraws: 40,
          seed,
          riverDischargeM3s: 10,
        });
      } catch (error) {
        bad.push(`seed ${seed}: threw ${(error as Error).message}`);
        continue;
      }
      for (const [name, e] of estimates(r)) {
        if (!e) continue;
        if (![e.value, e.lower, e.upper].every(Number.isFinite)) bad.push(`seed ${seed}: ${name} not finite`);
        else if (!(e.lower <= e.value && e.value <= e.upper)) bad.push(`seed ${seed}: ${name} outside its interval`);
      }
    }
    expectWithin(bad.length, 0, 0, bad.slice(0, 5).join("; "));
  });
});

describe("mixing engine on extreme single values (issue 15 item 11)", () => {
  const base = (c: (i: number) => number): MixingSample[] =>
    Array.from({ length: 10 }, (_, i) => ({
      stationId: `s${i}`,
      salinity: i * 3.5,
      conc: c(i),
      censored: false,
      accepted: true,
    }));
  it("a concentration of 1e308 is left out with an invalid-sample warning; every deviationPercent is finite", () => {
    const r = analyzeConstituent(
      base((i) => (i === 4 ? 1e308 : 50 - i)),
      { name: "X", unit: "µmol/L", bootstrapDraws: 20 },
    );
    expectWithin(r.warnings.some((w) => w.code === "invalid-sample") ? 1 : 0, 1, 0, "invalid-sample warning");
    expectWithin(
      r.deviations.every((d) => Number.isFinite(d.deviationPercent)) ? 1 : 0,
      1,
      0,
      "finite deviationPercent",
    );
  });
  it("a river override of 1e-300 gives no ±Infinity: % change absent or finite", () => {
    const r = analyzeConstituent(
      base((i) => 50 - i),
      { name: "X", unit: "µmol/L", bootstrapDraws: 20, river: { conc: 1e-300, salinity: 0 } },
    );
    const p = r.percentChange;
    expectWithin(!p || [p.value, p.lower, p.upper].every(Number.isFinite) ? 1 : 0, 1, 0, "finite % change or none");
    expectWithin(
      r.deviations.every((d) => Number.isFinite(d.deviationPercent)) ? 1 : 0,
      1,
      0,
      "finite deviationPercent",
    );
  });
});
