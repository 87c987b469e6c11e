/**
 * Main-thread side of the analysis worker: sends requests with fresh ids and
 * hands replies to the caller, dropping those of superseded requests.
 */
import type { WorkerRequest, WorkerResponse } from "./protocol.ts";

type Request = WorkerRequest extends infer R ? (R extends { id: number } ? Omit<R, "id"> : never) : never;

export class AnalysisClient {
  readonly #worker: Worker;
  #nextId = 1;
  #currentId = 0;

  constructor(onMessage: (message: WorkerResponse) => void) {
    this.#worker = new Worker(new URL("./analysis.worker.ts", import.meta.url), {
      type: "module",
      name: "brackline-analysis",
    });
    this.#worker.onmessage = (event: MessageEvent<WorkerResponse>) => {
      if (event.data.id === this.#currentId) onMessage(event.data);
    };
    this.#worker.onerror = (event: ErrorEvent) => {
      onMessage({
        type: "error",
        id: this.#currentId,
        message: event.message || "The analysis worker failed to start.",
      });
    };
  }

  /** Sends a request; replies to earlier requests are dropped from now on. */
  send(request: Request): number {
    const id = this.#nextId++;
    this.#currentId = id;
    this.#worker.postMessage({ ...request, id } as WorkerRequest);
    return id;
  }

  terminate(): void {
    this.#worker.terminate();
  }
}
