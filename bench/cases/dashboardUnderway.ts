// Benchmark: the dashboard with a 1e6-record underway log, in headless Chromium with software
// WebGL. Time from dropping the log (file input) to the first frame drawn with its points, against
// reading the same File into memory in the page (the floor any importer pays); frames per second
// while panning and zooming with the log loaded, against the bare MapLibre + deck.gl page with the
// same style and basemap (fixtures/bareMap.ts) doing the same camera path in the same run.
import { mkdirSync, readFileSync, rmSync, writeFileSync, appendFileSync } from "node:fs";
import { loadavg } from "node:os";
import { join } from "node:path";
import type { Page } from "playwright-core";
import type { BenchCase, BenchRow } from "../benchCase.ts";
import { waitForAnalysis, waitForMap } from "../../tests/e2e/browser.ts";
import { REPO, openBenchDashboard } from "../fixtures/dashboardDist.ts";
import { serveBareMap } from "../fixtures/bareMap.ts";
import { underwayCsvChunks } from "../fixtures/underwayLog.ts";

const RECORDS = 1_000_000;
const PAN_MS = 6000;

/** Writes the invented 1e6-record log along the demo channel's main stem; returns its path. */
function writeLog(dir: string): string {
  const fc = JSON.parse(readFileSync(join(REPO, "data-demo", "centerline.geojson"), "utf8")) as {
    features: Array<{ properties: { role?: string }; geometry: { type: string; coordinates: [number, number][] } }>;
  };
  const main = fc.features.find((f) => f.properties.role === "main" && f.geometry.type === "LineString")!;
  const path = join(dir, "underway-1e6.csv");
  writeFileSync(path, "");
  for (const chunk of underwayCsvChunks(RECORDS, 7, 50_000, main.geometry.coordinates)) appendFileSync(path, chunk);
  return path;
}

/** Frames per second over a fixed pan-and-zoom camera path (jumpTo each animation frame). */
function panZoomFps(page: Page, ms: number): Promise<number> {
  return page.evaluate(
    (duration) =>
      new Promise<number>((resolve) => {
        type M = {
          getCenter(): { lng: number; lat: number };
          getZoom(): number;
          jumpTo(o: { center: [number, number]; zoom: number }): void;
        };
        const m = (window as unknown as { __brackline: { map: M } }).__brackline.map;
        const c = m.getCenter();
        const z0 = m.getZoom();
        let frames = 0;
        let t0 = -1;
        const step = (t: number) => {
          if (t0 < 0) t0 = t;
          const k = (t - t0) / duration;
          if (k >= 1) {
            m.jumpTo({ center: [c.lng, c.lat], zoom: z0 });
            resolve(frames / ((t - t0) / 1000));
            return;
          }
          m.jumpTo({
            center: [c.lng + 0.04 * Math.sin(2 * Math.PI * k), c.lat + 0.03 * Math.sin(4 * Math.PI * k)],
            zoom: z0 + 1.2 * Math.sin(Math.PI * k),
          });
          frames++;
          requestAnimationFrame(step);
        };
        requestAnimationFrame(step);
      }),
    ms,
  );
}

export const dashboardUnderwayBench: BenchCase = {
  name: "dashboard-underway",
  async run(): Promise<BenchRow[]> {
    const dir = join(REPO, "node_modules", ".cache", "brackline-underway-bench");
    mkdirSync(dir, { recursive: true });
    const logPath = writeLog(dir);
    const bare = await serveBareMap();
    const s = await openBenchDashboard();
    try {
      await waitForMap(s.page);
      await waitForAnalysis(s.page);
      // Floor: the page reads the same File into memory.
      await s.page.evaluate(() => {
        const input = document.createElement("input");
        input.type = "file";
        input.id = "bench-file";
        input.hidden = true;
        document.body.append(input);
      });
      await s.page.setInputFiles("#bench-file", logPath);
      const fileReadMs = await s.page.evaluate(async () => {
        const f = (document.getElementById("bench-file") as HTMLInputElement).files![0]!;
        const t0 = performance.now();
        await f.arrayBuffer();
        return performance.now() - t0;
      });
      // Drop → first frame with the points: watch from before the file is set.
      const watch = s.page.evaluate(
        () =>
          new Promise<number>((resolve) => {
            const t0 = performance.now();
            const poll = () => {
              // The log read and deck.gl (loaded on demand) has drawn its layer with the points in
              // (data-dense-drawn, set after a deck.gl frame); the next frame shows it.
              if (
                document.querySelector('[data-underway-status="ready"]') &&
                document.querySelector('[data-dense-drawn~="underway"]')
              )
                requestAnimationFrame(() => resolve(performance.now() - t0));
              else requestAnimationFrame(poll);
            };
            poll();
          }),
      );
      watch.catch(() => undefined);
      await s.page.setInputFiles('[data-testid="underway-input"]', logPath);
      const dropMs = await watch;
      const drawn = await s.page.locator("[data-underway-points]").getAttribute("data-underway-points");
      await s.page.waitForTimeout(500);
      const fps = await panZoomFps(s.page, PAN_MS);

      const barePage = await s.context.newPage();
      await barePage.setViewportSize({ width: 1440, height: 900 });
      await barePage.goto(bare.url, { waitUntil: "load" });
      await barePage.waitForSelector('[data-ready="true"]', { timeout: 120_000 });
      const bareFps = await panZoomFps(barePage, PAN_MS);
      await barePage.close();
      const load = loadavg()
        .map((l) => l.toFixed(1))
        .join(" ");
      return [
        {
          name: "frames per second panning and zooming with a 1e6-record underway log loaded, software WebGL",
          value: fps,
          unit: "fps",
          baseline: { name: "bare MapLibre + deck.gl page, same path", value: bareFps },
          ratio: fps / Math.max(bareFps, 1e-3),
          ratioLabel: "of the bare map",
          goal: "≥ 10 fps",
          note: `${PAN_MS / 1000} s camera path (jumpTo every frame, ±1.2 zoom); ${drawn ?? "?"} aggregated points drawn; map area of a 1440×900 page vs full-page bare map; load average ${load}`,
        },
        {
          name: "drop a 1e6-record underway log to its first drawn frame",
          value: dropMs / 1000,
          unit: "s",
          baseline: { name: "reading the same File into memory in the page", value: fileReadMs / 1000 },
          ratio: dropMs / Math.max(fileReadMs, 1e-3),
          ratioLabel: "× the file read",
          note: `streamed, parsed, placed on the channel and aggregated in a worker; load average ${load}`,
        },
      ];
    } finally {
      await s.close();
      bare.close();
      rmSync(dir, { recursive: true, force: true });
    }
  },
};
