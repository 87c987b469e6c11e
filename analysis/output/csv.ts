/**
 * The one CSV writer of Brackline (CLI, dashboard exports, briefing attachments): RFC 4180 fields,
 * CRLF line ends, and spreadsheet-formula neutralisation of text cells.
 *
 * @see Shafranovich, Y. (2005) Common Format and MIME Type for CSV Files, IETF RFC 4180, §2.
 * @see OWASP Foundation (2023) CSV Injection (text cells starting with = + - @ TAB CR are prefixed with a quote).
 */

/** A cell value: numbers are written in full precision, missing and non-finite values as an empty field. */
export type CsvValue = string | number | boolean | null | undefined;

/** First characters that make a spreadsheet read a text cell as a formula. */
const FORMULA_START = /^[=+\-@\t\r]/;
/** A plain number written as text ("-1.5", "+2e-3"): left as it is, a spreadsheet reads it as a number. */
const PLAIN_NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

/**
 * Neutralises a text cell that a spreadsheet would run as a formula: a cell starting with
 * `=`, `+`, `-`, `@`, TAB or CR gets a leading apostrophe. Plain numbers ("-3.2") stay as they are.
 *
 * @param text the cell text
 * @returns the text, safe to open in a spreadsheet
 */
export function neutraliseFormula(text: string): string {
  return FORMULA_START.test(text) && !PLAIN_NUMBER.test(text) ? `'${text}` : text;
}

/** Machine-readable number text: shortest round-trip form; "" for a non-finite number. */
export function csvNumber(x: number): string {
  return Number.isFinite(x) ? String(x) : "";
}

/** One field: neutralised, quoted and escaped as needed; missing and non-finite values are empty. */
export function csvField(v: CsvValue): string {
  if (v === null || v === undefined) return "";
  if (typeof v === "number") return csvNumber(v);
  if (typeof v === "boolean") return v ? "true" : "false";
  const t = neutraliseFormula(v);
  return /[",\r\n]/.test(t) || t !== t.trim() ? `"${t.replace(/"/g, '""')}"` : t;
}

/**
 * A whole CSV document: header row, then the rows, each line ending in CRLF.
 *
 * @throws RangeError when a row has a different number of fields than the header
 */
export function toCsv(header: readonly string[], rows: ReadonlyArray<readonly CsvValue[]>): string {
  for (const [i, r] of rows.entries()) {
    if (r.length !== header.length)
      throw new RangeError(`toCsv(): row ${i} has ${r.length} fields, header has ${header.length}`);
  }
  return [header, ...rows].map((r) => r.map(csvField).join(",") + "\r\n").join("");
}
