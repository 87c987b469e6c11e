/**
 * The comparison of analysed surveys as the workspace API gives it (`analyzeInputs` → `comparison`),
 * also called by the dashboard's worker once its surveys are analysed one by one.
 */
import { compareSurveys, type CompareOptions } from "../compare/compareSurveys.ts";
import type { SurveyComparison } from "../compare/types.ts";
import type { SurveyAnalysis } from "../pipeline/surveyAnalysis.ts";

/**
 * Compares every analysed survey with the reference survey (the first unless `referenceIndex`).
 *
 * @param analyses the surveys' analyses, in input order
 * @param options reference survey index (default 0)
 * @returns the comparison of each later survey with the reference
 * @throws RangeError when fewer than 2 surveys are given
 * @see compareSurveys (analysis/compare) for the differences and their intervals
 */
export function workspaceComparison(
  analyses: readonly SurveyAnalysis[],
  options: CompareOptions = {},
): SurveyComparison {
  if (analyses.length < 2)
    throw new RangeError(`analyzeInputs(): a comparison needs at least 2 surveys; got ${analyses.length}`);
  return compareSurveys(analyses, options);
}
