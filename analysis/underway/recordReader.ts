/**
 * Turns the records of an underway log (from analysis/io's papaparse readers) into columns,
 * one record at a time, so a log of any length is read with memory proportional to its values.
 */
import type { DelimitedRecord } from "../io/delimitedRecords.ts";
import type { TextDialect } from "../io/dialect.ts";
import { detectDateOrder, type DateOrder } from "../io/dateTime.ts";
import { underwayColumnRoles, type UnderwayColumnRole } from "./headerRoles.ts";
import { IssueLog } from "./issueLog.ts";
import { GrowableFloat64, GrowableUint32, GrowableUint8 } from "./growableColumns.ts";
import { readTimeCell } from "./cellText.ts";
import { ValueColumns } from "./valueColumns.ts";
import { PositionReader } from "./positionReader.ts";
import type { UnderwayImport, UnderwaySummary } from "./types.ts";

/** Data records looked at before the column roles are fixed (date order, date-time columns). */
const SAMPLE_RECORDS = 20;

/** Options of the underway readers. */
export interface ReadUnderwayOptions {
  /** File name used in every issue. */
  fileName: string;
  /** Field delimiter / decimal comma; detected from the start of the file when absent. */
  delimiter?: string;
  decimalComma?: boolean;
  /** Issues kept in full (default 1,000); every issue is still counted by reason. */
  issueCap?: number;
  /** Progress callback, fraction of the input read 0…1. */
  onProgress?: (fraction: number) => void;
}

/** Record-by-record builder of an {@link UnderwayImport}. */
export class UnderwayRecordReader {
  readonly #file: string;
  readonly #dialect: TextDialect;
  /** The dialect the records are read with. */
  get dialect(): TextDialect {
    return this.#dialect;
  }
  readonly #log: IssueLog;
  #headers: string[] | undefined;
  #roles: UnderwayColumnRole[] = [];
  #pending: DelimitedRecord[] | undefined = [];
  #order: DateOrder | undefined;
  #time: { col: number; header: string; dayCol: number } | undefined;
  #zoneless = false;
  readonly #timeText = new Map<number, string>();
  #values: ValueColumns | undefined;
  #position: PositionReader | undefined;
  readonly #rows = new GrowableUint32();
  readonly #timeMs = new GrowableFloat64();
  readonly #accepted = new GrowableUint8();
  readonly #summary: UnderwaySummary;

  constructor(dialect: TextDialect, options: ReadUnderwayOptions) {
    this.#file = options.fileName;
    this.#dialect = dialect;
    this.#log = new IssueLog(options.issueCap);
    this.#summary = {
      rowsRead: 0,
      rowsAccepted: 0,
      rowsRejected: 0,
      rejectedByReason: {},
      issuesByReason: this.#log.byReason,
      issueCount: 0,
      issueCap: this.#log.cap,
      blankLines: 0,
      timesAssumedUtc: false,
    };
  }

  /** Takes the next record (header first). */
  readonly push = (record: DelimitedRecord): void => {
    if (this.#headers === undefined) {
      this.#headers = record.fields.map((h) => h.trim());
      return;
    }
    if (this.#pending !== undefined) {
      this.#pending.push(record);
      if (this.#pending.length >= SAMPLE_RECORDS) this.#start();
      return;
    }
    this.#read(record);
  };

  #start(): void {
    const headers = this.#headers ?? [];
    const pending = this.#pending ?? [];
    this.#pending = undefined;
    const sample = pending.map((r) => r.fields);
    this.#roles = underwayColumnRoles(headers, sample);
    const col = (role: string) => this.#roles.find((r) => r.role === role);
    const t = col("time") ?? col("date");
    if (t !== undefined) {
      this.#order = detectDateOrder(sample.map((r) => r[t.index] ?? ""));
      this.#time = { col: t.index, header: t.header, dayCol: t.role === "date" ? (col("timeOfDay")?.index ?? -1) : -1 };
    } else
      this.#log.add(
        "no time column",
        this.#file,
        1,
        "",
        headers.join(", "),
        "a time column (e.g. time, date_time)",
        "warning",
      );
    this.#position = new PositionReader(this.#roles, this.#file, this.#dialect.decimalComma, this.#log);
    this.#values = new ValueColumns(this.#roles, this.#file, this.#dialect.decimalComma, this.#log);
    for (const r of pending) this.#read(r);
  }

  #read(record: DelimitedRecord): void {
    const { fields, row } = record;
    const s = this.#summary;
    s.rowsRead += 1;
    if (record.parseErrors.length > 0)
      this.#log.add(
        "malformed record",
        this.#file,
        row,
        "",
        fields.join(this.#dialect.delimiter),
        record.parseErrors.join("; "),
        "warning",
      );
    this.#rows.push(row);
    const tm = this.#time;
    if (tm === undefined) this.#timeMs.push(Number.NaN);
    else {
      const text = fields[tm.col] ?? "";
      const r = readTimeCell(text, this.#order, tm.dayCol >= 0 ? (fields[tm.dayCol] ?? "") : undefined);
      if (r.status === 2) this.#timeText.set(this.#rows.length - 1, text);
      if (r.status === 2)
        this.#log.add(
          "unreadable time",
          this.#file,
          row,
          tm.header,
          text,
          "an ISO 8601 date-time (e.g. 2026-05-04T10:15:02Z) or a date and time",
        );
      else if (r.status === 0 && !r.zoned) this.#zoneless = true;
      this.#timeMs.push(r.value);
    }
    const reason = this.#position!.read(fields, row, this.#rows.length - 1);
    this.#values!.read(fields, row, this.#rows.length - 1);
    if (reason === undefined) {
      s.rowsAccepted += 1;
      this.#accepted.push(1);
    } else {
      s.rowsRejected += 1;
      s.rejectedByReason[reason] = (s.rejectedByReason[reason] ?? 0) + 1;
      this.#accepted.push(0);
    }
  }

  /** Ends the file; `blankLines` is the count the papaparse reader skipped. */
  finish(blankLines: number): UnderwayImport {
    if (this.#headers === undefined) {
      this.#headers = [];
      this.#log.add("empty file", this.#file, 0, "", "", "a header row and data rows");
    }
    if (this.#pending !== undefined) this.#start();
    const s = this.#summary;
    s.blankLines = blankLines;
    s.issueCount = this.#log.count;
    s.timesAssumedUtc = this.#zoneless;
    const n = this.#rows.length;
    const pos = this.#position!.finish();
    const roles = this.#headers.map((_, i) => this.#roles.find((r) => r.index === i)?.role ?? ("ignored" as const));
    return {
      data: {
        file: this.#file,
        n,
        sourceRow: this.#rows.trimmed(),
        timeMs: this.#timeMs.trimmed(),
        lonDeg: pos.lonDeg,
        latDeg: pos.latDeg,
        accepted: this.#accepted.trimmed(),
        columns: this.#values!.finish(),
        originalText: {
          ...(this.#time !== undefined && this.#timeText.size > 0 ? { [this.#time.header]: this.#timeText } : {}),
          ...pos.originalText,
          ...this.#values!.originalText,
        },
      },
      issues: this.#log.issues,
      summary: s,
      headers: this.#headers,
      dialect: this.#dialect,
      roles,
    };
  }
}
