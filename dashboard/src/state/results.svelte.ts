/**
 * The analysis results: the main thread's snapshot of what the worker holds and found (surveys,
 * channel overlay, problems found while reading, each survey's analysis and map overlay, job
 * status). Filled only from the worker's events; data arrays are `$state.raw`, replaced, never
 * mutated.
 */
import type { FeatureCollection } from "geojson";
import type { ImportIssue, Survey, SurveyComparison } from "../../../analysis/index.ts";
import type { AnalysisEvent, InputNotice } from "../worker/protocol.ts";
import type { AnalysisResult } from "../worker/engine.ts";
import type { ChannelOverlay, SurveyOverlay } from "../worker/overlay.ts";

/** A copy of `items` with `value` at `index` (the arrays here are replaced, never mutated). */
function replacedAt<T>(items: readonly T[], index: number, value: T): T[] {
  const out = [...items];
  out[index] = value;
  return out;
}

export type ResultsStatus = "idle" | "reading" | "analysing" | "ready" | "error";

/** Progress of the running worker job. */
export interface Progress {
  stage: string;
  done: number;
  total: number;
}

export class AnalysisResults {
  surveys = $state.raw<Survey[]>([]);
  issues = $state.raw<ImportIssue[]>([]);
  channel = $state.raw<ChannelOverlay | undefined>(undefined);
  /** Basemap GeoJSON (water, land, marsh, place labels), drawn by MapLibre. */
  basemap = $state.raw<FeatureCollection | undefined>(undefined);
  /** Analysis results by survey index (undefined until the worker answers). */
  analyses = $state.raw<Array<AnalysisResult | undefined>>([]);
  overlays = $state.raw<Array<SurveyOverlay | undefined>>([]);
  /** The worker's comparison of the surveys (the workspace API's), once every survey is analysed. */
  comparison = $state.raw<SurveyComparison | undefined>(undefined);
  /** Why there is no comparison, when the worker could not make one. */
  comparisonReason = $state<string | undefined>(undefined);
  status = $state<ResultsStatus>("idle");
  progress = $state<Progress | null>(null);
  /** Choices made for the user while reading (layer, distances from the mouth...), to state. */
  notices = $state.raw<InputNotice[]>([]);
  /** Without a centerline: the one built from the station positions, offered to the user (GeoJSON feature). */
  offeredCenterline = $state.raw<object | undefined>(undefined);
  /** Errors reported by the worker, newest last. */
  errors = $state.raw<string[]>([]);

  /** How many of the surveys have their analysis (the survey on screen comes first, the rest after). */
  readonly analysedCount = $derived(this.analyses.filter((a) => a !== undefined).length);
  /**
   * "Analysing k of n surveys…" while a job still works on the surveys Compare, the archive and the
   * briefing need; undefined once every survey is in (or nothing runs).
   */
  readonly waitingText: string | undefined = $derived(
    (this.status === "analysing" || this.status === "reading") && this.surveys.length > 1
      ? `Analysing the surveys: ${this.analysedCount} of ${this.surveys.length} done…`
      : undefined,
  );

  /** Folds one worker event into the results. */
  receive(message: AnalysisEvent): void {
    switch (message.type) {
      case "progress":
        this.progress = { stage: message.stage, done: message.done, total: message.total };
        if (this.status !== "reading" || message.done > 0) this.status = "analysing";
        break;
      case "loaded":
        this.surveys = message.surveys;
        this.issues = message.issues;
        this.channel = message.channel;
        this.notices = message.notices ?? [];
        this.offeredCenterline = message.offeredCenterline;
        this.analyses = message.surveys.map(() => undefined);
        this.overlays = message.surveys.map(() => undefined);
        this.status = "analysing";
        this.comparison = undefined;
        this.comparisonReason = undefined;
        break;
      case "comparison":
        this.comparison = message.comparison;
        this.comparisonReason = message.reason;
        break;
      case "overlay":
        // The marks of the survey's constituent on screen, before its analysis (never over a complete one).
        if (this.analyses[message.surveyIndex] === undefined)
          this.overlays = replacedAt(this.overlays, message.surveyIndex, message.overlay);
        break;
      case "analysis":
        this.analyses = replacedAt(this.analyses, message.surveyIndex, message.analysis);
        this.overlays = replacedAt(this.overlays, message.surveyIndex, message.overlay);
        break;
      case "done":
        this.status = "ready";
        this.progress = null;
        break;
      case "error":
        this.errors = [...this.errors, message.message];
        this.status = this.surveys.length > 0 ? "ready" : "error";
        break;
    }
  }

  /** Marks the start of a new job (files are being read, or settings changed). */
  begin(reading: boolean): void {
    this.comparison = undefined;
    this.comparisonReason = undefined;
    this.status = reading ? "reading" : "analysing";
    this.progress = { stage: reading ? "Reading files" : "Analysing", done: 0, total: 1 };
  }
}
