// @vitest-environment jsdom
import { describe, expect, it } from "vitest";
import { fireEvent, render, within } from "@testing-library/svelte";
import { flushSync } from "svelte";
import BehaviourTable from "../../../dashboard/src/panels/BehaviourTable.svelte";
import { Selection } from "../../../dashboard/src/state/selection.svelte.ts";
import { fixtureAnalysis } from "./fixtures.ts";
import { expectMarkupSnapshot } from "./snapshot.ts";

function setup() {
  const selection = new Selection();
  const r = render(BehaviourTable, { analysis: fixtureAnalysis(), selection });
  const rowNames = () => [...r.container.querySelectorAll("tbody tr")].map((tr) => tr.getAttribute("data-constituent"));
  const header = (label: string) => r.getByRole("button", { name: new RegExp(`^${label.replace(/[()*]/g, "\\$&")}`) });
  return { selection, rowNames, header, ...r };
}

describe("BehaviourTable", () => {
  it("BehaviourTable shows every constituent with its class in plain words and units", () => {
    const { rowNames, container } = setup();
    expect(rowNames()).toEqual(["Fe", "Ba", "Si"]);
    const fe = container.querySelector("tr[data-constituent='Fe']") as HTMLElement;
    expect(fe.textContent).toContain("Removed in the estuary");
    expect(fe.textContent).toContain("(low confidence)");
    expect(fe.textContent).toContain("nmol/L");
    expect(container.querySelector("tr[data-constituent='Ba']")?.textContent).toContain(
      "Mid-estuary maximum, then conservative",
    );
  });

  it("BehaviourTable prints % change and C*₀ with their 95 % intervals, zone in salinity and km, and the maximum", () => {
    const { container } = setup();
    const fe = container.querySelector("tr[data-constituent='Fe']") as HTMLElement;
    const text = (fe.textContent ?? "").replace(/\s+/g, " ");
    expect(text).toContain("−69.6 (−72.4 to −66.8)");
    expect(text).toContain("243 nmol/L (221 to 266)");
    expect(fe.textContent).toContain("S 0.5–6.5");
    expect(fe.textContent).toContain("24.0–38.0 km");
    const ba = container.querySelector("tr[data-constituent='Ba']") as HTMLElement;
    expect(ba.textContent).toContain("+72.7");
    expect(ba.textContent).toMatch(/S 4\.0, 28\.0 km,\s+excess 77 \(65 to 89\) nmol\/L/);
  });

  it("BehaviourTable shows the warning count with the messages in an expandable list", () => {
    const { container } = setup();
    const fe = container.querySelector("tr[data-constituent='Fe']") as HTMLElement;
    const details = fe.querySelector("details")!;
    expect(details.querySelector("summary")?.textContent).toBe("2 warnings");
    expect([...details.querySelectorAll("li")].map((li) => li.getAttribute("data-code"))).toEqual([
      "few-stations-in-zone",
      "censored-values",
    ]);
    expect(container.querySelector("tr[data-constituent='Ba'] .warnings")?.textContent?.trim()).toBe("none");
  });

  it("BehaviourTable sorts by % change ascending then descending, with aria-sort on the header", async () => {
    const { rowNames, header, container } = setup();
    await fireEvent.click(header("Change (%)"));
    expect(rowNames()).toEqual(["Fe", "Si", "Ba"]);
    const th = header("Change (%)").closest("th")!;
    expect(th.getAttribute("aria-sort")).toBe("ascending");
    await fireEvent.click(header("Change (%)"));
    expect(rowNames()).toEqual(["Ba", "Si", "Fe"]);
    expect(th.getAttribute("aria-sort")).toBe("descending");
    expect(container.querySelectorAll("th[aria-sort='none']")).toHaveLength(7);
  });

  it("BehaviourTable puts rows without a value last in either direction (C*₀: Si has none)", async () => {
    const { rowNames, header } = setup();
    await fireEvent.click(header("C*₀"));
    expect(rowNames()).toEqual(["Ba", "Fe", "Si"]);
    await fireEvent.click(header("C*₀"));
    expect(rowNames()).toEqual(["Fe", "Ba", "Si"]);
  });

  it("BehaviourTable sort headers are buttons reachable by keyboard", () => {
    const { container } = setup();
    const buttons = container.querySelectorAll("thead th button");
    expect(buttons).toHaveLength(8);
    for (const b of buttons) expect(b.tagName).toBe("BUTTON");
  });

  it("BehaviourTable clicking a row sets selection.constituent and marks the row", async () => {
    const { selection, container } = setup();
    const ba = container.querySelector("tr[data-constituent='Ba']") as HTMLElement;
    await fireEvent.click(within(ba).getByText("Mid-estuary maximum, then conservative"));
    expect(selection.constituent).toBe("Ba");
    expect(ba.classList.contains("selected")).toBe(true);
    expect(ba.getAttribute("aria-current")).toBe("true");
    await fireEvent.click(
      within(container.querySelector("tr[data-constituent='Si']") as HTMLElement).getByRole("button", { name: "Si" }),
    );
    expect(selection.constituent).toBe("Si");
  });

  it("BehaviourTable follows selection.constituent set elsewhere", () => {
    const { selection, container } = setup();
    selection.constituent = "Si";
    flushSync();
    expect(container.querySelector("tr.selected")?.getAttribute("data-constituent")).toBe("Si");
  });

  it("BehaviourTable shows the analysis' screening caution under the table", () => {
    const { container } = setup();
    const caution = container.querySelector(".caution")?.textContent ?? "";
    expect(caution).toMatch(/^Screening analysis, not a compliance/);
    expect(caution).toContain("Defer to local regulations");
    expect(caution).toContain("licensed practice");
  });

  it("BehaviourTable markup matches the saved snapshot", () => {
    const { container } = setup();
    expectMarkupSnapshot(container.querySelector(".behaviour-table")!.outerHTML, "behaviour-table", "html.snap");
  });
});
