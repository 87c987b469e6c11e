/**
 * Files to surveys and channel: the one entry point from bytes to data (CLI and dashboard worker).
 */
import { emptyConstituentsNotice } from "./emptyConstituents.ts";
import { emptySummary, mergeSummaries } from "../io/importSummary.ts";
import { readGeoJsonPoints } from "../io/geojsonPoints.ts";
import type { ImportResult, ReadSurveyOptions } from "../io/importPipeline.ts";
import { readNetcdfStations } from "../io/netcdfStations.ts";
import { readSurveyText } from "../io/readSurvey.ts";
import { readStationTable, type StationTable } from "../io/stationTable.ts";
import type { ImportIssue } from "../survey/survey.ts";
import { decodeText, detectFileKind, EXPECTED_FILE, type InputFileKind } from "./fileKind.ts";
import { readCenterline, type ChannelInput } from "./readCenterline.ts";
import type { InputChoices, InputFile, InputFileReport, WorkspaceInputs } from "./types.ts";
import { columnReport, placeWithoutCenterline } from "./stationPlacement.ts";
import { appendAll } from "../survey/arrayExtent.ts";

const fileIssue = (file: string, value: string, expected: string): ImportIssue => ({
  file,
  row: 0,
  column: "",
  value,
  expected,
  severity: "error",
});

function readSurveyFile(file: InputFile, kind: InputFileKind, options: ReadSurveyOptions): ImportResult {
  if (kind === "surveyNetcdf") {
    const bytes = typeof file.content === "string" ? new TextEncoder().encode(file.content) : file.content;
    return readNetcdfStations(bytes, options);
  }
  const text = decodeText(file.content);
  return kind === "surveyGeoJson" ? readGeoJsonPoints(text, options) : readSurveyText(text, options);
}

/** The station table of a file as readInputs reads it (the file's saved mapping applied). */
export function readStationTableFile(file: InputFile, choices: InputChoices = {}): StationTable {
  const mapping = choices.mappingByFile?.[file.name];
  return readStationTable(decodeText(file.content), { fileName: file.name, ...(mapping ? { mapping } : {}) });
}

/**
 * One survey file read exactly as readInputs reads it (same options from the choices and the station
 * table), so a caller may read files elsewhere (the CLI's worker threads) and hand the results to
 * readInputs as `preRead`.
 *
 * @param kind the file's kind (a survey kind: surveyText, surveyGeoJson or surveyNetcdf)
 */
export function readSurveyFileAs(
  file: InputFile,
  kind: InputFileKind,
  choices: InputChoices = {},
  stationTable?: StationTable,
  onProgress?: (fraction: number) => void,
): ImportResult {
  const mapping = choices.mappingByFile?.[file.name] ?? (kind === "surveyText" ? choices.mapping : undefined);
  return readSurveyFile(file, kind, {
    fileName: file.name,
    ...(mapping ? { mapping } : {}),
    ...(stationTable ? { stationTable } : {}),
    ...(choices.layer ? { layer: choices.layer } : {}),
    ...(choices.unitOverrides ? { unitOverrides: choices.unitOverrides } : {}),
    ...(choices.dischargeM3s !== undefined ? { riverDischargeM3s: choices.dischargeM3s } : {}),
    ...(onProgress ? { onProgress } : {}),
  });
}

/**
 * A survey file already read by {@link readSurveyFileAs} (with its kind and, optionally, its
 * columnReport for the file's report), keyed by file name.
 */
export type PreReadFiles = ReadonlyMap<
  string,
  { kind: InputFileKind; result?: ImportResult; columns?: ReturnType<typeof columnReport> }
>;

/**
 * Reads input files into surveys and a channel with one file-kind dispatch: delimited text, GeoJSON
 * points and CF-netCDF are surveys; a delimited table with places but nothing measured is a station
 * table (joined to the surveys by station id); GeoJSON lines are the centerline (read by
 * readCenterline with the one mouth rule, its suggestion drawing on the surveys' station salinity).
 * Never throws on bad content: every problem is an issue naming the file (and row, column, value).
 *
 * @param files names and contents (bytes or text)
 * @param choices mapping, unit overrides, layer, mouth, kinds given by the user, off-channel distance, discharge
 * @param preRead files already read elsewhere with {@link readSurveyFileAs} (their kind and result are used as given)
 * @returns surveys, channel, station table, per-file reports, issues and the import summary
 * @throws TypeError when files is not an array of { name, content } (caller mistake)
 */
export function readInputs(
  files: readonly InputFile[],
  choices: InputChoices = {},
  preRead?: PreReadFiles,
): WorkspaceInputs {
  if (!Array.isArray(files)) throw new TypeError(`readInputs(): files must be an array, got ${typeof files}`);
  for (const [i, f] of files.entries())
    if (!f || typeof f.name !== "string" || (typeof f.content !== "string" && !(f.content instanceof Uint8Array)))
      throw new TypeError(`readInputs(): files[${i}] must be { name: string, content: Uint8Array | string }`);
  const { onProgress, ...plain } = choices;
  const issues: ImportIssue[] = [];
  const notices: WorkspaceInputs["notices"] = [];
  const kinds = files.map((f) => {
    const given = choices.kindByFile?.[f.name] ?? preRead?.get(f.name)?.kind;
    if (given) return given;
    const { kind, reason } = detectFileKind(f.content);
    if (kind === "unknown") issues.push(fileIssue(f.name, reason ?? "", EXPECTED_FILE));
    return kind;
  });
  const reports: InputFileReport[] = files.map((f, i) => ({ file: f.name, kind: kinds[i]!, surveys: [] }));

  let stationTable: StationTable | undefined;
  let stationFile = "";
  files.forEach((f, i) => {
    if (kinds[i] !== "stationTable") return;
    if (stationTable) {
      issues.push(fileIssue(f.name, "", `one station table (already read ${stationFile})`));
      return;
    }
    stationFile = f.name;
    stationTable = readStationTableFile(f, choices);
    appendAll(issues, stationTable.issues);
    reports[i]!.mapping = stationTable.mapping;
  });

  const surveyIdx = files.flatMap((_, i) => (kinds[i]!.startsWith("survey") ? [i] : []));
  const results = surveyIdx.map((i, n) => {
    const f = files[i]!;
    const r =
      preRead?.get(f.name)?.result ??
      readSurveyFileAs(
        f,
        kinds[i]!,
        choices,
        stationTable,
        onProgress ? (x: number) => onProgress((n + x) / surveyIdx.length) : undefined,
      );
    Object.assign(reports[i]!, { surveys: r.surveys.map((s) => s.name), summary: r.summary, mapping: r.mapping });
    Object.assign(reports[i]!, preRead?.get(f.name)?.columns ?? columnReport(f, kinds[i]!, r.mapping));
    appendAll(issues, r.issues);
    return r;
  });
  const surveys = results.flatMap((r) => r.surveys);
  const summary = results.map((r) => r.summary).reduce(mergeSummaries, emptySummary());
  const empty = emptyConstituentsNotice(surveys);
  if (empty) notices.push(empty);

  let channel: ChannelInput | undefined;
  files.forEach((f, i) => {
    if (kinds[i] !== "centerline") return;
    if (channel) {
      issues.push(fileIssue(f.name, "", `one centerline (already read ${channel.fileName})`));
      return;
    }
    const stations = surveys.flatMap((s) =>
      s.stations.map((st) => ({ lonLat: st.lonLat, salinity: st.salinity.accepted ? st.salinity.value : undefined })),
    );
    const read = readCenterline(f.content, {
      fileName: f.name,
      ...(choices.mouth !== undefined ? { mouth: choices.mouth } : {}),
      stations,
    });
    appendAll(issues, read.issues);
    channel = read.channel;
  });
  const unmatched = Object.keys(choices.unitOverrides ?? {}).filter(
    (k) =>
      !results.some((r) =>
        r.mapping.columns.some((c) => [c.header, c.name].some((x) => x?.toLowerCase() === k.trim().toLowerCase())),
      ),
  );
  for (const k of unmatched)
    issues.push(
      fileIssue("(unit override)", k, `a column named "${k}" in the survey files (unit override not applied)`),
    );
  const withoutLine =
    channel === undefined && !kinds.includes("centerline")
      ? placeWithoutCenterline(surveys, choices.useStationCenterline !== false, choices.mouth)
      : undefined;
  if (withoutLine) {
    notices.push(...withoutLine.notices);
    if (withoutLine.channel) channel = withoutLine.channel;
    surveys.splice(0, surveys.length, ...withoutLine.surveys);
  }
  onProgress?.(1);
  return {
    surveys,
    notices,
    ...(withoutLine?.offered ? { offeredCenterline: withoutLine.offered } : {}),
    ...(channel ? { channel } : {}),
    ...(stationTable ? { stationTable } : {}),
    files: reports,
    issues,
    summary,
    choices: plain,
  };
}
