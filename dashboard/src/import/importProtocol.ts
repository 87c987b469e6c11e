/**
 * The import flow's messages to and from the analysis worker. Import requests
 * are answered on their own id and never supersede an analysis under way.
 */
import type { Survey } from "../../../analysis/index.ts";
import type { AnalysisSettings } from "../state/settings.svelte.ts";
import type { TextFile } from "../lib/demoData.ts";
import type { ImportChoice } from "./importFile.ts";
import type { FileInspection, FileOutcome, ImportSource } from "./importTypes.ts";

export type ImportRequest =
  /** Recognise a file and preview it. */
  | { type: "inspect"; id: number; file: ImportSource }
  /** Read a file with the confirmed choice, posting progress. */
  | { type: "import"; id: number; file: ImportSource; choice: ImportChoice };

/** Surveys already read (an import or a restored workspace): replace the loaded set and analyse. */
export interface SetSurveysRequest {
  type: "setSurveys";
  id: number;
  surveys: Survey[];
  centerline?: TextFile;
  settings: AnalysisSettings;
}

export type ImportResponse =
  | { type: "inspected"; id: number; inspection: FileInspection }
  | { type: "imported"; id: number; outcome: FileOutcome };

/** True for the requests the import handler answers. */
export function isImportRequest(request: { type: string }): request is ImportRequest {
  return request.type === "inspect" || request.type === "import";
}
