import type { ImportIssue, ValueCell } from "../survey/survey.ts";
import type { FlagDecision } from "./qcFlags.ts";
import { readQcFlag } from "./qcFlags.ts";
import { makeIssue } from "./importSummary.ts";
import { parseValueText } from "./valueText.ts";

/** Plausible ranges outside which a number is read as invalid (common practice). */
export const VALUE_LIMITS: Readonly<Record<string, [number, number]>> = {
  salinity: [0, 70],
  pH: [0, 14],
  temperature: [-5, 60],
};

/** Context for reading the cells of one row. */
export interface CellContext {
  file: string;
  row: number;
  decimalComma: boolean;
  flagMap: Readonly<Record<string, FlagDecision>>;
  issues: ImportIssue[];
}

/**
 * Reads one value cell, reports invalid text, applies the plausibility range and the QC flag.
 *
 * @param ctx row context (issues are appended to ctx.issues)
 * @param header column header (for issues)
 * @param text cell text
 * @param flag optional flag text and flag header
 * @param limits optional [min, max] plausible range
 * @returns the ValueCell keeping the original text
 */
export function readValueCell(
  ctx: CellContext,
  header: string,
  text: string,
  flag?: { text: string; header: string },
  limits?: [number, number],
): ValueCell {
  const cell = parseValueText(text, { decimalComma: ctx.decimalComma });
  if (cell.status === "invalid") {
    ctx.issues.push(
      makeIssue(
        ctx.file,
        ctx.row,
        header,
        text,
        "a number, a below-detection mark (<0.05, BDL, ND) or a missing marker (blank, NA, -999)",
      ),
    );
  } else if (cell.status === "measured" && limits !== undefined && cell.value !== undefined) {
    if (cell.value < limits[0] || cell.value > limits[1]) {
      ctx.issues.push(makeIssue(ctx.file, ctx.row, header, text, `a value between ${limits[0]} and ${limits[1]}`));
      return { value: undefined, original: cell.original, status: "invalid", accepted: false };
    }
  }
  if (flag !== undefined && flag.text.trim().length > 0) {
    cell.qcFlag = flag.text;
    const decision = readQcFlag(flag.text, ctx.flagMap);
    if (decision === undefined) {
      ctx.issues.push(
        makeIssue(
          ctx.file,
          ctx.row,
          flag.header,
          flag.text,
          "a known QC flag (1/2 good, 3/4 bad, 9 missing, A/R, good/bad); value set aside",
          "warning",
        ),
      );
      cell.accepted = false;
    } else if (decision !== "accept") cell.accepted = false;
  }
  return cell;
}

/**
 * Reads a plain number cell (depth, distance, discharge) with its issue on failure.
 *
 * @returns the number, or undefined for missing or unreadable text (unreadable text is reported)
 */
export function readNumberCell(ctx: CellContext, header: string, text: string, min = -Infinity): number | undefined {
  const cell = parseValueText(text, { decimalComma: ctx.decimalComma });
  if (cell.status === "measured" && cell.value !== undefined && cell.value >= min) return cell.value;
  if (cell.status !== "missing")
    ctx.issues.push(makeIssue(ctx.file, ctx.row, header, text, min === 0 ? "a number ≥ 0" : "a number", "warning"));
  return undefined;
}
