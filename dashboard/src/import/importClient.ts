/**
 * Main-thread side of the import flow: a second instance of the analysis
 * worker that inspects and reads dropped files, so reading never interrupts
 * the analysis shown on screen. Each request gets a promise of its answer.
 */
import type { WorkerRequest, WorkerResponse } from "../worker/protocol.ts";
import type { ImportChoice } from "./importFile.ts";
import type { FileInspection, FileOutcome, ImportSource } from "./importTypes.ts";

type Pending = {
  resolve: (message: WorkerResponse) => void;
  reject: (error: Error) => void;
  onProgress?: (fraction: number, stage: string) => void;
};

export class ImportClient {
  #worker: Worker | undefined;
  readonly #pending = new Map<number, Pending>();
  #nextId = 1;

  /** The worker, started on first use. */
  #start(): Worker {
    if (this.#worker) return this.#worker;
    const worker = new Worker(new URL("../worker/analysis.worker.ts", import.meta.url), {
      type: "module",
      name: "brackline-import",
    });
    worker.onmessage = (event: MessageEvent<WorkerResponse>) => {
      const m = event.data;
      const p = this.#pending.get(m.id);
      if (!p) return;
      if (m.type === "progress") {
        p.onProgress?.(m.total > 0 ? m.done / m.total : 0, m.stage);
        return;
      }
      this.#pending.delete(m.id);
      if (m.type === "error") p.reject(new Error(m.message));
      else p.resolve(m);
    };
    worker.onerror = (event: ErrorEvent) => {
      const error = new Error(event.message || "The import worker failed.");
      for (const p of this.#pending.values()) p.reject(error);
      this.#pending.clear();
    };
    this.#worker = worker;
    return worker;
  }

  #ask(request: WorkerRequest, onProgress?: Pending["onProgress"]): Promise<WorkerResponse> {
    return new Promise((resolve, reject) => {
      this.#pending.set(request.id, { resolve, reject, ...(onProgress ? { onProgress } : {}) });
      this.#start().postMessage(request);
    });
  }

  /** Recognises a file and previews it. */
  async inspect(file: ImportSource): Promise<FileInspection> {
    const m = await this.#ask({ type: "inspect", id: this.#nextId++, file });
    if (m.type !== "inspected") throw new Error(`Unexpected worker answer "${m.type}" to inspect.`);
    return m.inspection;
  }

  /** Reads a file with the confirmed choice; `onProgress` gets the fraction read. */
  async read(
    file: ImportSource,
    choice: ImportChoice,
    onProgress?: (fraction: number, stage: string) => void,
  ): Promise<FileOutcome> {
    const m = await this.#ask({ type: "import", id: this.#nextId++, file, choice }, onProgress);
    if (m.type !== "imported") throw new Error(`Unexpected worker answer "${m.type}" to import.`);
    return m.outcome;
  }

  terminate(): void {
    this.#worker?.terminate();
    this.#worker = undefined;
  }
}
