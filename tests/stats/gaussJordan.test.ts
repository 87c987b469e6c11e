import { describe, expect, it } from "vitest";
import { solveAugmented } from "../../analysis/stats/gaussJordan.ts";
import { expectWithin } from "../helpers/tolerance.ts";

/** Augmented matrix [A | r] of a k × k system, row-major. */
function augmented(a: number[][], r: number[]): Float64Array {
  const k = r.length;
  const m = new Float64Array(k * (k + 1));
  for (let i = 0; i < k; i++) {
    for (let j = 0; j < k; j++) m[i * (k + 1) + j] = a[i]![j]!;
    m[i * (k + 1) + k] = r[i]!;
  }
  return m;
}

describe("solveAugmented (Gauss–Jordan with partial pivoting; Press et al. 2007 §2.1, from memory)", () => {
  it("solves the 4 × 4 Hilbert system H·β = H·1 to β = 1 (Hilbert matrix H_ij = 1/(i + j + 1), common practice as an ill-conditioned check, condition number ≈ 1.6e4)", () => {
    const k = 4;
    const h = Array.from({ length: k }, (_, i) => Array.from({ length: k }, (_, j) => 1 / (i + j + 1)));
    const r = h.map((row) => row.reduce((s, v) => s + v, 0));
    const out = new Float64Array(k);
    expect(solveAugmented(augmented(h, r), k, out)).toBe(true);
    for (let i = 0; i < k; i++) expectWithin(out[i], 1, 1e-10, `β${i} of the Hilbert system`);
  });

  it("pivots past a zero on the diagonal: [[0, 1], [1, 0]]·β = [2, 3] gives β = [3, 2] (common practice)", () => {
    const out = new Float64Array(2);
    expect(
      solveAugmented(
        augmented(
          [
            [0, 1],
            [1, 0],
          ],
          [2, 3],
        ),
        2,
        out,
      ),
    ).toBe(true);
    expect([...out]).toEqual([3, 2]);
  });

  it("reports a singular system: [[1, 2], [2, 4]] (rank 1)", () => {
    expect(
      solveAugmented(
        augmented(
          [
            [1, 2],
            [2, 4],
          ],
          [1, 2],
        ),
        2,
        new Float64Array(2),
      ),
    ).toBe(false);
  });
});
