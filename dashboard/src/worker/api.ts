/**
 * The worker's API: one object whose methods the main thread calls through Comlink
 * (analysis.worker.ts exposes it; client.ts wraps it). It holds the surveys, the channel network
 * (built once, here, by the one centerline reader) and the latest analyses; the main thread keeps
 * only a snapshot of the results and the selection. The same object runs in Node for tests.
 */
import type { ImportIssue, Survey } from "../../../analysis/index.ts";
import type { TextFile } from "./protocol.ts";
import type { ImportChoice } from "./importFile.ts";
import type { FileInspection, FileOutcome, ImportSource } from "./importTypes.ts";
import { inspectFile } from "./inspectFile.ts";
import { importFile } from "./importFile.ts";
import type { AnalysisSettings } from "./protocol.ts";
import { analyse, readChannel, readSurveys, type AnalysisResult, type Channel } from "./engine.ts";
import { briefingHtml, fileProvenance } from "./briefing.ts";
import { brushStretch, type BrushedStretch } from "./brushStretch.ts";
import type { ChannelOverlay } from "./overlay.ts";
import type { AnalysisEvent, AnalysisJob, ProgressCallback } from "./protocol.ts";
import type { UnderwayRequest, UnderwayResult } from "./underwayProtocol.ts";
import { readUnderway } from "./underwayEngine.ts";

/** Lets queued calls (a newer job) arrive between steps. */
function yieldToQueue(): Promise<void> {
  return new Promise((resolve) => setTimeout(resolve, 0));
}

function messageOf(error: unknown): string {
  return error instanceof Error ? `${error.name}: ${error.message}` : String(error);
}

/** Builds the worker's API object with its own held state (one per worker instance). */
export function createWorkerApi() {
  let latestRun = 0;
  let surveys: Survey[] = [];
  let channel: Channel = undefined;
  let channelOverlay: ChannelOverlay | undefined;
  /** Latest analysis of each survey, kept for the briefing and the brushed stretch. */
  let analyses: Array<AnalysisResult | undefined> = [];
  /** The files read (survey files and centerline), for the briefing's provenance table. */
  let files: TextFile[] = [];
  let issues: ImportIssue[] = [];
  let centerlineFile: TextFile | undefined;

  /** Builds the channel from a centerline file; a broken file is reported and leaves no channel. */
  function useCenterline(file: TextFile | undefined, emit: (e: AnalysisEvent) => void): void {
    let built: ReturnType<typeof readChannel>;
    try {
      built = readChannel(file);
    } catch (error) {
      emit({ type: "error", message: `${file?.name ?? "centerline"}: ${messageOf(error)}` });
    }
    centerlineFile = file;
    channel = built?.channel;
    channelOverlay = built?.overlay;
  }

  async function analyseAll(run: number, settings: AnalysisSettings, emit: (e: AnalysisEvent) => void) {
    const total = surveys.length;
    for (let i = 0; i < total; i++) {
      emit({ type: "progress", stage: `Analysing ${surveys[i].name}`, done: i * 100, total: total * 100 });
      await yieldToQueue();
      if (run !== latestRun) return;
      try {
        const name = surveys[i].name;
        const { analysis, overlay } = analyse(surveys[i], channel, channelOverlay, settings, (fraction, label) =>
          emit({
            type: "progress",
            stage: `${name}: ${label}`,
            done: Math.round((i + fraction) * 100),
            total: total * 100,
          }),
        );
        analyses[i] = analysis;
        emit({ type: "analysis", surveyIndex: i, analysis, overlay });
      } catch (error) {
        emit({ type: "error", message: `Survey "${surveys[i].name}": ${messageOf(error)}` });
      }
    }
    emit({ type: "progress", stage: "Analysis complete", done: 1, total: 1 });
    emit({ type: "done" });
  }

  return {
    /**
     * Runs one analysis job, reporting through `onEvent`. A newer call supersedes this one: its
     * remaining surveys are not analysed (the promise still resolves).
     */
    async run(job: AnalysisJob, onEvent: (event: AnalysisEvent) => void): Promise<void> {
      const run = ++latestRun;
      const emit = (e: AnalysisEvent) => {
        if (run === latestRun) onEvent(e);
      };
      try {
        if (job.kind === "load") {
          emit({ type: "progress", stage: "Reading files", done: 0, total: 1 });
          await yieldToQueue();
          const read = readSurveys(job.surveys, (fraction) =>
            emit({ type: "progress", stage: "Reading files", done: Math.round(fraction * 100), total: 100 }),
          );
          useCenterline(job.centerline, emit);
          surveys = read.surveys;
          files = job.surveys;
          issues = read.issues;
        } else if (job.kind === "setSurveys") {
          useCenterline(job.centerline, emit);
          surveys = job.surveys;
          files = [];
          issues = [];
        } else if (job.kind === "centerline") {
          useCenterline(job.centerline, emit);
        }
        if (job.kind !== "analyze") {
          analyses = surveys.map(() => undefined);
          emit({ type: "loaded", surveys, issues, channel: channelOverlay });
        }
        await analyseAll(run, job.settings, emit);
      } catch (error) {
        emit({ type: "error", message: messageOf(error) });
      }
    },

    /** The channel stretch where one survey's salinity lies within a brushed range (km and map paths). */
    brushStretch(surveyIndex: number, range: [number, number] | null): BrushedStretch {
      return brushStretch(channel, analyses[surveyIndex]?.salinityProfile, range);
    },

    /** The self-contained HTML briefing of the analysed surveys (analysis/report). */
    async briefing(basemap: unknown, dataNotice: string | undefined): Promise<string> {
      const done = analyses.filter((a): a is AnalysisResult => a !== undefined);
      const provenance = await fileProvenance(files, centerlineFile);
      return briefingHtml(done, channel, provenance, basemap, dataNotice);
    },

    /** Recognises a dropped file and previews it. */
    inspect(file: ImportSource): Promise<FileInspection> {
      return inspectFile(file);
    },

    /** Reads a dropped file with the confirmed choice; `onProgress` gets the fraction read. */
    read(file: ImportSource, choice: ImportChoice, onProgress?: ProgressCallback): Promise<FileOutcome> {
      const stage = `Reading ${file.name}`;
      onProgress?.(0, stage);
      return importFile(file, choice, (fraction) => onProgress?.(fraction, stage));
    },

    /** Streams, places and aggregates an underway log (the caller transfers the typed arrays back). */
    underway(request: UnderwayRequest, onProgress?: ProgressCallback): Promise<UnderwayResult> {
      return readUnderway(request, onProgress);
    },
  };
}

/** The API the worker exposes (what `Comlink.wrap` turns into async calls on the main thread). */
export type WorkerApi = ReturnType<typeof createWorkerApi>;
