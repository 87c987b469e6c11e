/**
 * Reading single cells of an underway log: numbers and times, on top of the survey reader's text
 * rules (analysis/io valueText and dateTime), with a fast path for the ISO 8601 times loggers write.
 */
import { parseDateTimeText, type DateOrder } from "../io/dateTime.ts";
import { isMissingText, parseNumberText } from "../io/valueText.ts";
import { CELL_INVALID, CELL_MEASURED, CELL_MISSING, type UnderwayCellStatus } from "./types.ts";

/** Outcome of reading one cell: the value (NaN unless measured) and its status. */
export interface CellReading {
  value: number;
  status: UnderwayCellStatus;
}

const MISSING: CellReading = { value: Number.NaN, status: CELL_MISSING };
const INVALID: CellReading = { value: Number.NaN, status: CELL_INVALID };

/**
 * Fast path for the plain decimal numbers loggers write ("12.5", "-0.25", "1e-3"): only digits,
 * ".", "e", "E", "+", "-" and at most 64 characters, read with `Number`. Anything else (and any text
 * `Number` rejects) returns undefined so the caller falls back to analysis/io parseNumberText, which
 * accepts the same numbers.
 */
export function fastDecimal(text: string): number | undefined {
  const n = text.length;
  if (n === 0 || n > 64) return undefined;
  for (let i = 0; i < n; i++) {
    const c = text.charCodeAt(i);
    // 0-9 . e E + -
    if (!((c >= 48 && c <= 57) || c === 46 || c === 101 || c === 69 || c === 43 || c === 45)) return undefined;
  }
  const v = Number(text);
  return Number.isFinite(v) ? v : undefined;
}

/**
 * Reads a plain number cell: a number is measured (kept exactly as `Number` parses the text); a
 * missing-value marker of analysis/io (blank, NA, -999, -9999, ...) is missing; anything else is
 * invalid. Below-detection texts are invalid here: flow-through sensors report numbers.
 *
 * @param text the cell text
 * @param decimalComma whether "," is the decimal separator
 * @returns value and status
 */
export function readNumberCell(text: string, decimalComma: boolean): CellReading {
  const v = (decimalComma ? undefined : fastDecimal(text)) ?? parseNumberText(text, { decimalComma });
  if (v !== undefined) {
    if (v === -999 || v === -9999 || v === -99999) return MISSING;
    return { value: v, status: CELL_MEASURED };
  }
  return isMissingText(text) ? MISSING : INVALID;
}

let cachedDay = "";
let cachedDayMs = Number.NaN;

/** Two ASCII digits at i as a number, or -1. */
function two(t: string, i: number): number {
  const a = t.charCodeAt(i) - 48;
  const b = t.charCodeAt(i + 1) - 48;
  return a >= 0 && a <= 9 && b >= 0 && b <= 9 ? a * 10 + b : -1;
}

/** "YYYY-MM-DDTHH:MM:SSZ" (20 characters, the usual logger form) → ms, or NaN. */
function compactIsoUtc(t: string): number {
  if (t.length !== 20 || t.charCodeAt(19) !== 90 || t.charCodeAt(10) !== 84) return Number.NaN;
  if (t.charCodeAt(13) !== 58 || t.charCodeAt(16) !== 58) return Number.NaN;
  const h = two(t, 11);
  const mi = two(t, 14);
  const s = two(t, 17);
  if (h < 0 || h > 23 || mi < 0 || mi > 59 || s < 0 || s > 59) return Number.NaN;
  const day = t.slice(0, 10);
  if (day !== cachedDay) {
    const m = /^(\d{4})-(\d{2})-(\d{2})$/.exec(day);
    if (m === null) return Number.NaN;
    const [y, mo, d] = [Number(m[1]), Number(m[2]), Number(m[3])];
    const ms = Date.UTC(y, mo - 1, d);
    if (mo < 1 || mo > 12 || new Date(ms).getUTCDate() !== d) return Number.NaN;
    cachedDay = day;
    cachedDayMs = ms;
  }
  return cachedDayMs + ((h * 60 + mi) * 60 + s) * 1000;
}

const FAST_ISO = /^(\d{4})-(\d{2})-(\d{2})[T ](\d{2}):(\d{2})(?::(\d{2})(\.\d+)?)?(Z|[+-]\d{2}:?\d{2})?$/;

/** Milliseconds since 1970 of an ISO text from parseDateTimeText (zone-less read as UTC). */
function isoToMs(iso: string): number {
  const t = iso.endsWith("Z") ? iso : iso.length === 10 ? `${iso}T00:00:00Z` : `${iso}Z`;
  const ms = Date.parse(t);
  return Number.isFinite(ms) ? ms : Number.NaN;
}

/** A time reading; `zoned` tells whether the text stated its zone. */
export interface TimeReading extends CellReading {
  zoned: boolean;
}

/**
 * Reads a time cell (or a date cell plus a time-of-day cell) into ms since 1970-01-01 UTC.
 * ISO 8601 date-times ("2026-05-04T10:15:02Z", "2026-05-04 10:15:02.5+02:00") take a fast path;
 * other forms go through analysis/io parseDateTimeText. Times without a zone are read as UTC
 * (reported in the summary).
 *
 * @param text date-time or date text
 * @param order day/month/year order of numeric dates (undefined: ISO or undecided → MDY as analysis/io)
 * @param timeOfDay separate time-of-day text, when the log splits date and time
 * @returns ms since 1970 UTC (NaN unless measured), status, and whether a zone was stated
 */
export function readTimeCell(text: string, order: DateOrder | undefined, timeOfDay?: string): TimeReading {
  const t = text.trim();
  if (timeOfDay === undefined) {
    const quick = compactIsoUtc(t);
    if (!Number.isNaN(quick)) return { value: quick, status: CELL_MEASURED, zoned: true };
    const m = FAST_ISO.exec(t);
    if (m !== null) {
      const [y, mo, d, h, mi] = [Number(m[1]), Number(m[2]), Number(m[3]), Number(m[4]), Number(m[5])];
      const s = m[6] === undefined ? 0 : Number(m[6]);
      const frac = m[7] === undefined ? 0 : Number(m[7]);
      if (mo >= 1 && mo <= 12 && d >= 1 && d <= 31 && h <= 23 && mi <= 59 && s <= 59) {
        let ms = Date.UTC(y, mo - 1, d, h, mi, s) + Math.round(frac * 1000);
        const z = m[8];
        if (z !== undefined && z !== "Z") {
          const sign = z[0] === "+" ? 1 : -1;
          const digits = z.slice(1).replace(":", "");
          ms -= sign * (Number(digits.slice(0, 2)) * 60 + Number(digits.slice(2))) * 60000;
        }
        if (new Date(Date.UTC(y, mo - 1, d)).getUTCDate() === d)
          return { value: ms, status: CELL_MEASURED, zoned: z !== undefined };
      }
    }
  }
  if (t.length === 0 || isMissingText(t)) return { ...MISSING, zoned: false };
  const parsed = parseDateTimeText(t, order, timeOfDay);
  if (parsed === undefined) return { ...INVALID, zoned: false };
  const ms = isoToMs(parsed.iso);
  if (Number.isNaN(ms)) return { ...INVALID, zoned: false };
  return { value: ms, status: CELL_MEASURED, zoned: parsed.iso.endsWith("Z") };
}
