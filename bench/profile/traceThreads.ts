// Two views of a Chromium trace of a cold start (bench/profile/timeline.ts --trace): how busy each
// thread that matters was in each 250 ms from navigation (renderer main, GPU main, dedicated workers:
// the analysis worker and MapLibre's), and the GPU process's WebGL command-buffer flushes per context
// (the first context is MapLibre's; a second is deck.gl's, on the bare page and in the dashboard only with a dense layer). In software WebGL a long flush is a frame
// drawn, or shaders built, on the CPU, and the renderer's next frame commit waits for it (the main
// thread then shows as busy): e.g. deck.gl's first draw (~1 s) held the analysis result ~1 s in the queue.
// Usage: npx tsx bench/profile/traceThreads.ts TRACE.json   (or called by timeline.ts --trace)
import { readFileSync } from "node:fs";

/** One event of a Chromium trace file (the fields the profiles read). */
export interface TraceEvent {
  name: string;
  ph: string;
  ts: number;
  dur?: number;
  pid: number;
  tid: number;
  args?: { name?: string; handler?: string; data?: Record<string, unknown> };
}

/** The events of a Chromium trace file's JSON text. */
export function traceEvents(traceJson: string): TraceEvent[] {
  return (JSON.parse(traceJson) as { traceEvents: TraceEvent[] }).traceEvents;
}

const BIN_MS = 250;
const BINS = 32;
const THREADS = /^(CrRendererMain|CrGpuMain|DedicatedWorker thread)$/;

/** Lines: busy tenths of each 250 ms bin per thread, then WebGL flushes over 30 ms per context. */
export function threadViews(traceJson: string): string[] {
  const events = traceEvents(traceJson);
  const names = new Map<string, string>();
  for (const e of events)
    if (e.ph === "M" && e.name === "thread_name") names.set(`${e.pid}:${e.tid}`, String(e.args?.name));
  const nav = events.find((e) => e.name === "navigationStart" || e.name === "NavigationBodyLoader::StartLoadingBody");
  const t0 = nav?.ts ?? 0;
  const rows = new Map<string, number[]>();
  const flushes = new Map<string, { first: number; totalMs: number; long: string[] }>();
  for (const e of events) {
    if (e.ph !== "X" || e.dur === undefined) continue;
    const at = (e.ts - t0) / 1000;
    if (e.name === "ThreadControllerImpl::RunTask") {
      const thread = names.get(`${e.pid}:${e.tid}`) ?? "?";
      if (!THREADS.test(thread)) continue;
      const key = `${thread} ${e.tid}`;
      const row = rows.get(key) ?? new Array<number>(BINS).fill(0);
      let s = at;
      const end = at + e.dur / 1000;
      while (s < end) {
        const b = Math.floor(s / BIN_MS);
        const be = Math.min(end, (b + 1) * BIN_MS);
        if (b >= 0 && b < BINS) row[b]! += be - s;
        s = be;
      }
      rows.set(key, row);
    } else if (e.name === "CommandBufferService:PutChanged" && e.args?.handler) {
      const f = flushes.get(e.args.handler) ?? { first: at, totalMs: 0, long: [] };
      f.totalMs += e.dur / 1000;
      if (e.dur > 30_000) f.long.push(`${at.toFixed(0)}+${(e.dur / 1000).toFixed(0)}`);
      flushes.set(e.args.handler, f);
    }
  }
  const out = [
    `busy tenths of each ${BIN_MS} ms from navigation`,
    "".padEnd(28) + Array.from({ length: BINS }, (_, i) => ((i * BIN_MS) / 1000).toFixed(2).padStart(5)).join(""),
  ];
  for (const [k, r] of rows)
    out.push(k.slice(0, 28).padEnd(28) + r.map((x) => String(Math.round(x / (BIN_MS / 10))).padStart(5)).join(""));
  out.push("WebGL flushes (ms from navigation + ms), per context in order of first use:");
  for (const [h, f] of [...flushes].sort((a, b) => a[1].first - b[1].first))
    out.push(`  ${h}: first ${f.first.toFixed(0)}, total ${f.totalMs.toFixed(0)} ms; over 30 ms: ${f.long.join(" ")}`);
  return out;
}

if (process.argv[1]?.endsWith("traceThreads.ts") && process.argv[2])
  console.log(threadViews(readFileSync(process.argv[2], "utf8")).join("\n"));
