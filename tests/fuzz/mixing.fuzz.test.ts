import { describe, expect, it } from "vitest";
import { analyzeConstituent } from "../../analysis/mixing/analyzeConstituent.ts";
import type { ConstituentAnalysis } from "../../analysis/mixing/result.ts";
import { sampleSet } from "./generators/samples.ts";
import { seeded } from "./generators/random.ts";
import { numberProblems } from "./invariants.ts";
import { cases } from "./scale.ts";

const N = cases(400);

/** Runs the seeded sample sets once; each property below reads the outcomes. */
function outcomes(): Array<{ n: number; result?: ConstituentAnalysis; error?: string }> {
  const r = seeded(909);
  return Array.from({ length: N }, (_, n) => {
    const samples = sampleSet(r);
    try {
      return {
        n,
        result: analyzeConstituent(samples, { name: "Fe", unit: "nmol/L", bootstrapDraws: 40, seed: n + 1 }),
      };
    } catch (e) {
      return {
        n,
        error: `${e instanceof Error ? e.name : "?"}: ${String(e instanceof Error ? e.message : e).slice(0, 160)}`,
      };
    }
  });
}

const all = outcomes();

/** JSON's view of a result: what the CLI and the briefing print. */
const asJson = (x: unknown): unknown =>
  JSON.parse(JSON.stringify(x, (_, v: unknown) => (typeof v === "number" && !Number.isFinite(v) ? null : v)));

describe(`fuzz: ${N} seeded small sample sets through analyzeConstituent()`, () => {
  it("item 3: never throws on user data (many zeros, repeated salinities, censored, negative or huge values)", () => {
    expect(
      all
        .filter((o) => o.error !== undefined)
        .map((o) => `#${o.n} ${o.error}`)
        .slice(0, 10),
    ).toEqual([]);
  });

  it("item 11: every number is finite (no NaN, Infinity or null in the JSON) and every point estimate lies inside its interval", () => {
    const bad: string[] = [];
    for (const o of all) if (o.result) for (const p of numberProblems(asJson(o.result), `#${o.n}`)) bad.push(p);
    expect(bad.slice(0, 10)).toEqual([]);
  });

  it("too little data gives a class and a warning, never an empty result", () => {
    for (const o of all) if (o.result) expect(o.result.class.length, `#${o.n}`).toBeGreaterThan(0);
  });
});
