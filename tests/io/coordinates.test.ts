import { describe, expect, it } from "vitest";
import { parseCoordinateText } from "../../analysis/io/coordinates.ts";
import { expectWithin } from "../helpers/tolerance.ts";

// d + m/60 + s/3600 (sexagesimal degrees; common practice)
describe("parseCoordinateText (decimal degrees, degrees-minutes, degrees-minutes-seconds)", () => {
  it.each([
    ["45°12.5'N", "latitude", 45 + 12.5 / 60],
    ["45 12.50 N", "latitude", 45 + 12.5 / 60],
    ["N45 12.5", "latitude", 45 + 12.5 / 60],
    ["45°12'30\"S", "latitude", -(45 + 12 / 60 + 30 / 3600)],
    ["45.2083", "latitude", 45.2083],
    ["-45.2083", "latitude", -45.2083],
    ["1°03.2'W", "longitude", -(1 + 3.2 / 60)],
    ["122 25.5 W", "longitude", -(122 + 25.5 / 60)],
    ["35.5 E", "longitude", 35.5],
    ["-0 30.0", "longitude", -0.5],
  ] as const)("parseCoordinateText(%j, %s) = %f", (text, axis, expected) => {
    expectWithin(parseCoordinateText(text, axis), expected, 1e-12, `${text}`);
  });

  it("parseCoordinateText() reads a decimal comma when asked", () => {
    expectWithin(parseCoordinateText("45,5", "latitude", true), 45.5, 1e-12, "decimal comma");
  });

  it.each([
    ["95.0", "latitude"],
    ["45°61'N", "latitude"],
    ["45.5 E", "latitude"],
    ["12 N", "longitude"],
    ["-45 N", "latitude"],
    ["abc", "latitude"],
    ["", "longitude"],
  ] as const)(
    "parseCoordinateText(%j, %s) is undefined (out of range, wrong hemisphere or not a coordinate)",
    (text, axis) => {
      expect(parseCoordinateText(text, axis)).toBeUndefined();
    },
  );
});
