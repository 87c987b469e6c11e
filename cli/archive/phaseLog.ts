/**
 * A timeline of a CLI run for profiling (`BRACKLINE_PHASES=1`): each thread writes one stderr line
 * per mark, `phase <ms since the epoch> <thread id> cpu=<ms> gc=<ms> <label>`, so the main thread's
 * and the workers' marks can be put on one time axis (the bench's phase rows read them). `cpu=` is
 * the CPU time this thread has run so far (Linux `/proc/thread-self/schedstat`; left out elsewhere),
 * so a task's CPU can be told from its wall time on a loaded machine; `gc=` is the time this
 * thread's JavaScript has stood still for garbage collection so far (the pauses V8 reports to
 * `v8.GCProfiler`: scavenges, mark-compact finalisation; not the concurrent marking and sweeping
 * on V8's helper threads). Nothing is written, and nothing measured, without the variable.
 */
import { readFileSync } from "node:fs";
import { GCProfiler } from "node:v8";
import { threadId } from "node:worker_threads";

/** True when the run writes its timeline. */
export const PHASES_ON = process.env.BRACKLINE_PHASES === "1";

/** CPU time this thread has run [ms] (Linux), or undefined. */
function threadCpuMs(): number | undefined {
  try {
    return Number(readFileSync("/proc/thread-self/schedstat", "latin1").split(" ")[0]) / 1e6;
  } catch {
    return undefined;
  }
}

/** This thread's garbage-collection pauses since the first mark, read at every mark. */
const gc = PHASES_ON ? new GCProfiler() : undefined;
gc?.start();
let gcPauseMs = 0;

/** This thread's GC pause time so far [ms] (the profiler is restarted to read it). */
function gcPauseSoFarMs(): number {
  if (!gc) return 0;
  for (const s of gc.stop().statistics) gcPauseMs += s.cost / 1000; // µs
  gc.start();
  return gcPauseMs;
}

/** Writes one mark of the timeline (no-op unless {@link PHASES_ON}). */
export function phaseMark(label: string): void {
  if (!PHASES_ON) return;
  const cpu = threadCpuMs();
  const at = (performance.timeOrigin + performance.now()).toFixed(1);
  const cpuText = cpu === undefined ? "" : `cpu=${cpu.toFixed(1)} `;
  process.stderr.write(`phase ${at} ${threadId} ${cpuText}gc=${gcPauseSoFarMs().toFixed(1)} ${label}\n`);
}
