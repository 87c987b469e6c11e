import { describe, expect, it } from "vitest";
import { expectWithin } from "../../helpers/tolerance.ts";
import { offsetPolyline, pathData } from "../../../dashboard/src/compare/offsetPath.ts";

describe("comparison map offsets", () => {
  it("offsetPolyline() moves a straight line sideways by exactly the offset (plane geometry, common practice)", () => {
    const out = offsetPolyline(
      [
        [0, 0],
        [10, 0],
        [20, 0],
      ],
      5,
    );
    for (const [i, p] of out.entries()) {
      expectWithin(p[0], i * 10, 1e-12, `x of vertex ${i}`);
      expectWithin(Math.abs(p[1]), 5, 1e-12, `|y| of vertex ${i}`);
    }
  });

  it("offsetPolyline() keeps a right-angle corner at the mitre distance offset·√2 (plane geometry, common practice)", () => {
    const out = offsetPolyline(
      [
        [0, 0],
        [10, 0],
        [10, 10],
      ],
      4,
    );
    expectWithin(Math.hypot(out[1][0] - 10, out[1][1]), 4 * Math.SQRT2, 1e-9, "corner offset");
  });

  it("pathData() writes M then L commands to 0.1 px", () => {
    expect(
      pathData([
        [0, 0],
        [1.26, 2],
      ]),
    ).toBe("M0.0,0.0L1.3,2.0");
  });
});
