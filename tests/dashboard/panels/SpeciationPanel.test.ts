// @vitest-environment jsdom
import { describe, expect, it, vi } from "vitest";
import { fireEvent, render } from "@testing-library/svelte";
import { flushSync } from "svelte";
import SpeciationPanel from "../../../dashboard/src/panels/SpeciationPanel.svelte";
import { Selection } from "../../../dashboard/src/state/selection.svelte.ts";
import { feSpeciationVsPh, linearGrid, stationSpeciation } from "../../../analysis/index.ts";
import { createWorkerApi } from "../../../dashboard/src/worker/api.ts";
import { fixtureAnalysis } from "./fixtures.ts";
import { expectSvgSnapshot } from "./snapshot.ts";

// Invented carbonate end-members for layout tests (not measurements).
const carbonate = {
  river: { salinity: 0, taUmolKg: 1000, dicUmolKg: 1100, temperatureC: 12 },
  sea: { salinity: 35, taUmolKg: 2300, dicUmolKg: 2050, temperatureC: 12 },
};

// The panel draws what the worker API computes; here the API object runs in the test's thread.
const worker = createWorkerApi();
const speciate = vi.fn((request: Parameters<typeof worker.speciation>[0]) =>
  Promise.resolve(worker.speciation(structuredClone(request))),
);

/** Lets the worker's answer arrive and the panel redraw. */
async function answered(): Promise<void> {
  await new Promise((resolve) => setTimeout(resolve, 0));
  flushSync();
}

async function setup(withCarbonate = false) {
  const selection = new Selection();
  selection.selectStations(["S03"]);
  const r = render(SpeciationPanel, {
    analysis: fixtureAnalysis(),
    selection,
    speciate,
    idPrefix: "t",
    ...(withCarbonate ? { carbonate } : {}),
  });
  await answered();
  const chart = (name: string) =>
    r.container.querySelector(`svg[data-export-name='speciation-${name}']`) as SVGSVGElement;
  return { selection, chart, ...r };
}

describe("SpeciationPanel", () => {
  it("SpeciationPanel draws four charts with axis titles carrying units", async () => {
    const { chart } = await setup();
    const titles = (n: string) => [...chart(n).querySelectorAll(".axis-title")].map((t) => t.textContent);
    expect(titles("fe")[1]).toBe("Share of dissolved Fe(III) (%)");
    expect(titles("cd")).toEqual(["Salinity (PSS-78)", "Share of dissolved Cd (%)"]);
    expect(titles("ions")).toEqual(["Salinity (PSS-78)", "Concentration (mmol/kg)", "Ionic strength (mol/kg-H₂O)"]);
    expect(titles("ph")).toEqual(["Salinity (PSS-78)", "pH"]);
  });

  it("SpeciationPanel marks the selected station's pH on the Fe(III) chart and its salinity on the Cd chart", async () => {
    const { chart } = await setup();
    expect(chart("fe").querySelector(".marker")).not.toBeNull();
    expect(chart("fe").textContent).toContain("S03: pH 7.20");
    expect(chart("cd").textContent).toContain("S03: free Cd²⁺");
  });

  it("SpeciationPanel shows the Fe(III) fractions that stationSpeciation() returns for the station", async () => {
    const { container } = await setup();
    const r = stationSpeciation({ pH: 7.2, salinity: 1.2, temperatureC: 12 });
    const top = Object.entries(r.fe.fractions).sort((a, b) => b[1] - a[1])[0];
    const readout = container.querySelector(".fe-readout")?.textContent ?? "";
    expect(readout.length).toBeGreaterThan(0);
    expect(readout).toContain(`${(100 * top[1]).toPrecision(2).replace(/\.0$/, "")}`);
    expect(container.querySelector(".cd-readout")?.textContent).toContain("% of dissolved inorganic Cd");
  });

  it("SpeciationPanel constant-set switch redraws the Fe(III) chart from the chosen set", async () => {
    const { chart, getByLabelText } = await setup();
    const before = chart("fe").querySelector(".series")?.getAttribute("d");
    await fireEvent.click(getByLabelText(/Stefánsson 2007/));
    await answered();
    const after = chart("fe").querySelector(".series")?.getAttribute("d");
    expect(after).not.toBe(before);
    const expected = feSpeciationVsPh("stefansson2007", { salinity: 1.2, temperatureC: 12 }, linearGrid(3, 10, 141), {
      mixing: { riverSalinity: 0, seaSalinity: 35 },
    });
    expect(chart("fe").querySelectorAll(".series")).toHaveLength(expected.series.length);
    expect(chart("fe").querySelector("desc")?.textContent).toContain("Stefánsson 2007");
  });

  it("SpeciationPanel states each Fe(III) set's pH scale and upper limits, and the Cd activity model's ionic-strength validity", async () => {
    const { container, getByLabelText } = await setup();
    const fe = () => container.querySelector("[data-testid='fe-set-note']")?.textContent ?? "";
    expect(fe()).toMatch(/pH scale: activity scale/);
    expect(fe()).toMatch(/upper limit/);
    await fireEvent.click(getByLabelText(/Liu & Millero 2002/));
    flushSync();
    expect(fe()).toMatch(/free \[H⁺\]/);
    expect(container.querySelector("[data-testid='cd-set-note']")?.textContent).toMatch(/Davies.*0\.5 mol\/kg/);
  });

  it("SpeciationPanel names constant sets by their literature, not by other programs or databases", async () => {
    const { container } = await setup();
    const labels = [...container.querySelectorAll("fieldset label")].map((l) => l.textContent ?? "").join(" ");
    expect(labels).toMatch(/Baes & Mesmer 1976/);
    expect(labels).not.toMatch(/WATEQ|PHREEQC|ThermoChimie|MINTEQ|llnl|sit\.dat|\.dat\b/i);
  });

  it("SpeciationPanel offers at least two constant sets for Fe(III) and for Cd", async () => {
    const { container } = await setup();
    expect(container.querySelectorAll("input[name='t-fe']").length).toBeGreaterThanOrEqual(2);
    expect(container.querySelectorAll("input[name='t-cd']").length).toBeGreaterThanOrEqual(2);
  });

  it("SpeciationPanel draws free Cd²⁺ and the chloro-complexes, and Ca, Mg, Cl and ionic strength", async () => {
    const { chart } = await setup();
    const keys = (n: string) => [...chart(n).querySelectorAll(".series")].map((p) => p.getAttribute("data-key"));
    expect(keys("cd")).toContain("Cd+2");
    expect(keys("cd")).toContain("CdCl+");
    expect(keys("ions")).toEqual(["Mg+2", "Ca+2", "Cl-", "ionicStrength"]);
  });

  it("SpeciationPanel plots measured pH of every station and clicking one selects it", async () => {
    const { chart, selection } = await setup();
    const pts = chart("ph").querySelectorAll(".point");
    expect(pts).toHaveLength(12);
    expect(chart("ph").querySelectorAll(".point.selected")).toHaveLength(1);
    await fireEvent.click(chart("ph").querySelector(".point[data-station='S08']")!);
    await answered();
    expect([...selection.stationIds]).toEqual(["S08"]);
    expect(chart("fe").textContent).toContain("S08: pH 7.70");
  });

  it("SpeciationPanel draws the expected pH along the mixing line when carbonate end-members are given", async () => {
    const without = await setup();
    expect(without.chart("ph").querySelector(".series[data-key='pH_T']")).toBeNull();
    expect(without.container.textContent).toContain("only measured pH is shown");
    without.unmount();
    const { chart } = await setup(true);
    expect(chart("ph").querySelector(".series[data-key='pH_T']")).not.toBeNull();
  });

  it("SpeciationPanel asks the worker with the focus station's conditions and the chosen sets, and says what it needs", async () => {
    speciate.mockClear();
    const { container, selection } = await setup();
    const request = speciate.mock.calls.at(-1)![0];
    expect(request.station).toEqual({ id: "S03", salinity: 1.2, temperatureC: 12, pH: 7.2 });
    expect(request.settings.feSetId).toBe("baesMesmer1976");
    expect(request.settings.carbonate).toBeUndefined();
    expect(request.measuredPh).toHaveLength(12);
    selection.selectStations([]);
    flushSync();
    await answered();
    expect(container.querySelector(".focus")?.textContent).toMatch(/Select a station/);
  });

  it("SpeciationPanel says it waits for the worker before the first answer", () => {
    const selection = new Selection();
    const { container } = render(SpeciationPanel, {
      analysis: fixtureAnalysis(),
      selection,
      speciate: () => new Promise(() => undefined),
      idPrefix: "w",
    });
    flushSync();
    expect(container.querySelector("[data-testid='speciation-pending']")?.textContent).toMatch(/Computing/);
    expect(container.querySelector("svg")).toBeNull();
  });

  it("SpeciationPanel shows the screening caution", async () => {
    const { container } = await setup();
    expect(container.querySelector(".caution")?.textContent).toContain("not a compliance");
  });

  it("SpeciationPanel Fe(III) chart SVG matches the saved snapshot (S03, default set)", async () => {
    const { chart } = await setup();
    expectSvgSnapshot(chart("fe").outerHTML, "speciation-fe");
  });

  it("SpeciationPanel pH chart SVG matches the saved snapshot (with carbonate end-members)", async () => {
    const { chart } = await setup(true);
    expectSvgSnapshot(chart("ph").outerHTML, "speciation-ph");
  });
});
