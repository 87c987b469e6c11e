import { describe, expect, it } from "vitest";
import { screenshot, skipBrowser, openReadyDashboard } from "./browser.ts";
import { suiteDashboard } from "./suite.ts";
import { pixelStats } from "./pixels.ts";

describe.skipIf(skipBrowser)("dashboard loads the invented demo estuary (headless Chromium)", () => {
  const s = suiteDashboard(() => openReadyDashboard({ settled: false }));

  it("shows the product name, the caution line and both demo surveys in the survey switcher", async () => {
    await expect(s.page.locator("h1").textContent()).resolves.toBe("Brackline");
    const caution = await s.page.locator('[data-testid="caution"]').textContent();
    expect(caution).toContain("Screening analysis, not a compliance");
    expect(caution).toContain("licensed practice");
    const options = await s.page.locator('[data-testid="survey-select"] option').allTextContents();
    expect(options.length).toBe(2);
  });

  it("lists the demo stations and draws a non-blank map where the estuary is", async () => {
    const stations = await s.page.locator("[data-station-id]").count();
    expect(stations).toBeGreaterThan(20);
    await s.page.waitForTimeout(500);
    const png = await screenshot(s.page, "load-overview");
    const box = await s.page.locator(".map").boundingBox();
    expect(box).not.toBeNull();
    const stats = pixelStats(png, box ?? undefined);
    expect(stats.distinctColours).toBeGreaterThan(20);
    expect(stats.nonBackgroundShare).toBeGreaterThan(0.05);
  });

  it("logs no console errors, page errors or off-line requests", () => {
    expect(s.errors).toEqual([]);
  });
});
