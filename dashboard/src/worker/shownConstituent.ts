import { constituentsWithoutValues, type SurveyColumns } from "../../../analysis/index.ts";

/**
 * Which constituent the dashboard shows for a survey: the one chosen when the survey mixes it and has
 * observations of it, else its first mixing constituent with observations (a value or a
 * below-detection result at some station); non-mixing variables (oxygen, chlorophyll...) are never
 * chosen by default. A constituent whose column the file has but this survey never filled (a cruise
 * that did not measure it) is passed over, unless no mixing constituent has any observation. One rule
 * for the main thread (the selection after files are read) and the worker (the constituent whose map
 * marks it posts first, `AnalysisJob.firstConstituent`).
 *
 * @param constituents the survey's constituents, in survey order
 * @param chosen the name chosen so far (e.g. the selection's)
 * @param stations the survey's stations (their value cells); none given: every constituent counts as observed
 * @returns the name to show, or undefined when the survey has no mixing constituent
 */
export function shownConstituent(
  constituents: ReadonlyArray<{ name: string; kind?: string }>,
  chosen: string,
  stations: SurveyColumns["stations"] = [],
): string | undefined {
  const mixing = constituents.filter((c) => c.kind !== "nonMixing").map((c) => c.name);
  const empty = new Set(stations.length === 0 ? [] : constituentsWithoutValues([{ constituents, stations }]));
  const observed = mixing.filter((name) => !empty.has(name));
  const pool = observed.length > 0 ? observed : mixing;
  return pool.includes(chosen) ? chosen : pool[0];
}
