/**
 * The archive options of `brackline compare`: seasons, a discharge table joined by date, threads
 * and the cache, turned into what summarizeArchive and analyzeArchive take.
 */
import { availableParallelism } from "node:os";
import { basename } from "node:path";
import type { DischargeSource, Season, Survey } from "../../analysis/index.ts";
import { dischargeOnDate, isoDay, parseSeasons, readDischargeTable } from "../../analysis/index.ts";
import { InputError, UsageError } from "../exitCodes.ts";
import { readFileSync } from "node:fs";
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

/** Threads from `--threads n`, this one included (default: available parallelism); 0 or 1 = this thread only. */
export function threadsOption(text: string | undefined): number {
  if (text === undefined) return availableParallelism();
  if (!/^\s*\d+\s*$/.test(text) || Number(text) > 256)
    throw new UsageError(`--threads: expected a whole number 0…256; got "${text}"`);
  return Number(text);
}

/** Cache directory from `--cache-dir` / `--no-cache` (default: the user's cache directory). */
export function cacheDirOption(dir: string | undefined, noCache: boolean | undefined): string | undefined {
  if (noCache) return undefined;
  return dir ?? defaultCacheDir();
}

/**
 * Discharge of every survey from `--discharge-table flows.csv`: the table row of the survey's day,
 * else of the nearest earlier day (at most 31 days before), with the statement of which row was
 * used. Table problems go to stderr; surveys without a row are named.
 *
 * @throws InputError when the table cannot be read or has no usable row
 */
export function dischargeFromTable(
  path: string,
  surveys: readonly Pick<Survey, "name" | "startDate">[],
  err: (text: string) => void,
): Record<string, DischargeSource> {
  let text: string;
  try {
    text = readFileSync(path, "utf8");
  } catch (error) {
    throw new InputError(
      `${path}: cannot read discharge table (${(error as NodeJS.ErrnoException).code ?? (error as Error).message})`,
    );
  }
  const table = readDischargeTable(text, basename(path));
  for (const i of table.issues.slice(0, 20))
    err(`  ${i.severity}: ${i.file} row ${i.row}, column "${i.column}", value "${i.value}": expected ${i.expected}`);
  if (table.issues.length > 20) err(`  ... and ${table.issues.length - 20} more problems in ${table.fileName}`);
  if (table.rows.length === 0)
    throw new InputError(`${path}: no usable row (expected a date column and a discharge column in m³/s)`);
  err(`discharge table ${table.fileName}: ${table.rows.length} days, ${table.unitNote}`);
  const out: Record<string, DischargeSource> = {};
  const missing: string[] = [];
  for (const s of surveys) {
    const day = isoDay(s.startDate);
    const hit = day ? dischargeOnDate(table, day) : undefined;
    if (hit) out[s.name] = { dischargeM3s: hit.dischargeM3s, source: hit.statement };
    else missing.push(s.name);
  }
  if (missing.length)
    err(
      `discharge table ${table.fileName}: no row on or up to 31 days before ${missing.length} survey(s) (${missing.slice(0, 5).join(", ")}${missing.length > 5 ? ", …" : ""}); their discharge stays as given in the files or by --discharge`,
    );
  return out;
}
