/**
 * The task a worker runs for an archive: analyse one survey of the set-up inputs.
 */
import type { AnalyzeSurveyOptions, ChannelNetwork, Survey, SurveyAnalysis } from "../../analysis/index.ts";
import { analyzeSurvey } from "../../analysis/index.ts";
import type { TaskHandler } from "./workerPool.ts";

/** What every worker receives once: the surveys, the channel and the settings (plain data). */
export interface SurveySetup {
  surveys: Survey[];
  network?: ChannelNetwork;
  options: Omit<AnalyzeSurveyOptions, "onProgress" | "network">;
}

/** One task: the index of the survey to analyse. */
export interface SurveyTask {
  index: number;
}

let setup: SurveySetup | undefined;

/** Analyses one survey per task (in a worker, or inline for the one-thread baseline). */
export const surveyTaskHandler: TaskHandler<SurveySetup, SurveyTask, SurveyAnalysis> = {
  setup(data) {
    setup = data;
  },
  run(task) {
    if (!setup) throw new Error("surveyTaskHandler: run before setup");
    const survey = setup.surveys[task.index];
    if (!survey) throw new RangeError(`surveyTaskHandler: no survey at index ${task.index}`);
    return analyzeSurvey(survey, { ...setup.options, ...(setup.network ? { network: setup.network } : {}) });
  },
};
