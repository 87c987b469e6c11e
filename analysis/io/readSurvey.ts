import { requireOptions, requireString } from "./argChecks.ts";
import type { TextDialect } from "./dialect.ts";
import { detectDialect, detectNewline, stripBom } from "./dialect.ts";
import { parseDelimitedChunks, parseDelimitedText } from "./delimitedRecords.ts";
import type { ImportResult, ReadSurveyOptions } from "./importPipeline.ts";
import { RecordRouter } from "./recordRouter.ts";

function dialectFor(sample: string, options: ReadSurveyOptions): TextDialect {
  const m = options.mapping;
  const detected = detectDialect(sample);
  const delimiter = options.delimiter ?? m?.delimiter ?? detected.delimiter;
  const decimalComma = options.decimalComma ?? m?.decimalComma ?? (delimiter === "," ? false : detected.decimalComma);
  const newline = detectNewline(sample);
  return newline === undefined ? { delimiter, decimalComma } : { delimiter, decimalComma, newline };
}

/**
 * Reads a survey file given as text (CSV, TSV or semicolon-separated with decimal comma; UTF-8
 * with or without BOM; quoted fields) with papaparse, following the confirmed, saved or suggested
 * column mapping. Never throws on bad data: every problem is an ImportIssue with file, row, column
 * and value, and every data row is counted as accepted or rejected in the summary. Row numbers count
 * records (header = 1), so a quoted field spanning lines does not shift them.
 *
 * @param text the file content
 * @param options file name, mapping, station table, layer, grouping, discharge, progress
 * @returns surveys, issues, summary, the mapping used, headers and dialect
 * @throws TypeError when text is not a string or options.fileName is missing (caller mistakes)
 */
export function readSurveyText(text: string, options: ReadSurveyOptions): ImportResult {
  requireString("readSurveyText", "text", text);
  requireOptions("readSurveyText", options);
  const clean = stripBom(text);
  const dialect = dialectFor(clean.slice(0, 65536), options);
  const router = new RecordRouter(dialect, options);
  const blank = parseDelimitedText(clean, dialect, router.push);
  return router.finish(blank);
}

/** Text in pieces: a WHATWG ReadableStream or any (async) iterable of strings or UTF-8 bytes. */
export type TextChunkSource =
  ReadableStream<Uint8Array | string> | AsyncIterable<Uint8Array | string> | Iterable<Uint8Array | string>;

async function* decodeChunks(source: TextChunkSource, counter: { size: number }): AsyncGenerator<string> {
  const decoder = new TextDecoder("utf-8");
  const iterable: AsyncIterable<Uint8Array | string> | Iterable<Uint8Array | string> =
    typeof (source as ReadableStream).getReader === "function"
      ? readAll(source as ReadableStream<Uint8Array | string>)
      : (source as AsyncIterable<Uint8Array | string>);
  for await (const chunk of iterable) {
    counter.size += chunk.length;
    yield typeof chunk === "string" ? chunk : decoder.decode(chunk, { stream: true });
  }
  const tail = decoder.decode();
  if (tail.length > 0) yield tail;
}

async function* readAll<T>(stream: ReadableStream<T>): AsyncGenerator<T> {
  const reader = stream.getReader();
  try {
    for (;;) {
      const { done, value } = await reader.read();
      if (done) return;
      yield value;
    }
  } finally {
    reader.releaseLock();
  }
}

/**
 * Streams a large survey file through papaparse's chunked reader. The delimiter is detected on the
 * first 64 KiB; the mapping is chosen after the first 50 records; progress is reported as the
 * fraction of `totalSize` read (characters for string chunks, bytes for byte chunks).
 *
 * @param source the file in chunks (split anywhere, also inside quoted fields)
 * @param options as for readSurveyText, plus totalSize for progress
 * @returns a promise of the same result readSurveyText gives for the whole text
 * @throws TypeError when the source is not a stream or iterable, or options.fileName is missing
 */
export async function readSurveyStream(
  source: TextChunkSource,
  options: ReadSurveyOptions & { totalSize?: number },
): Promise<ImportResult> {
  requireOptions("readSurveyStream", options);
  if (source === null || typeof source !== "object") {
    throw new TypeError(
      `readSurveyStream(): source must be a ReadableStream or an iterable of chunks, got ${typeof source}`,
    );
  }
  const counter = { size: 0 };
  const chunks = decodeChunks(source, counter);
  let head = "";
  const early: string[] = [];
  while (head.length < 65536) {
    const next = await chunks.next();
    if (next.done === true) break;
    early.push(next.value);
    head += next.value;
  }
  const dialect = dialectFor(stripBom(head).slice(0, 65536), options);
  const router = new RecordRouter(dialect, options);
  const total = options.totalSize;
  const early0 = early.length;
  let handed = 0;
  async function* all(): AsyncGenerator<string> {
    yield* early;
    yield* chunks;
  }
  // Progress: share of totalSize read so far (the early chunks count once they are handed to the parser).
  const blank = await parseDelimitedChunks(all(), dialect, router.push, () => {
    handed += 1;
    if (total === undefined || total <= 0) return;
    const sizeSoFar =
      handed <= early0 ? Math.min(counter.size, (counter.size * handed) / Math.max(early0, 1)) : counter.size;
    options.onProgress?.(Math.min(1, sizeSoFar / total));
  });
  return router.finish(blank);
}
