import Papa from "papaparse";
import type { ImportResult } from "../../analysis/io/importPipeline.ts";
import type { ImportedStation } from "../../analysis/io/importSummary.ts";

/**
 * The promises every import keeps, whatever the input (README: "nothing is dropped silently"):
 * rows read = accepted + rejected; every rejected row and every unreadable cell is named by an
 * issue with file, row, column and value. Returns the broken promises (empty when all hold).
 */
export function importProblems(res: ImportResult, file: string): string[] {
  const bad: string[] = [];
  const s = res.summary;
  if (s.rowsRead !== s.rowsAccepted + s.rowsRejected)
    bad.push(`rows read ${s.rowsRead} ≠ accepted ${s.rowsAccepted} + rejected ${s.rowsRejected}`);
  const byReason = Object.values(s.rejectedByReason).reduce((a, b) => a + b, 0);
  if (byReason !== s.rowsRejected) bad.push(`rejected by reason ${byReason} ≠ rejected ${s.rowsRejected}`);
  for (const i of res.issues) {
    if (i.file !== file) bad.push(`issue names file "${i.file}"`);
    if (!Number.isInteger(i.row) || i.row < 0) bad.push(`issue row ${i.row}`);
    if (typeof i.column !== "string" || typeof i.value !== "string") bad.push("issue without column/value text");
    if (i.value.length > 201) bad.push(`issue value of ${i.value.length} characters`);
    if (i.expected.trim() === "") bad.push("issue without an expectation");
  }
  const kept = new Set(
    res.surveys.flatMap((sv) =>
      sv.stations.flatMap((st) => (st as ImportedStation).contributingRows ?? [st.sourceRow]),
    ),
  );
  const rejectedNamed = new Set(
    res.issues
      .filter((i) => i.row > 1 && !kept.has(i.row) && i.column !== "" && i.value !== undefined)
      .map((i) => i.row),
  );
  if (rejectedNamed.size !== s.rowsRejected)
    bad.push(`${s.rowsRejected} rejected rows but ${rejectedNamed.size} named with row, column and value`);
  for (const sv of res.surveys)
    for (const st of sv.stations) {
      for (const c of sv.constituents) {
        const cell = st.values[c.name];
        if (cell === undefined) continue;
        if (cell.value !== undefined && !Number.isFinite(cell.value))
          bad.push(`non-finite ${c.name} on row ${st.sourceRow}`);
        if (
          cell.status === "invalid" &&
          (st as ImportedStation).contributingRows === undefined &&
          !res.issues.some((i) => i.row === st.sourceRow && i.column === c.header)
        )
          bad.push(`invalid ${c.name} on row ${st.sourceRow} without an issue naming column "${c.header}"`);
      }
      if (st.salinity.value !== undefined && !Number.isFinite(st.salinity.value)) bad.push("non-finite salinity");
    }
  return bad;
}

/** A stack-trace line ("    at fn (file.ts:12:5)") or an internal-error banner. */
export function hasStackTrace(stderr: string): boolean {
  return /\n\s+at .+(\(|\s)[^\s()]+:\d+:\d+\)?/.test(stderr) || /: internal error:/i.test(stderr);
}

/** Terminal control characters: C0 except tab and line feed, DEL, and C1 (ESC sequences, CSI). */
// eslint-disable-next-line no-control-regex -- matching control characters is the point
export const CONTROL_CHARS = /[\u0000-\u0008\u000b-\u001f\u007f-\u009f]/;

/**
 * Every place a JSON document holds NaN, ±Infinity or null where a number belongs, and every
 * estimate ({ value, lower, upper }) whose value lies outside its interval.
 */
export function numberProblems(doc: unknown, path = "$", out: string[] = []): string[] {
  if (out.length > 20) return out;
  if (typeof doc === "number") {
    if (!Number.isFinite(doc)) out.push(`${path} = ${doc}`);
    return out;
  }
  if (doc === null) {
    out.push(`${path} = null`);
    return out;
  }
  if (Array.isArray(doc)) {
    doc.forEach((v, i) => numberProblems(v, `${path}[${i}]`, out));
    return out;
  }
  if (typeof doc === "object") {
    const o = doc as Record<string, unknown>;
    if (typeof o.value === "number" && typeof o.lower === "number" && typeof o.upper === "number") {
      const tol = 1e-9 * Math.max(1, Math.abs(o.value));
      if (!(o.lower - tol <= o.value && o.value <= o.upper + tol))
        out.push(`${path}: estimate ${o.value} outside its interval [${o.lower}, ${o.upper}]`);
    }
    for (const [k, v] of Object.entries(o)) numberProblems(v, `${path}.${k}`, out);
  }
  return out;
}

/**
 * CSV cells a spreadsheet would run as a formula: text beginning with "=", "+", "-", "@", tab or
 * carriage return that is not a plain number (OWASP, "CSV Injection": prefix such cells with a
 * single quote).
 */
export function formulaCells(csv: string): string[] {
  const rows = Papa.parse<string[]>(csv, { skipEmptyLines: true }).data;
  const bad: string[] = [];
  for (const row of rows)
    for (const cell of row)
      if (/^[=+\-@\t\r]/.test(cell) && !/^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(cell)) bad.push(cell);
  return bad;
}
