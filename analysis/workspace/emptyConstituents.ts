/**
 * Constituent columns a survey file has but never filled: no station of any of its surveys carries a
 * value or a below-detection result for them (a programme's export keeps every column of its format,
 * including the ones a year's cruises did not measure). Stated once per import, so that a constituent
 * shown with no observations is explained by the file, not taken for a reading fault.
 */
import type { Survey } from "../survey/survey.ts";

/** The parts of a survey {@link constituentsWithoutValues} reads (a whole Survey will do). */
export interface SurveyColumns {
  constituents: ReadonlyArray<{ name: string }>;
  stations: ReadonlyArray<{ values: Readonly<Record<string, { status: string } | undefined>> }>;
}

/** Notice code of {@link emptyConstituentsNotice}. */
export const EMPTY_CONSTITUENTS_NOTICE = "constituentsWithoutValues";

/**
 * Names of the constituents of `surveys` (one file's) that no station of any of them observed, in
 * the order the file gives them. An observation is a measured value or a below-detection result;
 * missing, invalid or empty cells are none.
 *
 * @param surveys the surveys read from one file (or one survey)
 * @returns the constituent names without any observation (empty when every column has one)
 */
export function constituentsWithoutValues(surveys: readonly SurveyColumns[]): string[] {
  const names: string[] = [];
  for (const s of surveys) for (const c of s.constituents) if (!names.includes(c.name)) names.push(c.name);
  return names.filter(
    (name) =>
      !surveys.some((s) =>
        s.stations.some((st) => {
          const status = st.values[name]?.status;
          return status === "measured" || status === "belowDetection";
        }),
      ),
  );
}

/**
 * One notice for an import, naming per survey file the constituents none of its surveys observed
 * (see {@link constituentsWithoutValues}); undefined when every column has an observation. Surveys
 * are grouped by the file their stations were read from (`Station.sourceFile`), so surveys read
 * earlier and kept in a workspace are grouped as when they were read.
 *
 * @param surveys every survey of the import or workspace
 * @returns the notice (code {@link EMPTY_CONSTITUENTS_NOTICE}) or undefined
 */
export function emptyConstituentsNotice(surveys: readonly Survey[]): { code: string; message: string } | undefined {
  const byFile = new Map<string, Survey[]>();
  for (const s of surveys) {
    const file = s.stations[0]?.sourceFile ?? s.name;
    const group = byFile.get(file);
    if (group) group.push(s);
    else byFile.set(file, [s]);
  }
  const parts = [...byFile].flatMap(([file, group]) => {
    const empty = constituentsWithoutValues(group);
    if (empty.length === 0) return [];
    const where = group.length === 1 ? "its survey" : `any of its ${group.length} surveys`;
    return [`${file} has no value of ${empty.join(", ")} in ${where} (the columns are empty)`];
  });
  return parts.length === 0 ? undefined : { code: EMPTY_CONSTITUENTS_NOTICE, message: `${parts.join("; ")}.` };
}
