// Benchmark: the dashboard's archive view with 150 invented surveys (four constituents each) in
// headless Chromium: brushing a date range until every part of the view has changed (small
// multiples, strip, discharge scatter, the chosen surveys' zone map, overlaid mixing plot and
// table: the frame after the release), against the same drag on an SVG of the same size with the
// same pointer wiring and an empty brush handler, in the same run and browser.
import type { BenchCase, BenchRow } from "../benchCase.ts";
import { CHROMIUM_PATH, chromiumAvailable } from "../../tests/e2e/browser.ts";
import { inFreshBrowser } from "../fixtures/freshBrowser.ts";
import { serveArchiveViewPage } from "../fixtures/archiveViewPage.ts";

const SURVEYS = 150;
/** Brushes alternating between two periods so every brush changes the chosen set. */
const RANGES: Array<[number, number]> = [
  [0.15, 0.55],
  [0.45, 0.9],
];

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)]!;
}

/** ms from the release: scripts and DOM changes, style and layout, paint to the next frame, and their sum. */
interface Timing {
  total: number;
  script: number;
  layout: number;
  paint: number;
}

interface BenchWindow {
  __archiveBench: {
    brush(target: string, f0: number, f1: number): Promise<Timing>;
    chosen(): number;
    marks(): number;
  };
}

export const archiveViewBench: BenchCase = {
  name: "archiveView",
  async run(): Promise<BenchRow[]> {
    if (!chromiumAvailable) throw new Error(`Chromium not found at ${CHROMIUM_PATH}`);
    const served = await serveArchiveViewPage(SURVEYS);
    try {
      return await inFreshBrowser(served.url, async (page) => {
        await page.waitForSelector('body[data-ready="true"]', { timeout: 60_000 });
        const brush = (target: string, [f0, f1]: [number, number]) =>
          page.evaluate(
            ([t, a, b]) =>
              (window as unknown as BenchWindow).__archiveBench.brush(t as string, a as number, b as number),
            [target, f0, f1] as const,
          );
        // warm-up (first layout, JIT)
        for (const r of RANGES) {
          await brush("view", r);
          await brush("baseline", r);
        }
        const view: number[] = [];
        const parts: Timing[] = [];
        const base: number[] = [];
        const chosen: number[] = [];
        for (let k = 0; k < 16; k++) {
          const r = RANGES[k % 2]!;
          const t = await brush("view", r);
          view.push(t.total);
          parts.push(t);
          chosen.push(await page.evaluate(() => (window as unknown as BenchWindow).__archiveBench.chosen()));
          base.push((await brush("baseline", r)).total);
        }
        const marks = await page.evaluate(() => (window as unknown as BenchWindow).__archiveBench.marks());
        const v = median(view);
        const b = median(base);
        const load = (await import("node:os"))
          .loadavg()
          .map((l) => l.toFixed(1))
          .join(" ");
        return [
          {
            name: `archiveView: brush a date range → every part of the archive view updated, ${SURVEYS} surveys × 4 constituents (release to next frame)`,
            value: v,
            unit: "ms",
            baseline: { name: "same drag on an SVG with an empty brush handler", value: b },
            ratio: v / Math.max(b, 1e-3),
            ratioLabel: "× the empty handler",
            goal: "≤ 100 ms with 150 surveys",
            note: `median of ${view.length} brushes (${view.map((t) => t.toFixed(0)).join(", ")} ms); ${Math.min(...chosen)}–${Math.max(...chosen)} surveys chosen per brush; medians: scripts + DOM ${median(parts.map((p) => p.script)).toFixed(0)} ms, style + layout ${median(parts.map((p) => p.layout)).toFixed(0)} ms, to next frame ${median(parts.map((p) => p.paint)).toFixed(0)} ms; ${marks} survey marks in the view; load average ${load}`,
          },
        ];
      });
    } finally {
      served.close();
    }
  },
};
