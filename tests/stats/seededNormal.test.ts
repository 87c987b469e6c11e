import { describe, expect, it } from "vitest";
import { randomLcg, randomNormal } from "d3-random";
import { NormalDeviates, seededNormal } from "../../analysis/stats/seededNormal.ts";

// Polar method (Marsaglia & Bray 1964) on d3-random's LCG: the stream must be the library's, number for number.
describe("seededNormal (same stream as d3-random randomNormal on randomLcg)", () => {
  for (const [seed, mu, sigma] of [
    [42, 0, 1],
    [7, 0, 1],
    [0.25, 0, 1],
    [123456789, 3.5, 0.2],
  ] as const) {
    it(`seed ${seed}, N(${mu}, ${sigma}²): 20,001 draws bit for bit`, () => {
      const ref = randomNormal.source(randomLcg(seed))(mu, sigma);
      const z = seededNormal(seed, mu, sigma);
      let mismatches = 0;
      for (let i = 0; i < 20001; i++) if (!Object.is(ref(), z())) mismatches++;
      expect(mismatches).toBe(0);
    });
  }
});

describe("NormalDeviates (the generator object behind seededNormal)", () => {
  it("gives the stream of seededNormal, number for number (Marsaglia & Bray 1964 polar method)", () => {
    const g = new NormalDeviates(42, 1.5, 0.5);
    const z = seededNormal(42, 1.5, 0.5);
    let mismatches = 0;
    for (let i = 0; i < 5001; i++) if (!Object.is(g.next(), z())) mismatches++;
    expect(mismatches).toBe(0);
  });
});
