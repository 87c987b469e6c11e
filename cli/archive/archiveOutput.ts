/**
 * Output of `brackline compare` for an archive (three or more surveys): the JSON document with
 * series[] and intrusion[], or the series as one long CSV table.
 */
import type { ArchiveSummary, SurveyComparison } from "../../analysis/index.ts";
import { archiveName, archiveTableRows, SCREENING_CAUTION, toCsv } from "../../analysis/index.ts";

/**
 * The archive JSON document (field names are the README's contract).
 *
 * @param archive the archive summary
 * @param comparison the two-survey comparison, included only for small archives
 */
export function archiveJson(archive: ArchiveSummary, comparison?: SurveyComparison): string {
  const { nSurveys, dateRange, seasons, series, intrusion, intrusionRelations, statements, methods, warnings } =
    archive;
  return `${JSON.stringify(
    {
      caution: SCREENING_CAUTION,
      surveys: archiveName(archive),
      nSurveys,
      ...(dateRange ? { dateRange } : {}),
      seasons,
      statements,
      series,
      intrusion,
      intrusionRelations,
      methods,
      warnings,
      ...(comparison ? { comparison } : {}),
    },
    null,
    2,
  )}\n`;
}

/** The archive series as one long CSV table (the one CSV writer: CRLF, formula neutralisation). */
export function archiveCsv(archive: ArchiveSummary): string {
  const { header, rows } = archiveTableRows(archive);
  return toCsv(header, rows);
}
