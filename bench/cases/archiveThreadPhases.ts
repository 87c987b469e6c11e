// CPU and garbage-collection pauses of each JavaScript thread of an archive CLI run in its two long
// phases, reading the inputs and the analysis, from the `cpu=` and `gc=` fields of the timeline
// marks (cli/archive/phaseLog.ts). Unlike wall times these hardly change with the machine's load,
// and they say how much of a thread's time was garbage collection.
import { marks, type Mark } from "./archivePhases.ts";

/** One thread's CPU and GC pauses in a phase [ms]. */
export interface ThreadPhase {
  cpuMs: number;
  gcMs: number;
}

/** The main thread's and the first worker's reading and analysis phases (NaN where absent). */
export interface ThreadPhases {
  mainRead: ThreadPhase;
  mainAnalysis: ThreadPhase;
  workerRead: ThreadPhase;
  workerAnalysis: ThreadPhase;
}

const NONE: ThreadPhase = { cpuMs: Number.NaN, gcMs: Number.NaN };

function between(from: Mark | undefined, to: Mark | undefined): ThreadPhase {
  return from && to ? { cpuMs: to.cpu - from.cpu, gcMs: to.gc - from.gc } : NONE;
}

/**
 * The phases of one run's threads from its stderr: the main thread from "command loaded" to
 * "inputs ready" (reading) and from "analysis start" to "analysis end"; the first worker from
 * "worker loaded" to "survey set-up done" (it reads files until the analysis set-up arrives) and
 * from there to its last task's end.
 */
export function threadPhases(stderr: string): ThreadPhases {
  const ms = marks(stderr);
  const find = (thread: number, label: string): Mark | undefined =>
    ms.find((m) => m.thread === thread && m.label === label);
  const worker = ms.find((m) => m.thread !== 0 && m.label === "worker loaded")?.thread;
  const setUp = worker === undefined ? undefined : find(worker, "survey set-up done");
  const lastTask =
    worker === undefined || !setUp
      ? undefined
      : ms.filter((m) => m.thread === worker && m.t >= setUp.t && / end$/.test(m.label)).at(-1);
  return {
    mainRead: between(find(0, "command loaded"), find(0, "inputs ready")),
    mainAnalysis: between(find(0, "analysis start"), find(0, "analysis end")),
    workerRead: worker === undefined ? NONE : between(find(worker, "worker loaded"), setUp),
    workerAnalysis: between(setUp, lastTask),
  };
}
