/** CSV writing after RFC 4180: CRLF line ends, fields quoted when they hold a comma, quote, CR or LF. */

export type CsvValue = string | number | boolean | null | undefined;

/** One field, quoted and escaped as needed; non-finite numbers and missing values are empty. */
export function csvField(v: CsvValue): string {
  if (v === null || v === undefined) return "";
  if (typeof v === "number") return Number.isFinite(v) ? String(v) : "";
  if (typeof v === "boolean") return v ? "true" : "false";
  return /[",\r\n]/.test(v) || v !== v.trim() ? `"${v.replace(/"/g, '""')}"` : v;
}

/** A whole CSV document: header row, then the rows, each line ending in CRLF. */
export function toCsv(header: readonly string[], rows: ReadonlyArray<readonly CsvValue[]>): string {
  for (const [i, r] of rows.entries()) {
    if (r.length !== header.length)
      throw new RangeError(`toCsv(): row ${i} has ${r.length} fields, header has ${header.length}`);
  }
  return [header, ...rows].map((r) => r.map(csvField).join(",") + "\r\n").join("");
}
