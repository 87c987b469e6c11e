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

/** Starts one worker; `name` shows in the browser's tools; `onFail` hears a worker that fails to start. */
export function startWorker(name: string, onFail?: (message: string) => void): WorkerHandle {
  const worker = new Worker(analysisWorkerUrl, { type: "module", name });
  worker.addEventListener("error", (event: ErrorEvent) => {
    onFail?.(event.message || `The ${name} worker failed to start.`);
  });
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
