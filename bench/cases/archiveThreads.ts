// Per-thread CPU of a running CLI process (Linux /proc), for the archive bench: the main thread, the
// worker threads and V8/libuv's helper threads (garbage collection, optimising compiler), each split
// at the moment the CLI says the analysis starts. Elsewhere than Linux the numbers are NaN.
import { spawn } from "node:child_process";
import { readdirSync, readFileSync } from "node:fs";

/** CPU seconds of each thread of a running process (empty when /proc cannot be read). */
export function threadCpuS(pid: number): Map<number, number> {
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

/** CPU [s] of one phase of a run, by kind of thread. */
export interface PhaseCpu {
  main: number;
  /** The busiest `workers` non-main threads (the worker threads), busiest first. */
  workers: number[];
  /** All other threads: V8's platform threads (GC, compiler) and libuv's. */
  helpers: number;
  total: number;
}

/** A finished CLI run with its stdout, stderr and per-thread CPU before and after the analysis start. */
export interface ThreadedRun {
  wallS: number;
  /** When the parent saw the process end (epoch ms, for the CLI's phase marks). */
  exitAtMs: number;
  stdout: string;
  stderr: string;
  /** The whole process. */
  all: PhaseCpu;
  /** From the analysis start line to the end of the process. */
  analysis: PhaseCpu;
}

function phase(cpu: Map<number, number>, pid: number, workers: number): PhaseCpu {
  const main = cpu.get(pid) ?? Number.NaN;
  const others = [...cpu.entries()].filter(([t]) => t !== pid).map(([, c]) => c);
  others.sort((x, y) => y - x);
  const w = others.slice(0, workers);
  const total = [...cpu.values()].reduce((x, y) => x + y, 0);
  return { main, workers: w, helpers: total - main - w.reduce((x, y) => x + y, 0), total };
}

/**
 * Runs `node args…` and samples its threads' CPU every 20 ms (a thread's last sample is kept after it
 * ends); the split is taken when a stderr line matches `startLine`.
 *
 * @param workers how many non-main threads are worker threads (0 for a one-thread run)
 * @param env extra environment variables of the run
 */
export function runSampled(
  args: readonly string[],
  startLine: RegExp,
  workers: number,
  env: Record<string, string> = {},
): Promise<ThreadedRun> {
  return new Promise((resolve, reject) => {
    const t0 = performance.now();
    const seen = new Map<number, number>();
    let atStart: Map<number, number> | undefined;
    const child = spawn(process.execPath, args, { stdio: ["ignore", "pipe", "pipe"], env: { ...process.env, ...env } });
    const pid = child.pid ?? -1;
    const sample = (): void => {
      for (const [t, c] of threadCpuS(pid)) seen.set(t, c);
    };
    const poll = setInterval(sample, 20);
    let stdout = "";
    let stderr = "";
    child.stdout.setEncoding("utf8").on("data", (d: string) => (stdout += d));
    child.stderr.setEncoding("utf8").on("data", (d: string) => {
      stderr += d;
      if (!atStart && startLine.test(stderr)) {
        sample();
        atStart = new Map(seen);
      }
    });
    child.on("error", reject);
    child.on("close", (code) => {
      clearInterval(poll);
      const exitAtMs = Date.now();
      const wallS = (performance.now() - t0) / 1000;
      if (code !== 0) return reject(new Error(`exit code ${code}: ${stderr.slice(-500)}`));
      const after = new Map([...seen].map(([t, c]) => [t, c - (atStart?.get(t) ?? 0)]));
      resolve({
        wallS,
        exitAtMs,
        stdout,
        stderr,
        all: phase(seen, pid, workers),
        analysis: atStart ? phase(after, pid, workers) : phase(new Map(), pid, workers),
      });
    });
  });
}

/**
 * A lower bound of the wall time of a phase on an idle 2-core machine, from its threads' CPU: no less
 * than the busiest thread, and no less than all its CPU shared by 2 cores.
 */
export function idleBoundS(p: PhaseCpu): number {
  return Math.max(p.main, ...p.workers, p.total / 2);
}

/** The median of some numbers (NaN when there are none). */
export function median(xs: readonly number[]): number {
  const s = xs.filter((x) => !Number.isNaN(x)).sort((a, b) => a - b);
  if (s.length === 0) return Number.NaN;
  const m = s.length >> 1;
  return s.length % 2 ? s[m]! : (s[m - 1]! + s[m]!) / 2;
}
