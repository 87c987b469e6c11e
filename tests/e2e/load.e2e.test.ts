import { describe, expect, it } from "vitest";
import { screenshot, skipBrowser, openReadyDashboard, stationPixel } from "./browser.ts";
import { suiteDashboard } from "./suite.ts";
import { pixelAt, pixelStats } from "./pixels.ts";

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

  it("draws every listed station on the one map canvas, each in the colour of its salinity at its place", async () => {
    const listed = await s.page
      .locator("[data-station-id]")
      .evaluateAll((els) => els.map((e) => e.getAttribute("data-station-id") ?? "").sort());
    const rendered = await s.page.evaluate(() =>
      (window as unknown as { __brackline: { renderedStations(): string[] } }).__brackline.renderedStations(),
    );
    expect(rendered).toEqual(listed);
    // One WebGL canvas at the cold start: deck.gl is loaded only for dense layers (underway log, archive zones).
    await expect(s.page.locator(".map canvas").count()).resolves.toBe(1);
    // The pixel at the uppermost station's place (fresh water, well apart from its neighbours) is the
    // dark blue end of the cividis salinity scale, not the basemap beneath.
    const top = listed[listed.length - 1]!;
    const at = await stationPixel(s.page, top);
    const [r, g, b] = pixelAt(await s.page.screenshot(), Math.round(at[0]), Math.round(at[1]));
    console.log(
      `load.e2e: station ${top} drawn at (${at.map((v) => v.toFixed(0)).join(", ")}) in rgb(${r}, ${g}, ${b})`,
    );
    expect(r).toBeLessThan(80);
    expect(b).toBeGreaterThan(r + 30);
  });

  it("logs no console errors, page errors or off-line requests", () => {
    expect(s.errors).toEqual([]);
  });
});
