/**
 * A capped list of import problems with complete counts by reason: a million-row log with a broken
 * column must not hold a million issue objects, yet no problem may go uncounted.
 */
import type { ImportIssue } from "../survey/survey.ts";
import { makeIssue } from "../io/importSummary.ts";

/** Default number of issues kept in full. */
export const DEFAULT_ISSUE_CAP = 1000;

/** Collects issues up to a cap and counts every one by reason. */
export class IssueLog {
  readonly issues: ImportIssue[] = [];
  readonly byReason: Record<string, number> = {};
  count = 0;
  readonly cap: number;

  /**
   * @param cap issues kept in full (≥ 0)
   * @throws RangeError when cap is not a whole number ≥ 0
   */
  constructor(cap: number = DEFAULT_ISSUE_CAP) {
    if (!Number.isInteger(cap) || cap < 0) throw new RangeError(`IssueLog: cap must be a whole number ≥ 0, got ${cap}`);
    this.cap = cap;
  }

  /**
   * Records one problem.
   *
   * @param reason short reason used for the counts ("unreadable salinity")
   * @param file file name
   * @param row 1-based record number (header = 1)
   * @param column header text
   * @param value the original text of the cell
   * @param expected what was expected instead
   * @param severity "error" (default) or "warning"
   */
  add(
    reason: string,
    file: string,
    row: number,
    column: string,
    value: string,
    expected: string,
    severity: ImportIssue["severity"] = "error",
  ): void {
    this.count += 1;
    this.byReason[reason] = (this.byReason[reason] ?? 0) + 1;
    if (this.issues.length < this.cap) this.issues.push(makeIssue(file, row, column, value, expected, severity));
  }
}
