import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { screenshot, settle, skipBrowser, stationPixel, waitForAnalysis } from "./browser.ts";
import { suiteDashboard } from "./suite.ts";

/** Stations from the mouth (W01) to the head (W30) of the invented wet survey, to draw along. */
const ALONG_CHANNEL = ["W01", "W08", "W15", "W22", "W30"];

describe.skipIf(skipBrowser)("drawing a channel centerline on the map", () => {
  const s = suiteDashboard();

  it("the Draw channel toggle is a keyboard-reachable button that starts drawing", async () => {
    const button = s.page.getByRole("button", { name: "Draw channel" });
    await button.focus();
    await s.page.keyboard.press("Enter");
    await expect(s.page.locator('[data-testid="draw-panel"]').getAttribute("data-draw-mode")).resolves.toBe("drawing");
    await expect(s.page.getByRole("button", { name: "Finish line" }).getAttribute("aria-pressed")).resolves.toBe(
      "true",
    );
  });

  it("clicking points on the map draws a line whose km ticks (analysis/geometry) appear from the mouth and reach farther as it lengthens", async () => {
    const pixels = [];
    for (const id of ALONG_CHANNEL) pixels.push(await stationPixel(s.page, id));
    await s.page.mouse.click(pixels[0][0], pixels[0][1]);
    await s.page.mouse.click(pixels[1][0], pixels[1][1]);
    await settle(s.page);
    const maxKm = async () =>
      Math.max(
        ...(await s.page
          .locator(".brackline-draw-km")
          .evaluateAll((els) => els.map((e) => Number((e as HTMLElement).dataset.km)))),
      );
    expect(await s.page.locator(".brackline-draw-km").count()).toBeGreaterThan(1);
    const kmAfterTwo = await maxKm();
    expect(kmAfterTwo).toBeGreaterThan(0);
    await expect(s.page.locator(".brackline-draw-km").first().textContent()).resolves.toBe("mouth");
    for (const p of pixels.slice(2, -1)) await s.page.mouse.click(p[0], p[1]);
    await settle(s.page);
    expect(await s.page.locator('[data-testid="draw-panel"] .help').first().textContent()).toContain("4 points");
    // Backspace removes the last point, a click puts it back.
    await s.page.keyboard.press("Backspace");
    expect(await s.page.locator('[data-testid="draw-panel"] .help').first().textContent()).toContain("3 points");
    // Wait past the double-click interval: a second click on the same spot would otherwise finish the line.
    await s.page.waitForTimeout(800);
    await s.page.mouse.click(pixels[3][0], pixels[3][1]);
    await settle(s.page);
    expect(await s.page.locator('[data-testid="draw-panel"] .help').first().textContent()).toContain("4 points");
    await settle(s.page);
    const labels = await s.page.locator(".brackline-draw-km").allTextContents();
    expect(await maxKm()).toBeGreaterThan(kmAfterTwo);
    expect(labels.slice(1).every((t) => / km$/.test(t))).toBe(true);
    await screenshot(s.page, "draw-1-drawing");
  });

  it("double-clicking the last point finishes the line, which becomes the active channel and is re-analysed in the worker", async () => {
    const head = await stationPixel(s.page, ALONG_CHANNEL[ALONG_CHANNEL.length - 1]);
    const panel = s.page.locator('[data-testid="draw-panel"]');
    await expect(panel.getAttribute("data-vertices")).resolves.toBe("4");
    await s.page.mouse.dblclick(head[0], head[1]);
    await expect(panel.getAttribute("data-vertices")).resolves.toBe("5");
    await expect(s.page.locator('[data-testid="draw-panel"]').getAttribute("data-draw-mode")).resolves.toBe("editing");
    await s.page.waitForSelector('[data-analysis-status="analysing"], [data-analysis-status="ready"]');
    await waitForAnalysis(s.page);
    await settle(s.page);
    const text = (await s.page.locator('[data-testid="drawn-length"]').textContent()) ?? "";
    expect(text).toMatch(/\d+\.\d km from the mouth/);
    await screenshot(s.page, "draw-2-finished");
  });

  // Regression guard: the map's style update (setStyle, after the labels moved to MapLibre symbol layers)
  // must keep the draw tool's source and vertex layer, which the drag's hit test queries.
  it("dragging a vertex handle moves it and changes the drawn length", async () => {
    const drawLayers = await s.page.evaluate(() => {
      const m = (window as unknown as { __brackline?: { map?: { getLayer(id: string): unknown } } }).__brackline?.map;
      return ["brackline-draw-line", "brackline-draw-vertices"].map((id) => m?.getLayer(id) !== undefined);
    });
    console.log(`draw.e2e: draw layers present before the drag: ${drawLayers.join(", ")}`);
    expect(drawLayers).toEqual([true, true]);
    const before = (await s.page.locator('[data-testid="drawn-length"]').textContent()) ?? "";
    const p = await stationPixel(s.page, ALONG_CHANNEL[2]);
    await s.page.mouse.move(p[0], p[1]);
    await s.page.mouse.down();
    // Across the line (perpendicular to its neighbours W08 → W22), so the drawn length must grow.
    const [a, b] = [await stationPixel(s.page, ALONG_CHANNEL[1]), await stationPixel(s.page, ALONG_CHANNEL[3])];
    const len = Math.hypot(b[0] - a[0], b[1] - a[1]) || 1;
    const across = [(-(b[1] - a[1]) / len) * 80, ((b[0] - a[0]) / len) * 80];
    await s.page.mouse.move(p[0] + across[0], p[1] + across[1], { steps: 6 });
    await s.page.mouse.up();
    await settle(s.page);
    // The length is measured in the worker (the one centerline reader), so it arrives asynchronously.
    await expect
      .poll(async () => (await s.page.locator('[data-testid="drawn-length"]').textContent()) ?? "", { timeout: 30_000 })
      .not.toBe(before);
    await waitForAnalysis(s.page);
  });

  it("Export GeoJSON downloads an RFC 7946 FeatureCollection: a [lon, lat] LineString of 5 vertices and a mouth Point at its first vertex", async () => {
    const [download] = await Promise.all([
      s.page.waitForEvent("download"),
      s.page.getByRole("button", { name: "Export GeoJSON" }).click(),
    ]);
    expect(download.suggestedFilename()).toBe("drawn-centerline.geojson");
    const path = await download.path();
    const fc = JSON.parse(readFileSync(path, "utf8")) as {
      type: string;
      features: Array<{ type: string; geometry: { type: string; coordinates: unknown }; properties: { role: string } }>;
    };
    expect(fc.type).toBe("FeatureCollection");
    const line = fc.features.find((f) => f.geometry.type === "LineString");
    const mouth = fc.features.find((f) => f.geometry.type === "Point");
    const coords = line?.geometry.coordinates as Array<[number, number]>;
    expect(coords.length).toBe(5);
    // The invented estuary lies near 45.0–45.3° N, 35.3–35.6° W (data-demo): [lon, lat] order, not [lat, lon].
    for (const [lon, lat] of coords) {
      expect(lon).toBeGreaterThan(-35.7);
      expect(lon).toBeLessThan(-35.2);
      expect(lat).toBeGreaterThan(44.9);
      expect(lat).toBeLessThan(45.4);
    }
    expect(line?.properties.role).toBe("main");
    expect(mouth?.properties.role).toBe("mouth");
    expect(mouth?.geometry.coordinates).toEqual(coords[0]);
  });

  it("logs no console errors, page errors or off-line requests", () => {
    expect(s.errors).toEqual([]);
  });
});
