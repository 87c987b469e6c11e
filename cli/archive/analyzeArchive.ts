/**
 * Analyses every survey of an archive on worker threads, with a per-survey cache, progress on
 * stderr and cancel (SIGINT): finished surveys stay cached, so a re-run continues where it stopped.
 */
import { createHash } from "node:crypto";
import { availableParallelism } from "node:os";
import type { CommandIo } from "../command.ts";
import type { Survey, SurveyAnalysis } from "../../analysis/index.ts";
import { surveyDischarge } from "../../analysis/index.ts";
import { SurveyCache, surveyCacheKey } from "./surveyCache.ts";
import { surveyWorkerUrl } from "./earlyStart.ts";
import { surveyTaskHandler, type SurveySetup } from "./surveyTask.ts";
import { CancelledError, runPool, startWorkers, type StartedWorkers } from "./workerPool.ts";
import { phaseMark } from "./phaseLog.ts";

/** Options of {@link analyzeArchive}. */
export interface ArchiveRunOptions {
  /**
   * Threads that analyse, this one included (default: available parallelism, at most the number of
   * surveys): n ≥ 2 is this thread and n − 1 worker threads taking surveys from one queue; 0 or 1 =
   * this thread only.
   */
  threads?: number;
  /** Cache directory; undefined = no cache. */
  cacheDir?: string;
  io: CommandIo;
  /** Cancels the run (default: a SIGINT handler installed for the run). */
  signal?: AbortSignal;
  /** Worker threads started before the inputs were read ({@link startSurveyWorkers}); ended by the run. */
  started?: StartedWorkers;
}

/** What {@link analyzeArchive} did, for messages and the bench. */
export interface ArchiveRunStats {
  analysed: number;
  cached: number;
  threads: number;
  seconds: number;
  /** Sum over surveys of the time spent analysing each (inside its thread) [s]. */
  taskSeconds: number;
}

export { surveyWorkerUrl };

/**
 * Starts the survey worker threads now (before reading the inputs, so loading their code overlaps
 * the reading); pass them to {@link analyzeArchive} as `started`.
 */
export function startSurveyWorkers(threads: number): StartedWorkers {
  return startWorkers(surveyWorkerUrl(), threads);
}

/**
 * Relative cost of analysing a survey, for largest-first scheduling: the bootstrap dominates, so
 * the count of (station, mixing constituent) values, plus the stations for the rest.
 */
export function surveyCost(survey: Survey): number {
  const tracers = survey.constituents.filter((c) => c.kind !== "nonMixing").map((c) => c.name);
  let values = 0;
  for (const st of survey.stations)
    for (const name of tracers) {
      const cell = st.values[name];
      if (cell && Number.isFinite(cell.value)) values++;
    }
  return values * 100 + survey.stations.length;
}

/** The cache key of every survey of a run (exported for tests). */
export function cacheKeys(surveys: readonly Survey[], setup: SurveySetup): string[] {
  const network = setup.inputs.channel?.network;
  const channel = network
    ? createHash("sha256")
        .update(JSON.stringify({ ...network, segmentIndexData: undefined }))
        .update(setup.inputs.channel!.mouth.statement)
        .digest("hex")
    : "none";
  // The table itself is not hashed for every survey: what it gives each one (its resolved discharge,
  // with origin, table date and days before) is, so a changed discharge changes the key.
  const { dischargeTable, ...settings } = setup.settings;
  return surveys.map((survey) =>
    surveyCacheKey({
      survey,
      channel,
      settings,
      offChannelM: setup.inputs.choices.offChannelM,
      discharge:
        surveyDischarge(survey, {
          settingM3s: settings.riverDischargeM3s,
          chosenM3s: setup.inputs.choices.dischargeM3s,
          table: dischargeTable,
        }) ?? null,
    }),
  );
}

/**
 * Analyses the set-up's surveys in parallel; results come back in survey order.
 *
 * @throws CancelledError when cancelled (finished surveys are cached)
 */
export async function analyzeArchive(
  input: SurveySetup & { surveys: readonly Survey[] },
  o: ArchiveRunOptions,
): Promise<{ analyses: SurveyAnalysis[]; stats: ArchiveRunStats }> {
  const t0 = performance.now();
  phaseMark("analysis start");
  const { surveys, ...setup } = input;
  const cache = new SurveyCache(o.cacheDir);
  // Keys (a hash of each survey, the channel, the settings and the analysis code) only with a cache.
  const keys: Array<string | undefined> = o.cacheDir ? cacheKeys(surveys, setup) : surveys.map(() => undefined);
  const out = new Array<SurveyAnalysis>(surveys.length);
  const todo: number[] = [];
  keys.forEach((k, i) => {
    const hit = k === undefined ? undefined : cache.get<SurveyAnalysis>(k);
    if (hit) out[i] = hit;
    else todo.push(i);
  });
  const n = surveys.length;
  // One survey left to analyse is faster here than on a thread that must first load the code.
  const asked = o.threads ?? (o.started ? o.started.workers.length + 1 : availableParallelism());
  const threads = todo.length < 2 || asked < 2 ? 0 : Math.min(asked, todo.length);
  o.io.err(
    `archive: ${n} surveys, ${n - todo.length} from the cache, ${todo.length} to analyse on ${threads <= 0 ? "this thread" : `${threads} threads (this one and ${threads - 1} worker thread${threads === 2 ? "" : "s"})`}`,
  );
  const controller = new AbortController();
  const onSigint = () => controller.abort();
  if (!o.signal) process.once("SIGINT", onSigint);
  const signal = o.signal ?? controller.signal;
  let done = 0;
  let taskSeconds = 0;
  try {
    await runPool({
      workerUrl: surveyWorkerUrl(),
      threads: Math.max(0, threads - 1),
      alsoHere: threads >= 2,
      ...(o.started ? { started: o.started } : {}),
      setup,
      tasks: todo.map((index) => ({ survey: surveys[index]! })),
      cost: (t) => surveyCost(t.survey),
      inline: surveyTaskHandler,
      signal,
      onResult: (ti, result, taskMs) => {
        taskSeconds += taskMs / 1000;
        const i = todo[ti]!;
        out[i] = result;
        if (keys[i] !== undefined) cache.set(keys[i], result);
        done++;
        o.io.err(`[${n - todo.length + done}/${n}] ${result.survey.name} analysed (${(taskMs / 1000).toFixed(2)} s)`);
      },
    });
  } catch (error) {
    if (error instanceof CancelledError) throw new CancelledError(done + (n - todo.length));
    throw error;
  } finally {
    if (!o.signal) process.off("SIGINT", onSigint);
  }
  phaseMark("analysis end");
  return {
    analyses: out,
    stats: {
      analysed: todo.length,
      cached: n - todo.length,
      threads,
      seconds: (performance.now() - t0) / 1000,
      taskSeconds,
    },
  };
}
