// Benchmark: the whole San Francisco Bay cruise archive 2016–2022 (../shared/data, read at run time)
// with its station table through the built CLI (`brackline compare`, four nutrients, 2,000 bootstrap
// draws, no cache), on 2 worker threads against the same command on one thread (--threads 0), each in
// a fresh process, in the same run. The load average is printed beside the numbers: on a shared
// machine, compare runs made at different loads with care.
import { execFile } from "node:child_process";
import { mkdirSync, readdirSync, readFileSync, writeFileSync } from "node:fs";
import { availableParallelism, loadavg } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import type { BenchCase, BenchRow } from "../benchCase.ts";
import {
  northBayCenterline,
  SF_DIR,
  SF_PRESENT,
  STATION_FILE,
  surveyFiles,
} from "../../tests/archive/helpers/sfBayArchive.ts";

const ROOT = fileURLToPath(new URL("../../", import.meta.url));
const OUT = join(ROOT, "node_modules", ".cache", "brackline-bench-archive");
const BIN = join(ROOT, "cli", "bin", "brackline.js");

interface CliRun {
  /** Whole process [s]. */
  wallS: number;
  /** The analysis phase as the CLI reports it ("archive: … in X s") [s]. */
  analyseS: number;
  /** CPU of the process and its threads [s]. */
  cpuS: number;
  surveys: number;
  output: string;
  /** CPU [s] of the main thread, of the busiest `threads − 1` other threads (the workers) and of all threads, sampled from /proc every 20 ms. */
  threadsCpu?: { main: number; workers: number[]; total: number };
}

/**
 * A lower bound of the wall time this run would take on an idle 2-core machine, from its threads'
 * CPU: no less than the busiest thread, and no less than all its CPU shared by 2 cores.
 */
function idleEstimateS(r: CliRun): number {
  const t = r.threadsCpu;
  if (!t) return Number.NaN;
  return Math.max(t.main, ...t.workers, t.total / 2);
}

/** CPU [s] of the V8/libuv helper threads (garbage collection, optimising compiler): all threads but the JavaScript ones. */
function helpersS(r: CliRun): number {
  const t = r.threadsCpu;
  if (!t) return Number.NaN;
  return t.total - t.main - t.workers.reduce((x, y) => x + y, 0);
}

function archiveArgs(threads: number): string[] {
  const line = join(OUT, "north-bay.geojson");
  return [
    BIN,
    "compare",
    ...surveyFiles().map((f) => join(SF_DIR, f)),
    "--stations",
    join(SF_DIR, STATION_FILE),
    "--centerline",
    line,
    "--mouth",
    "start",
    ...["Nitrite", "Nitrate_+_Nitrite", "Phosphate", "Silicate"].flatMap((c) => ["--unit", `${c}=µmol/L`]),
    "--draws",
    "2000",
    "--no-cache",
    "--threads",
    String(threads),
  ];
}

/** CPU seconds of each thread of a running process (Linux /proc; empty elsewhere). */
function threadCpuS(pid: number): Map<number, number> {
  const out = new Map<number, number>();
  try {
    for (const tid of readdirSync(`/proc/${pid}/task`)) {
      const stat = readFileSync(`/proc/${pid}/task/${tid}/stat`, "utf8");
      const f = stat.slice(stat.lastIndexOf(")") + 2).split(" ");
      out.set(Number(tid), (Number(f[11]) + Number(f[12])) / 100); // utime + stime, clock ticks (100 Hz)
    }
  } catch {
    // The process ended between two looks.
  }
  return out;
}

function cli(threads: number): Promise<CliRun> {
  return new Promise((resolve, reject) => {
    const t0 = performance.now();
    const perThread = new Map<number, number>();
    const child = execFile(process.execPath, archiveArgs(threads), { maxBuffer: 1 << 28 }, (e, out, err) => {
      clearInterval(poll);
      const wallS = (performance.now() - t0) / 1000;
      if (e) return reject(new Error(`threads ${threads}: ${e.message} ${err.slice(-500)}`));
      const m = /archive: (\d+) surveys analysed, \d+ from the cache, in ([\d.]+) s/.exec(err);
      const pid = child.pid ?? -1;
      const main = perThread.get(pid) ?? Number.NaN;
      const others = [...perThread.entries()]
        .filter(([t]) => t !== pid)
        .map(([, c]) => c)
        .sort((x, y) => y - x);
      const workers = others.slice(0, Math.max(0, threads - 1));
      const total = [...perThread.values()].reduce((x, y) => x + y, 0);
      resolve({
        wallS,
        analyseS: Number(m?.[2] ?? NaN),
        cpuS: NaN,
        surveys: Number(m?.[1] ?? 0),
        output: out,
        threadsCpu: { main, workers, total },
      });
    });
    const poll = setInterval(() => {
      if (child.pid !== undefined) for (const [t, c] of threadCpuS(child.pid)) perThread.set(t, c);
    }, 20);
  });
}

/** CPU seconds used by finished children of this process so far. */
function childrenCpuS(): number {
  // process.resourceUsage() covers this process only; the children's CPU is read from /proc when there.
  try {
    const stat = readFileSync("/proc/self/stat", "utf8");
    const f = stat.slice(stat.lastIndexOf(")") + 2).split(" ");
    return (Number(f[13]) + Number(f[14])) / 100; // cutime + cstime, in clock ticks (100 Hz)
  } catch {
    return Number.NaN;
  }
}

async function measured(threads: number): Promise<CliRun> {
  const c0 = childrenCpuS();
  const r = await cli(threads);
  return { ...r, cpuS: childrenCpuS() - c0 };
}

export const archiveBench: BenchCase = {
  name: "archive",
  async run(): Promise<BenchRow[]> {
    if (!SF_PRESENT) return [{ name: "archive", value: Number.NaN, unit: "s", note: "skipped: ../shared/data absent" }];
    mkdirSync(OUT, { recursive: true });
    writeFileSync(join(OUT, "north-bay.geojson"), northBayCenterline());
    const load0 = loadavg()[0]!;
    await cli(2); // builds cli/dist/ when stale and warms the file cache, outside the timing
    const one = await measured(0);
    const two = await measured(2);
    const load1 = loadavg()[0]!;
    const load = `load average ${load0.toFixed(2)} → ${load1.toFixed(2)} (1 min) on ${availableParallelism()} cores`;
    return [
      {
        name: `archive: brackline compare, whole 2016–2022 SF Bay archive + station table (${two.surveys} surveys, four nutrients, 2,000 draws, no cache), --threads 2 (this thread and a worker), process wall time`,
        value: two.wallS,
        unit: "s",
        baseline: { name: "same command, --threads 0", value: one.wallS },
        ratio: one.wallS / two.wallS,
        ratioLabel: "× speed-up (whole process)",
        goal: "≤ 5 s",
        note: `${load}; CPU ${two.cpuS.toFixed(1)} s (one thread ${one.cpuS.toFixed(1)} s); per thread: main ${two.threadsCpu?.main.toFixed(1)} s, worker ${two.threadsCpu?.workers.map((w) => w.toFixed(1)).join(" + ")} s, V8/libuv helpers ${helpersS(two).toFixed(1)} s (one thread: main ${one.threadsCpu?.main.toFixed(1)} s, helpers ${helpersS(one).toFixed(1)} s; threaded runs tune V8's compiler, cli/archive/compilerTuning.ts, one-thread runs keep V8's defaults, which are faster there); idle-machine lower bound from the threads' CPU ${idleEstimateS(two).toFixed(1)} s (one thread ${idleEstimateS(one).toFixed(1)} s)`,
      },
      {
        name: "archive: analysis phase of the same runs (as the CLI reports it: queue, threads, results)",
        value: two.analyseS,
        unit: "s",
        baseline: { name: "same work on this thread (--threads 0)", value: one.analyseS },
        ratio: one.analyseS / two.analyseS,
        ratioLabel: "× speed-up",
        goal: "≥ 1.7× on 2 cores",
        note: `${load}; the worker starts while the files are read and reads some of them; ratio of the idle-machine lower bounds ${(idleEstimateS(one) / idleEstimateS(two)).toFixed(2)}×`,
      },
    ];
  },
};
