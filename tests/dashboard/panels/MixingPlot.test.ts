// @vitest-environment jsdom
import { describe, expect, it, vi } from "vitest";
import { fireEvent, render, screen } from "@testing-library/svelte";
import { flushSync } from "svelte";
import MixingPlot from "../../../dashboard/src/panels/MixingPlot.svelte";
import { Selection } from "../../../dashboard/src/state/selection.svelte.ts";
import { fixtureAnalysis } from "./fixtures.ts";
import { expectSvgSnapshot } from "./snapshot.ts";

function setup(constituent = "Fe") {
  const selection = new Selection();
  selection.constituent = constituent;
  const r = render(MixingPlot, { analysis: fixtureAnalysis(), selection, idPrefix: "t" });
  const svg = r.container.querySelector("svg[data-export-name='mixing']") as SVGSVGElement;
  return { selection, svg, ...r };
}

describe("MixingPlot", () => {
  it("is drawn at the panel's known width at once (widthHint), else at its default 640 px until it measures itself", () => {
    const selection = new Selection();
    selection.constituent = "Fe";
    const hinted = render(MixingPlot, { analysis: fixtureAnalysis(), selection, idPrefix: "wh", widthHint: 492 });
    const svg = hinted.container.querySelector("svg[data-export-name='mixing']")!;
    expect(svg.getAttribute("width")).toBe("492");
    // the height follows the width as for a measured panel: 0.66 × width, kept within 340–520 px
    expect(svg.getAttribute("height")).toBe("340");
    const plain = render(MixingPlot, { analysis: fixtureAnalysis(), selection, idPrefix: "nw" });
    expect(plain.container.querySelector("svg[data-export-name='mixing']")!.getAttribute("width")).toBe("640");
  });

  it("MixingPlot labels both axes with units (Salinity (PSS-78), Fe (nmol/L))", () => {
    const { svg } = setup();
    const titles = [...svg.querySelectorAll(".axis-title")].map((t) => t.textContent);
    expect(titles).toEqual(["Salinity (PSS-78)", "Fe (nmol/L)"]);
  });

  it("MixingPlot draws one mark per observation, censored as triangles and QC-rejected as labelled crosses", () => {
    const { svg } = setup();
    expect(svg.querySelectorAll(".point")).toHaveLength(13);
    expect(svg.querySelectorAll(".point-belowDetection")).toHaveLength(1);
    const rejected = svg.querySelectorAll(".point-rejected");
    expect(rejected).toHaveLength(1);
    expect(rejected[0].textContent).toContain("S07b rejected");
  });

  it("MixingPlot draws the dilution line, fit with band, tangent, C*₀ marker and reaction zone", () => {
    const { svg } = setup();
    for (const sel of [".dilution-line", ".fit", ".fit-band", ".tangent", ".effective-endmember", ".reaction-zone"]) {
      expect(svg.querySelector(sel), sel).not.toBeNull();
    }
    expect(svg.querySelector(".effective-endmember")?.textContent).toContain("C*₀ 243 nmol/L");
  });

  it("MixingPlot has an accessible title and description", () => {
    const { svg } = setup();
    expect(svg.getAttribute("aria-labelledby")).toBe("t-title");
    expect(svg.querySelector("title")?.textContent).toBe("Mixing plot: Fe (nmol/L) against salinity");
    expect(svg.querySelector("desc")?.textContent).toContain("13 observations");
  });

  it("MixingPlot click selects a station, shift-click adds, and the selected class follows", async () => {
    const { svg, selection } = setup();
    const p = (id: string) => svg.querySelector(`.point[data-station='${id}']`) as SVGGElement;
    await fireEvent.click(p("S03"));
    expect([...selection.stationIds]).toEqual(["S03"]);
    await fireEvent.click(p("S05"), { shiftKey: true });
    expect([...selection.stationIds].sort()).toEqual(["S03", "S05"]);
    expect(p("S03").classList.contains("selected")).toBe(true);
    expect(p("S05").getAttribute("aria-checked")).toBe("true");
    expect(p("S04").classList.contains("selected")).toBe(false);
  });

  it("MixingPlot highlights stations selected elsewhere (linked selection)", () => {
    const { svg, selection } = setup();
    selection.selectStations(["S10"]);
    flushSync();
    expect(svg.querySelectorAll(".point.selected")).toHaveLength(1);
    expect(svg.querySelector(".point.selected")?.getAttribute("data-station")).toBe("S10");
  });

  it("MixingPlot horizontal drag sets selection.salinityBrush and selects the stations inside it", async () => {
    const { svg, selection } = setup();
    const surface = svg.querySelector(".brush-surface") as SVGRectElement;
    const x0 = Number(surface.getAttribute("x"));
    const w = Number(surface.getAttribute("width"));
    // the x axis runs 0..35 over the frame (niced); drag from 10 % to 40 % of the width
    await fireEvent.pointerDown(surface, { clientX: x0 + 0.1 * w, clientY: 200, button: 0 });
    await fireEvent.pointerMove(surface, { clientX: x0 + 0.25 * w, clientY: 200 });
    await fireEvent.pointerUp(surface, { clientX: x0 + 0.4 * w, clientY: 200 });
    const brush = selection.salinityBrush;
    expect(brush).not.toBeNull();
    const [lo, hi] = brush!;
    expect(lo).toBeLessThan(hi);
    const inside = fixtureAnalysis()
      .constituents[0].observations!.filter((o) => o.salinity >= lo && o.salinity <= hi)
      .map((o) => o.stationId);
    expect(inside.length).toBeGreaterThan(0);
    expect([...selection.stationIds].sort()).toEqual(inside.sort());
    expect(svg.querySelector(".brush")).not.toBeNull();
  });

  it("MixingPlot arrow keys move focus along salinity and Enter toggles the station", async () => {
    const { svg, selection } = setup();
    const first = svg.querySelector(".point[data-order='0']") as SVGGElement;
    expect(first.getAttribute("tabindex")).toBe("0");
    first.focus();
    await fireEvent.keyDown(first, { key: "ArrowRight" });
    const second = svg.querySelector(".point[data-order='1']") as SVGGElement;
    expect(document.activeElement).toBe(second);
    await fireEvent.keyDown(second, { key: "Enter" });
    expect([...selection.stationIds]).toEqual([second.getAttribute("data-station")]);
  });

  it("MixingPlot switches constituent with selection.constituent", () => {
    const { svg, selection } = setup();
    selection.constituent = "Si";
    flushSync();
    expect(svg.querySelectorAll(".axis-title")[1].textContent).toBe("Si (µmol/L)");
    expect(svg.querySelectorAll(".point")).toHaveLength(12);
  });

  it("MixingPlot SVG output matches the saved snapshot (Fe, S03 selected)", () => {
    const { svg, selection } = setup();
    selection.selectStations(["S03"]);
    flushSync();
    expectSvgSnapshot(svg.outerHTML, "mixing-fe");
  });

  it("MixingPlot SVG output matches the saved snapshot (Ba, maximum)", () => {
    const { svg } = setup("Ba");
    expectSvgSnapshot(svg.outerHTML, "mixing-ba");
    expect(screen.getByText("maximum")).toBeTruthy();
  });
});

describe("MixingPlot dense layer", () => {
  it("MixingPlot draws points on a canvas above denseThreshold, keeps selected ones in the SVG, and click picks the nearest", async () => {
    const fills: Array<[number, number]> = [];
    const ctx = {
      setTransform: () => undefined,
      clearRect: () => undefined,
      fillRect: (x: number, y: number) => fills.push([x, y]),
      globalAlpha: 1,
      fillStyle: "",
    };
    vi.spyOn(HTMLCanvasElement.prototype, "getContext").mockReturnValue(ctx as unknown as CanvasRenderingContext2D);
    const selection = new Selection();
    const { container } = render(MixingPlot, {
      analysis: fixtureAnalysis(),
      selection,
      idPrefix: "dn",
      denseThreshold: 5,
    });
    flushSync();
    expect(container.querySelector("canvas.dense-layer")).not.toBeNull();
    expect(fills).toHaveLength(13);
    const svg = container.querySelector("svg")!;
    expect(svg.querySelectorAll(".point")).toHaveLength(0);
    // press and release on the plot surface right at S05's mark (fills hold mark centres − 1.5 px)
    const s05 = fixtureAnalysis().constituents[0].observations!.findIndex((o) => o.stationId === "S05");
    const [fx, fy] = fills[s05];
    const surface = svg.querySelector(".brush-surface")!;
    await fireEvent.pointerDown(surface, { clientX: fx + 1.5, clientY: fy + 1.5, button: 0 });
    await fireEvent.pointerUp(surface, { clientX: fx + 1.5, clientY: fy + 1.5 });
    expect([...selection.stationIds]).toEqual(["S05"]);
    expect(svg.querySelectorAll(".point.selected")).toHaveLength(1);
    vi.restoreAllMocks();
  });
});
