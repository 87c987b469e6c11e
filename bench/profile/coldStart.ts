// Profiles one cold start of the bare MapLibre + deck.gl page (bench/fixtures/bareMap.ts) and of the
// built dashboard in Debian's Chromium with the bench's flags: when each ready marker first appears,
// the map's events, resource timings, and a Chromium trace summed per thread (script compile,
// evaluation, tasks, GC, layout/paint). Not a bench row: a tool to see what the first view waits for.
// Usage: npx tsx bench/profile/coldStart.ts [--runs N]   (build dashboard/dist first)
import { chromium, type Browser } from "playwright-core";
import { CHROMIUM_FLAGS, CHROMIUM_PATH } from "../../tests/e2e/browser.ts";
import { serveBareMap } from "../fixtures/bareMap.ts";
import { DIST, ensureDist, serveDist } from "../fixtures/dashboardDist.ts";

const MARKERS: Record<string, string> = {
  mapReady: '[data-map-ready="true"]',
  activeAnalysis: '[data-active-analysis="ready"]',
  mixingSvg: '[data-panel="MixingPlot"] svg',
  profileSvg: '[data-panel="ChannelProfile"] svg',
  table: '[data-panel="BehaviourTable"] table',
  allAnalysed: '[data-analysis-status="ready"]',
  bareReady: '[data-ready="true"]',
};

/** Init script: records when each marker first appears and the map's first events. */
const INIT = `(() => {
  const t = (window.__profile = { marks: {}, mapEvents: {} });
  const markers = ${JSON.stringify(MARKERS)};
  t.workers = [];
  const W = window.Worker;
  window.Worker = function (url, opts) {
    const w = new W(url, opts);
    const rec = { url: String(url).split("/").pop().slice(0, 30), created: performance.now(), posts: [], received: [] };
    t.workers.push(rec);
    const post = w.postMessage.bind(w);
    w.postMessage = (...a) => { if (rec.posts.length < 8) rec.posts.push(Math.round(performance.now())); return post(...a); };
    w.addEventListener("message", (e) => { if (rec.received.length < 12) rec.received.push(Math.round(performance.now()) + (e.data && e.data.type ? ":" + e.data.type : "")); });
    return w;
  };
  window.Worker.prototype = W.prototype;
  const tick = () => {
    for (const [k, sel] of Object.entries(markers)) if (!(k in t.marks) && document.querySelector(sel)) t.marks[k] = performance.now();
    if (!t.speciationDone && document.querySelector('[data-panel]') && !document.querySelector('[data-testid="speciation-pending"]')) { t.speciationDone = performance.now(); }
    const map = window.__brackline && window.__brackline.map;
    if (map && !t.hooked) {
      t.hooked = true;
      t.mapEvents.mapObject = performance.now();
      for (const ev of ["styledata", "load", "idle", "render", "sourcedata"]) map.once(ev, () => (t.mapEvents[ev] = performance.now()));
      t.mapEvents.renders = 0;
      map.on("render", () => { t.mapEvents.renders++; t.mapEvents.lastRender = performance.now(); });
      map.on("moveend", () => { t.mapEvents.moveends = (t.mapEvents.moveends || 0) + 1; t.mapEvents.lastMoveend = performance.now(); });
      map.on("styledata", () => { t.mapEvents.styledatas = (t.mapEvents.styledatas || 0) + 1; t.mapEvents.lastStyledata = performance.now(); });
      t.mapEvents.log = [];
      for (const fn of ["setStyle", "addSource", "removeSource", "addLayer", "removeLayer", "resize", "fitBounds"]) {
        const orig = map[fn].bind(map);
        map[fn] = (...a) => { t.mapEvents.log.push(Math.round(performance.now()) + " " + fn + " " + (typeof a[0] === "string" ? a[0] : "")); return orig(...a); };
      }
      map.on("moveend", () => t.mapEvents.log.push(Math.round(performance.now()) + " moveend z" + map.getZoom().toFixed(2)));
      map.on("resize", () => t.mapEvents.log.push(Math.round(performance.now()) + " resize " + map.getCanvas().width + "x" + map.getCanvas().height));
      map.on("sourcedata", (e) => e.sourceDataType === "content" && t.mapEvents.log.push(Math.round(performance.now()) + " content " + e.sourceId));
      map.on("idle", () => { t.mapEvents.idles = (t.mapEvents.idles || 0) + 1; });
    }
    requestAnimationFrame(tick);
  };
  requestAnimationFrame(tick);
})();`;

interface Summary {
  marks: Record<string, number>;
  mapEvents: Record<string, number>;
  resources: Array<{ name: string; start: number; end: number; kB: number }>;
  threads: Record<string, Record<string, number>>;
  cpu: string[];
}

interface CpuNode {
  id: number;
  callFrame: { functionName: string; url: string; lineNumber: number };
  children?: number[];
}

/** Main-thread self time by script and by function (top 25), from a CDP CPU profile. */
function summarizeCpu(profile: { nodes: CpuNode[]; samples: number[]; timeDeltas: number[] }): string[] {
  const byId = new Map(profile.nodes.map((n) => [n.id, n]));
  const self = new Map<number, number>();
  profile.samples.forEach((id, i) => self.set(id, (self.get(id) ?? 0) + (profile.timeDeltas[i] ?? 0) / 1000));
  const byUrl = new Map<string, number>();
  const byFn = new Map<string, number>();
  for (const [id, ms] of self) {
    const n = byId.get(id)!;
    const url = n.callFrame.url.replace(/^https?:\/\/[^/]+\//, "") || `(${n.callFrame.functionName || "native"})`;
    byUrl.set(url, (byUrl.get(url) ?? 0) + ms);
    const fn = `${n.callFrame.functionName || "(anon)"} ${url.slice(0, 40)}:${n.callFrame.lineNumber}`;
    byFn.set(fn, (byFn.get(fn) ?? 0) + ms);
  }
  const top = (m: Map<string, number>, k: number) =>
    [...m]
      .sort((a, b) => b[1] - a[1])
      .slice(0, k)
      .map(([n, ms]) => `  ${ms.toFixed(0).padStart(6)} ms  ${n}`);
  return ["main thread self time by script:", ...top(byUrl, 12), "by function:", ...top(byFn, 30)];
}

const SUMMED = new Set([
  "v8.compile",
  "v8.compileModule",
  "V8.CompileCode",
  "v8.parseOnBackground",
  "v8.evaluateModule",
  "EvaluateScript",
  "FunctionCall",
  "TimerFire",
  "FireAnimationFrame",
  "MajorGC",
  "MinorGC",
  "V8.GC_MARK_COMPACTOR",
  "ParseHTML",
  "Layout",
  "UpdateLayoutTree",
  "Paint",
  "RunTask",
  "ThreadControllerImpl::RunTask",
  "ResourceReceivedData",
  "v8.run",
]);

function summarizeTrace(buf: Buffer): Record<string, Record<string, number>> {
  const events = (JSON.parse(buf.toString("utf8")) as { traceEvents: Array<Record<string, unknown>> }).traceEvents;
  const names = new Map<string, string>();
  for (const e of events)
    if (e.ph === "M" && e.name === "thread_name")
      names.set(`${e.pid}:${e.tid}`, String((e.args as { name: string }).name));
  const out: Record<string, Record<string, number>> = {};
  for (const e of events) {
    if (e.ph !== "X" || typeof e.dur !== "number" || !SUMMED.has(String(e.name))) continue;
    const th = `${names.get(`${e.pid}:${e.tid}`) ?? "?"} ${e.pid}:${e.tid}`;
    const row = (out[th] ??= {});
    row[String(e.name)] = (row[String(e.name)] ?? 0) + (e.dur as number) / 1000;
  }
  for (const [k, row] of Object.entries(out))
    if ((row.RunTask ?? 0) + (row["v8.run"] ?? 0) < 50 && Object.values(row).every((v) => v < 50)) delete out[k];
  return out;
}

async function profile(browser: Browser, url: string, done: string[]): Promise<Summary> {
  const context = await browser.newContext({ viewport: { width: 1440, height: 900 } });
  await context.addInitScript({ content: INIT });
  const page = await context.newPage();
  const cdp = await context.newCDPSession(page);
  await cdp.send("Profiler.enable");
  await cdp.send("Profiler.setSamplingInterval", { interval: 500 });
  await cdp.send("Profiler.start");
  await browser.startTracing(page, {
    categories: ["devtools.timeline", "v8", "v8.execute", "disabled-by-default-devtools.timeline", "blink", "toplevel"],
  });
  await page.goto(url, { waitUntil: "load" });
  await page.waitForFunction((sels) => sels.every((s) => document.querySelector(s)), done, {
    polling: "raf",
    timeout: 180_000,
  });
  await page.waitForTimeout(300);
  const trace = await browser.stopTracing();
  const { profile: cpuProfile } = (await cdp.send("Profiler.stop")) as unknown as {
    profile: { nodes: CpuNode[]; samples: number[]; timeDeltas: number[] };
  };
  const r = (await page.evaluate(() => {
    const p = (
      window as unknown as {
        __profile: { marks: Record<string, number>; mapEvents: Record<string, number>; speciationDone?: number };
      }
    ).__profile;
    const nav = performance.getEntriesByType("navigation")[0] as PerformanceNavigationTiming;
    return {
      marks: {
        ...p.marks,
        speciationDone: p.speciationDone ?? -1,
        domContentLoaded: nav.domContentLoadedEventEnd,
        load: nav.loadEventEnd,
      },
      mapEvents: {
        ...p.mapEvents,
        ...Object.fromEntries(performance.getEntriesByType("mark").map((m) => [m.name, m.startTime])),
      },
      workers: (p as unknown as { workers: unknown[] }).workers,
      resources: (performance.getEntriesByType("resource") as PerformanceResourceTiming[]).map((e) => ({
        name: e.name.replace(/^https?:\/\/[^/]+\//, ""),
        start: e.startTime,
        end: e.responseEnd,
        kB: e.encodedBodySize / 1000,
      })),
    };
  })) as Omit<Summary, "threads" | "cpu">;
  await context.close();
  return { ...r, threads: summarizeTrace(trace), cpu: summarizeCpu(cpuProfile) };
}

function print(label: string, s: Summary): void {
  const f = (x: number) => x.toFixed(0).padStart(6);
  console.log(`\n=== ${label}`);
  console.log(
    "marks (ms since navigation):",
    Object.entries(s.marks)
      .map(([k, v]) => `${k} ${v.toFixed(0)}`)
      .join(", "),
  );
  console.log(
    "map events:",
    Object.entries(s.mapEvents)
      .map(([k, v]) => `${k} ${typeof v === "number" ? v.toFixed(0) : JSON.stringify(v)}`)
      .join(", "),
  );
  console.log("workers:", JSON.stringify((s as unknown as { workers: unknown }).workers));
  console.log("resources:");
  for (const r of s.resources)
    console.log(`  ${f(r.start)} → ${f(r.end)}  ${r.kB.toFixed(0).padStart(6)} kB  ${r.name.slice(0, 70)}`);
  console.log("trace, ms per thread:");
  for (const [th, row] of Object.entries(s.threads))
    console.log(
      `  ${th}: ${Object.entries(row)
        .sort((a, b) => b[1] - a[1])
        .map(([k, v]) => `${k} ${v.toFixed(0)}`)
        .join(", ")}`,
    );
  for (const l of s.cpu) console.log(l);
}

function argValues(name: string): string[] {
  return process.argv.flatMap((a, i) => (a === name && process.argv[i + 1] ? [process.argv[i + 1]!] : []));
}

/** The first complete view as the bench defines it (FIRST_VIEW in bench/fixtures/readySpecs.ts), by marker. */
const FIRST_VIEW = [
  MARKERS.mapReady!,
  MARKERS.activeAnalysis!,
  MARKERS.mixingSvg!,
  MARKERS.profileSvg!,
  MARKERS.table!,
];

async function main(): Promise<void> {
  ensureDist();
  // --dist DIR (repeatable): other built dashboards to profile in turn with this one, e.g. main's.
  const dists = [DIST, ...argValues("--dist")];
  const brief = process.argv.includes("--brief");
  const bare = await serveBareMap();
  const servers = await Promise.all(dists.map(serveDist));
  const browser = await chromium.launch({ executablePath: CHROMIUM_PATH, headless: true, args: CHROMIUM_FLAGS });
  try {
    const runs = Number(argValues("--runs")[0] ?? 1) || 1;
    for (let i = 0; i < runs; i++) {
      const b = await profile(browser, bare.url, [MARKERS.bareReady!]);
      if (brief) console.log(`run ${i + 1} bare map ready ${b.marks.bareReady!.toFixed(0)} ms`);
      else print(`bare map, run ${i + 1}`, b);
      for (const [k, server] of servers.entries()) {
        const d = await profile(browser, server.url, FIRST_VIEW);
        const first = FIRST_VIEW.map((sel) => d.marks[Object.keys(MARKERS).find((m) => MARKERS[m] === sel)!]!).reduce(
          (a, x) => (x > a ? x : a),
          0,
        );
        if (brief)
          console.log(
            `run ${i + 1} ${dists[k]}: first view ${first.toFixed(0)} ms (analysis ${d.marks.activeAnalysis!.toFixed(0)}, map idle ${d.marks.mapReady!.toFixed(0)}, map load ${(d.mapEvents.load ?? NaN).toFixed(0)}) = ${(first / b.marks.bareReady!).toFixed(2)}× bare`,
          );
        else print(`dashboard ${dists[k]}, run ${i + 1}`, d);
      }
    }
  } finally {
    await browser.close();
    for (const s of servers) s.kill();
    bare.close();
  }
}

await main();
