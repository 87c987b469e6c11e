// Worker thread entry of the archive analysis: a set-up message naming its handler (read a survey
// file, or analyse a survey; default: analyse), then one task per message, or, with a shared queue
// in the set-up, every task it can claim from the queue's counter before this thread does.
import { parentPort } from "node:worker_threads";
import { readTaskHandler } from "./readTask.ts";
import { surveyTaskHandler } from "./surveyTask.ts";
import { claimTask, type SharedQueue, type TaskHandler, type ToWorker } from "./workerPool.ts";
import { phaseMark } from "./phaseLog.ts";

phaseMark("worker loaded");

const HANDLERS: Record<string, TaskHandler<unknown, unknown, unknown>> = {
  survey: surveyTaskHandler as TaskHandler<unknown, unknown, unknown>,
  read: readTaskHandler as TaskHandler<unknown, unknown, unknown>,
};
let handler = HANDLERS.survey!;

/** Runs one task and posts its result or error; false after an error. */
function runTask(index: number, task: unknown): boolean {
  try {
    const t0 = performance.now();
    phaseMark(`task ${index} start`);
    const result = handler.run(task);
    phaseMark(`task ${index} end`);
    parentPort!.postMessage({ index, result, taskMs: performance.now() - t0 });
    return true;
  } catch (error) {
    parentPort!.postMessage({ index, error: (error as Error).stack ?? String(error) });
    return false;
  }
}

function runQueue(queue: SharedQueue<unknown>): void {
  for (let i = claimTask(queue); i !== undefined; i = claimTask(queue)) if (!runTask(i, queue.tasks[i])) return;
}

parentPort!.on("message", (m: ToWorker<unknown, unknown>) => {
  if ("setup" in m) {
    handler = HANDLERS[m.handler ?? "survey"]!;
    handler.setup(m.setup);
    phaseMark(`${m.handler ?? "survey"} set-up done`);
    if (m.queue) runQueue(m.queue);
    return;
  }
  runTask(m.index, m.task);
});
