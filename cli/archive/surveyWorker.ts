// Worker thread entry of the archive analysis: a set-up message naming its handler (read a survey
// file, or analyse a survey; default: analyse), then one task per message.
import { parentPort } from "node:worker_threads";
import { readTaskHandler } from "./readTask.ts";
import { surveyTaskHandler } from "./surveyTask.ts";
import type { TaskHandler, ToWorker } from "./workerPool.ts";
import { phaseMark } from "./phaseLog.ts";

phaseMark("worker loaded");

const HANDLERS: Record<string, TaskHandler<unknown, unknown, unknown>> = {
  survey: surveyTaskHandler as TaskHandler<unknown, unknown, unknown>,
  read: readTaskHandler as TaskHandler<unknown, unknown, unknown>,
};
let handler = HANDLERS.survey!;

parentPort!.on("message", (m: ToWorker<unknown, unknown>) => {
  if ("setup" in m) {
    handler = HANDLERS[m.handler ?? "survey"]!;
    handler.setup(m.setup);
    return phaseMark(`${m.handler ?? "survey"} set-up done`);
  }
  try {
    const t0 = performance.now();
    phaseMark(`task ${m.index} start`);
    const result = handler.run(m.task);
    phaseMark(`task ${m.index} end`);
    parentPort!.postMessage({ index: m.index, result, taskMs: performance.now() - t0 });
  } catch (error) {
    parentPort!.postMessage({ index: m.index, error: (error as Error).stack ?? String(error) });
  }
});
