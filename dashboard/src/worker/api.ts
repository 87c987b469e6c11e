/**
 * The worker's API: one object whose methods the main thread calls through Comlink
 * (analysis.worker.ts exposes it; client.ts wraps it). It holds the surveys, the channel network
 * (built once, here, by the one centerline reader) and the latest analyses; the main thread keeps
 * only a snapshot of the results and the selection. The same object runs in Node for tests.
 */
import {
  channelOverlay,
  exportWorkspace,
  importWorkspace,
  workspaceComparison,
  type ConstituentPart,
  type Season,
  type WorkspaceDocument,
  type WorkspaceInputs,
} from "../../../analysis/index.ts";
import type { TextFile } from "./protocol.ts";
import type { ImportChoice } from "./importFile.ts";
import type { FileInspection, FileOutcome, ImportSource } from "./importTypes.ts";
import { inspectFile } from "./inspectFile.ts";
import { importFile } from "./importFile.ts";
import type { AnalysisSettings } from "./protocol.ts";
import { analyse, inputsOf, mergeParts, readFiles, type AnalysisResult } from "./engine.ts";
import { briefingHtml, fileProvenance } from "./briefing.ts";
import { brushStretch, type BrushedStretch } from "./brushStretch.ts";
import type { ChannelOverlay } from "./overlay.ts";
import type { AnalysisEvent, AnalysisJob, JobOrder, ProgressCallback, SourceFile } from "./protocol.ts";
import type { UnderwayPoints, UnderwayRequest, UnderwayResult, UnderwayView } from "./underwayProtocol.ts";
import { readUnderway, viewUnderway } from "./underwayEngine.ts";
import { previewCenterline, type DrawnPreview } from "./drawnPreview.ts";
import { speciationModel, type SpeciationModel, type SpeciationRequest } from "./speciation.ts";
import { archiveOf, type ArchiveAnswer } from "./archive.ts";
import type { CachedAnalysis, ResultCache } from "./resultCache.ts";
import { shownConstituent } from "./shownConstituent.ts";

/** Lets queued calls (a newer job) arrive between steps. */
function yieldToQueue(): Promise<void> {
  return new Promise((resolve) => setTimeout(resolve, 0));
}

/** Longest wait, after the first survey of a job, for the main thread's `resumeBackground`. */
const FIRST_VIEW_WAIT_MS = 3000;

/** One part of a survey's constituents analysed by another worker (`analysePart`); undefined when it has none. */
export type PartAnswer = { constituents: AnalysisResult["constituents"] } | undefined;

/** The inputs a job reads (load, setSurveys); undefined for jobs that re-analyse what a worker holds. */
function jobInputs(job: AnalysisJob): WorkspaceInputs | undefined {
  if (job.kind === "load") return readFiles(job.surveys, job.centerline);
  if (job.kind === "setSurveys") return inputsOf(job.surveys, job.centerline, job.settings.mouth);
  return undefined;
}

function messageOf(error: unknown): string {
  return error instanceof Error ? `${error.name}: ${error.message}` : String(error);
}

type ComparisonEvent = Extract<AnalysisEvent, { type: "comparison" }>;

/** The workspace API's comparison of the analysed surveys (the first is the reference), or why there is none. */
function compareAll(analyses: ReadonlyArray<AnalysisResult | undefined>): ComparisonEvent {
  const done = analyses.filter((a): a is AnalysisResult => a !== undefined);
  if (done.length < analyses.length)
    return { type: "comparison", reason: "Some surveys could not be analysed, so they cannot be compared." };
  try {
    return { type: "comparison", comparison: workspaceComparison(done) };
  } catch (error) {
    return { type: "comparison", reason: `The surveys could not be compared: ${messageOf(error)}` };
  }
}

/**
 * Builds the worker's API object with its own held state (one per worker instance). With a
 * `cache` (the browser's, see resultCache.ts) a survey whose inputs, settings and engine are
 * unchanged takes its stored result instead of being analysed again.
 */
export function createWorkerApi(cache?: ResultCache) {
  let latestRun = 0;
  /** What readInputs read (surveys, the channel built by the one centerline reader, problems). */
  let inputs: WorkspaceInputs = inputsOf([], undefined);
  let channel: ChannelOverlay | undefined;
  /** Latest analysis of each survey, kept for the briefing and the brushed stretch. */
  let analyses: Array<AnalysisResult | undefined> = [];
  /** The files read (survey files and centerline), for the briefing's provenance table. */
  let files: SourceFile[] = [];
  let centerlineFile: TextFile | undefined;

  /** Holds new inputs; a centerline that cannot be read is reported as an error event too. */
  function useInputs(next: WorkspaceInputs, centerline: TextFile | undefined, emit: (e: AnalysisEvent) => void) {
    inputs = next;
    centerlineFile = centerline;
    channel = next.channel ? channelOverlay(next.channel.network) : undefined;
    if (centerline && !next.channel) {
      const why = next.issues.find((i) => i.file === centerline.name && i.severity === "error");
      emit({ type: "error", message: `${centerline.name}: ${why?.expected ?? "no usable centerline"}` });
    }
  }

  /** What one survey's result depends on besides the engine: the survey, its channel, choices and settings. */
  function cacheParts(
    survey: WorkspaceInputs["surveys"][number],
    settings: AnalysisSettings,
    from: WorkspaceInputs = inputs,
  ): unknown {
    return {
      survey,
      centerline: from.channel ? { geojson: from.channel.geojson, mouth: from.channel.mouth } : null,
      stationTable: from.stationTable ?? null,
      choices: from.choices,
      settings,
    };
  }

  /** Collects the other parts of the running job's first survey (see `receivePart`). */
  let partWaiter: { token: number; parts: Map<number, PartAnswer>; want: number; done: () => void } | undefined;

  /**
   * The first survey with its constituents in `parts.count` parts: part 0 here, the others from
   * `receivePart` (analysed here after all when they do not come within twice this part's time).
   */
  async function analyseInParts(
    run: number,
    survey: WorkspaceInputs["surveys"][number],
    settings: AnalysisSettings,
    parts: { count: number; token: number },
    onStep: (fraction: number, label: string) => void,
  ): Promise<CachedAnalysis | undefined> {
    const received = new Map<number, PartAnswer>();
    let arrived: () => void = () => undefined;
    const all = new Promise<void>((resolve) => (arrived = resolve));
    partWaiter = { token: parts.token, parts: received, want: parts.count - 1, done: () => arrived() };
    const t0 = Date.now();
    const own = analyse(inputs, survey, settings, onStep, { index: 0, count: parts.count });
    const waitMs = 2 * (Date.now() - t0) + 500;
    await Promise.race([all, new Promise((resolve) => setTimeout(resolve, waitMs))]);
    if (partWaiter?.token === parts.token) partWaiter = undefined;
    if (run !== latestRun) return undefined;
    const rest = [];
    for (let index = 1; index < parts.count; index++) {
      const got = received.get(index);
      rest.push(got ?? analyse(inputs, survey, settings, undefined, { index, count: parts.count }).analysis);
    }
    return mergeParts(inputs, survey, [own.analysis, ...rest], own.analysis, channel);
  }

  /**
   * Survey `index` with the constituent on screen first: that constituent is analysed and its map
   * marks posted (an `overlay` event), then the others are analysed and the two parts merged (the same
   * result as one run, as `mergeParts` says). Undefined when there is nothing to post first (the
   * survey mixes no other constituent, or not this one).
   */
  async function analyseShownFirst(
    run: number,
    index: number,
    settings: AnalysisSettings,
    chosen: string,
    emit: (e: AnalysisEvent) => void,
    onStep: (fraction: number, label: string) => void,
  ): Promise<CachedAnalysis | undefined> {
    const survey = inputs.surveys[index];
    const name = shownConstituent(survey.constituents, chosen, survey.stations);
    const others = survey.constituents.map((c) => c.name).filter((n) => n !== name);
    if (name === undefined || others.length === 0) return undefined;
    const head = analyse(inputs, survey, settings, undefined, { names: [name] });
    emit({ type: "overlay", surveyIndex: index, overlay: head.overlay });
    // The marks leave now; a newer job may arrive meanwhile.
    await yieldToQueue();
    if (run !== latestRun) return undefined;
    const rest = analyse(inputs, survey, settings, onStep, { names: others });
    return mergeParts(inputs, survey, [head.analysis, rest.analysis], rest.analysis, channel);
  }

  /** Opens the gate of the running job's background surveys (see `resumeBackground`). */
  let openGate: (() => void) | undefined;

  /**
   * Waits, after the first survey of a job, until the main thread has drawn it and sent the
   * requests its first view makes (speciation, brushed stretch), so those are answered before the
   * background surveys hold the worker; at most FIRST_VIEW_WAIT_MS (the map's first idle may be part of it).
   */
  function firstViewGate(): Promise<void> {
    return new Promise((resolve) => {
      const timer = setTimeout(resolve, FIRST_VIEW_WAIT_MS);
      openGate = () => {
        clearTimeout(timer);
        resolve();
      };
    });
  }

  /**
   * Analyses every held survey in the job's order (`JobOrder`): `firstSurvey` (the survey on screen)
   * first, then the others in order, yielding between surveys so a newer job, a speciation request or
   * the first view's requests are answered in between. With a `firstSurvey` the background surveys
   * wait for `resumeBackground`; `firstParts` and `firstConstituent` say how the first is analysed.
   */
  async function analyseAll(
    run: number,
    settings: AnalysisSettings,
    emit: (e: AnalysisEvent) => void,
    { firstSurvey, firstParts: parts, firstConstituent }: JobOrder,
  ) {
    const { surveys } = inputs;
    const total = surveys.length;
    const gate = firstSurvey !== undefined;
    const first = firstSurvey ?? 0;
    const start = first >= 0 && first < total ? first : 0;
    const order = [start, ...surveys.map((_, i) => i).filter((i) => i !== start)];
    for (const [k, i] of order.entries()) {
      const name = surveys[i].name;
      const stage = total > 1 ? `Analysing survey ${k + 1} of ${total}, ${name}` : `Analysing ${name}`;
      emit({ type: "progress", stage, done: k * 100, total: total * 100 });
      await yieldToQueue();
      if (run !== latestRun) return;
      try {
        const key = cache ? await cache.key(cacheParts(surveys[i], settings)) : undefined;
        const stored = key ? await cache!.get(key) : undefined;
        if (run !== latestRun) return;
        const onStep = (fraction: number, label: string) =>
          emit({
            type: "progress",
            stage: `${stage}: ${label}`,
            done: Math.round((k + fraction) * 100),
            total: total * 100,
          });
        const inParts =
          !stored && k === 0 && parts && parts.count > 1
            ? await analyseInParts(run, surveys[i], settings, parts, onStep)
            : undefined;
        if (run !== latestRun) return;
        const shown =
          !stored && !inParts && k === 0 && firstConstituent !== undefined
            ? await analyseShownFirst(run, i, settings, firstConstituent, emit, onStep)
            : undefined;
        if (run !== latestRun) return;
        const { analysis, overlay }: CachedAnalysis =
          stored ?? inParts ?? shown ?? analyse(inputs, surveys[i], settings, onStep);
        if (key && !stored) void cache!.put(key, { analysis, overlay });
        analyses[i] = analysis;
        emit({ type: "analysis", surveyIndex: i, analysis, overlay });
      } catch (error) {
        emit({ type: "error", message: `Survey "${name}": ${messageOf(error)}` });
      }
      if (gate && k === 0 && total > 1) {
        await firstViewGate();
        if (run !== latestRun) return;
      }
    }
    if (total >= 2) emit(compareAll(analyses));
    emit({ type: "progress", stage: "Analysis complete", done: 1, total: 1 });
    emit({ type: "done" });
  }

  return {
    /**
     * Runs one analysis job, reporting through `onEvent`: the survey `job.firstSurvey` (the one
     * on screen) first, then the others. A newer call supersedes this one: its remaining surveys
     * are not analysed (the promise still resolves).
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
          const read = readFiles(job.surveys, job.centerline, (fraction) =>
            emit({ type: "progress", stage: "Reading files", done: Math.round(fraction * 100), total: 100 }),
          );
          useInputs(read, job.centerline, emit);
          files = job.surveys;
        } else if (job.kind === "setSurveys") {
          useInputs(inputsOf(job.surveys, job.centerline, job.settings.mouth), job.centerline, emit);
          files = [];
        } else if (job.kind === "centerline") {
          const next = inputsOf(inputs.surveys, job.centerline, job.settings.mouth);
          const oldLine = centerlineFile?.name;
          next.issues = [...inputs.issues.filter((i) => i.file !== oldLine), ...next.issues];
          useInputs({ ...next, files: inputs.files, summary: inputs.summary }, job.centerline, emit);
        }
        const mouthChanged =
          job.kind === "analyze" && (centerlineFile || inputs.channel) && job.settings.mouth !== inputs.choices.mouth;
        if (mouthChanged) {
          // Another mouth: the channel is re-read from the held centerline file, the km change.
          const next = inputsOf(inputs.surveys, centerlineFile, job.settings.mouth);
          useInputs({ ...next, files: inputs.files, summary: inputs.summary }, centerlineFile, emit);
        }
        if (job.kind !== "analyze" || mouthChanged) {
          analyses = inputs.surveys.map(() => undefined);
          emit({
            type: "loaded",
            surveys: inputs.surveys,
            issues: inputs.issues,
            channel,
            notices: inputs.notices,
            ...(inputs.offeredCenterline ? { offeredCenterline: inputs.offeredCenterline as object } : {}),
          });
        }
        await analyseAll(run, job.settings, emit, job);
      } catch (error) {
        emit({ type: "error", message: messageOf(error) });
      }
    },

    /**
     * The main thread has drawn the first survey of the running job and sent its first view's
     * requests: the background surveys may start (before FIRST_VIEW_WAIT_MS has passed).
     */
    resumeBackground(): void {
      openGate?.();
      openGate = undefined;
    },

    /**
     * Another worker's part of the first survey of the job whose `firstParts.token` is `token`
     * (`undefined`: it has none, this worker analyses that part itself). Parts of other jobs are ignored.
     */
    receivePart(token: number, index: number, part: PartAnswer): void {
      const w = partWaiter;
      if (!w || w.token !== token || index < 1) return;
      if (part) w.parts.set(index, part);
      if (!part || w.parts.size >= w.want) w.done();
    },

    /**
     * Part `part` of the constituents of survey `surveyIndex` of a job that reads its inputs (load,
     * setSurveys), read and analysed here like `run` would, for the worker that runs the job
     * (`receivePart`). Undefined when the job reads nothing or the result cache holds the whole survey.
     */
    async analysePart(job: AnalysisJob, surveyIndex: number, part: ConstituentPart): Promise<PartAnswer> {
      const read = jobInputs(job);
      const survey = read?.surveys[surveyIndex];
      if (!read || !survey) return undefined;
      const key = cache ? await cache.key(cacheParts(survey, job.settings, read)) : undefined;
      if (key && (await cache!.get(key))) return undefined;
      return { constituents: analyse(read, survey, job.settings, undefined, part).analysis.constituents };
    },

    /**
     * The comparison of exactly the chosen surveys (indices into the held surveys, the first is the
     * reference), made by the workspace API's comparison, or why there is none.
     */
    compare(surveyIndices: number[]): Omit<ComparisonEvent, "type"> {
      if (surveyIndices.length < 2) return { reason: "Choose two or more surveys to compare them." };
      const e = compareAll(surveyIndices.map((i) => analyses[i]));
      return { ...(e.comparison ? { comparison: e.comparison } : {}), ...(e.reason ? { reason: e.reason } : {}) };
    },

    /** The channel stretch where one survey's salinity lies within a brushed range (km and map paths). */
    brushStretch(surveyIndex: number, range: [number, number] | null): BrushedStretch {
      return brushStretch(inputs.channel?.network, analyses[surveyIndex]?.salinityProfile, range);
    },

    /** The analysed surveys as an archive: series, relations and statements (analysis/archive). */
    archive(seasons?: Season[], dischargeTable?: TextFile): ArchiveAnswer {
      return archiveOf(analyses, seasons, dischargeTable);
    },

    /** Km ticks and length of a centerline being drawn on the map (read by the one centerline reader). */
    previewCenterline(file: TextFile): DrawnPreview {
      return previewCenterline(file);
    },

    /** The self-contained HTML briefing of the analysed surveys (analysis/report). */
    async briefing(
      basemap: unknown,
      dataNotice: string | undefined,
      surveyIndices?: number[],
      archiveChoices?: { seasons?: Season[]; dischargeTable?: TextFile },
    ): Promise<string> {
      const chosen = surveyIndices ? surveyIndices.map((i) => analyses[i]) : analyses;
      const done = chosen.filter((a): a is AnalysisResult => a !== undefined);
      const provenance = await fileProvenance(files, centerlineFile, inputs.files);
      // The archive section states what the archive view shows: the same seasons and discharge table.
      const archive = archiveChoices
        ? archiveOf(done, archiveChoices.seasons, archiveChoices.dischargeTable)
        : undefined;
      return briefingHtml(done, inputs.channel?.network, provenance, basemap, dataNotice, archive?.summary);
    },

    /** Speciation context at the focus station and along the mixing line (analysis/seawater). */
    speciation(request: SpeciationRequest): SpeciationModel {
      return speciationModel(request);
    },

    /** Reads and validates workspace text (analysis/io importWorkspace: migrations, problems as issues). */
    importWorkspace(text: string): ReturnType<typeof importWorkspace> {
      return importWorkspace(text);
    },

    /** Workspace text of a document, validated (analysis/io exportWorkspace; throws TypeError when invalid). */
    exportWorkspace(doc: WorkspaceDocument): string {
      return exportWorkspace(doc);
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

    /** Re-aggregates the last underway log read by this worker for a map view (undefined before any). */
    underwayView(view: UnderwayView): UnderwayPoints | undefined {
      return viewUnderway(view);
    },
  };
}

/** The API the worker exposes (what `Comlink.wrap` turns into async calls on the main thread). */
export type WorkerApi = ReturnType<typeof createWorkerApi>;
