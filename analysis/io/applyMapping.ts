import { requireOptions, requireStringArray } from "./argChecks.ts";
import type { ColumnMapping } from "./columnMapping.ts";
import type { ImportResult, ReadSurveyOptions } from "./importPipeline.ts";
import { RecordRouter } from "./recordRouter.ts";

/**
 * Applies a (confirmed or corrected) column mapping to rows already split into cells — e.g. the
 * preview in the mapping dialog, or rows from another reader. Row i of `rows` is file row i + 2.
 *
 * @param headers header texts
 * @param rows data rows as cell texts in header order
 * @param mapping the mapping to apply
 * @param options file name and the other reader options (decimal comma via options.decimalComma)
 * @returns the same result readSurveyText gives; never throws on bad data
 * @throws TypeError when headers is not an array of strings or options.fileName is missing
 */
export function applyMapping(
  headers: readonly string[],
  rows: readonly (readonly string[])[],
  mapping: ColumnMapping,
  options: ReadSurveyOptions,
): ImportResult {
  requireStringArray("applyMapping", "headers", headers);
  requireOptions("applyMapping", options);
  const router = new RecordRouter(
    { delimiter: mapping.delimiter ?? ",", decimalComma: options.decimalComma ?? mapping.decimalComma ?? false },
    { ...options, mapping },
  );
  router.push({ fields: [...headers], row: 1, parseErrors: [] });
  rows.forEach((r, i) => router.push({ fields: [...r], row: i + 2, parseErrors: [] }));
  return router.finish(0);
}
