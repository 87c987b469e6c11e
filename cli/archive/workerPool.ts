/**
 * A small pool of worker threads for independent tasks: the workers can be started before the
 * inputs are read (their start-up overlaps the reading), get one shared set-up message each, then
 * take tasks from one shared queue, largest first (a worker asks for the next task when it finishes
 * one, so no thread idles while another holds a static share); progress per finished task; cancel
 * through an AbortSignal (workers are terminated). With 0 threads the tasks run in this thread
 * (the one-thread baseline).
 */
import { Worker } from "node:worker_threads";
import { tuneCompilerForThreads } from "./compilerTuning.ts";
import { phaseMark } from "./phaseLog.ts";

/** Handler of a worker module: set-up once, then one call per task. */
export interface TaskHandler<Setup, Task, Result> {
  setup(data: Setup): void;
  run(task: Task): Result;
}

/**
 * Every task of a run at once, with a counter in shared memory from which the worker and this thread
 * each claim the next task (Atomics.add), see {@link PoolOptions.sharedQueue}.
 */
export interface SharedQueue<Task> {
  tasks: readonly Task[];
  /** Task indices in the order they are claimed. */
  order: readonly number[];
  /** One Int32 on a SharedArrayBuffer: the position in `order` of the next task to claim. */
  claim: Int32Array;
}

/** Messages to a worker: a set-up (naming the handler when the worker has several; with a shared queue, the whole run), then tasks. */
export type ToWorker<Setup, Task> =
  { setup: Setup; handler?: string; queue?: SharedQueue<Task> } | { index: number; task: Task };

/** The next task index of a shared queue, claimed for this thread (undefined when none is left). */
export function claimTask(queue: Pick<SharedQueue<unknown>, "order" | "claim">): number | undefined {
  const k = Atomics.add(queue.claim, 0, 1);
  return k < queue.order.length ? queue.order[k] : undefined;
}
/** Messages from a worker: a result or an error of one task. */
export interface FromWorker<Result> {
  index: number;
  result?: Result;
  error?: string;
  taskMs?: number;
}

/** Worker threads started ahead of their tasks (see {@link startWorkers}). */
export interface StartedWorkers {
  readonly workers: readonly Worker[];
}

/**
 * Starts worker threads now, so that loading their code overlaps whatever this thread does next
 * (reading the input files). Hand them to {@link runPool}, which ends them; end unused ones with
 * {@link stopWorkers}.
 *
 * @param workerUrl the worker script
 * @param threads number of threads (0 starts none)
 */
export function startWorkers(workerUrl: URL, threads: number): StartedWorkers {
  if (!Number.isInteger(threads) || threads < 0)
    throw new RangeError(`startWorkers: threads must be a whole number ≥ 0; got ${threads}`);
  if (threads > 0) tuneCompilerForThreads();
  return { workers: Array.from({ length: threads }, () => new Worker(workerUrl)) };
}

/** Ends started workers that are not needed (safe to call twice). */
export async function stopWorkers(started: StartedWorkers | undefined): Promise<void> {
  if (started) await Promise.all(started.workers.map((w) => w.terminate()));
}

/** Options of {@link runPool}. */
export interface PoolOptions<Setup, Task, Result> {
  /** Worker script (plain JavaScript; a TypeScript worker goes through a small .js entry that registers tsx). */
  workerUrl: URL;
  /** Number of worker threads; 0 runs everything in this thread with `inline`. */
  threads: number;
  /** Workers already started with {@link startWorkers} (used first; extra ones are ended, missing ones started). */
  started?: StartedWorkers;
  setup: Setup;
  tasks: readonly Task[];
  /** Relative cost of a task, for largest-first scheduling (default: equal). */
  cost?: (task: Task) => number;
  /** The handler, for threads = 0. */
  inline?: TaskHandler<Setup, Task, Result>;
  /** Called after each finished task (index into tasks, time spent in the task itself [ms]). */
  onResult?: (index: number, result: Result, taskMs: number) => void;
  signal?: AbortSignal;
  /** Handler name sent with the set-up, for a worker script with several handlers. */
  handler?: string;
  /** Keep the `started` workers running after a successful run (for a next run with another handler). */
  keepStarted?: boolean;
  /**
   * Send every task with the set-up and let each thread claim the next one from a counter in shared
   * memory (with `alsoHere`): no thread holds a task in hand that another could have started, so
   * the last tasks go to whichever thread is free first. For a few long tasks whose data is cheap to
   * copy (the files of an archive to parse); many small tasks are fed one message each.
   */
  sharedQueue?: boolean;
  /**
   * This thread takes tasks from the same queue too (with `inline`), between handling the workers'
   * messages: on 2 cores, this thread and one worker do the work of two workers without a third
   * JavaScript engine loading and compiling the same code. Each worker then keeps two tasks in hand,
   * so it never waits while this thread finishes a task.
   */
  alsoHere?: boolean;
}

/** Thrown when the run was cancelled; `done` tasks had finished. */
export class CancelledError extends Error {
  override name = "CancelledError";
  constructor(readonly done: number) {
    super(`cancelled after ${done} task(s)`);
  }
}

/**
 * Runs every task and returns the results in task order. The worker threads (given or started
 * here) are ended before it returns.
 *
 * @throws CancelledError when the signal aborts; the first task error otherwise
 */
export async function runPool<Setup, Task, Result>(o: PoolOptions<Setup, Task, Result>): Promise<Result[]> {
  const results = new Array<Result>(o.tasks.length);
  const order = o.tasks.map((_, i) => i);
  if (o.cost) {
    const costs = o.tasks.map(o.cost);
    order.sort((a, b) => costs[b]! - costs[a]! || a - b);
  }
  let done = 0;
  const n = o.threads <= 0 ? 0 : Math.max(1, Math.min(o.threads, o.tasks.length));
  const given = o.started?.workers ?? [];
  // Started workers beyond what the tasks need are ended at once.
  const unused = given.slice(n);
  if (!o.keepStarted) void Promise.all(unused.map((w) => w.terminate()));
  if (o.alsoHere && !o.inline) throw new TypeError("runPool: alsoHere needs an inline handler");
  if (n === 0) {
    if (!o.inline) throw new TypeError("runPool: threads = 0 needs an inline handler");
    o.inline.setup(o.setup);
    for (const i of order) {
      if (o.signal?.aborted) throw new CancelledError(done);
      const t0 = performance.now();
      phaseMark(`task ${i} start`);
      results[i] = o.inline.run(o.tasks[i]!);
      phaseMark(`task ${i} end`);
      done++;
      o.onResult?.(i, results[i]!, performance.now() - t0);
      await new Promise((r) => setImmediate(r)); // lets a SIGINT through between tasks
    }
    return results;
  }
  if (n > given.length) tuneCompilerForThreads();
  const workers = [
    ...given.slice(0, n),
    ...Array.from({ length: Math.max(0, n - given.length) }, () => new Worker(o.workerUrl)),
  ];
  let next = 0;
  const queue: SharedQueue<Task> | undefined = o.sharedQueue
    ? { tasks: o.tasks, order, claim: new Int32Array(new SharedArrayBuffer(4)) }
    : undefined;
  /** The next task for this thread, or undefined. */
  const take = (): number | undefined => (queue ? claimTask(queue) : next < order.length ? order[next++] : undefined);
  let ok = false;
  const listeners: Array<() => void> = [];
  try {
    await new Promise<void>((resolve, reject) => {
      const stop = () => reject(new CancelledError(done));
      if (o.signal?.aborted) return stop();
      o.signal?.addEventListener("abort", stop, { once: true });
      const feed = (w: Worker): void => {
        if (queue || next >= order.length) return;
        const i = order[next++]!;
        w.postMessage({ index: i, task: o.tasks[i] } satisfies ToWorker<Setup, Task>);
      };
      const here = async (): Promise<void> => {
        o.inline!.setup(o.setup);
        for (let i = take(); i !== undefined && !o.signal?.aborted; i = take()) {
          const t0 = performance.now();
          try {
            phaseMark(`task ${i} start`);
            results[i] = o.inline!.run(o.tasks[i]!);
            phaseMark(`task ${i} end`);
          } catch (error) {
            return reject(error);
          }
          done++;
          o.onResult?.(i, results[i]!, performance.now() - t0);
          if (done === order.length) return resolve();
          await new Promise((r) => setImmediate(r)); // the workers' results and a SIGINT get through
        }
      };
      for (const w of workers) {
        const onMessage = (m: FromWorker<Result>) => {
          if (m.error !== undefined) return reject(new Error(m.error));
          results[m.index] = m.result!;
          done++;
          // The next task goes out before this result is handled, so the worker never waits on us.
          if (done < order.length) feed(w);
          o.onResult?.(m.index, m.result!, m.taskMs ?? Number.NaN);
          if (done === order.length) resolve();
        };
        const onExit = (code: number) => {
          if (done < order.length && code !== 0) reject(new Error(`worker stopped with exit code ${code}`));
        };
        w.on("message", onMessage);
        w.on("error", reject);
        w.on("exit", onExit);
        listeners.push(() => {
          w.off("message", onMessage);
          w.off("error", reject);
          w.off("exit", onExit);
        });
        w.postMessage({
          setup: o.setup,
          ...(o.handler ? { handler: o.handler } : {}),
          ...(queue ? { queue } : {}),
        } satisfies ToWorker<Setup, Task>);
        feed(w);
        // A second task in hand, as long as this thread is still left one to start with.
        if (o.alsoHere && order.length - next >= 2) feed(w);
      }
      if (order.length === 0) resolve();
      else if (o.alsoHere) void here();
    });
    ok = true;
  } finally {
    for (const off of listeners) off();
    const keep = ok && o.keepStarted ? new Set(given) : new Set<Worker>();
    await Promise.all(workers.filter((w) => !keep.has(w)).map((w) => w.terminate()));
  }
  return results;
}
