/**
 * The worker's bridge to analysis/: everything goes through the one input-to-results API the CLI
 * uses (analysis/workspace readInputs → analyzeInputs). The channel network is built once, here, by
 * the one centerline reader (readCenterline, one mouth rule); the map overlays come from
 * analyzeInputs too. The only dashboard file that calls the analysis API; it runs the same in Node.
 */
import {
  analyzeInputs,
  emptySummary,
  plottedObservations,
  surveyOverlay,
  placeWithoutCenterline,
  readCenterline,
  readDischargeTable,
  readInputs,
  type ChannelInput,
  type ConstituentPart,
  type DischargeTable,
  type ConstituentSettings,
  type ImportIssue,
  type InputFile,
  type Survey,
  type SurveyAnalysis,
  type WorkspaceInputs,
  type WorkspaceSettings,
  emptyConstituentsNotice,
} from "../../../analysis/index.ts";
import type { AnalysisSettings, SourceFile, TextFile } from "./protocol.ts";
import type { ChannelOverlay, SurveyOverlay } from "./overlay.ts";

/** The survey analysis as the panels and the map read it. */
export type AnalysisResult = SurveyAnalysis;

function inputFile(file: SourceFile): InputFile {
  return { name: file.name, content: "text" in file ? file.text : file.bytes };
}

/**
 * Reads survey files and a centerline with readInputs (the CLI's reader): one file-kind dispatch,
 * the centerline read with the one mouth rule (its suggestion using the surveys' salinity).
 */
export function readFiles(
  surveys: SourceFile[],
  centerline: TextFile | undefined,
  onProgress?: (fraction: number) => void,
): WorkspaceInputs {
  const files = [...surveys, ...(centerline ? [centerline] : [])].map(inputFile);
  return readInputs(files, {
    ...(centerline ? { kindByFile: { [centerline.name]: "centerline" as const } } : {}),
    ...(onProgress ? { onProgress } : {}),
  });
}

/** The channel of a centerline file, read by readCenterline with the surveys' stations as mouth evidence. */
export function readChannel(
  file: TextFile | undefined,
  surveys: readonly Survey[] = [],
  mouth?: "start" | "end",
): { channel: ChannelInput | undefined; issues: ImportIssue[] } {
  if (!file) return { channel: undefined, issues: [] };
  const stations = surveys.flatMap((s) =>
    s.stations.map((st) => ({ lonLat: st.lonLat, salinity: st.salinity.accepted ? st.salinity.value : undefined })),
  );
  const read = readCenterline(file.text, { fileName: file.name, stations, ...(mouth ? { mouth } : {}) });
  return { channel: read.channel, issues: read.issues };
}

/**
 * Inputs from surveys already read (an import or a restored workspace) and a centerline file. Without
 * a centerline the centerline built from the station positions is the channel, with readInputs' notice
 * (the CLI's rule, placeWithoutCenterline); it is also offered to the draw tool for editing.
 */
export function inputsOf(
  surveys: Survey[],
  centerline: TextFile | undefined,
  mouth?: "start" | "end",
): WorkspaceInputs {
  const { channel, issues } = readChannel(centerline, surveys, mouth);
  const base = { files: [], issues, summary: emptySummary(), choices: mouth ? { mouth } : {} };
  // The notice readInputs gives when the files are read, given again for surveys read earlier.
  const empty = emptyConstituentsNotice(surveys);
  const emptyNotices = empty ? [empty] : [];
  if (centerline || surveys.length === 0)
    return { surveys, ...(channel ? { channel } : {}), ...base, notices: emptyNotices };
  const placed = placeWithoutCenterline(surveys, true, mouth);
  return {
    surveys: placed.surveys,
    ...base,
    ...(placed.channel ? { channel: placed.channel } : {}),
    notices: [...emptyNotices, ...placed.notices],
    ...(placed.offered ? { offeredCenterline: placed.offered } : {}),
  };
}

/** Per-constituent settings for analyzeInputs from the dashboard's settings. */
function constituentSettings(settings: AnalysisSettings): Record<string, ConstituentSettings> {
  const out: Record<string, ConstituentSettings> = {};
  const names = new Set([...Object.keys(settings.endmemberOverrides), ...Object.keys(settings.precisionPercent)]);
  for (const name of names) {
    const o = settings.endmemberOverrides[name];
    const rel = settings.precisionPercent[name];
    out[name] = {
      ...(o?.river ? { river: o.river } : {}),
      ...(o?.sea ? { sea: o.sea } : {}),
      ...(rel !== undefined ? { precision: { relative: rel / 100, absolute: 0 } } : {}),
    };
  }
  return out;
}

let lastTable: { file: TextFile; table: DischargeTable } | undefined;

/** The discharge table of a file, read by the analysis' reader (the last one kept: every survey of a run uses it). */
export function dischargeTableOf(file: TextFile): DischargeTable {
  if (lastTable?.file.name !== file.name || lastTable.file.text !== file.text)
    lastTable = { file, table: readDischargeTable(file.text, file.name) };
  return lastTable.table;
}

/** The analyzeInputs settings of the dashboard's settings (same bootstrap defaults as the CLI). */
export function workspaceSettings(settings: AnalysisSettings): WorkspaceSettings {
  return {
    saltIntrusionSalinity: settings.saltIntrusionSalinity,
    ...(settings.riverDischargeM3s !== undefined ? { riverDischargeM3s: settings.riverDischargeM3s } : {}),
    ...(settings.dischargeTable ? { dischargeTable: dischargeTableOf(settings.dischargeTable) } : {}),
    constituents: constituentSettings(settings),
  };
}

/**
 * Analyses one survey of the inputs with analyzeInputs; `onStep` reports progress as a fraction with
 * a label. With `part` only that part of its constituents (see `mergeParts`).
 */
export function analyse(
  inputs: WorkspaceInputs,
  survey: Survey,
  settings: AnalysisSettings,
  onStep?: (fraction: number, label: string) => void,
  part?: ConstituentPart,
): { analysis: AnalysisResult; overlay: SurveyOverlay } {
  const choices = {
    ...inputs.choices,
    ...(settings.offChannelM !== undefined ? { offChannelM: settings.offChannelM } : {}),
    ...(settings.keepOffChannel ? { keepOffChannel: true } : {}),
  };
  const results = analyzeInputs(
    { ...inputs, surveys: [survey], choices },
    {
      ...workspaceSettings(settings),
      ...(onStep ? { onProgress: onStep } : {}),
      ...(part ? { constituentPart: part } : {}),
    },
  );
  const [first] = results.surveys;
  return { analysis: first!.analysis, overlay: first!.overlay };
}

/**
 * One survey's analysis from the analyses of the parts of its constituents (`analyse` with `part`,
 * the parts together covering every constituent): the survey-wide parts are the same in each, the
 * constituents are put back in the survey's order, and the plotted observations and the map overlay
 * are made from the whole, as analyzeInputs makes them. Equal to `analyse` without parts.
 *
 * @param channel the channel overlay of `inputs.channel` (channelOverlay), which holds its km ticks
 */
export function mergeParts(
  inputs: WorkspaceInputs,
  survey: Survey,
  parts: ReadonlyArray<Pick<AnalysisResult, "constituents">>,
  base: AnalysisResult,
  channel: ChannelOverlay | undefined,
): { analysis: AnalysisResult; overlay: SurveyOverlay } {
  const rank = new Map(survey.constituents.map((c, i) => [c.name, i]));
  const constituents = parts
    .flatMap((p) => p.constituents)
    .sort((a, b) => (rank.get(a.name) ?? Infinity) - (rank.get(b.name) ?? Infinity));
  const analysis: AnalysisResult = { ...base, constituents };
  analysis.observations = plottedObservations(survey, analysis);
  return { analysis, overlay: surveyOverlay(analysis, inputs.channel?.network, channel?.ticks ?? []) };
}
