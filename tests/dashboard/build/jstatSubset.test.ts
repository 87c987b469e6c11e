// The dashboard's jStat subset (dashboard/src/vendor/jstatSubset.ts, swapped in for "jstat" by
// dashboard/vite.config.ts) gives bit-identical results to jStat as published for every function
// analysis/ calls (analysis/stats/jstat.d.ts), over grids covering the arguments the analysis uses
// (probabilities of two-sided intervals, small and large degrees of freedom, both tails).
import { readFileSync, readdirSync } from "node:fs";
import { join } from "node:path";
import jStat from "jstat";
import { describe, expect, it } from "vitest";
import subset from "../../../dashboard/src/vendor/jstatSubset.ts";

const REPO = join(import.meta.dirname, "..", "..", "..");
const PROBS = [
  1e-12, 1e-6, 0.001, 0.005, 0.01, 0.025, 0.05, 0.1, 0.159, 0.25, 0.5, 0.75, 0.9, 0.95, 0.975, 0.99, 0.999,
];
const DOFS = [1, 2, 3, 4, 5, 7, 10, 15, 30, 60, 120, 1000, 1e5];
const XS = [-40, -8, -3, -1.96, -1, -0.5, -1e-3, 0, 1e-3, 0.5, 1, 1.645, 2.5, 4, 10, 80, 1e3];

describe("dashboard jStat subset against jStat as published (bit for bit)", () => {
  it("normal cdf and inv", () => {
    for (const [m, s] of [
      [0, 1],
      [3, 0.2],
      [-5, 12],
    ] as const) {
      for (const x of XS) expect(subset.normal.cdf(x, m, s)).toBe(jStat.normal.cdf(x, m, s));
      for (const p of [0, 1, ...PROBS]) expect(subset.normal.inv(p, m, s)).toBe(jStat.normal.inv(p, m, s));
    }
  });

  it("Student t cdf and inv", () => {
    for (const df of DOFS) {
      for (const x of XS) expect(subset.studentt.cdf(x, df)).toBe(jStat.studentt.cdf(x, df));
      for (const p of PROBS) expect(subset.studentt.inv(p, df)).toBe(jStat.studentt.inv(p, df));
    }
  });

  it("F cdf and inv", () => {
    for (const d1 of [1, 2, 3, 5, 10]) {
      for (const d2 of DOFS) {
        for (const x of XS) expect(subset.centralF.cdf(x, d1, d2)).toBe(jStat.centralF.cdf(x, d1, d2));
        for (const p of PROBS) expect(subset.centralF.inv(p, d1, d2)).toBe(jStat.centralF.inv(p, d1, d2));
      }
    }
  });

  it("chi-square cdf and log-gamma", () => {
    for (const df of DOFS) for (const x of XS) expect(subset.chisquare.cdf(x, df)).toBe(jStat.chisquare.cdf(x, df));
    for (const x of [0.1, 0.5, 1, 1.5, 2, 3.7, 10, 55.5, 171, 1e4]) expect(subset.gammaln(x)).toBe(jStat.gammaln(x));
  });

  it("analysis/ calls no jStat function outside the subset", () => {
    const dir = join(REPO, "analysis");
    const used = new Set<string>();
    for (const f of readdirSync(dir, { recursive: true }) as string[]) {
      if (!f.endsWith(".ts") || f.endsWith(".d.ts")) continue;
      for (const m of readFileSync(join(dir, f), "utf8").matchAll(/jStat\.([A-Za-z.]+)/g)) used.add(m[1]!);
    }
    const offered = new Set([
      "gammaln",
      "centralF.cdf",
      "centralF.inv",
      "chisquare.cdf",
      "normal.cdf",
      "normal.inv",
      "studentt.cdf",
      "studentt.inv",
    ]);
    expect([...used].filter((u) => !offered.has(u))).toEqual([]);
    expect(used.size).toBeGreaterThan(0);
  });
});
