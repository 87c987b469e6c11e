/**
 * Entry points of the underway reader: a whole text, or a stream of chunks parsed with
 * papaparse's chunked reader (analysis/io delimitedRecords) so a log of a million records is never
 * held as text or as row objects.
 */
import { requireOptions, requireString } from "../io/argChecks.ts";
import { detectDialect, stripBom, type TextDialect } from "../io/dialect.ts";
import { parseDelimitedChunks, parseDelimitedText } from "../io/delimitedRecords.ts";
import type { TextChunkSource } from "../io/readSurvey.ts";
import { UnderwayRecordReader, type ReadUnderwayOptions } from "./recordReader.ts";
import type { UnderwayImport } from "./types.ts";

const HEAD_CHARS = 65536;

function dialectOf(head: string, options: ReadUnderwayOptions): TextDialect {
  const detected = detectDialect(stripBom(head).slice(0, HEAD_CHARS));
  const delimiter = options.delimiter ?? detected.delimiter;
  const decimalComma = options.decimalComma ?? (delimiter === "," ? false : detected.decimalComma);
  return { delimiter, decimalComma };
}

/**
 * Reads a whole underway log given as text (CSV, TSV or semicolon-separated with decimal comma;
 * UTF-8 with or without BOM). Columns are recognised from the headers (time, latitude, longitude,
 * salinity or conductivity + temperature, temperature, fluorescence, turbidity). Never throws on
 * bad data: every problem cell is an issue (file, row, column, original text, expected) and every
 * record is counted as accepted or rejected by reason.
 *
 * @param text the file content
 * @param options file name, dialect overrides, issue cap, progress
 * @returns columns (typed arrays), issues (capped), summary, headers, dialect and column roles
 * @throws TypeError when text is not a string or options.fileName is missing
 */
export function readUnderwayText(text: string, options: ReadUnderwayOptions): UnderwayImport {
  requireString("readUnderwayText", "text", text);
  requireOptions("readUnderwayText", options);
  const clean = stripBom(text);
  const reader = new UnderwayRecordReader(dialectOf(clean.slice(0, HEAD_CHARS), options), options);
  const blank = parseDelimitedText(clean, reader.dialect, reader.push);
  options.onProgress?.(1);
  return reader.finish(blank);
}

async function* decode(source: TextChunkSource, counter: { size: number }): AsyncGenerator<string> {
  const decoder = new TextDecoder("utf-8");
  let iterable: AsyncIterable<Uint8Array | string> | Iterable<Uint8Array | string>;
  if (typeof (source as ReadableStream).getReader === "function") {
    const reader = (source as ReadableStream<Uint8Array | string>).getReader();
    iterable = {
      async *[Symbol.asyncIterator]() {
        try {
          for (;;) {
            const { done, value } = await reader.read();
            if (done) return;
            yield value;
          }
        } finally {
          reader.releaseLock();
        }
      },
    };
  } else iterable = source as AsyncIterable<Uint8Array | string>;
  for await (const chunk of iterable) {
    counter.size += chunk.length;
    yield typeof chunk === "string" ? chunk : decoder.decode(chunk, { stream: true });
  }
  const tail = decoder.decode();
  if (tail.length > 0) yield tail;
}

/**
 * Streams an underway log through papaparse's chunked reader into typed columns. The dialect is
 * detected on the first 64 KiB; the column roles are fixed after the first 20 records. Memory
 * grows with the number of values (8 bytes per number, 1 status byte per cell), not with the text.
 *
 * @param source the file in chunks: a ReadableStream or (async) iterable of strings or UTF-8 bytes
 * @param options as for readUnderwayText, plus totalSize (characters or bytes) for progress
 * @returns a promise of the same result readUnderwayText gives for the whole text
 * @throws TypeError when source is not a stream or iterable, or options.fileName is missing
 */
export async function readUnderwayStream(
  source: TextChunkSource,
  options: ReadUnderwayOptions & { totalSize?: number },
): Promise<UnderwayImport> {
  requireOptions("readUnderwayStream", options);
  if (source === null || typeof source !== "object")
    throw new TypeError(
      `readUnderwayStream(): source must be a ReadableStream or an iterable of chunks, got ${typeof source}`,
    );
  const counter = { size: 0 };
  const chunks = decode(source, counter);
  const early: string[] = [];
  let headLength = 0;
  while (headLength < HEAD_CHARS) {
    const next = await chunks.next();
    if (next.done === true) break;
    early.push(next.value);
    headLength += next.value.length;
  }
  const reader = new UnderwayRecordReader(dialectOf(early.join("").slice(0, HEAD_CHARS), options), options);
  async function* all(): AsyncGenerator<string> {
    yield* early;
    yield* chunks;
  }
  const total = options.totalSize;
  const blank = await parseDelimitedChunks(all(), reader.dialect, reader.push, () => {
    if (total !== undefined && total > 0) options.onProgress?.(Math.min(1, counter.size / total));
  });
  options.onProgress?.(1);
  return reader.finish(blank);
}
