/**
 * Types of the dashboard's data import flow: what a dropped file is, what the
 * worker found in its first rows, and what reading it produced. All plain data
 * (structured-clone safe) so they cross the worker boundary.
 */
import {
  FILE_KIND_LABELS,
  type InputFileKind,
  type ColumnMapping,
  type ImportIssue,
  type ImportSummary,
  type LayerChoice,
  type StationTable,
  type Survey,
  type TextDialect,
  type UnusedColumn,
} from "../../../analysis/index.ts";

/** A file to import: a browser File (streamed in the worker) or text already in memory. */
export type ImportSource = Blob & { name: string };

/** What a file holds, recognised from its content (analysis/workspace's file kinds). */
export type FileKind = InputFileKind;

/** Human names of the file kinds (the workspace API's). */
export { FILE_KIND_LABELS };

/** The first look at a file: its kind, and for delimited text its headers, preview and suggested mapping. */
export interface FileInspection {
  fileName: string;
  sizeBytes: number;
  kind: FileKind;
  headers: string[];
  /** The first data rows as cell texts in header order. */
  previewRows: string[][];
  /** Suggested mapping (delimited text only). */
  suggested?: ColumnMapping;
  dialect?: TextDialect;
  /** Why the file was not recognised, when kind is "unknown". */
  message?: string;
}

/** What reading one file produced. */
export interface FileOutcome {
  fileName: string;
  kind: FileKind;
  surveys: Survey[];
  issues: ImportIssue[];
  summary?: ImportSummary;
  mapping?: ColumnMapping;
  /** Parsed centerline GeoJSON (kind "centerline"). */
  centerline?: object;
  /** Station table (kind "stationTable"). */
  stationTable?: StationTable;
  /** The depth layer kept (surveys): the chosen one, else the reader's default for the file. */
  layer?: LayerChoice;
  /** Numeric columns that were not used (no unit, not recognised, not a mixing tracer...), with the reason. */
  notUsed?: UnusedColumn[];
}
