import { describe, expect, it } from "vitest";
import { parseNumberText, parseValueText } from "../../analysis/io/valueText.ts";
import { expectWithin } from "../helpers/tolerance.ts";

describe("parseValueText (cell text → ValueCell, common practice for exchanged water-quality tables)", () => {
  it.each(["<0.05", "< 0.05", "<=0.05"])(
    "parseValueText(%j) is below detection with limit 0.05 and keeps the original",
    (t) => {
      const c = parseValueText(t);
      expect(c.status).toBe("belowDetection");
      expectWithin(c.detectionLimit, 0.05, 1e-15, `limit of ${t}`);
      expect(c.original).toBe(t);
      expect(c.value).toBeUndefined();
    },
  );

  it("parseValueText() reads '<0,05' with decimal comma as limit 0.05", () => {
    expectWithin(parseValueText("<0,05", { decimalComma: true }).detectionLimit, 0.05, 1e-15, "decimal comma limit");
  });

  it.each(["BDL", "ND", "n.d.", "<DL", "bdl", "N.D."])("parseValueText(%j) is below detection without a limit", (t) => {
    const c = parseValueText(t);
    expect(c.status).toBe("belowDetection");
    expect(c.detectionLimit).toBeUndefined();
    expect(c.accepted).toBe(true);
  });

  it.each(["", "  ", "NA", "N/A", "-999", "-9999", "-999.0", "na"])("parseValueText(%j) is missing", (t) => {
    expect(parseValueText(t).status).toBe("missing");
  });

  it.each(["abc", "1.2.3", "12,5", "<script>", "1e999", "Infinity", "0x10", "--5"])(
    "parseValueText(%j) is invalid and not accepted",
    (t) => {
      const c = parseValueText(t);
      expect(c.status).toBe("invalid");
      expect(c.accepted).toBe(false);
      expect(c.original).toBe(t);
    },
  );

  it("parseNumberText() reads dot and comma decimals, exponents and signs", () => {
    expectWithin(parseNumberText("12.5"), 12.5, 0, "dot");
    expectWithin(parseNumberText("12,5", { decimalComma: true }), 12.5, 0, "comma");
    expectWithin(parseNumberText("-1.5e-3"), -0.0015, 1e-18, "exponent");
    expectWithin(parseNumberText(" +7 "), 7, 0, "sign and spaces");
    expect(parseNumberText("1,234.5")).toBeUndefined();
    expect(parseNumberText("12.5", { decimalComma: true })).toBeUndefined();
  });
});
