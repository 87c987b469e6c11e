import { describe, expect, it } from "vitest";
import { detectDialect, stripBom } from "../../analysis/io/dialect.ts";

describe("detectDialect (delimiter and decimal separator)", () => {
  it("detectDialect() finds a comma file even when a quoted header contains commas and semicolons", () => {
    const text = 'station,"Ba, nmol kg-1",note\nA,1.5,"a; b; c"\nB,2.5,"x; y"\n';
    expect(detectDialect(text)).toEqual({ delimiter: ",", decimalComma: false });
  });
  it("detectDialect() finds semicolons with decimal commas", () => {
    expect(detectDialect("station;salinity;Fe (nmol/L)\nA;12,5;<0,05\nB;30,1;3,2\n")).toEqual({
      delimiter: ";",
      decimalComma: true,
    });
  });
  it("detectDialect() finds semicolons with decimal points", () => {
    expect(detectDialect("station;salinity\nA;12.5\nB;30.1\n")).toEqual({ delimiter: ";", decimalComma: false });
  });
  it("detectDialect() finds tabs", () => {
    expect(detectDialect("station\tsalinity\tSi\nA\t12.5\t3\n").delimiter).toBe("\t");
  });
  it("stripBom() removes a UTF-8 byte-order mark only at the start", () => {
    expect(stripBom("\uFEFFDate,Time")).toBe("Date,Time");
    expect(stripBom("Date,Time")).toBe("Date,Time");
  });
});
