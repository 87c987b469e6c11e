// One cold start of the built dashboard in a fresh Chromium: a timeline of long main-thread tasks
// (PerformanceObserver "longtask"), the map's renders/idle/source events and the first-view markers.
// Usage: npx tsx bench/profile/timeline.ts [--dist DIR | --bare [--size WxH]] [--trace [--v8] [--trace-out FILE]] [--cpu-out FILE]
// With --trace also each thread's busy time per 250 ms and the WebGL flushes per context (traceThreads.ts);
// --v8 adds V8's compile and GC events (the background JIT). --size gives the bare page's map the
// dashboard's map size, as the bench does (e.g. 686x695).
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { chromium } from "playwright-core";
import { CHROMIUM_FLAGS, CHROMIUM_PATH } from "../../tests/e2e/browser.ts";
import { DIST, ensureDist, serveDist } from "../fixtures/dashboardDist.ts";
import { bareMapUrl, parseSize, serveBareMap } from "../fixtures/bareMap.ts";
import { threadViews, traceEvents } from "./traceThreads.ts";

const INIT = `(() => {
  const log = (window.__tl = []);
  performance.mark("trace-anchor"); log.push(Math.round(performance.now()) + " anchor");
  const at = (s) => log.push(Math.round(performance.now()) + " " + s);
  new PerformanceObserver((l) => { for (const e of l.getEntries()) at("longtask " + Math.round(e.duration) + " ms (from " + Math.round(e.startTime) + ")"); }).observe({ type: "longtask", buffered: true });
  const sels = { analysis: '[data-active-analysis="ready"]', mapReady: '[data-map-ready="true"]', mixing: '[data-panel="MixingPlot"] svg', specPending: '[data-testid="speciation-pending"]', shell: '.shell', canvas: 'canvas' };
  const seen = {};
  let hooked = false;
  const tick = () => {
    for (const [k, s] of Object.entries(sels)) { const has = !!document.querySelector(s); if (has !== !!seen[k]) { seen[k] = has; at((has ? "+" : "-") + k); } }
    const map = window.__brackline && window.__brackline.map;
    if (map && !hooked) { hooked = true; at("map object");
      for (const ev of ["load", "idle", "resize", "moveend", "styledata"]) map.on(ev, () => at("map " + ev));
      let r = 0; map.on("render", () => { r++; if (r < 60) at("map render " + r + (map.areTilesLoaded() ? "" : " tiles-loading")); });
      map.on("sourcedata", (e) => e.sourceDataType === "content" && at("content " + e.sourceId));
      map.on("data", (e) => e.dataType === "source" && e.isSourceLoaded && at("sourceloaded " + e.sourceId));
    }
    if (performance.now() < 15000) requestAnimationFrame(tick);
  };
  requestAnimationFrame(tick);
  const W = window.Worker;
  window.Worker = function (url, opts) { at("worker " + String(url).split("/").pop().slice(0, 24)); const w = new W(url, opts); return w; };
  window.Worker.prototype = W.prototype;
})();`;

/** Renderer main-thread tasks over 50 ms with their largest inner events (JS entry points by function and URL). */
function longTasks(buf: Buffer): void {
  const events = traceEvents(buf.toString("utf8"));
  const names = new Map<string, string>();
  for (const e of events)
    if (e.ph === "M" && e.name === "thread_name") names.set(`${e.pid}:${e.tid}`, String(e.args?.name));
  const nav = events.find((e) => e.name === "navigationStart" || e.name === "NavigationBodyLoader::StartLoadingBody");
  const t0 = nav?.ts ?? 0;
  const main = events.filter(
    (e) => e.ph === "X" && names.get(`${e.pid}:${e.tid}`) === "CrRendererMain" && e.dur !== undefined,
  );
  const tasks = main.filter((e) => e.name === "RunTask" && e.dur! > 50_000);
  for (const t of tasks) {
    const inner = main.filter(
      (e) =>
        e !== t &&
        e.ts >= t.ts &&
        e.ts + e.dur! <= t.ts + t.dur! &&
        e.dur! > 8_000 &&
        e.name !== "RunTask" &&
        e.name !== "ThreadControllerImpl::RunTask",
    );
    console.log(`task ${((t.ts - t0) / 1000).toFixed(0)} +${(t.dur! / 1000).toFixed(0)} ms`);
    for (const e of inner.slice(0, 25)) {
      const d = e.args?.data ?? {};
      const what = [
        d.functionName,
        String(d.url ?? "")
          .split("/")
          .pop(),
        d.lineNumber,
        d.type,
        d.id,
      ]
        .filter((x) => x !== undefined && x !== "")
        .join(" ");
      console.log(`    ${((e.ts - t0) / 1000).toFixed(0)} +${(e.dur! / 1000).toFixed(0)} ${e.name} ${what}`);
    }
  }
}

const dist = process.argv.includes("--dist") ? process.argv[process.argv.indexOf("--dist") + 1]! : DIST;
ensureDist();
const bareMap = process.argv.includes("--bare") ? await serveBareMap() : undefined;
const server = await serveDist(dist);
const url = server.url;
const profile = mkdtempSync(join(tmpdir(), "brackline-tl-"));
const browser = await chromium.launch({ executablePath: CHROMIUM_PATH, headless: true, args: CHROMIUM_FLAGS });
const context = await browser.newContext({ viewport: { width: 1440, height: 900 } });
const tracing = process.argv.includes("--trace");
try {
  const page = await context.newPage();
  if (tracing)
    await browser.startTracing(page, {
      categories: [
        "devtools.timeline",
        "v8.execute",
        "disabled-by-default-devtools.timeline",
        "blink",
        "toplevel",
        "gpu",
        "blink.user_timing",
        ...(process.argv.includes("--v8") ? ["v8", "disabled-by-default-v8.compile", "disabled-by-default-v8.gc"] : []),
      ],
    });
  page.on("console", (m) => console.log("console:", m.text()));
  page.on("worker", (w) => w.on("console", (m) => console.log("worker console:", m.text())));
  await page.addInitScript({ content: INIT });
  const cpuOut = process.argv.includes("--cpu-out") ? process.argv[process.argv.indexOf("--cpu-out") + 1]! : undefined;
  const cdp = cpuOut ? await context.newCDPSession(page) : undefined;
  if (cdp) {
    await cdp.send("Profiler.enable");
    await cdp.send("Profiler.setSamplingInterval", { interval: 1000 });
    await cdp.send("Profiler.start");
  }
  const size = parseSize(
    process.argv.includes("--size") ? process.argv[process.argv.indexOf("--size") + 1] : undefined,
  );
  const bareUrl = bareMap && bareMapUrl(bareMap, size);
  await page.goto(bareUrl ?? url, { waitUntil: "load" });
  if (bareMap) await page.waitForSelector('[data-ready="true"]', { timeout: 60_000 });
  else {
    await page.waitForSelector('[data-analysis-status="ready"]', { timeout: 60_000 });
    await page.waitForSelector('[data-map-ready="true"]', { timeout: 60_000 });
  }
  await page.waitForTimeout(500);
  if (cdp && cpuOut) {
    const { profile: cpu } = await cdp.send("Profiler.stop");
    const anchor = await page.evaluate(() => performance.getEntriesByName("trace-anchor")[0]!.startTime);
    (await import("node:fs")).writeFileSync(cpuOut, JSON.stringify({ anchorMs: anchor, ...cpu }));
  }
  if (tracing) {
    const trace = await browser.stopTracing();
    const out = process.argv.includes("--trace-out")
      ? process.argv[process.argv.indexOf("--trace-out") + 1]!
      : undefined;
    if (out) (await import("node:fs")).writeFileSync(out, trace);
    longTasks(trace);
    console.log(threadViews(trace.toString("utf8")).join("\n"));
  }
  const tl = await page.evaluate(() => (window as unknown as { __tl: string[] }).__tl);
  const marks = await page.evaluate(() =>
    performance.getEntriesByType("mark").map((m) => `${Math.round(m.startTime)} mark ${m.name}`),
  );
  for (const l of [...tl, ...marks].sort((a, b) => parseInt(a) - parseInt(b))) console.log(l);
} finally {
  await context.close();
  await browser.close();
  rmSync(profile, { recursive: true, force: true });
  server.kill();
  bareMap?.close();
}
