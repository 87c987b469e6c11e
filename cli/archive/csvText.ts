/** CSV text for the archive table (RFC 4180 quoting by papaparse). */
import Papa from "papaparse";

/** Header and rows as CSV text; numbers with 8 significant digits, empty cells for missing values. */
export function csvText(
  header: readonly string[],
  rows: ReadonlyArray<ReadonlyArray<string | number | undefined>>,
): string {
  const cell = (v: string | number | undefined): string =>
    v === undefined ? "" : typeof v === "number" ? String(Number(v.toPrecision(8))) : v;
  return `${Papa.unparse({ fields: [...header], data: rows.map((r) => r.map(cell)) }, { newline: "\n" })}\n`;
}
