// Cold starts of the bare map page and the built dashboard, each page load in its own freshly
// launched Chromium (bench flags, fresh profile), alternating bare / dashboard, N pairs. Prints each
// pair and the medians. Not a bench row: a quick way to compare builds on a noisy shared machine.
// Usage: npx tsx bench/profile/coldPairs.ts [--runs N] [--warm-bare] [--dist DIR ...] [--bare-size WxH] [--threads]
// (build dashboard/dist first; --bare-size gives the bare page's map the dashboard map's size, as the bench does)
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir, loadavg } from "node:os";
import { join } from "node:path";
import { launchChromium } from "../../tests/e2e/browser.ts";
import { browserCpuS, threadCpuMs } from "./browserCpu.ts";
import { bareMapUrl, parseSize, serveBareMap } from "../fixtures/bareMap.ts";
import { DIST, ensureDist, serveDist } from "../fixtures/dashboardDist.ts";
import { BARE, FIRST_VIEW, type ReadySpec } from "../fixtures/readySpecs.ts";

async function coldLoad(url: string, spec: ReadySpec): Promise<Record<string, number>> {
  const profile = mkdtempSync(join(tmpdir(), "brackline-pairs-"));
  const context = await launchChromium(profile);
  try {
    const page = context.pages()[0] ?? (await context.newPage());
    await page.addInitScript({
      content: `globalThis.__name = globalThis.__name || ((f) => f);
      (() => { const m = (window.__marks = {}); const sels = ${JSON.stringify({ ...Object.fromEntries(FIRST_VIEW.all.map((s) => [s, s])), bare: BARE.all[0] })};
      const tick = () => { for (const [k, s] of Object.entries(sels)) if (!(k in m) && document.querySelector(s)) m[k] = performance.now(); requestAnimationFrame(tick); };
      requestAnimationFrame(tick); })();`,
    });
    const cpu0 = browserCpuS(profile);
    await page.goto(url, { waitUntil: "load" });
    const h = await page.waitForFunction(
      ({ all, none }) =>
        all.every((sel) => document.querySelector(sel)) && !none.some((sel) => document.querySelector(sel))
          ? performance.now()
          : false,
      { all: spec.all, none: spec.none ?? [] },
      { polling: "raf", timeout: 180_000 },
    );
    const t = (await h.jsonValue()) as number;
    const cpuMs = (browserCpuS(profile) - cpu0) * 1000;
    if (process.argv.includes("--threads")) {
      const rows = [...threadCpuMs(profile)].filter(([, ms]) => ms >= 30).sort((a, b) => b[1] - a[1]);
      console.log(`    threads (CPU ms since launch): ${rows.map(([k, ms]) => `${k} ${ms}`).join(", ")}`);
    }
    const marks = (await page.evaluate(() => (window as unknown as { __marks: Record<string, number> }).__marks)) ?? {};
    return { ready: t, cpuMs, ...marks };
  } finally {
    await context.close();
    rmSync(profile, { recursive: true, force: true });
  }
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;
const arg = (name: string) => process.argv[process.argv.indexOf(name) + 1];
ensureDist();
const runs = process.argv.includes("--runs") ? Number(arg("--runs")) : 3;
// --dist DIR (repeatable): the built dashboards to compare, each loaded after the bare page in every round
const dists = process.argv.flatMap((a, i) => (a === "--dist" ? [process.argv[i + 1]!] : []));
if (dists.length === 0) dists.push(DIST);
const bare = await serveBareMap();
// --bare-size WxH: the bare page's map at the dashboard map's size, as the bench draws it (e.g. 686x695)
const bareUrl = bareMapUrl(bare, parseSize(process.argv.includes("--bare-size") ? arg("--bare-size") : undefined));
const dashes = await Promise.all(dists.map(serveDist));
const b: number[] = [];
const d: number[][] = dists.map(() => []);
const bc: number[] = [];
const dc: number[][] = dists.map(() => []);
const short = (k: string) => k.replace(/^\[data-|"\]$|="true|="ready|\] svg$|\] table$/g, "").slice(0, 16);
try {
  for (let i = 0; i < runs; i++) {
    const rb = await coldLoad(bareUrl, BARE);
    b.push(rb.ready!);
    bc.push(rb.cpuMs!);
    const parts = [`round ${i + 1}: bare ${rb.ready!.toFixed(0)} ms (cpu ${rb.cpuMs!.toFixed(0)} ms)`];
    for (const [k, dash] of dashes.entries()) {
      const rd = await coldLoad(dash.url, FIRST_VIEW);
      d[k]!.push(rd.ready!);
      dc[k]!.push(rd.cpuMs!);
      parts.push(
        `  ${dists[k]}: ${rd.ready!.toFixed(0)} ms = ${(rd.ready! / rb.ready!).toFixed(2)}× (${Object.entries(rd)
          .filter(([key]) => key !== "ready" && !/svg|table|bare/.test(key))
          .map(([key, v]) => `${short(key)} ${v.toFixed(0)}`)
          .join(", ")})`,
      );
    }
    console.log(
      `${parts.join("\n")}\n  load ${loadavg()
        .map((l) => l.toFixed(1))
        .join(" ")}`,
    );
  }
  console.log(
    `median CPU (all browser processes, navigation to ready): bare ${median(bc).toFixed(0)} ms; ${dists.map((x, k) => `${x} ${median(dc[k]!).toFixed(0)} ms`).join("; ")}`,
  );
  console.log(
    `median: bare ${median(b).toFixed(0)} ms; ${dists.map((x, k) => `${x} ${median(d[k]!).toFixed(0)} ms ${(median(d[k]!) / median(b)).toFixed(2)}×`).join("; ")}`,
  );
} finally {
  for (const x of dashes) x.kill();
  bare.close();
}
