/**
 * Main-thread side of the worker: starts an instance of analysis.worker.ts and wraps its API
 * with Comlink, so every call is a typed async function (`WorkerApi` from api.ts). Callbacks
 * (progress, analysis events) are passed through `proxyCallback`.
 */
import { proxy, releaseProxy, wrap, type Remote } from "comlink";
import type { WorkerApi } from "./api.ts";
import { analysisWorkerUrl } from "./analysisWorkerUrl.ts";

/** The worker API as the main thread calls it. */
export type RemoteApi = Remote<WorkerApi>;

/** A started worker: its API, and `terminate` to stop it. */
export interface WorkerHandle {
  api: RemoteApi;
  terminate(): void;
}

/** The analysis worker the built page's head started before the main bundle ran (dashboard/sharedWorker.ts). */
interface EarlyWorker {
  worker: Worker;
  /** The absolute URL it was started from. */
  url: string;
  /** Error events it fired before it was adopted. */
  errors: ErrorEvent[];
}

/** The early-started analysis worker, once: for the first "brackline-analysis" started from the same URL. */
function adoptEarlyWorker(name: string): EarlyWorker | undefined {
  const g = globalThis as { __bracklineEarlyWorker?: EarlyWorker };
  const early = g.__bracklineEarlyWorker;
  if (!early || name !== "brackline-analysis" || early.url !== analysisWorkerUrl) return undefined;
  delete g.__bracklineEarlyWorker;
  return early;
}

/** Starts one worker; `name` shows in the browser's tools; `onFail` hears a worker that fails to start. */
export function startWorker(name: string, onFail?: (message: string) => void): WorkerHandle {
  const early = adoptEarlyWorker(name);
  const worker = early?.worker ?? new Worker(analysisWorkerUrl, { type: "module", name });
  const failed = (event: ErrorEvent) => {
    onFail?.(event.message || `The ${name} worker failed to start.`);
  };
  worker.addEventListener("error", failed);
  for (const event of early?.errors ?? []) failed(event);
  const api = wrap<WorkerApi>(worker);
  return {
    api,
    terminate() {
      api[releaseProxy]();
      worker.terminate();
    },
  };
}

/** Marks a callback to be called back across the worker boundary. */
export function proxyCallback<F extends (...args: never[]) => unknown>(f: F): F {
  return proxy(f);
}
