import type { ValueCell } from "../survey/survey.ts";

/**
 * Missing-value markers recognised in survey files (compared case-insensitively after trimming).
 * Common practice in exchanged water-quality tables; the numeric sentinels -999/-9999 are the
 * fill values many instruments and databases write.
 */
export const MISSING_MARKERS: readonly string[] = [
  "",
  "na",
  "n/a",
  "null",
  "none",
  "-",
  "--",
  "-999",
  "-999.0",
  "-999.9",
  "-9999",
  "-9999.0",
  "-99999",
];

/** Below-detection words without a limit (compared case-insensitively, dots and spaces ignored). */
export const BELOW_DETECTION_WORDS: readonly string[] = [
  "bdl",
  "nd",
  "<dl",
  "<lod",
  "bd",
  "<loq",
  "belowdl",
  "lod",
  "dl",
];

const NUMBER_DOT = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;
const NUMBER_COMMA = /^[+-]?(\d+,?\d*|,\d+)([eE][+-]?\d+)?$/;

/** Options for {@link parseNumberText}. */
export interface NumberTextOptions {
  /** true when the file writes the decimal separator as a comma ("12,5"). */
  decimalComma?: boolean;
}

/**
 * Reads a plain decimal number, with "." or (when `decimalComma`) "," as the decimal separator.
 * Thousands separators are not accepted (ambiguous between locales); such text is not a number.
 *
 * @param text the cell text (trimmed by the caller or not)
 * @param options decimal separator choice
 * @returns the finite number, or undefined when the text is not a plain finite number
 */
export function parseNumberText(text: string, options: NumberTextOptions = {}): number | undefined {
  const t = text.trim();
  if (t.length === 0 || t.length > 64) return undefined;
  let normal: string;
  if (options.decimalComma === true) {
    if (!NUMBER_COMMA.test(t)) return NUMBER_DOT.test(t) && !t.includes(".") ? Number(t) : undefined;
    normal = t.replace(",", ".");
  } else {
    if (!NUMBER_DOT.test(t)) return undefined;
    normal = t;
  }
  const v = Number(normal);
  return Number.isFinite(v) ? v : undefined;
}

/** True when the text is one of the {@link MISSING_MARKERS}. */
export function isMissingText(text: string): boolean {
  return MISSING_MARKERS.includes(text.trim().toLowerCase());
}

function squeeze(text: string): string {
  return text.trim().toLowerCase().replace(/[\s.]/g, "");
}

/**
 * Turns one cell's text into a {@link ValueCell}, keeping the original text.
 *
 * - number → status "measured";
 * - `<0.05`, `< 0.05`, `<0,05` (decimal comma) → "belowDetection" with detectionLimit 0.05;
 * - `BDL`, `ND`, `n.d.`, `<DL`, `<LOD` → "belowDetection" without a limit;
 * - blank, `NA`, `N/A`, `-999`, `-9999` → "missing";
 * - anything else, including `NaN` and `Infinity` (not numbers, and not a declared missing marker),
 *   → "invalid" (the caller reports an ImportIssue naming the text).
 *
 * @param text the cell text as found in the file
 * @param options decimal separator choice
 * @returns the parsed cell; `accepted` is true except for invalid cells
 */
export function parseValueText(text: string, options: NumberTextOptions = {}): ValueCell {
  const original = text;
  const v = parseNumberText(text, options);
  if (v !== undefined) {
    if (v === -999 || v === -9999 || v === -99999)
      return { value: undefined, original, status: "missing", accepted: true };
    return { value: v, original, status: "measured", accepted: true };
  }
  if (isMissingText(text)) return { value: undefined, original, status: "missing", accepted: true };
  const t = text.trim();
  if (t.startsWith("<")) {
    const limit = parseNumberText(t.slice(1).replace(/^=/, ""), options);
    if (limit !== undefined && limit >= 0) {
      return { value: undefined, original, status: "belowDetection", detectionLimit: limit, accepted: true };
    }
  }
  if (BELOW_DETECTION_WORDS.includes(squeeze(t))) {
    return { value: undefined, original, status: "belowDetection", accepted: true };
  }
  return { value: undefined, original, status: "invalid", accepted: false };
}
