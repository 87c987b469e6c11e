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

export type WorkerRequest =
  | {
      type: "load";
      id: number;
      surveys: TextFile[];
      centerline?: TextFile;
      settings: AnalysisSettings;
    }
  | { type: "analyze"; id: number; settings: AnalysisSettings };

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
  | { type: "error"; id: number; message: string };
