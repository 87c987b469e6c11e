/**
 * Reads one dropped file with analysis/io (runs in the analysis worker):
 * delimited surveys are streamed with progress, GeoJSON points and netCDF are
 * read whole, a centerline is checked by building the channel, a station
 * table is read for joining. Problems come back as issues, never thrown.
 */
import {
  readGeoJsonPoints,
  readNetcdfStations,
  readStationTable,
  readSurveyStream,
  stripBom,
  type ColumnMapping,
  type LayerChoice,
  type ReadSurveyOptions,
  type StationTable,
} from "../../../analysis/index.ts";
import { readChannel } from "./engine.ts";
import type { FileKind, FileOutcome, ImportSource } from "./importTypes.ts";

/** What the user confirmed for one file. */
export interface ImportChoice {
  kind: FileKind;
  /** Confirmed mapping (delimited text). */
  mapping?: ColumnMapping;
  /** Station table to join by station id. */
  stationTable?: StationTable;
  /** Depth layer to keep per station and time (absent: the reader's default). */
  layer?: LayerChoice;
}

/** Bytes per slice when a file is streamed (progress is reported once per slice). */
export const STREAM_SLICE_BYTES = 256 * 1024;

/** A Blob as a sequence of byte slices; the reader decodes UTF-8 across slice boundaries. */
async function* blobChunks(file: Blob, sliceBytes = STREAM_SLICE_BYTES): AsyncGenerator<Uint8Array> {
  for (let offset = 0; offset < file.size; offset += sliceBytes) {
    yield new Uint8Array(await file.slice(offset, offset + sliceBytes).arrayBuffer());
  }
}

function fileIssue(file: string, value: string, expected: string): FileOutcome["issues"][number] {
  return { file, row: 0, column: "", value, expected, severity: "error" };
}

/**
 * Reads one file of a known kind.
 *
 * @param file the file
 * @param choice kind, confirmed mapping and station table
 * @param onProgress fraction of the file read, 0…1
 * @returns surveys, issues, summary and mapping; or the centerline / station table
 */
export async function importFile(
  file: ImportSource,
  choice: ImportChoice,
  onProgress?: (fraction: number) => void,
): Promise<FileOutcome> {
  const name = file.name;
  const empty: FileOutcome = { fileName: name, kind: choice.kind, surveys: [], issues: [] };
  const options: ReadSurveyOptions = {
    fileName: name,
    ...(choice.mapping ? { mapping: choice.mapping } : {}),
    ...(choice.stationTable ? { stationTable: choice.stationTable } : {}),
    ...(choice.layer ? { layer: choice.layer } : {}),
    ...(onProgress ? { onProgress } : {}),
  };
  const fromResult = (r: Awaited<ReturnType<typeof readSurveyStream>>): FileOutcome => ({
    ...empty,
    surveys: r.surveys,
    issues: r.issues,
    summary: r.summary,
    mapping: r.mapping,
    layer: r.layer,
  });
  switch (choice.kind) {
    case "surveyText":
      return fromResult(
        await readSurveyStream(
          // Streamed in slices where Blob.arrayBuffer() exists; otherwise read whole (jsdom).
          typeof file.arrayBuffer === "function" ? blobChunks(file) : [await file.text()],
          { ...options, totalSize: file.size },
        ),
      );
    case "surveyGeoJson":
      return fromResult(readGeoJsonPoints(await file.text(), options));
    case "surveyNetcdf":
      return fromResult(readNetcdfStations(new Uint8Array(await file.arrayBuffer()), options));
    case "stationTable": {
      const table = readStationTable(await file.text(), {
        fileName: name,
        ...(choice.mapping ? { mapping: choice.mapping } : {}),
      });
      return { ...empty, issues: table.issues, stationTable: table, mapping: table.mapping };
    }
    case "centerline": {
      const text = stripBom(await file.text());
      const read = readChannel({ name, text });
      if (read.channel) return { ...empty, centerline: read.channel.geojson as object, issues: read.issues };
      return {
        ...empty,
        issues: read.issues.length > 0 ? read.issues : [fileIssue(name, "", "a usable channel centerline")],
      };
    }
    default:
      return { ...empty, issues: [fileIssue(name, "", "a survey table, GeoJSON or netCDF file")] };
  }
}
