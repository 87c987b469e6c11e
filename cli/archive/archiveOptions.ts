/**
 * The archive options of `brackline compare`: seasons, threads and the cache, turned into what
 * summarizeArchive and analyzeArchive take, and the report of a discharge table joined by date.
 */
import type { DischargeTable, Season, SurveyAnalysis } from "../../analysis/index.ts";
import { DISCHARGE_JOIN_MAX_DAYS, dischargeTableReport, parseSeasons } from "../../analysis/index.ts";
import { UsageError } from "../exitCodes.ts";
import { defaultCacheDir } from "./surveyCache.ts";

/** Seasons from `--seasons "wet=Dec-Apr,dry=Aug-Nov"` (default: meteorological seasons). */
export function seasonsOption(text: string | undefined): Season[] | undefined {
  if (text === undefined) return undefined;
  try {
    return parseSeasons(text);
  } catch (error) {
    throw new UsageError(`--seasons: ${(error as Error).message.replace(/^parseSeasons: /, "")}`);
  }
}

export { threadsOption } from "./earlyStart.ts";

/** Cache directory from `--cache-dir` / `--no-cache` (default: the user's cache directory). */
export function cacheDirOption(dir: string | undefined, noCache: boolean | undefined): string | undefined {
  if (noCache) return undefined;
  return dir ?? defaultCacheDir();
}

/**
 * Reports on stderr what `--discharge-table` gave the analysed surveys (dischargeTableReport, from
 * each survey's stated discharge source): the table's problems, its unit, how many surveys took a
 * row and which were left without a discharge.
 */
export function reportDischargeTable(
  table: DischargeTable,
  analyses: readonly Pick<SurveyAnalysis, "survey">[],
  err: (text: string) => void,
): void {
  const r = dischargeTableReport(
    table,
    analyses.map((a) => a.survey),
  );
  for (const i of r.issues.slice(0, 20))
    err(`  ${i.severity}: ${i.file} row ${i.row}, column "${i.column}", value "${i.value}": expected ${i.expected}`);
  if (r.issues.length > 20) err(`  ... and ${r.issues.length - 20} more problems in ${r.fileName}`);
  err(
    `discharge table ${r.fileName}: ${r.days} days, ${r.unitNote}; ${r.joined} survey(s) took a row (${r.sameDay} of their own day), ${r.ownDischarge} kept their own discharge`,
  );
  if (r.missing.length)
    err(
      `discharge table ${r.fileName}: no row on or up to ${DISCHARGE_JOIN_MAX_DAYS} days before ${r.missing.length} survey(s) without a discharge of their own (${r.missing.slice(0, 5).join(", ")}${r.missing.length > 5 ? ", …" : ""}): no fluxes for them`,
    );
}
