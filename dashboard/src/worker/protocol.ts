/**
 * Messages between the dashboard and its analysis worker. Every request has an
 * id; replies carry the id they answer, and a newer request supersedes older
 * ones (the worker stops work on a superseded request between steps).
 */
import type { ImportIssue, Survey } from "../../../analysis/index.ts";
import type { AnalysisSettings } from "../state/settings.svelte.ts";
import type { TextFile } from "../lib/demoData.ts";
import type { ChannelOverlay, SurveyOverlay } from "./overlay.ts";
import type { AnalysisResult } from "./engine.ts";
import type { ImportRequest, ImportResponse, SetSurveysRequest } from "../import/importProtocol.ts";
import type { UnderwayRequest, UnderwayResponse } from "./underwayProtocol.ts";

export type WorkerRequest =
  | {
      type: "load";
      id: number;
      surveys: TextFile[];
      centerline?: TextFile;
      settings: AnalysisSettings;
    }
  | { type: "analyze"; id: number; settings: AnalysisSettings }
  /** Replace the channel centerline (e.g. one drawn on the map) and re-analyse every survey. */
  | { type: "centerline"; id: number; centerline: TextFile; settings: AnalysisSettings }
  /** Build the self-contained HTML briefing of the analysed surveys (analysis/report). */
  | { type: "briefing"; id: number; basemap?: unknown; dataNotice?: string }
  /** Import flow: inspect or read a dropped file, and hand over surveys already read. */
  | ImportRequest
  | SetSurveysRequest
  /** Underway log: stream, bin and aggregate for the map (see underwayProtocol.ts). */
  | UnderwayRequest;

export type WorkerResponse =
  /** Work in progress: `done` of `total` steps of `stage`. */
  | { type: "progress"; id: number; stage: string; done: number; total: number }
  /** Files read: surveys, problems found, and the channel drawn on the map. */
  | {
      type: "loaded";
      id: number;
      surveys: Survey[];
      issues: ImportIssue[];
      channel: ChannelOverlay | undefined;
    }
  /** One survey analysed, with its map overlay (zones and maxima placed on the channel). */
  | { type: "analysis"; id: number; surveyIndex: number; analysis: AnalysisResult; overlay: SurveyOverlay }
  /** All requested work finished. */
  | { type: "done"; id: number }
  /** Answers of the import flow (see import/importProtocol.ts). */
  | ImportResponse
  /** Underway log progress and result (see underwayProtocol.ts). */
  | UnderwayResponse
  | { type: "error"; id: number; message: string }
  /** The briefing as one self-contained HTML document. */
  | { type: "briefing"; id: number; html: string };
