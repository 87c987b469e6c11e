import { requireOptions } from "./argChecks.ts";
import { NetCDFReader } from "netcdfjs";
import type { ColumnAssignment, ColumnMapping } from "./columnMapping.ts";
import { fileShapeSignature } from "./fileShape.ts";
import type { ImportResult, ReadSurveyOptions } from "./importPipeline.ts";
import { makeIssue } from "./importSummary.ts";
import { RecordRouter } from "./recordRouter.ts";
import { cfColumn, netcdfColumns } from "./netcdfColumns.ts";

/**
 * Reads CF-convention station or profile data from a netCDF-3 file (classic or 64-bit offset) with
 * netcdfjs. Variables are recognised by their standard_name (CF Standard Name Table): time (CF time
 * units such as "days since 1970-01-01"), latitude, longitude, depth, sea_water_practical_salinity,
 * sea_water_temperature, pH; the station id comes from the variable with cf_role timeseries_id or
 * profile_id; other variables whose units attribute is a concentration become constituents. Data on
 * the salinity variable's dimensions become rows; variables on a subset of those dimensions (per
 * station or per depth) are repeated. _FillValue/missing_value cells become missing. Float values
 * are written back to text with 7 significant digits (float32 precision) as the cells' original text.
 * Never throws on bad data: an unreadable file is a file-level error.
 *
 * @param buffer the file bytes (ArrayBuffer or Uint8Array)
 * @param options as for readSurveyText (a given mapping replaces the CF-derived one)
 * @returns surveys, issues, summary, mapping and headers
 * @throws TypeError when buffer is not an ArrayBuffer/Uint8Array or options.fileName is missing
 * @see Eaton, B. et al., 2023. NetCDF Climate and Forecast (CF) Metadata Conventions 1.11, §4 and ch. 9 (discrete sampling geometries).
 */
export function readNetcdfStations(buffer: ArrayBuffer | Uint8Array, options: ReadSurveyOptions): ImportResult {
  requireOptions("readNetcdfStations", options);
  if (!(buffer instanceof ArrayBuffer) && !(buffer instanceof Uint8Array)) {
    throw new TypeError(`readNetcdfStations(): buffer must be an ArrayBuffer or Uint8Array, got ${typeof buffer}`);
  }
  const file = options.fileName;
  let reader: NetCDFReader | undefined;
  let failure = "";
  try {
    reader = new NetCDFReader(buffer);
  } catch (err) {
    failure = err instanceof Error ? err.message : String(err);
  }
  const built = reader === undefined ? undefined : safeColumns(reader);
  if (reader === undefined || built === undefined || "error" in built) {
    const router = new RecordRouter({ delimiter: ",", decimalComma: false }, options);
    const result = router.finish(0);
    const why =
      reader === undefined ? failure : built !== undefined && "error" in built ? built.error : "unreadable variables";
    result.issues.unshift(
      makeIssue(file, 0, "", why.slice(0, 200), "a netCDF-3 file with CF station or profile variables"),
    );
    return result;
  }
  const { columns, rowCount } = built;
  const headers = columns.map((c) => c.header);
  const assignments: ColumnAssignment[] = columns.map((c) => cfColumn(c));
  const mapping: ColumnMapping = options.mapping ?? { shape: fileShapeSignature(headers), columns: assignments };
  const router = new RecordRouter({ delimiter: ",", decimalComma: false }, { ...options, mapping });
  router.push({ fields: headers, row: 1, parseErrors: [] });
  for (let r = 0; r < rowCount; r += 1)
    router.push({ fields: columns.map((c) => c.text(r)), row: r + 2, parseErrors: [] });
  const result = router.finish(0);
  result.issues.unshift(...built.issues.map((i) => ({ ...i, file })));
  return result;
}

function safeColumns(reader: NetCDFReader): ReturnType<typeof netcdfColumns> | undefined {
  try {
    return netcdfColumns(reader);
  } catch (err) {
    return { error: err instanceof Error ? err.message : String(err) };
  }
}
