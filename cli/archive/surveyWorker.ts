// Worker thread entry of the archive analysis: set-up from workerData, then one survey per message.
import { parentPort, workerData } from "node:worker_threads";
import { surveyTaskHandler, type SurveySetup, type SurveyTask } from "./surveyTask.ts";

surveyTaskHandler.setup(workerData as SurveySetup);
parentPort!.on("message", (m: { index: number; task: SurveyTask }) => {
  try {
    const t0 = performance.now();
    const result = surveyTaskHandler.run(m.task);
    parentPort!.postMessage({ index: m.index, result, taskMs: performance.now() - t0 });
  } catch (error) {
    parentPort!.postMessage({ index: m.index, error: (error as Error).stack ?? String(error) });
  }
});
