/**
 * Which constituent the dashboard shows for a survey: the one chosen when the survey has it among the
 * constituents it mixes, else its first such constituent; non-mixing variables (oxygen, chlorophyll...)
 * are never chosen by default. One rule for the main thread (the selection after files are read) and
 * the worker (the constituent whose map marks it posts first, `AnalysisJob.firstConstituent`).
 *
 * @param constituents the survey's constituents, in survey order
 * @param chosen the name chosen so far (e.g. the selection's)
 * @returns the name to show, or undefined when the survey has no mixing constituent
 */
export function shownConstituent(
  constituents: ReadonlyArray<{ name: string; kind?: string }>,
  chosen: string,
): string | undefined {
  const mixing = constituents.filter((c) => c.kind !== "nonMixing").map((c) => c.name);
  return mixing.includes(chosen) ? chosen : mixing[0];
}
