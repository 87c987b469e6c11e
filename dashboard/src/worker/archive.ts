/**
 * The archive of the analysed surveys for the dashboard's archive view: the series, relations and
 * statements of analysis/archive (`summarizeArchive`, the function the CLI's `compare` and the
 * briefing use), made here in the worker so the main thread only lays them out. A discharge table
 * is read and joined by the same analysis functions as the CLI's `--discharge-table`.
 */
import {
  DEFAULT_SEASONS,
  DISCHARGE_JOIN_RULE,
  joinDischargeTable,
  readDischargeTable,
  summarizeArchive,
  type ArchiveSummary,
  type ImportIssue,
  type Season,
} from "../../../analysis/index.ts";
import type { AnalysisResult } from "./engine.ts";
import type { TextFile } from "./protocol.ts";

/** The fewest surveys the archive view is made for. */
export const ARCHIVE_MIN_SURVEYS = 3;

/** What a discharge table gave the archive. */
export interface DischargeTableReport {
  fileName: string;
  /** Accepted days in the table. */
  days: number;
  /** How the discharge column was read (unit). */
  unitNote: string;
  /** The join rule in plain words. */
  rule: string;
  /** Surveys that took a discharge from the table, and of those how many from their own day. */
  joined: number;
  sameDay: number;
  /** Surveys left without a table row (no date, or no row within the gap). */
  missing: string[];
  /** Problems in the table (file, row, column, value). */
  issues: ImportIssue[];
}

/** The archive summary of the held analyses, or why there is none. */
export interface ArchiveAnswer {
  summary?: ArchiveSummary;
  reason?: string;
  /** Present when a discharge table was given. */
  discharge?: DischargeTableReport;
}

/**
 * Summarises the analysed surveys as an archive (analysis/archive `summarizeArchive`).
 *
 * @param analyses the worker's latest analysis of each survey (undefined: not analysed)
 * @param seasons user-defined seasons (default: the analysis' meteorological seasons)
 * @param dischargeTable a daily discharge table (date, m³/s) joined to the surveys by date
 * @returns the summary, or the reason it was not made (fewer than three analysed surveys, an error)
 */
export function archiveOf(
  analyses: ReadonlyArray<AnalysisResult | undefined>,
  seasons: readonly Season[] = DEFAULT_SEASONS,
  dischargeTable?: TextFile,
): ArchiveAnswer {
  const done = analyses.filter((a): a is AnalysisResult => a !== undefined);
  if (done.length < ARCHIVE_MIN_SURVEYS)
    return {
      reason: `The archive view needs ${ARCHIVE_MIN_SURVEYS} or more analysed surveys; ${done.length} analysed so far.`,
    };
  try {
    let discharge: DischargeTableReport | undefined;
    let joined: ReturnType<typeof joinDischargeTable> | undefined;
    if (dischargeTable) {
      const table = readDischargeTable(dischargeTable.text, dischargeTable.name);
      joined = joinDischargeTable(
        table,
        done.map((a) => a.survey),
      );
      discharge = {
        fileName: table.fileName,
        days: table.rows.length,
        unitNote: table.unitNote,
        rule: DISCHARGE_JOIN_RULE,
        joined: Object.keys(joined.discharge).length,
        sameDay: joined.sameDay,
        missing: joined.missing,
        issues: table.issues,
      };
    }
    const summary = summarizeArchive(done, { seasons, ...(joined ? { discharge: joined.discharge } : {}) });
    return { summary, ...(discharge ? { discharge } : {}) };
  } catch (error) {
    return { reason: `The archive could not be summarised: ${error instanceof Error ? error.message : String(error)}` };
  }
}
