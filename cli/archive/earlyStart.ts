/**
 * Starting the survey worker threads as early as possible: the CLI's entry calls
 * {@link prestartSurveyWorkers} before it loads the command's code, so each worker loads and
 * compiles its copy of the analysis while this thread loads its own and reads the files (on a
 * 2-core machine the two loads overlap instead of following each other). Light on purpose: no
 * analysis import, only the command line, file sizes and node:worker_threads.
 */
import { statSync } from "node:fs";
import { availableParallelism } from "node:os";
import { parseArgs } from "node:util";
import { UsageError } from "../exitCodes.ts";
import { OPTIONS } from "../optionTable.ts";
import { startWorkers, stopWorkers, type StartedWorkers } from "./workerPool.ts";

/** The worker script of the survey pool (the build's JavaScript, or a tsx entry from the TypeScript sources). */
export const surveyWorkerUrl = (): URL =>
  new URL(import.meta.url.endsWith(".ts") ? "./surveyWorkerTs.js" : "./surveyWorker.js", import.meta.url);

/** Threads from `--threads n`, this one included (default: available parallelism); 0 or 1 = this thread only. */
export function threadsOption(text: string | undefined): number {
  if (text === undefined) return availableParallelism();
  if (!/^\s*\d+\s*$/.test(text) || Number(text) > 256)
    throw new UsageError(`--threads: expected a whole number 0…256; got "${text}"`);
  return Number(text);
}

/** Survey files smaller than this in total are not worth starting workers before reading. */
const EARLY_START_BYTES = 256 * 1024;

/**
 * Starts the worker threads before the files are read when they will likely be used (explicit
 * `--threads n ≥ 2`, or default threads and two or more survey files of at least 256 KiB together).
 *
 * @returns the started workers (hand them to the pool, which ends them), or undefined
 */
export function startWorkersIfWorthIt(
  paths: readonly string[],
  values: { threads?: string | undefined },
): StartedWorkers | undefined {
  const threads = threadsOption(values.threads);
  if (threads < 2) return undefined;
  if (values.threads === undefined) {
    if (paths.length < 2) return undefined;
    let bytes = 0;
    for (const p of paths) bytes += statSync(p, { throwIfNoEntry: false })?.size ?? 0;
    if (bytes < EARLY_START_BYTES) return undefined;
  }
  return startWorkers(surveyWorkerUrl(), threads - 1);
}

/** Commands that analyse surveys through the pool. */
const POOL_COMMANDS = new Set(["analyze", "compare", "report"]);

let prestarted: { args: readonly string[]; started: StartedWorkers } | undefined;

/**
 * Starts the survey workers for a command line before the command's code is loaded, when that
 * command would start them anyway ({@link startWorkersIfWorthIt} on the same arguments). Nothing
 * happens for other commands, `--help` or a command line that does not parse (the command reports it).
 */
export function prestartSurveyWorkers(command: string, args: readonly string[]): void {
  if (!POOL_COMMANDS.has(command) || args.includes("--help") || args.includes("-h")) return;
  try {
    const { values, positionals } = parseArgs({
      args: [...args],
      options: OPTIONS,
      strict: false,
      allowPositionals: true,
    });
    const threads = typeof values.threads === "string" ? values.threads : undefined;
    const started = startWorkersIfWorthIt(positionals, { threads });
    if (started) prestarted = { args, started };
  } catch {
    // The command parses its arguments again and says what is wrong.
  }
}

/** The workers prestarted for this command line, handed over once (the caller ends them). */
export function takePrestarted(): StartedWorkers | undefined {
  const p = prestarted;
  prestarted = undefined;
  return p?.started;
}

/** Ends prestarted workers the command did not take (it failed, or decided on one thread). */
export async function stopPrestarted(): Promise<void> {
  await stopWorkers(takePrestarted());
}
