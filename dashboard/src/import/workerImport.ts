/**
 * The worker side of the import flow: answers "inspect" and "import"
 * requests, posting progress while a file is read.
 */
import type { ImportRequest, ImportResponse } from "./importProtocol.ts";
import { inspectFile } from "./inspectFile.ts";
import { importFile } from "./importFile.ts";

type Progress = { type: "progress"; id: number; stage: string; done: number; total: number };

/** Handles one import request, posting its answer (and progress) through `post`. */
export async function handleImportRequest(
  request: ImportRequest,
  post: (message: ImportResponse | Progress) => void,
): Promise<void> {
  const { id } = request;
  if (request.type === "inspect") {
    post({ type: "inspected", id, inspection: await inspectFile(request.file) });
    return;
  }
  const stage = `Reading ${request.file.name}`;
  post({ type: "progress", id, stage, done: 0, total: 100 });
  const outcome = await importFile(request.file, request.choice, (fraction) =>
    post({ type: "progress", id, stage, done: Math.round(fraction * 100), total: 100 }),
  );
  post({ type: "imported", id, outcome });
}
