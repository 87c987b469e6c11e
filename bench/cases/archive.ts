// Benchmark: the whole San Francisco Bay cruise archive 2016–2022 (../shared/data, read at run time)
// with its station table through the built CLI (`brackline compare`, four nutrients, 2,000 bootstrap
// draws, no cache), on 2 threads (this one and a worker) against the same command on one thread
// (--threads 0), each in a fresh process, in the same run: several pairs of runs in alternating order,
// medians. The load average is printed beside the numbers; on a shared machine the per-thread CPU of
// the analysis phase (from /proc, split when the CLI says the analysis starts) gives a lower bound of
// the idle-machine times that the load does not change much.
import { mkdirSync, writeFileSync } from "node:fs";
import { availableParallelism, loadavg } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import type { BenchCase, BenchRow } from "../benchCase.ts";
import { idleBoundS, median, runSampled, type ThreadedRun } from "./archiveThreads.ts";
import { PHASE_NAMES, runPhases, type RunPhases } from "./archivePhases.ts";
import { threadPhases, type ThreadPhase, type ThreadPhases } from "./archiveThreadPhases.ts";
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

const ANALYSIS_START = /archive: \d+ surveys, \d+ from the cache, \d+ to analyse/;
const ANALYSIS_DONE = /archive: (\d+) surveys analysed, \d+ from the cache, in ([\d.]+) s/;
/** Pairs of runs (one thread, two threads; the order alternates between pairs): BENCH_ARCHIVE_PAIRS, default 3. */
const PAIRS = Math.max(1, Number(process.env.BENCH_ARCHIVE_PAIRS ?? 3) || 3);

interface CliRun extends ThreadedRun {
  /** The analysis phase as the CLI reports it ("archive: … in X s") [s]. */
  analyseS: number;
  surveys: number;
  /** The run's phases from its timeline (BRACKLINE_PHASES=1). */
  phases: RunPhases;
  /** CPU and GC pauses of each JavaScript thread in the reading and analysis phases (timeline marks). */
  threads: ThreadPhases;
}

async function cli(threads: number): Promise<CliRun> {
  const r = await runSampled(archiveArgs(threads), ANALYSIS_START, Math.max(0, threads - 1), {
    BRACKLINE_PHASES: "1",
  });
  const m = ANALYSIS_DONE.exec(r.stderr);
  return {
    ...r,
    analyseS: Number(m?.[2] ?? NaN),
    surveys: Number(m?.[1] ?? 0),
    phases: runPhases(r.stderr, r.exitAtMs),
    threads: threadPhases(r.stderr),
  };
}

const f1 = (x: number): string => x.toFixed(1);
const f2 = (x: number): string => x.toFixed(2);
/** Median of one figure over runs. */
const med = (runs: readonly CliRun[], f: (r: CliRun) => number): number => median(runs.map(f));

/** "GC 0.06 of 1.85 s CPU" (medians over the runs) of one thread's phase. */
function gcText(runs: readonly CliRun[], f: (t: ThreadPhases) => ThreadPhase): string {
  return `GC ${f2(med(runs, (r) => f(r.threads).gcMs) / 1000)} of ${f2(med(runs, (r) => f(r.threads).cpuMs) / 1000)} s CPU`;
}

/** "main 1.8 s, worker 1.6 s, helpers 0.8 s" (medians over the runs) of one phase. */
function cpuText(runs: readonly CliRun[], ph: "all" | "analysis"): string {
  const parts = [`main ${f1(med(runs, (r) => r[ph].main))} s`];
  if (runs[0]![ph].workers.length > 0) parts.push(`worker ${f1(med(runs, (r) => r[ph].workers[0] ?? NaN))} s`);
  parts.push(`V8/libuv helpers ${f1(med(runs, (r) => r[ph].helpers))} s`);
  return parts.join(", ");
}

export const archiveBench: BenchCase = {
  name: "archive",
  async run(): Promise<BenchRow[]> {
    if (!SF_PRESENT) return [{ name: "archive", value: Number.NaN, unit: "s", note: "skipped: ../shared/data absent" }];
    mkdirSync(OUT, { recursive: true });
    writeFileSync(join(OUT, "north-bay.geojson"), northBayCenterline());
    const load0 = loadavg()[0]!;
    await cli(2); // warms the file cache, outside the timing
    const one: CliRun[] = [];
    const two: CliRun[] = [];
    for (let p = 0; p < PAIRS; p++) {
      // Alternating order, so a load that rises or falls during the bench favours neither side.
      for (const threads of p % 2 === 0 ? [0, 2] : [2, 0]) (threads === 0 ? one : two).push(await cli(threads));
    }
    const load1 = loadavg()[0]!;
    const same = [...one, ...two].every((r) => r.stdout === one[0]!.stdout);
    const load = `load average ${load0.toFixed(2)} → ${load1.toFixed(2)} (1 min) on ${availableParallelism()} cores; medians of ${PAIRS} pairs of runs (order alternating)`;
    const pairRatios = (f: (r: CliRun) => number): string => one.map((o, i) => f2(f(o) / f(two[i]!))).join(", ");
    const idleAll = (r: CliRun): number => idleBoundS(r.all);
    const idleAnalysis = (r: CliRun): number => idleBoundS(r.analysis);
    const wall2 = med(two, (r) => r.wallS);
    const wall1 = med(one, (r) => r.wallS);
    const an2 = med(two, (r) => r.analyseS);
    const an1 = med(one, (r) => r.analyseS);
    const phaseRows: BenchRow[] = (Object.keys(PHASE_NAMES) as Array<keyof RunPhases>).map((k) => ({
      name: `archive phase: ${PHASE_NAMES[k]} (2 threads; timeline marks, BRACKLINE_PHASES=1)`,
      value: med(two, (r) => r.phases[k]),
      unit: "s",
      baseline: { name: "one thread", value: med(one, (r) => r.phases[k]) },
      note: `per pair (two / one): ${two.map((t, i) => `${f2(t.phases[k])} / ${f2(one[i]!.phases[k])}`).join(", ")}`,
    }));
    return [
      {
        name: `archive: brackline compare, whole 2016–2022 SF Bay archive + station table (${two[0]!.surveys} surveys, four nutrients, 2,000 draws, no cache), --threads 2 (this thread and a worker), process wall time`,
        value: wall2,
        unit: "s",
        baseline: { name: "same command, --threads 0", value: wall1 },
        ratio: wall1 / wall2,
        ratioLabel: "× speed-up (whole process)",
        goal: "≤ 5 s",
        note: `${load}; per pair ${pairRatios((r) => r.wallS)}×; CPU ${f1(med(two, (r) => r.all.total))} s (one thread ${f1(med(one, (r) => r.all.total))} s): ${cpuText(two, "all")} (one thread: ${cpuText(one, "all")}); threaded runs tune V8's compiler (cli/archive/compilerTuning.ts), one-thread runs keep V8's defaults, which are faster there; no heap or young-generation limits are set in either; idle-machine lower bound from the threads' CPU ${f1(med(two, idleAll))} s (one thread ${f1(med(one, idleAll))} s); output byte-identical between all runs: ${same ? "yes" : "NO"}`,
      },
      {
        name: "archive: analysis phase of the same runs (as the CLI reports it: queue, threads, results)",
        value: an2,
        unit: "s",
        baseline: { name: "same work on this thread (--threads 0)", value: an1 },
        ratio: an1 / an2,
        ratioLabel: "× speed-up",
        goal: "≥ 1.7× on 2 cores",
        note: `${load}; per pair ${pairRatios((r) => r.analyseS)}×; CPU in the phase: ${cpuText(two, "analysis")} (one thread: ${cpuText(one, "analysis")}); idle-machine lower bounds from the threads' CPU in the phase ${f2(med(two, idleAnalysis))} s vs ${f2(med(one, idleAnalysis))} s, ratio ${f2(median(one.map((o, i) => idleAnalysis(o) / idleAnalysis(two[i]!))))}× (median per pair); the worker starts while the files are read and reads some of them`,
      },
      {
        name: "archive: garbage-collection pauses of the JavaScript threads in the analysis phase (v8.GCProfiler, summed over the threads; GC work on V8's helper threads is counted with the helpers above)",
        value: med(two, (r) => (r.threads.mainAnalysis.gcMs + r.threads.workerAnalysis.gcMs) / 1000),
        unit: "s",
        baseline: { name: "one thread", value: med(one, (r) => r.threads.mainAnalysis.gcMs / 1000) },
        note: `analysis: main ${gcText(two, (t) => t.mainAnalysis)}, worker ${gcText(two, (t) => t.workerAnalysis)} (one thread: ${gcText(one, (t) => t.mainAnalysis)}); reading the inputs: main ${gcText(two, (t) => t.mainRead)}, worker ${gcText(two, (t) => t.workerRead)} (one thread: ${gcText(one, (t) => t.mainRead)})`,
      },
      ...phaseRows,
    ];
  },
};
