// The phases of one archive CLI run, from the timeline the CLI writes with BRACKLINE_PHASES=1
// (cli/archive/phaseLog.ts: `phase <epoch ms> <thread id> cpu=<ms> gc=<ms> <label>` per mark, workers included):
// start-up, module load, reading, parsing (with the time the main thread waited for a worker's last
// file), the rest of reading the inputs, analysis (with each thread's idle end), summary and output.

/** Wall time of each phase of one run [s]; NaN when the run did not pass that phase. */
export interface RunPhases {
  /** Process start to the CLI's entry module evaluated (Node start-up, launcher). */
  startUp: number;
  /** The command's code loaded (the analysis bundle) on the main thread. */
  moduleLoad: number;
  /** Process start until the first worker had loaded its code (NaN without workers). */
  workerReady: number;
  /** Reading the files, parsing the survey files and the rest of readInputs (station table, centerline, reports). */
  readInputs: number;
  /** Of readInputs: time the main thread waited with nothing to parse while a worker parsed its last file. */
  readWait: number;
  /** The analysis phase (queue, threads, results). */
  analysis: number;
  /** Of the analysis: the summed idle time of the threads that finished before the last one [s]. */
  analysisTail: number;
  /** Archive summary, output text and writing it. */
  summaryOutput: number;
  /** Output written to process exit (worker shutdown, process teardown). */
  exit: number;
}

/** One mark of a run's timeline. */
export interface Mark {
  /** When [epoch ms]. */
  t: number;
  thread: number;
  /** The thread's CPU time so far [ms] (NaN when the CLI could not read it). */
  cpu: number;
  /** The thread's garbage-collection pauses so far [ms] (NaN when not written). */
  gc: number;
  label: string;
}

/** The marks of a run's stderr. */
export function marks(stderr: string): Mark[] {
  const out: Mark[] = [];
  for (const line of stderr.split("\n")) {
    const m = /^phase (\d+(?:\.\d+)?) (\d+) (?:cpu=(\d+(?:\.\d+)?) )?(?:gc=(\d+(?:\.\d+)?) )?(.*)$/.exec(line);
    if (m)
      out.push({
        t: Number(m[1]),
        thread: Number(m[2]),
        cpu: Number(m[3] ?? NaN),
        gc: Number(m[4] ?? NaN),
        label: m[5]!,
      });
  }
  return out;
}

/** Summed busy time [ms] of each thread's tasks between two times, and each thread's last task end. */
function tasks(ms: readonly Mark[], from: number, to: number): Map<number, { busy: number; lastEnd: number }> {
  const open = new Map<string, number>();
  const by = new Map<number, { busy: number; lastEnd: number }>();
  for (const m of ms) {
    if (m.t < from || m.t > to) continue;
    const s = /^task (\d+) (start|end)$/.exec(m.label);
    if (!s) continue;
    const key = `${m.thread}:${s[1]}`;
    if (s[2] === "start") open.set(key, m.t);
    else {
      const t0 = open.get(key);
      if (t0 === undefined) continue;
      const e = by.get(m.thread) ?? { busy: 0, lastEnd: 0 };
      e.busy += m.t - t0;
      e.lastEnd = Math.max(e.lastEnd, m.t);
      by.set(m.thread, e);
    }
  }
  return by;
}

/**
 * The phases of one run from its stderr.
 *
 * @param exitAtMs the process's exit time (epoch ms) as the parent saw it
 */
export function runPhases(stderr: string, exitAtMs: number): RunPhases {
  const ms = marks(stderr);
  const at = (label: string, thread = 0): number => ms.find((m) => m.thread === thread && m.label === label)?.t ?? NaN;
  const start = at("process start");
  const entry = at("CLI entry loaded");
  const loaded = at("command loaded");
  const parseStart = at("files read from disk; parsing");
  const parsed = at("files parsed");
  const ready = at("inputs ready");
  const a0 = at("analysis start");
  const a1 = at("analysis end");
  const written = at("output written");
  const workerLoaded = ms.filter((m) => m.thread !== 0 && m.label === "worker loaded").map((m) => m.t);
  let readWait = 0;
  if (Number.isFinite(parseStart) && Number.isFinite(parsed)) {
    const own = tasks(ms, parseStart, parsed).get(0);
    readWait = own ? parsed - own.lastEnd : 0;
  }
  const inAnalysis = [...tasks(ms, a0, a1).values()];
  const lastEnd = Math.max(...inAnalysis.map((x) => x.lastEnd));
  const tail = inAnalysis.reduce((s, x) => s + (lastEnd - x.lastEnd), 0);
  const s = (ms: number): number => ms / 1000;
  return {
    startUp: s(entry - start),
    moduleLoad: s(loaded - entry),
    workerReady: workerLoaded.length ? s(Math.min(...workerLoaded) - start) : NaN,
    readInputs: s(ready - loaded),
    readWait: s(readWait),
    analysis: s(a1 - a0),
    analysisTail: s(tail),
    summaryOutput: s(written - a1),
    exit: s(exitAtMs - written),
  };
}

/** Names of the phases, for the bench rows. */
export const PHASE_NAMES: Record<keyof RunPhases, string> = {
  startUp: "Node start-up and CLI entry",
  moduleLoad: "command and analysis code loaded (main thread)",
  workerReady: "first worker ready (from process start)",
  readInputs: "inputs read: files, parsing, station table, centerline, reports",
  readWait: "of which the main thread waited for a worker's last file",
  analysis: "analysis phase",
  analysisTail: "of which threads idle at the end",
  summaryOutput: "archive summary, JSON made and written",
  exit: "output written to process exit",
};
