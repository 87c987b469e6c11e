/**
 * A small pool of worker threads for independent tasks: one shared set-up message per worker, then
 * tasks handed out largest first; progress per finished task; cancel through an AbortSignal
 * (workers are terminated). With 0 threads the tasks run in this thread (the one-thread baseline).
 */
import { Worker } from "node:worker_threads";

/** Handler of a worker module: set-up once, then one call per task. */
export interface TaskHandler<Setup, Task, Result> {
  setup(data: Setup): void;
  run(task: Task): Result;
}

/** Options of {@link runPool}. */
export interface PoolOptions<Setup, Task, Result> {
  /** Worker script (plain JavaScript; a TypeScript worker goes through a small .js entry that registers tsx). */
  workerUrl: URL;
  /** Number of worker threads; 0 runs everything in this thread with `inline`. */
  threads: number;
  setup: Setup;
  tasks: readonly Task[];
  /** Relative cost of a task, for largest-first scheduling (default: equal). */
  cost?: (task: Task) => number;
  /** The handler, for threads = 0. */
  inline?: TaskHandler<Setup, Task, Result>;
  /** Called after each finished task (index into tasks, time spent in the task itself [ms]). */
  onResult?: (index: number, result: Result, taskMs: number) => void;
  signal?: AbortSignal;
}

/** Thrown when the run was cancelled; `done` tasks had finished. */
export class CancelledError extends Error {
  override name = "CancelledError";
  constructor(readonly done: number) {
    super(`cancelled after ${done} task(s)`);
  }
}

/**
 * Runs every task and returns the results in task order.
 *
 * @throws CancelledError when the signal aborts; the first task error otherwise
 */
export async function runPool<Setup, Task, Result>(o: PoolOptions<Setup, Task, Result>): Promise<Result[]> {
  const results = new Array<Result>(o.tasks.length);
  const order = o.tasks.map((_, i) => i);
  if (o.cost) order.sort((a, b) => o.cost!(o.tasks[b]!) - o.cost!(o.tasks[a]!));
  let done = 0;
  if (o.threads <= 0) {
    if (!o.inline) throw new TypeError("runPool: threads = 0 needs an inline handler");
    o.inline.setup(o.setup);
    for (const i of order) {
      if (o.signal?.aborted) throw new CancelledError(done);
      const t0 = performance.now();
      results[i] = o.inline.run(o.tasks[i]!);
      done++;
      o.onResult?.(i, results[i]!, performance.now() - t0);
      await new Promise((r) => setImmediate(r)); // lets a SIGINT through between tasks
    }
    return results;
  }
  const n = Math.max(1, Math.min(o.threads, o.tasks.length));
  const workers = Array.from({ length: n }, () => new Worker(o.workerUrl, { workerData: o.setup }));
  let next = 0;
  try {
    await new Promise<void>((resolve, reject) => {
      const stop = () => reject(new CancelledError(done));
      if (o.signal?.aborted) return stop();
      o.signal?.addEventListener("abort", stop, { once: true });
      const feed = (w: Worker): void => {
        if (next >= order.length) return;
        const i = order[next++]!;
        w.postMessage({ index: i, task: o.tasks[i] });
      };
      for (const w of workers) {
        w.on("message", (m: { index: number; result?: Result; error?: string; taskMs?: number }) => {
          if (m.error !== undefined) return reject(new Error(m.error));
          results[m.index] = m.result!;
          done++;
          o.onResult?.(m.index, m.result!, m.taskMs ?? Number.NaN);
          if (done === order.length) resolve();
          else feed(w);
        });
        w.on("error", reject);
        w.on("exit", (code) => {
          if (done < order.length && code !== 0) reject(new Error(`worker stopped with exit code ${code}`));
        });
        feed(w);
      }
      if (order.length === 0) resolve();
    });
  } finally {
    await Promise.all(workers.map((w) => w.terminate()));
  }
  return results;
}
