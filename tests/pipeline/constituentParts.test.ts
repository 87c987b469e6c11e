import { describe, expect, it } from "vitest";
import { constituentPartOf } from "../../analysis/index.ts";

describe("constituentPartOf(): constituents in parts of about equal work", () => {
  it("equal costs alternate between the parts (LPT rule, Graham 1969)", () => {
    expect(constituentPartOf([30, 30, 30, 30, 30], 2)).toEqual([0, 1, 0, 1, 0]);
  });

  it("the costliest go first, each to the least loaded part (Graham 1969 LPT worked example: 7,6,5,4,3 on 2)", () => {
    // 7 → p0, 6 → p1, 5 → p1 (6 < 7), 4 → p0 (7 < 11), 3 → p0 (11 = 11, lower part): loads 14 and 11
    expect(constituentPartOf([3, 7, 4, 6, 5], 2)).toEqual([0, 0, 0, 1, 1]);
  });

  it("one part takes everything; an empty list gives no parts", () => {
    expect(constituentPartOf([5, 1, 2], 1)).toEqual([0, 0, 0]);
    expect(constituentPartOf([], 3)).toEqual([]);
  });

  it("a count below 1 or a negative cost is a caller mistake (RangeError naming the argument)", () => {
    expect(() => constituentPartOf([1], 0)).toThrow(/count/);
    expect(() => constituentPartOf([1, -2], 2)).toThrow(/costs\[1\]/);
  });
});
