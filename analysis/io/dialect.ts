import Papa from "papaparse";

/** How a delimited text file is written. */
export interface TextDialect {
  /** Field delimiter: ",", ";", "\t" or "|". */
  delimiter: string;
  /** True when numbers use a decimal comma ("12,5"); only possible when the delimiter is not ",". */
  decimalComma: boolean;
  /** Line break of the file, detected once on its beginning so the text and stream readers agree. */
  newline?: "\r\n" | "\n" | "\r";
}

/**
 * The line break a text uses, chosen as papaparse chooses it (quoted text removed; "\n" when it
 * comes before any "\r"; else "\r\n" when at least half the "\r" are followed by "\n"; else "\r"),
 * so the whole-text and the chunked reader agree even when the header is longer than a chunk.
 *
 * @param sample the beginning of the file
 * @returns the line break, or undefined when the sample holds none outside quotes
 */
export function detectNewline(sample: string): "\r\n" | "\n" | "\r" | undefined {
  const text = sample.replace(/"[^]*?"/g, "");
  const r = text.split("\r");
  const n = text.split("\n");
  if (r.length === 1 && n.length === 1) return undefined;
  if (r.length === 1 || (n.length > 1 && (n[0] ?? "").length < (r[0] ?? "").length)) return "\n";
  let withN = 0;
  for (const part of r) if (part.startsWith("\n")) withN += 1;
  return withN >= r.length / 2 ? "\r\n" : "\r";
}

/** Delimiters tried by {@link detectDialect}, in order of preference on a tie. */
export const CANDIDATE_DELIMITERS: readonly string[] = [",", ";", "\t", "|"];

/** Removes a leading UTF-8 byte-order mark (U+FEFF) if present. */
export function stripBom(text: string): string {
  return text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
}

function scoreDelimiter(sample: string, delimiter: string): number {
  const parsed = Papa.parse<string[]>(sample, { delimiter, preview: 30, skipEmptyLines: true });
  const rows = parsed.data;
  if (rows.length === 0) return 0;
  const width = rows[0].length;
  if (width < 2) return 0;
  let consistent = 0;
  for (const r of rows) if (r.length === width) consistent += 1;
  // Consistency across rows first, then the number of columns it produces.
  return (consistent / rows.length) * 1000 + Math.min(width, 999);
}

const DOT_DECIMAL = /^[+-]?\d+\.\d+$/;
const COMMA_DECIMAL = /^[+-]?\d+,\d+$/;

/**
 * Detects the field delimiter and the decimal separator of a delimited text sample.
 *
 * Each candidate delimiter is tried with papaparse on the first 30 records; the one giving the most
 * consistent field count (then the most columns) wins. A decimal comma is assumed only when the
 * delimiter is not a comma and comma-decimal cells ("12,5") outnumber dot-decimal cells ("12.5").
 *
 * @param sample the beginning of the file (a few kilobytes are enough), BOM already removed or not
 * @returns the detected dialect; "," and decimal point when nothing better is found
 */
export function detectDialect(sample: string): TextDialect {
  // A file's head is examined by several readers (kind, mapping, rows), and readInputs recognises
  // every file before it reads any: the answers for the last few samples are kept.
  const known = recentDialects.get(sample);
  if (known !== undefined) return { ...known };
  const dialect = detectDialectOf(sample);
  recentDialects.set(sample, dialect);
  if (recentDialects.size > RECENT_DIALECTS) recentDialects.delete(recentDialects.keys().next().value!);
  return { ...dialect };
}

/** Samples whose dialect is kept (each at most 64 K characters). */
const RECENT_DIALECTS = 8;
const recentDialects = new Map<string, TextDialect>();

function detectDialectOf(sample: string): TextDialect {
  const text = stripBom(sample);
  let best = ",";
  let bestScore = -1;
  for (const d of CANDIDATE_DELIMITERS) {
    const s = scoreDelimiter(text, d);
    if (s > bestScore) {
      best = d;
      bestScore = s;
    }
  }
  let decimalComma = false;
  if (best !== ",") {
    const parsed = Papa.parse<string[]>(text, { delimiter: best, preview: 50, skipEmptyLines: true });
    let commas = 0;
    let dots = 0;
    for (const row of parsed.data.slice(1)) {
      for (const cell of row) {
        const t = cell.trim().replace(/^</, "").trim();
        if (COMMA_DECIMAL.test(t)) commas += 1;
        else if (DOT_DECIMAL.test(t)) dots += 1;
      }
    }
    decimalComma = commas > dots;
  }
  return { delimiter: best, decimalComma };
}
