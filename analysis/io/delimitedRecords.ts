import Papa from "papaparse";
import type { TextDialect } from "./dialect.ts";
import { stripBom } from "./dialect.ts";

/** One record handed out by the delimited-text readers. */
export interface DelimitedRecord {
  /** The fields as text, exactly as papaparse returned them (quotes removed). */
  fields: string[];
  /** 1-based record number in the file; the header record is 1. */
  row: number;
  /** Problems papaparse reported for this record (unbalanced quotes, ...). */
  parseErrors: string[];
}

/** Receives records one at a time; returning false stops reading. */
export type RecordSink = (record: DelimitedRecord) => void;

function errorsByRow(errors: Papa.ParseError[], baseRow: number): Map<number, string[]> {
  const m = new Map<number, string[]>();
  for (const e of errors) {
    const r = typeof e.row === "number" ? e.row + baseRow : baseRow;
    const list = m.get(r) ?? [];
    list.push(`${e.code}: ${e.message}`);
    m.set(r, list);
  }
  return m;
}

/** Papaparse options shared by both readers. */
function papaOptions(dialect: TextDialect): {
  delimiter: string;
  skipEmptyLines: false;
  newline?: "\r\n" | "\n" | "\r";
} {
  return dialect.newline === undefined
    ? { delimiter: dialect.delimiter, skipEmptyLines: false }
    : { delimiter: dialect.delimiter, skipEmptyLines: false, newline: dialect.newline };
}

/**
 * An opening quote that is never closed makes papaparse read the rest of the file into one field.
 * Splits such a record back: the line holding the opening quote becomes one record marked
 * "UnclosedQuote" (the row reader rejects it, naming the row), and the text after that line is
 * returned to be parsed again as ordinary records, so no later row is swallowed.
 */
function splitUnclosedQuote(
  fields: string[],
  errors: readonly string[],
): { line: string[]; rest: string; column: number } | undefined {
  if (!errors.some((e) => e.startsWith("MissingQuotes"))) return undefined;
  const last = fields.length - 1;
  const tail = fields[last] ?? "";
  const m = /\r\n|\n|\r/.exec(tail);
  if (m === null) return undefined;
  return {
    line: [...fields.slice(0, last), `"${tail.slice(0, m.index)}`],
    rest: tail.slice(m.index + m[0].length),
    column: last,
  };
}

function unclosedMessage(column: number): string {
  return `UnclosedQuote: a quote opened in field ${column + 1} is never closed; this line is rejected and reading resumes on the next line`;
}

function isBlank(fields: readonly string[]): boolean {
  return fields.length === 1 && (fields[0] ?? "").trim() === "";
}

/**
 * Parses text into records from row `firstRow` on, recovering from unclosed quotes.
 *
 * @returns the number of records consumed (including blank ones) and blank lines skipped
 */
function parseFrom(
  text: string,
  dialect: TextDialect,
  sink: RecordSink,
  firstRow: number,
): { records: number; blank: number } {
  const parsed = Papa.parse<string[]>(text, papaOptions(dialect));
  const errs = errorsByRow(parsed.errors, firstRow);
  let blank = 0;
  let records = 0;
  const last = parsed.data.length - 1;
  for (let i = 0; i < parsed.data.length; i++) {
    const fields = parsed.data[i] as string[];
    const row = firstRow + records;
    records += 1;
    if (isBlank(fields)) {
      // The empty record after a final line break is not a blank line.
      if (i !== last || fields[0] !== "") blank += 1;
      continue;
    }
    const errors = errs.get(firstRow + i) ?? [];
    const split = splitUnclosedQuote(fields, errors);
    if (split === undefined) {
      sink({ fields, row, parseErrors: errors });
      continue;
    }
    sink({ fields: split.line, row, parseErrors: [unclosedMessage(split.column)] });
    const more = parseFrom(split.rest, dialect, sink, row + 1);
    records += more.records;
    blank += more.blank;
  }
  return { records, blank };
}

/**
 * Parses a whole delimited text with papaparse and hands every non-blank record to `sink`. A quote
 * that is never closed rejects only its own line (see splitUnclosedQuote).
 *
 * @param text the file content (a leading BOM is removed)
 * @param dialect delimiter and line break to use (see detectDialect, detectNewline)
 * @param sink called once per non-blank record, header first
 * @returns the number of blank lines skipped
 */
export function parseDelimitedText(text: string, dialect: TextDialect, sink: RecordSink): number {
  return parseFrom(stripBom(text), dialect, sink, 1).blank;
}

/** Minimal Node-readable look-alike papaparse's stream reader accepts (on/pause/resume/read). */
interface StreamLike {
  readable: true;
  read: () => null;
  on: (event: string, fn: (arg?: unknown) => void) => void;
  removeListener: (event: string, fn: (arg?: unknown) => void) => void;
  pause: () => void;
  resume: () => void;
}

/**
 * Wraps an async sequence of text chunks as the event-style stream papaparse's streaming reader
 * consumes, so a WHATWG ReadableStream (browser, Web Worker) or any chunk source is parsed in
 * pieces without holding the whole file.
 */
function toStreamLike(chunks: AsyncIterable<string>, onChunk: (chunk: string) => void): StreamLike {
  const listeners = new Map<string, Set<(arg?: unknown) => void>>();
  let paused = false;
  let wake: (() => void) | undefined;
  const emit = (ev: string, arg?: unknown): void => {
    for (const fn of [...(listeners.get(ev) ?? [])]) fn(arg);
  };
  const pump = async (): Promise<void> => {
    try {
      let first = true;
      for await (const raw of chunks) {
        while (paused) await new Promise<void>((r) => (wake = r));
        const chunk = first ? stripBom(raw) : raw;
        first = false;
        onChunk(raw);
        if (chunk.length > 0) emit("data", chunk);
      }
      emit("end");
    } catch (err) {
      emit("error", err);
    }
  };
  const s: StreamLike = {
    readable: true,
    read: () => null,
    on: (ev, fn) => {
      const set = listeners.get(ev) ?? new Set();
      set.add(fn);
      listeners.set(ev, set);
      if (ev === "error") queueMicrotask(() => void pump());
    },
    removeListener: (ev, fn) => listeners.get(ev)?.delete(fn),
    pause: () => (paused = true),
    resume: () => {
      paused = false;
      wake?.();
    },
  };
  return s;
}

/**
 * Streams delimited text through papaparse's chunked reader, record by record.
 *
 * @param chunks the text in pieces (any split points, even inside quoted fields)
 * @param dialect delimiter to use
 * @param sink called once per non-blank record, header first
 * @param onChunk called with every raw chunk after it was read (for progress)
 * @returns a promise of the number of blank lines skipped
 */
export function parseDelimitedChunks(
  chunks: AsyncIterable<string>,
  dialect: TextDialect,
  sink: RecordSink,
  onChunk: (chunk: string) => void = () => undefined,
): Promise<number> {
  return new Promise((resolve, reject) => {
    let row = 0;
    let blank = 0;
    const stream = toStreamLike(chunks, onChunk);
    Papa.parse(stream as unknown as Papa.LocalFile, {
      ...papaOptions(dialect),
      step: (result: Papa.ParseStepResult<string[]>) => {
        row += 1;
        const fields = result.data;
        if (isBlank(fields)) {
          blank += 1;
          return;
        }
        const errors = result.errors.map((e) => `${e.code}: ${e.message}`);
        const split = splitUnclosedQuote(fields, errors);
        if (split === undefined) {
          sink({ fields, row, parseErrors: errors });
          return;
        }
        sink({ fields: split.line, row, parseErrors: [unclosedMessage(split.column)] });
        const more = parseFrom(split.rest, dialect, sink, row + 1);
        row += more.records;
        blank += more.blank;
      },
      complete: () => resolve(blank),
      error: (err: Error) => reject(err),
    });
  });
}
