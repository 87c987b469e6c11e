// Worker thread entry of the archive analysis: the set-up message first, then one survey per message.
import { parentPort } from "node:worker_threads";
import { surveyTaskHandler, type SurveySetup, type SurveyTask } from "./surveyTask.ts";
import type { ToWorker } from "./workerPool.ts";

parentPort!.on("message", (m: ToWorker<SurveySetup, SurveyTask>) => {
  if ("setup" in m) return surveyTaskHandler.setup(m.setup);
  try {
    const t0 = performance.now();
    const result = surveyTaskHandler.run(m.task);
    parentPort!.postMessage({ index: m.index, result, taskMs: performance.now() - t0 });
  } catch (error) {
    parentPort!.postMessage({ index: m.index, error: (error as Error).stack ?? String(error) });
  }
});
