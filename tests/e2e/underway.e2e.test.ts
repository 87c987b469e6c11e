import { describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { REPO_ROOT, screenshot, settle, skipBrowser, openReadyDashboard } from "./browser.ts";
import { suiteDashboard } from "./suite.ts";
import { changedShare, pixelStats } from "./pixels.ts";
import { underwayCsvChunks } from "../../bench/fixtures/underwayLog.ts";

/** An invented 1e5-record 1 Hz log along the invented demo channel (main stem, mouth first). */
function demoChannelLog(): Buffer {
  const fc = JSON.parse(readFileSync(join(REPO_ROOT, "data-demo", "centerline.geojson"), "utf8")) as {
    features: Array<{ properties: { role?: string }; geometry: { type: string; coordinates: [number, number][] } }>;
  };
  const main = fc.features.find((f) => f.properties.role === "main" && f.geometry.type === "LineString")!;
  return Buffer.from([...underwayCsvChunks(100_000, 5, 10_000, main.geometry.coordinates)].join(""));
}

describe.skipIf(skipBrowser)("underway log on the map (headless Chromium)", () => {
  const s = suiteDashboard(() => openReadyDashboard({ settled: false }));

  it("loads a generated 100,000-record log, keeps the page updating while it reads, and draws its points on the map", async () => {
    await settle(s.page);
    const before = await screenshot(s.page, "underway-before");
    // Record every progress value the page shows: the UI thread keeps rendering while the worker reads.
    await s.page.evaluate(() => {
      const seen: number[] = [];
      (window as unknown as { __underwaySeen: number[] }).__underwaySeen = seen;
      new MutationObserver(() => {
        const p = document.querySelector<HTMLProgressElement>('[data-testid="underway-progress"]');
        if (p) seen.push(p.value);
      }).observe(document.body, { subtree: true, attributes: true, childList: true });
    });
    await s.page.setInputFiles('[data-testid="underway-input"]', {
      name: "underway-invented.csv",
      mimeType: "text/csv",
      buffer: demoChannelLog(),
    });
    await s.page.waitForSelector('[data-underway-status="ready"]', { timeout: 120_000 });
    const summary = (await s.page.locator('[data-testid="underway-summary"]').textContent()) ?? "";
    expect(summary).toContain("100,000 of 100,000 records placed");
    const seen = await s.page.evaluate(() => (window as unknown as { __underwaySeen: number[] }).__underwaySeen);
    expect(seen.some((v) => v > 0 && v < 1)).toBe(true);
    // deck.gl, loaded on demand for the log, has drawn its points over the map.
    await s.page.waitForSelector('[data-dense-drawn~="underway"]', { timeout: 60_000 });
    // deck.gl's canvas only draws: the map keeps one keyboard stop (MapLibre's labelled canvas).
    await expect(s.page.locator(".map canvas").count()).resolves.toBe(2);
    await expect(s.page.locator(".map canvas:not([tabindex='-1'])").count()).resolves.toBe(1);
    await settle(s.page);
    await s.page.waitForTimeout(1000);
    const after = await screenshot(s.page, "underway-after");
    const box = await s.page.locator(".map").boundingBox();
    expect(box).not.toBeNull();
    const stats = pixelStats(after, box ?? undefined);
    expect(stats.distinctColours).toBeGreaterThan(20);
    const centre: [number, number] = [box!.x + box!.width / 2, box!.y + box!.height / 2];
    expect(changedShare(before, after, centre, Math.min(box!.width, box!.height) / 2)).toBeGreaterThan(0.001);
  });

  it("still answers a constituent change after the import (page responsive)", async () => {
    const options = await s.page.locator('[data-testid="constituent-select"] option').allTextContents();
    expect(options.length).toBeGreaterThan(1);
    await s.page.selectOption('[data-testid="constituent-select"]', { index: 1 });
    await expect(s.page.locator('[data-testid="constituent-select"]').inputValue()).resolves.not.toBe("");
  });

  it("logs no console errors, page errors or off-line requests", () => {
    expect(s.errors).toEqual([]);
  });
});
