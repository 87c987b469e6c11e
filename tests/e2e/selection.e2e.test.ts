import { describe, expect, it } from "vitest";
import { screenshot, selectionStatus, settle, skipBrowser, stationPixel } from "./browser.ts";
import { suiteDashboard } from "./suite.ts";
import { changedShare } from "./pixels.ts";

const plotPoint = (id: string) => `[data-panel="MixingPlot"] [data-station="${id}"]`;
const listButton = (id: string) => `[data-station-id="${id}"]`;

describe.skipIf(skipBrowser)("selection links the map, the station list and the mixing plot both ways", () => {
  const s = suiteDashboard();

  it("clicking station W05 on the map selects it: status, list, mixing plot and a drawn highlight", async () => {
    const at = await stationPixel(s.page, "W05");
    const before = await screenshot(s.page, "selection-0-before");
    await s.page.mouse.click(at[0], at[1]);
    await settle(s.page);
    expect(await selectionStatus(s.page)).toBe("Selected: W05");
    await expect(s.page.locator(listButton("W05")).getAttribute("aria-pressed")).resolves.toBe("true");
    await expect(s.page.locator(plotPoint("W05")).getAttribute("aria-checked")).resolves.toBe("true");
    const after = await screenshot(s.page, "selection-1-map-click-W05");
    // The selected station is drawn larger with a dark ring and its label: pixels around it change.
    expect(changedShare(before, after, at, 18)).toBeGreaterThan(0.05);
  });

  it("shift-clicking W09 on the map adds it to the selection", async () => {
    const at = await stationPixel(s.page, "W09");
    await s.page.keyboard.down("Shift");
    await s.page.mouse.click(at[0], at[1]);
    await s.page.keyboard.up("Shift");
    await settle(s.page);
    expect(await selectionStatus(s.page)).toBe("Selected: W05, W09");
    await expect(s.page.locator(plotPoint("W09")).getAttribute("aria-checked")).resolves.toBe("true");
  });

  it("clicking W14 in the mixing plot selects it on the map (status text and drawn highlight)", async () => {
    const at = await stationPixel(s.page, "W14");
    const before = await screenshot(s.page, "selection-2-before-plot-click");
    await s.page.locator(plotPoint("W14")).click();
    await settle(s.page);
    expect(await selectionStatus(s.page)).toBe("Selected: W14");
    await expect(s.page.locator(listButton("W14")).getAttribute("aria-pressed")).resolves.toBe("true");
    await expect(s.page.locator(listButton("W05")).getAttribute("aria-pressed")).resolves.toBe("false");
    const after = await screenshot(s.page, "selection-3-plot-click-W14");
    expect(changedShare(before, after, at, 18)).toBeGreaterThan(0.05);
  });

  it("switching the constituent keeps the selection", async () => {
    const options = await s.page
      .locator('[data-testid="constituent-select"] option')
      .evaluateAll((els) => els.map((e) => (e as HTMLOptionElement).value));
    const other = options.find((v) => v !== "Fe");
    expect(other).toBeDefined();
    await s.page.selectOption('[data-testid="constituent-select"]', other ?? "");
    await settle(s.page);
    expect(await selectionStatus(s.page)).toBe("Selected: W14");
    await expect(s.page.locator(plotPoint("W14")).getAttribute("aria-checked")).resolves.toBe("true");
    await screenshot(s.page, "selection-4-other-constituent");
  });

  it("switching to the other survey and back keeps the selection", async () => {
    await s.page.selectOption('[data-testid="survey-select"]', "1");
    await settle(s.page);
    // kept, and said to be absent from the dry-season survey (its stations are D01…)
    expect(await selectionStatus(s.page)).toBe("Selected: W14 (not in this survey)");
    expect(await s.page.locator(listButton("W14")).count()).toBe(0);
    await screenshot(s.page, "selection-5-other-survey");
    await s.page.selectOption('[data-testid="survey-select"]', "0");
    await settle(s.page);
    await expect(s.page.locator(listButton("W14")).getAttribute("aria-pressed")).resolves.toBe("true");
    await expect(s.page.locator(plotPoint("W14")).getAttribute("aria-checked")).resolves.toBe("true");
  });

  it("logs no console errors, page errors or off-line requests", () => {
    expect(s.errors).toEqual([]);
  });
});
