import type { ColumnMapping } from "./columnMapping.ts";
import type { CompiledMapping } from "./compileMapping.ts";
import type { TextDialect } from "./dialect.ts";
import type { DelimitedRecord } from "./delimitedRecords.ts";
import type { ImportResult, ReadSurveyOptions } from "./importPipeline.ts";
import { chooseMapping, finishImport, startRows } from "./importPipeline.ts";
import type { RowReader } from "./rowReader.ts";

/** Records buffered before the mapping is chosen (header + sample rows for suggestMapping). */
const SAMPLE_ROWS = 50;

/** Buffers the header and the first records, then hands every record to the row reader. */
export class RecordRouter {
  private buffer: DelimitedRecord[] = [];
  headers: string[] = [];
  mapping: ColumnMapping | undefined;
  reader: RowReader | undefined;
  compiled: CompiledMapping | undefined;
  constructor(
    private readonly dialect: TextDialect,
    private readonly options: ReadSurveyOptions,
  ) {}
  push = (rec: DelimitedRecord): void => {
    if (this.reader !== undefined) return this.reader.read(rec);
    this.buffer.push(rec);
    if (this.buffer.length > SAMPLE_ROWS) this.start();
  };
  start(): void {
    if (this.reader !== undefined) return;
    const [head, ...rest] = this.buffer;
    this.headers =
      head === undefined ? [] : head.fields.map((h, i) => (h.trim() === "" ? `column ${i + 1}` : h.trim()));
    const chosen = chooseMapping(
      this.headers,
      rest.map((r) => r.fields),
      this.options,
    );
    // Record the dialect the file was read with, so a saved mapping replays it.
    this.mapping = {
      ...chosen,
      delimiter: chosen.delimiter ?? this.dialect.delimiter,
      decimalComma: chosen.decimalComma ?? this.dialect.decimalComma,
    };
    const { reader, compiled } = startRows(this.headers, this.mapping, this.dialect, this.options);
    this.reader = reader;
    this.compiled = compiled;
    if (head === undefined)
      reader.issues.push({
        file: this.options.fileName,
        row: 0,
        column: "",
        value: "",
        expected: "a header row and data rows (the file is empty)",
        severity: "error",
      });
    const unclosed = head?.parseErrors.find((e) => e.startsWith("UnclosedQuote"));
    if (head !== undefined && unclosed !== undefined)
      reader.issues.push({
        file: this.options.fileName,
        row: 1,
        column: "",
        value: head.fields.join(",").slice(0, 200),
        expected: `a header row with balanced quotes (${unclosed.slice(15)})`,
        severity: "error",
      });
    for (const r of rest) reader.read(r);
    this.buffer = [];
  }
  finish(blankLines: number): ImportResult {
    this.start();
    const reader = this.reader as RowReader;
    reader.summary.blankLines = blankLines;
    if (this.headers.length > 0 && reader.summary.rowsRead === 0) {
      reader.issues.push({
        file: this.options.fileName,
        row: 1,
        column: "",
        value: this.headers.join(",").slice(0, 200),
        expected: `data rows below the header (the file holds only a header row of ${this.headers.length} column${this.headers.length === 1 ? "" : "s"}${this.headers.length === 1 ? " — a truncated file or an undetected delimiter?" : ""})`,
        severity: "error",
      });
    }
    return finishImport(
      reader,
      this.compiled as CompiledMapping,
      this.mapping as ColumnMapping,
      this.headers,
      this.dialect,
      this.options,
    );
  }
}
