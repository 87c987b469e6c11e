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

/**
 * Parses a whole delimited text with papaparse and hands every non-blank record to `sink`.
 *
 * @param text the file content (a leading BOM is removed)
 * @param dialect delimiter to use (see detectDialect)
 * @param sink called once per non-blank record, header first
 * @returns the number of blank lines skipped
 */
export function parseDelimitedText(text: string, dialect: TextDialect, sink: RecordSink): number {
  const parsed = Papa.parse<string[]>(stripBom(text), { delimiter: dialect.delimiter, skipEmptyLines: false });
  const errs = errorsByRow(parsed.errors, 1);
  let blank = 0;
  const last = parsed.data.length - 1;
  parsed.data.forEach((fields, i) => {
    const row = i + 1;
    if (fields.length === 1 && fields[0].trim() === "") {
      // The empty record after a final line break is not a blank line.
      if (i !== last || fields[0] !== "") blank += 1;
      return;
    }
    sink({ fields, row, parseErrors: errs.get(row) ?? [] });
  });
  return blank;
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
      delimiter: dialect.delimiter,
      skipEmptyLines: false,
      step: (result: Papa.ParseStepResult<string[]>) => {
        row += 1;
        const fields = result.data;
        if (fields.length === 1 && fields[0].trim() === "") {
          blank += 1;
          return;
        }
        sink({ fields, row, parseErrors: result.errors.map((e) => `${e.code}: ${e.message}`) });
      },
      complete: () => resolve(blank),
      error: (err: Error) => reject(err),
    });
  });
}
