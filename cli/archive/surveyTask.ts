/**
 * The task a worker runs for an archive: analyse one survey through the workspace API
 * (analyzeInputs), exactly as a one-survey run would.
 */
import type { Survey, SurveyAnalysis, WorkspaceInputs, WorkspaceSettings } from "../../analysis/index.ts";
import { analyzeInputs } from "../../analysis/index.ts";
import type { TaskHandler } from "./workerPool.ts";

/** What every worker receives once: the inputs without their surveys, and the settings (plain data). */
export interface SurveySetup {
  inputs: Omit<WorkspaceInputs, "surveys">;
  settings: Omit<WorkspaceSettings, "onProgress" | "surveys" | "compare">;
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
    const results = analyzeInputs({ ...setup.inputs, surveys: [task.survey] }, setup.settings);
    return results.surveys[0]!.analysis;
  },
};

/** The set-up of a run: inputs without surveys (nor the per-row issues, files and station table, which the analysis does not read). */
export function surveySetup(inputs: WorkspaceInputs, settings: SurveySetup["settings"]): SurveySetup {
  const { surveys: _surveys, stationTable: _table, ...rest } = inputs;
  return { inputs: { ...rest, files: [], issues: [] }, settings };
}
