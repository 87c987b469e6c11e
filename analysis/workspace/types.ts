/**
 * Types of the one input-to-results API (readInputs → analyzeInputs), shared by the CLI, the dashboard
 * worker and the tests. All plain data (structured-clone safe) so they cross a worker boundary.
 */
import type { ColumnMapping } from "../io/columnMapping.ts";
import type { ImportSummary } from "../io/importSummary.ts";
import type { LayerChoice } from "../io/layerSelection.ts";
import type { StationTable } from "../io/stationTable.ts";
import type { MouthOption } from "../geometry/types.ts";
import type { ImportIssue, Survey } from "../survey/survey.ts";
import type { InputFileKind } from "./fileKind.ts";
import type { ChannelInput } from "./readCenterline.ts";
import type { MissingUnit, UnusedColumn } from "../io/mappingChoices.ts";
import type { StationCenterline } from "../pipeline/centerlineFromStations.ts";

/** One input file: its name (as shown in messages) and content. */
export interface InputFile {
  name: string;
  /** Bytes as read from disk or a Blob; text is accepted too (not for netCDF). */
  content: Uint8Array | string;
}

/**
 * Everything the user chose about the inputs. The CLI fills it from its options (cli/options.ts), the
 * dashboard from its dialogs; readInputs is the only reader of it.
 */
export interface InputChoices {
  /** Column mapping applied to every delimited survey file (a saved or confirmed mapping). */
  mapping?: ColumnMapping;
  /** Column mapping by file name; wins over `mapping`. */
  mappingByFile?: Readonly<Record<string, ColumnMapping>>;
  /** Unit overrides, column or constituent name → unit text (e.g. { "Fe": "µg/L" }). */
  unitOverrides?: Readonly<Record<string, string>>;
  /** Depth layer kept per station and time (default: every row). */
  layer?: LayerChoice;
  /** Which end of the main stem is the mouth; overrides what the centerline file says. */
  mouth?: MouthOption;
  /** Kind by file name, where the user said what a file is (`--stations`, `--centerline`); else recognised. */
  kindByFile?: Readonly<Record<string, InputFileKind>>;
  /** Stations farther than this from the centerline are off-channel [m] (analysis default when absent). */
  offChannelM?: number;
  /** Keep off-channel stations in the fits and end-members (they are still listed). */
  keepOffChannel?: boolean;
  /** Non-mixing variables (oxygen, chlorophyll, particles...) to analyse against the dilution line all the same. */
  analyseAsTracers?: readonly string[];
  /**
   * Without a centerline file the centerline built from the station positions is the channel, with a
   * notice (the CLI and the dashboard alike; the dashboard then lets the user edit or replace it in its
   * draw tool). `false` only offers it (`offeredCenterline`) and orients the station table's distances.
   */
  useStationCenterline?: boolean;
  /** River discharge [m³/s] for all surveys, or by survey name. */
  dischargeM3s?: number | Readonly<Record<string, number>>;
  /** Progress of reading, fraction 0…1 over all files. */
  onProgress?: (fraction: number) => void;
}

/** What was read from one file. */
export interface InputFileReport {
  file: string;
  kind: InputFileKind;
  surveys: string[];
  summary?: ImportSummary;
  /** The mapping used (delimited text and station tables). */
  mapping?: ColumnMapping;
  /** Constituent columns without a usable unit, with the option that supplies it. */
  missingUnits?: MissingUnit[];
  /** Numeric columns neither used nor reported as errors, with the reason. */
  notUsed?: UnusedColumn[];
}

/** Everything readInputs produces: surveys, the channel, what each file was, and every problem. */
export interface WorkspaceInputs {
  surveys: Survey[];
  channel?: ChannelInput;
  stationTable?: StationTable;
  files: InputFileReport[];
  /** Every problem, with file, row, column, value and what was expected. */
  issues: ImportIssue[];
  /** Rows read, accepted and rejected over all survey files. */
  summary: ImportSummary;
  /** Choices made for the user (layer, centerline from stations, distances from the mouth), to state. */
  notices: Array<{ code: string; message: string }>;
  /** Without a centerline file: a centerline built from the station positions, to offer in the draw tool. */
  offeredCenterline?: StationCenterline;
  /** The choices that apply to the analysis (callbacks removed). */
  choices: Omit<InputChoices, "onProgress">;
}
