/**
 * The task a worker runs for an archive: analyse one survey of the set-up inputs.
 */
import type { AnalyzeSurveyOptions, ChannelNetwork, Survey, SurveyAnalysis } from "../../analysis/index.ts";
import { analyzeSurvey } from "../../analysis/index.ts";
import type { TaskHandler } from "./workerPool.ts";

/** What every worker receives once: the channel and the settings (plain data). */
export interface SurveySetup {
  network?: ChannelNetwork;
  options: Omit<AnalyzeSurveyOptions, "onProgress" | "network">;
}

/** One task: the survey to analyse (sent with the task, so each survey is copied to one thread only). */
export interface SurveyTask {
  survey: Survey;
}

let setup: SurveySetup | undefined;

/** Analyses one survey per task (in a worker, or inline for the one-thread baseline). */
export const surveyTaskHandler: TaskHandler<SurveySetup, SurveyTask, SurveyAnalysis> = {
  setup(data) {
    setup = data;
  },
  run(task) {
    if (!setup) throw new Error("surveyTaskHandler: run before setup");
    return analyzeSurvey(task.survey, { ...setup.options, ...(setup.network ? { network: setup.network } : {}) });
  },
};
