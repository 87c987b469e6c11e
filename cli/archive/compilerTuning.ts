/**
 * V8 compiler settings for runs with worker threads. Each thread is its own V8 isolate, so the
 * optimising compiler compiles the hot analysis code once per thread, on V8's helper threads,
 * which on a 2-core machine take CPU from the two JavaScript threads (measured on the whole
 * 2016–2022 bay archive, `npm run bench -- archive`: ~2.5 s of 7.6 s CPU on helper threads with
 * two threads, against ~1.6 s with one). Most of it is the same large functions optimised again
 * after early deoptimisations on thin type feedback. Waiting for more feedback before optimising
 * (a larger interrupt budget) and inlining less per function cut that compile work by about
 * half (helpers ~1.3 s) at no cost to the JavaScript threads; results are bit-identical (the
 * compiler never changes what floating-point code computes). One-thread runs keep V8's defaults:
 * there the helpers run on the otherwise idle core.
 */
import { setFlagsFromString } from "node:v8";

/** The flags, each a V8 option (see `node --v8-options`). */
export const THREADED_V8_FLAGS = ["--interrupt-budget=400000", "--max-inlined-bytecode-size-cumulative=300"];

let applied = false;

/**
 * Applies {@link THREADED_V8_FLAGS} to this process (this thread and every worker started after),
 * once. V8 reads them when it next counts calls or compiles, so this is called before the workers
 * start and before the analysis code runs hot.
 */
export function tuneCompilerForThreads(): void {
  if (applied) return;
  applied = true;
  for (const flag of THREADED_V8_FLAGS) setFlagsFromString(flag);
}
