import { describe, expect, it } from "vitest";
import { screenshot, selectionStatus, settle, skipBrowser, stationPixel, waitForAnalysis } from "./browser.ts";
import { suiteDashboard } from "./suite.ts";

describe.skipIf(skipBrowser)("map tooltips, keyboard use and re-analysis in the worker", () => {
  const s = suiteDashboard();

  it("hovering station W30 on the map shows a tooltip with salinity, the constituent value and their units", async () => {
    const at = await stationPixel(s.page, "W30");
    await s.page.mouse.move(at[0], at[1]);
    const tip = s.page.locator('[role="tooltip"]');
    await tip.waitFor();
    const text = (await tip.textContent()) ?? "";
    expect(text).toContain("W30");
    expect(text).toContain("PSS-78");
    expect(text).toContain("nmol/L");
    expect(text).toContain("From mouth");
    await screenshot(s.page, "interaction-1-tooltip-W30");
    await s.page.mouse.move(5, 5);
  });

  it("the header controls and the station list are labelled and reachable with the keyboard", async () => {
    const labelOf = (testId: string) =>
      s.page
        .locator(`[data-testid="${testId}"]`)
        .evaluate((el) => (el as HTMLSelectElement).labels?.[0]?.querySelector("span")?.textContent?.trim() ?? "");
    await expect(labelOf("survey-select")).resolves.toBe("Survey");
    await expect(labelOf("constituent-select")).resolves.toBe("Constituent");
    await s.page.locator('[data-station-id="W03"]').focus();
    await s.page.keyboard.press("Enter");
    await settle(s.page);
    expect(await selectionStatus(s.page)).toBe("Selected: W03");
    await s.page.keyboard.press("Tab");
    await s.page.keyboard.press("Shift+Enter");
    await settle(s.page);
    expect(await selectionStatus(s.page)).toBe("Selected: W03, W04");
    await screenshot(s.page, "interaction-2-keyboard-selection");
  });

  it("re-running the analysis with a discharge override goes through the worker and reports the new discharge", async () => {
    await s.page.locator("summary", { hasText: "Settings" }).click();
    await s.page.getByLabel("River discharge override (m³/s)").fill("321");
    await s.page.getByRole("button", { name: "Re-run analysis" }).click();
    // Close the settings panel (it lies over the station list), as a user would, while the worker runs.
    await s.page.locator("summary", { hasText: "Settings" }).click();
    // The progress bar shows while the worker runs; on a fast machine it may already be gone, so only responsiveness is asserted.
    await s.page.locator('[data-station-id="W07"]').click();
    expect(await selectionStatus(s.page)).toBe("Selected: W07");
    await screenshot(s.page, "interaction-3-analysing");
    await waitForAnalysis(s.page);
    await settle(s.page);
    const discharge = await s.page.evaluate(
      () => document.querySelector("[data-discharge-m3s]")?.getAttribute("data-discharge-m3s") ?? null,
    );
    expect(discharge).toBe("321");
    await screenshot(s.page, "interaction-4-rerun");
  });

  it("logs no console errors, page errors or off-line requests", () => {
    expect(s.errors).toEqual([]);
  });
});
