// @vitest-environment jsdom
import { describe, expect, it } from "vitest";
import { fireEvent, render } from "@testing-library/svelte";
import { flushSync } from "svelte";
import ChannelProfile from "../../../dashboard/src/panels/ChannelProfile.svelte";
import { Selection } from "../../../dashboard/src/state/selection.svelte.ts";
import { fixtureAnalysis } from "./fixtures.ts";
import { expectSvgSnapshot } from "./snapshot.ts";

function setup(constituent = "Fe") {
  const selection = new Selection();
  selection.constituent = constituent;
  const r = render(ChannelProfile, { analysis: fixtureAnalysis(), selection, idPrefix: "t" });
  const svg = r.container.querySelector("svg[data-export-name='profile']") as SVGSVGElement;
  return { selection, svg, ...r };
}

describe("ChannelProfile", () => {
  it("ChannelProfile labels distance and both y axes with units", () => {
    const { svg } = setup();
    const titles = [...svg.querySelectorAll(".axis-title")].map((t) => t.textContent);
    expect(titles).toEqual(["Distance from the mouth (km)", "Fe (nmol/L)", "Salinity (PSS-78)"]);
  });

  it("ChannelProfile draws placed observations and salinity, and reports stations without a position", () => {
    const { svg, container } = setup();
    expect(svg.querySelectorAll(".point")).toHaveLength(12);
    expect(svg.querySelectorAll(".salinity-point")).toHaveLength(12);
    expect(container.querySelector("figcaption")?.textContent).toContain("1 observation has no channel position");
  });

  it("ChannelProfile puts the river on the left and the mouth on the right", () => {
    const { svg } = setup();
    const x = (id: string) =>
      Number(
        svg
          .querySelector(`.point[data-station='${id}'] circle, .point[data-station='${id}'] path`)
          ?.getAttribute("cx") ?? NaN,
      );
    expect(x("S01")).toBeLessThan(x("S11"));
  });

  it("ChannelProfile shades the reaction-zone stretch in km and marks the maximum with its excess", () => {
    const { svg } = setup("Ba");
    expect(svg.querySelectorAll(".reaction-zone")).toHaveLength(1);
    expect(svg.querySelectorAll("line.maximum")).toHaveLength(1);
    expect(svg.textContent).toContain("maximum +77 nmol/L");
  });

  it("ChannelProfile click selects a station and highlights it in both series", async () => {
    const { svg, selection } = setup();
    await fireEvent.click(svg.querySelector(".point[data-station='S04']")!);
    expect([...selection.stationIds]).toEqual(["S04"]);
    expect(svg.querySelectorAll(".point.selected")).toHaveLength(1);
    expect(svg.querySelectorAll(".salinity-point.selected")).toHaveLength(1);
  });

  it("ChannelProfile drag across a stretch selects the stations within it", async () => {
    const { svg, selection } = setup();
    const surface = svg.querySelector(".brush-surface")!;
    const x0 = Number(surface.getAttribute("x"));
    const w = Number(surface.getAttribute("width"));
    await fireEvent.pointerDown(surface, { clientX: x0 + 0.65 * w, clientY: 200, button: 0 });
    await fireEvent.pointerUp(surface, { clientX: x0 + w, clientY: 200 });
    // right 35 % of the reversed 50–0 km axis = 0–17.5 km: S08 (16 km) … S12 (0.5 km)
    expect([...selection.stationIds].sort()).toEqual(["S08", "S09", "S10", "S11", "S12"]);
  });

  it("ChannelProfile follows selection.constituent and selected stations set elsewhere", () => {
    const { svg, selection } = setup();
    selection.constituent = "Si";
    selection.selectStations(["S02", "S03"]);
    flushSync();
    expect(svg.querySelectorAll(".axis-title")[1].textContent).toBe("Si (µmol/L)");
    expect(svg.querySelectorAll(".point.selected")).toHaveLength(2);
  });

  it("ChannelProfile SVG output matches the saved snapshot (Ba, S05 selected)", () => {
    const { svg, selection } = setup("Ba");
    selection.selectStations(["S05"]);
    flushSync();
    expectSvgSnapshot(svg.outerHTML, "profile-ba");
  });
});
