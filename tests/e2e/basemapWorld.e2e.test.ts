// The offline world land (Natural Earth, public domain, from the world-atlas npm package): not fetched
// with the first page (the demo has its own invented coast), drawn around San Francisco Bay once the
// real cruise export is imported, named in the map attribution, and switched off from the settings.
import { copyFileSync } from "node:fs";
import { join } from "node:path";
import type { Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  openReadyDashboard,
  SCREENSHOT_DIR,
  screenshot,
  settle,
  skipBrowser,
  waitForAnalysis,
  type Session,
} from "./browser.ts";
import { suiteDashboard } from "./suite.ts";
import { BAY_DIR, bayFilesPresent, importBayCruise2018 } from "./bayFiles.ts";
import { decodePng } from "./pixels.ts";

if (!bayFilesPresent) console.warn(`basemapWorld.e2e: skipped, ${BAY_DIR} is absent`);

// Probe points [lon, lat] (common practice: read off any chart of the bay, away from the sampled channel).
const LAND = { "Berkeley Hills": [-122.22, 37.87], "Marin, north of Sausalito": [-122.53, 37.9] } as const;
const WATER = { "San Pablo Bay": [-122.4, 38.06], "central bay off Alameda": [-122.33, 37.75] } as const;

/** The dashboard's palette (dashboard/src/map/style.ts PALETTE): land and water fills. */
const LAND_RGB: [number, number, number] = [0xec, 0xea, 0xe3];
const WATER_RGB: [number, number, number] = [0xc6, 0xd8, 0xe0];

type Hook = {
  __brackline?: {
    map: {
      project(p: readonly [number, number]): { x: number; y: number };
      queryRenderedFeatures(p: [number, number], o: { layers: string[] }): unknown[];
      getSource(id: string): unknown;
      getStyle(): { layers: Array<{ id: string }> };
      getContainer(): HTMLElement;
    };
  };
};

/** Page pixel of a [lon, lat] and whether the world land layer draws there. */
async function probe(page: Page, lonLat: readonly [number, number]) {
  return page.evaluate((p) => {
    const map = (window as unknown as Hook).__brackline!.map;
    const xy = map.project(p);
    const r = map.getContainer().getBoundingClientRect();
    const land = map.queryRenderedFeatures([xy.x, xy.y], { layers: ["world-land"] }).length > 0;
    return { x: r.left + xy.x, y: r.top + xy.y, land };
  }, lonLat);
}

/** The most common colour in a 9×9 patch (station markers and labels are small). */
function patchColour(png: ReturnType<typeof decodePng>, x: number, y: number): [number, number, number] {
  const counts = new Map<string, number>();
  for (let dy = -4; dy <= 4; dy++)
    for (let dx = -4; dx <= 4; dx++) {
      const i = ((Math.round(y) + dy) * png.width + Math.round(x) + dx) * 4;
      const key = `${png.data[i]},${png.data[i + 1]},${png.data[i + 2]}`;
      counts.set(key, (counts.get(key) ?? 0) + 1);
    }
  const top = [...counts.entries()].sort((a, b) => b[1] - a[1])[0]![0];
  return top.split(",").map(Number) as [number, number, number];
}

const near = (a: [number, number, number], b: [number, number, number]) =>
  Math.max(...a.map((v, i) => Math.abs(v - b[i]!))) <= 12;

describe.skipIf(skipBrowser)("the first page load does not fetch the world land", () => {
  const s = suiteDashboard(openReadyDashboard, 120_000);

  it("the demo (its own invented coast) draws no world land and loaded no land asset", async () => {
    expect(await s.page.locator(".map").getAttribute("data-world-land")).toBe("off");
    const fetched = await s.page.evaluate(() =>
      performance
        .getEntriesByType("resource")
        .map((e) => e.name)
        .filter((n) => /land-(10|50|110)m|basemapWorld/.test(n)),
    );
    expect(fetched).toEqual([]);
    const hasSource = await s.page.evaluate(() =>
      Boolean((window as unknown as Hook).__brackline?.map.getSource("world-land")),
    );
    expect(hasSource).toBe(false);
    expect(s.errors).toEqual([]);
  });
});

describe.skipIf(skipBrowser || !bayFilesPresent)("world land around San Francisco Bay after an import", () => {
  let s: Session;
  const landRequests: string[] = [];

  beforeAll(async () => {
    s = await openReadyDashboard();
    s.page.on("request", (r) => {
      if (/land-(10|50|110)m/.test(r.url())) landRequests.push(r.url());
    });
  }, 120_000);

  afterAll(async () => {
    await s?.close();
  });

  it("importing the cruise export and its station table draws Natural Earth land around the bay", async () => {
    const dialog = await importBayCruise2018(s.page);
    await dialog.locator('[data-testid="mapping-confirm"]').click();
    await s.page.locator('[data-testid="import-report"]').waitFor({ timeout: 60_000 });
    await s.page.locator('[data-testid="data-toggle"]').click();
    await s.page.waitForSelector('[data-world-land="10m"]', { timeout: 90_000 });
    await waitForAnalysis(s.page);
    await s.page.waitForSelector('[data-map-ready="true"]');
    await s.page.evaluate(
      () =>
        new Promise<void>((resolve) => {
          const map = (
            window as unknown as { __brackline: { map: { loaded(): boolean; once(e: string, f: () => void): void } } }
          ).__brackline.map;
          if (map.loaded()) resolve();
          else map.once("idle", () => resolve());
        }),
    );
    await settle(s.page);
    const png = await screenshot(s.page, "basemap-world-1-sf-bay");
    copyFileSync(join(SCREENSHOT_DIR, "basemap-world-1-sf-bay.png"), "/tmp/basemap-world-1-sf-bay.png");
    const image = decodePng(png);
    for (const [name, p] of Object.entries(LAND)) {
      const at = await probe(s.page, p);
      const colour = patchColour(image, at.x, at.y);
      console.log(
        `basemapWorld.e2e: ${name} at (${at.x.toFixed(0)}, ${at.y.toFixed(0)}): land ${at.land}, rgb ${colour}`,
      );
      expect(at.land, name).toBe(true);
      expect(near(colour, LAND_RGB), `${name}: ${colour}`).toBe(true);
    }
    for (const [name, p] of Object.entries(WATER)) {
      const at = await probe(s.page, p);
      const colour = patchColour(image, at.x, at.y);
      console.log(
        `basemapWorld.e2e: ${name} at (${at.x.toFixed(0)}, ${at.y.toFixed(0)}): land ${at.land}, rgb ${colour}`,
      );
      expect(at.land, name).toBe(false);
      expect(near(colour, WATER_RGB), `${name}: ${colour}`).toBe(true);
    }
    console.log(`basemapWorld.e2e: land requests ${landRequests.map((u) => u.replace(/^.*\//, "")).join(", ")}`);
    expect(landRequests.some((u) => /land-10m/.test(u))).toBe(true);
  }, 240_000);

  it("the map attribution (folded behind its button) names Natural Earth (public domain)", async () => {
    const attribution = s.page.locator(".maplibregl-ctrl-attrib");
    await attribution.locator(".maplibregl-ctrl-attrib-button").click();
    await expect.poll(async () => attribution.locator(".maplibregl-ctrl-attrib-inner").isVisible()).toBe(true);
    const text = (await attribution.locator(".maplibregl-ctrl-attrib-inner").textContent()) ?? "";
    expect(text).toMatch(/Natural Earth.*public domain/);
    await screenshot(s.page, "basemap-world-2-attribution");
    await attribution.locator(".maplibregl-ctrl-attrib-button").click();
  });

  it("the settings switch takes the world land off and puts it back", async () => {
    const settings = s.page.locator("summary", { hasText: "Settings" });
    await settings.click();
    const toggle = s.page.locator('[data-testid="world-land-toggle"]');
    await toggle.uncheck();
    await s.page.waitForSelector('[data-world-land="off"]');
    const layers = async () =>
      s.page.evaluate(() => (window as unknown as Hook).__brackline!.map.getStyle().layers.map((l) => l.id));
    await expect.poll(layers).not.toContain("world-land");
    await toggle.check();
    await s.page.waitForSelector('[data-world-land="10m"]');
    await expect.poll(layers).toContain("world-land");
    await settings.click();
    await settle(s.page);
    expect(s.errors).toEqual([]);
  }, 120_000);
});
