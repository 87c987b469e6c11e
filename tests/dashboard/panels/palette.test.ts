// @vitest-environment jsdom
import { describe, expect, it } from "vitest";
import { render } from "@testing-library/svelte";
import Legend from "../../../dashboard/src/panels/Legend.svelte";
import {
  behaviourColour,
  deviationColour,
  okabeIto,
  rampStops,
  salinityColour,
  salinityDomain,
} from "../../../dashboard/src/panels/lib/palette.ts";
import { expectWithin } from "../../helpers/tolerance.ts";

function rgb(colour: string): [number, number, number] {
  const hex = colour.match(/^#([0-9a-f]{2})([0-9a-f]{2})([0-9a-f]{2})$/i);
  if (hex) return [1, 2, 3].map((i) => parseInt(hex[i], 16)) as [number, number, number];
  const m = colour.match(/rgb\((\d+), ?(\d+), ?(\d+)\)/);
  if (!m) throw new Error(`not a colour: ${colour}`);
  return [Number(m[1]), Number(m[2]), Number(m[3])];
}

/** WCAG 2.1 relative luminance (W3C 2018, §1.4.3 definition). */
function luminance(colour: string): number {
  const [r, g, b] = rgb(colour).map((v) => {
    const c = v / 255;
    return c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
  });
  return 0.2126 * r + 0.7152 * g + 0.0722 * b;
}

describe("palette", () => {
  it("okabeIto holds the Okabe & Ito 2008 colour-universal-design RGB values (from memory)", () => {
    expect(rgb(okabeIto.orange)).toEqual([230, 159, 0]);
    expect(rgb(okabeIto.skyBlue)).toEqual([86, 180, 233]);
    expect(rgb(okabeIto.bluishGreen)).toEqual([0, 158, 115]);
    expect(rgb(okabeIto.yellow)).toEqual([240, 228, 66]);
    expect(rgb(okabeIto.blue)).toEqual([0, 114, 178]);
    expect(rgb(okabeIto.vermillion)).toEqual([213, 94, 0]);
    expect(rgb(okabeIto.reddishPurple)).toEqual([204, 121, 167]);
  });

  it("behaviourColour gives every class its own colour (common practice: one hue per category)", () => {
    const colours = Object.values(behaviourColour);
    expect(new Set(colours).size).toBe(colours.length);
  });

  it("salinityColour() brightens monotonically from fresh to sea (WCAG 2.1 relative luminance), so order reads without hue", () => {
    const stops = rampStops(salinityColour, salinityDomain, 13);
    for (let i = 1; i < stops.length; i++) {
      expect(luminance(stops[i][1]), `stop ${i} at S ${stops[i][0]}`).toBeGreaterThan(luminance(stops[i - 1][1]));
    }
    expect(salinityColour(-5)).toBe(salinityColour(0));
    expect(salinityColour(50)).toBe(salinityColour(36));
  });

  it("deviationColour() is near white at zero, purple-leaning for removal and orange-leaning for addition", () => {
    const [r0, g0, b0] = rgb(deviationColour(0));
    expect(Math.min(r0, g0, b0), "deviationColour(0) is a light neutral").toBeGreaterThanOrEqual(225);
    expectWithin(
      Math.max(r0, g0, b0) - Math.min(r0, g0, b0),
      0,
      12,
      "deviationColour(0) has no strong hue (channel spread)",
    );
    const [rr, , rb] = rgb(deviationColour(-50));
    expect(rb).toBeGreaterThan(rr);
    const [ar, , ab] = rgb(deviationColour(50));
    expect(ar).toBeGreaterThan(ab);
    expect(() => deviationColour(1, 0)).toThrow(/limitPercent must be > 0, got 0/);
  });
});

describe("Legend", () => {
  it("Legend draws its entries and a salinity ramp titled with its unit, labelled for screen readers", () => {
    const { container } = render(Legend, {
      standalone: true,
      idPrefix: "lg",
      width: 300,
      items: [
        { label: "Station", colour: "#000000", symbol: "dot" },
        { label: "Rejected by QC", colour: okabeIto.vermillion, symbol: "cross" },
      ],
      ramp: { title: "Salinity (PSS-78)", stops: rampStops(salinityColour, salinityDomain, 5), ticks: [0, 18, 36] },
    });
    const svg = container.querySelector("svg.legend-standalone")!;
    expect(svg.getAttribute("aria-label")).toBe("Legend: Station; Rejected by QC; Salinity (PSS-78)");
    expect([...svg.querySelectorAll(".legend-item text")].map((t) => t.textContent)).toEqual([
      "Station",
      "Rejected by QC",
    ]);
    expect(svg.querySelector(".legend-ramp")?.textContent).toContain("Salinity (PSS-78)");
    expect(svg.querySelectorAll("#lg-ramp stop")).toHaveLength(5);
    expect([...svg.querySelectorAll(".legend-ramp text")].slice(1).map((t) => t.textContent)).toEqual([
      "0",
      "18",
      "36",
    ]);
  });
});
