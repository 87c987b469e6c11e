/**
 * The dashboard's state root, owned by App.svelte: settings, selection, the analysis results
 * (a snapshot of what the worker found), the saved workspace (surveys, centerline, mappings,
 * persistence) and the import flow, plus the two workers (one analyses, one reads dropped files).
 * Dependencies run components → state → worker; every number shown comes from analysis/ through
 * the worker.
 */
import { stationListOrder, type Survey } from "../../../analysis/index.ts";
import { Selection } from "./selection.svelte.ts";
import { Settings, type AnalysisSettings } from "./settings.svelte.ts";
import { AnalysisResults } from "./results.svelte.ts";
import { SavedWorkspace, type WorkspaceIo } from "./savedWorkspace.svelte.ts";
import { ImportFlow } from "./importFlow.svelte.ts";
import { ArchiveState } from "../archive/archiveState.svelte.ts";
import type { ArchiveChoices } from "../archive/archiveChoices.ts";
import { memoryStore, type WorkspaceStore } from "./workspaceStore.ts";
import { proxyCallback, startWorker, type RemoteApi, type WorkerHandle } from "../worker/client.ts";
import type { AnalysisJob, TextFile } from "../worker/protocol.ts";
import type { BrushedStretch } from "../worker/brushStretch.ts";
import type { DrawnPreview } from "../worker/drawnPreview.ts";
import type { SpeciationModel, SpeciationRequest } from "../worker/speciation.ts";
import type { MapData, MapStation } from "../map/mapData.ts";
import { deviationsById, placementsById } from "../lib/analysisView.ts";
import { withObservations } from "../panels/lib/observations.ts";
import type { SurveyAnalysisView } from "../panels/lib/types.ts";
import type { SurveyComparison } from "../../../analysis/index.ts";
import { shownConstituent } from "../worker/shownConstituent.ts";

/** What the root needs from outside: where to keep the workspace and how to start a worker. */
export interface AppOptions {
  store?: WorkspaceStore;
  /** Starts a worker (the browser's by default; tests pass one running in-process). */
  connect?: (name: string, onFail: (message: string) => void) => WorkerHandle;
  now?: () => Date;
}

const NO_STRETCH: BrushedStretch = { km: [], paths: [] };

/** Calls `f` after the next frame is drawn (or on the next task where there are no frames, e.g. Node). */
function afterNextFrame(f: () => void): void {
  if (typeof requestAnimationFrame === "function") requestAnimationFrame(() => setTimeout(f, 0));
  else setTimeout(f, 0);
}

/** A line the draw tool opens in editing mode (a new object opens it again). */
export interface DrawRequest {
  vertices: Array<[number, number]>;
  mouth: "start" | "end";
}

export class AppState {
  readonly settings = new Settings();
  readonly selection = new Selection();
  readonly results = new AnalysisResults();
  readonly workspace: SavedWorkspace;
  readonly importFlow: ImportFlow;
  /** The archive view's state: the worker's archive summary of the analysed surveys, the brushed dates. */
  readonly archive = new ArchiveState(() => this.#analysisApi());
  readonly #connect: NonNullable<AppOptions["connect"]>;
  #analyser: WorkerHandle | undefined;
  /**
   * A second analysis worker started with the first at the cold start: it analyses part of the first
   * job's survey on screen (the other processor core), hands it over and stops.
   */
  #partner: WorkerHandle | undefined;
  /** Whether the next job may use the partner (only the first one: the cold start). */
  #partnerJob = false;
  #reader: WorkerHandle | undefined;
  /** Counts analysis jobs; events of a superseded job are dropped. */
  #job = 0;
  #brushAsk = 0;
  /** false until the map's first idle when the background surveys wait for it; undefined when they do not. */
  #mapIdle: boolean | undefined;
  /** Lets the running job's background surveys start once the map is idle. */
  #onMapIdle: (() => void) | undefined;
  /** The channel stretch where salinity lies in the brushed range (placed by the worker). */
  brushedStretch = $state.raw<BrushedStretch>(NO_STRETCH);
  /** Everything the map draws. */
  readonly mapData: MapData;
  /** The line the draw tool is asked to open for editing (the centerline built from the stations). */
  drawRequest = $state.raw<DrawRequest | undefined>(undefined);

  constructor(options: AppOptions = {}) {
    this.#connect = options.connect ?? startWorker;
    this.workspace = new SavedWorkspace(this, options.store ?? memoryStore(), options.now);
    this.importFlow = new ImportFlow(this.workspace, () => this.reader());
    this.mapData = $derived({
      basemap: this.workspace.basemap,
      channel: this.results.channel,
      overlay: this.overlay,
      zone: this.overlay?.constituents[this.selection.constituent],
      brushPaths: this.brushedStretch.paths,
      stations: this.mapStations,
      constituent: this.selection.constituent,
      unit: this.unit,
      colouring: this.settings.colouring,
    });
  }

  /** The active survey. */
  readonly survey: Survey | undefined = $derived(this.results.surveys[this.selection.surveyIndex]);
  /** The active survey's analysis (undefined while the worker works). */
  readonly analysis = $derived(this.results.analyses[this.selection.surveyIndex]);
  /** The analysis as the panels take it: with the observations the analysis says to draw (QC-rejected ones included). */
  readonly panelAnalysis: SurveyAnalysisView | undefined = $derived(
    this.analysis ? withObservations(this.analysis) : undefined,
  );
  /**
   * Indices of the surveys Compare and the Briefing use: the user's choice of two or more, else every
   * survey when there are at most four, else the active survey and its neighbour.
   */
  readonly comparedIndices: number[] = $derived.by(() => {
    const names = this.results.surveys.map((s) => s.name);
    const chosen = this.selection.comparedSurveys.map((n) => names.indexOf(n)).filter((i) => i >= 0);
    if (chosen.length >= 2) return chosen.sort((a, b) => a - b);
    if (names.length <= 4) return names.map((_, i) => i);
    const i = this.selection.surveyIndex;
    return i + 1 < names.length ? [i, i + 1] : [i - 1, i];
  });
  readonly overlay = $derived(this.results.overlays[this.selection.surveyIndex]);
  readonly constituents = $derived(this.survey?.constituents ?? []);
  readonly unit = $derived(this.constituents.find((c) => c.name === this.selection.constituent)?.unit ?? "");

  /** Stations as the map shows them: position, salinity, value, deviation, projection. */
  readonly mapStations: MapStation[] = $derived.by(() => {
    const survey = this.survey;
    if (!survey) return [];
    const placements = placementsById(this.analysis);
    const deviations = deviationsById(this.analysis, this.selection.constituent);
    const out: MapStation[] = [];
    for (const st of survey.stations) {
      if (!st.lonLat) continue;
      const p = placements.get(st.id);
      const d = deviations.get(st.id);
      const cell = st.values[this.selection.constituent];
      out.push({
        id: st.id,
        lonLat: st.lonLat,
        salinity: st.salinity.accepted ? st.salinity.value : undefined,
        value: cell?.accepted ? cell.value : undefined,
        deviation: d?.deviation,
        deviationPercent: d?.deviationPercent,
        significant: d?.significant,
        nearestLonLat: p?.nearestLonLat,
        alongChannelKm: p?.alongChannelKm,
        offsetM: p?.offsetM,
        offChannel: p?.offChannel,
      });
    }
    return out;
  });

  /** The stations as the station list shows them: along the channel from the mouth, off-channel ones last (analysis order). */
  readonly listStations: MapStation[] = $derived.by(() => {
    const placements = this.analysis?.stations;
    if (!placements) return this.mapStations;
    const rank = new Map(stationListOrder(placements).map((id, i) => [id, i]));
    return [...this.mapStations].sort((a, b) => (rank.get(a.id) ?? Infinity) - (rank.get(b.id) ?? Infinity) || 0);
  });

  /**
   * Starts the analysis worker now, so it downloads and compiles its code while the map starts
   * (App calls this before mounting the map; otherwise the first job starts it).
   */
  startAnalysis(options: { untilMapIdle?: boolean; partner?: boolean } = {}): void {
    if (options.untilMapIdle) this.#mapIdle ??= false;
    this.#analysisApi();
    if (options.partner && !this.#partner) {
      this.#partnerJob = true;
      this.#partner = this.#connect("brackline-analysis-part", () => this.#partnerFailed?.());
    }
  }

  /** Tells the analysing worker not to wait for the partner's part (it failed to start). */
  #partnerFailed: (() => void) | undefined;

  /** Stops the partner worker (its part handed over, or not needed). */
  #stopPartner(): void {
    this.#partner?.terminate();
    this.#partner = undefined;
    this.#partnerFailed = undefined;
  }

  /**
   * The first job's survey on screen in two parts: the partner worker analyses part 1 of its
   * constituents and hands it to the analysing worker, which analyses part 0 and merges them (the
   * same result as one worker). Only a job that reads its inputs (the demo, a restored workspace).
   */
  #splitFirst(job: AnalysisJob, token: number): AnalysisJob {
    const partner = this.#partner;
    const use = this.#partnerJob && partner !== undefined && (job.kind === "load" || job.kind === "setSurveys");
    this.#partnerJob = false;
    if (!use) {
      this.#stopPartner();
      return job;
    }
    const analyser = this.#analysisApi();
    let handed = false;
    const hand = (part: Awaited<ReturnType<RemoteApi["analysePart"]>>) => {
      if (handed) return;
      handed = true;
      void analyser.receivePart(token, 1, part);
      this.#stopPartner();
    };
    this.#partnerFailed = () => hand(undefined);
    partner.api.analysePart(job, job.firstSurvey ?? 0, { index: 1, count: 2 }).then(hand, () => hand(undefined));
    return { ...job, firstParts: { count: 2, token } };
  }

  /**
   * The map has drawn its first view and gone idle. With `startAnalysis({ untilMapIdle: true })`
   * the other surveys wait for this (as well as for the survey on screen to be drawn), so on a
   * small machine they do not take the processor from the map's first frames.
   */
  mapIdle(): void {
    this.#mapIdle = true;
    const resume = this.#onMapIdle;
    this.#onMapIdle = undefined;
    resume?.();
  }

  /** The worker that analyses (started on first use). */
  #analysisApi(): RemoteApi {
    this.#analyser ??= this.#connect("brackline-analysis", (message) =>
      this.results.receive({ type: "error", message }),
    );
    return this.#analyser.api;
  }

  /** The workspace reader and writer, run in the analysis worker (which holds the schema library). */
  workspaceIo(): WorkspaceIo {
    return {
      importWorkspace: (text) => this.#analysisApi().importWorkspace(text),
      exportWorkspace: (doc) => this.#analysisApi().exportWorkspace($state.snapshot(doc) as typeof doc),
    };
  }

  /** The worker that reads dropped files and underway logs (started on first use). */
  reader(): RemoteApi {
    this.#reader ??= this.#connect("brackline-import", () => undefined);
    return this.#reader.api;
  }

  /**
   * Sends one job to the analysis worker; its events fill the results until a newer job starts.
   * The survey on screen is analysed first; once it is drawn (the frame after its result, when the
   * panels have sent their own requests) and, if asked, the map is idle, the worker goes on with the
   * other surveys.
   */
  run(job: AnalysisJob): Promise<void> {
    const id = ++this.#job;
    this.results.begin(job.kind === "load");
    let firstDrawn = false;
    const onEvent = proxyCallback((event: Parameters<AnalysisResults["receive"]>[0]) => {
      if (id !== this.#job) return;
      this.results.receive(event);
      if (event.type === "analysis" && !firstDrawn) {
        firstDrawn = true;
        afterNextFrame(() => {
          const resume = () => {
            if (id === this.#job) void this.#analyser?.api.resumeBackground();
          };
          if (this.#mapIdle !== false) resume();
          else this.#onMapIdle = resume;
        });
      }
      if (event.type === "loaded") {
        if (this.selection.surveyIndex >= event.surveys.length) this.selection.surveyIndex = 0;
        // Non-mixing variables (oxygen, chlorophyll...) are never the default constituent, nor one the
        // survey has no observation of (the rule the worker follows for the marks it posts first).
        const survey = event.surveys[this.selection.surveyIndex];
        const shown = shownConstituent(survey?.constituents ?? [], this.selection.constituent, survey?.stations);
        if (shown !== undefined) this.selection.constituent = shown;
      }
    });
    const ordered = this.#splitFirst(
      { ...job, firstSurvey: this.selection.surveyIndex, firstConstituent: this.selection.constituent },
      id,
    );
    return this.#analysisApi()
      .run(ordered, onEvent)
      .catch((error: unknown) => {
        if (id === this.#job) this.results.receive({ type: "error", message: String(error) });
      });
  }

  /** The analysis settings sent to the worker, with the archive view's discharge table (it feeds each survey's analysis). */
  #settingsSnapshot(): AnalysisSettings {
    const table = this.settings.archive.dischargeTable;
    return {
      ...($state.snapshot(this.settings.analysis) as AnalysisSettings),
      ...(table ? { dischargeTable: $state.snapshot(table) } : {}),
    };
  }

  /**
   * Sets the archive view's choices (seasons, discharge table). A new or removed discharge table
   * re-runs the analysis: each survey's discharge, and so its fluxes, may change with it.
   */
  setArchiveChoices(choices: ArchiveChoices): void {
    const before = this.settings.archive.dischargeTable;
    this.settings.archive = choices;
    const after = choices.dischargeTable;
    const same = before?.name === after?.name && before?.text === after?.text;
    if (!same && this.#analyser) void this.run({ kind: "analyze", settings: this.#settingsSnapshot() });
  }

  /** Reads survey files and a centerline in the worker and analyses them (the demo at start-up). */
  load(surveys: TextFile[], centerline: TextFile | undefined): Promise<void> {
    return this.run({
      kind: "load",
      surveys,
      ...(centerline ? { centerline } : {}),
      settings: this.#settingsSnapshot(),
    });
  }

  /** Replaces the analysed surveys with surveys already read (an import or a restored workspace). */
  loadSurveys(surveys: Survey[], centerline: TextFile | undefined): Promise<void> {
    return this.run({
      kind: "setSurveys",
      surveys: $state.snapshot(surveys) as Survey[],
      ...(centerline ? { centerline } : {}),
      settings: this.#settingsSnapshot(),
    });
  }

  /** Changes analysis settings and re-runs the analysis in the worker. */
  updateSettings(patch: Partial<AnalysisSettings>): void {
    this.settings.updateAnalysis(patch);
    if (!this.#analyser) return;
    void this.run({ kind: "analyze", settings: this.#settingsSnapshot() });
  }

  /** Replaces the channel centerline (e.g. one drawn on the map) and re-analyses every survey in the worker. */
  setCenterline(file: TextFile): void {
    this.workspace.centerline = file;
    this.workspace.dirty = true;
    void this.run({ kind: "centerline", centerline: file, settings: this.#settingsSnapshot() });
  }

  /**
   * Opens the centerline built from the station positions in the draw tool's editing mode with its
   * vertices (the mouth as chosen, else at the saltiest end, as the analysis placed it). Dragging a
   * vertex makes the edited line the channel; the draw tool exports it as GeoJSON.
   */
  editStationCenterline(): void {
    const line = this.results.offeredCenterline as
      { geometry?: { coordinates?: Array<[number, number]> }; properties?: { mouth?: "start" | "end" } } | undefined;
    const vertices = line?.geometry?.coordinates;
    if (!vertices || vertices.length < 2) return;
    const mouth = this.settings.analysis.mouth ?? line?.properties?.mouth ?? "end";
    this.drawRequest = { vertices: vertices.map(([lon, lat]) => [lon, lat]), mouth };
  }

  /**
   * Asks the worker where the brushed salinity range lies on the channel for the active survey;
   * a newer request wins.
   */
  async placeBrush(surveyIndex: number, range: [number, number] | null): Promise<void> {
    const ask = ++this.#brushAsk;
    if (!range || !this.#analyser) {
      this.brushedStretch = NO_STRETCH;
      return;
    }
    const stretch = await this.#analyser.api.brushStretch(surveyIndex, [range[0], range[1]]);
    if (ask === this.#brushAsk) this.brushedStretch = stretch;
  }

  /**
   * Speciation context for the speciation panel, computed in the analysis worker (already running
   * when the panel shows; a running analysis answers between surveys). A newer request wins in the panel.
   */
  speciate(request: SpeciationRequest): Promise<SpeciationModel> {
    return this.#analysisApi().speciation(request);
  }

  /** Km ticks and length of a centerline being drawn, placed by the worker's centerline reader. */
  previewCenterline(file: TextFile): Promise<DrawnPreview> {
    return this.#analysisApi().previewCenterline(file);
  }

  /**
   * The comparison of exactly the surveys chosen for comparison (`comparedIndices`): the worker's
   * comparison event when every survey is chosen, else asked of the worker for the chosen ones once
   * they are analysed. Reads the chosen analyses, so a derived promise re-asks when they arrive.
   */
  comparisonOfChosen(): Promise<{ comparison?: SurveyComparison; reason?: string }> {
    const indices = this.comparedIndices;
    if (indices.length === this.results.surveys.length)
      return Promise.resolve({
        ...(this.results.comparison ? { comparison: this.results.comparison } : {}),
        ...(this.results.comparisonReason
          ? { reason: this.results.comparisonReason }
          : this.results.waitingText
            ? { reason: this.results.waitingText }
            : {}),
      });
    if (indices.length < 2) return Promise.resolve({ reason: "Choose two or more surveys to compare them." });
    if (!indices.every((i) => this.results.analyses[i] !== undefined) || !this.#analyser)
      return Promise.resolve({ reason: this.results.waitingText ?? "Waiting for the analysis of the chosen surveys…" });
    return this.#analyser.api.compare([...indices]);
  }

  /** Asks the worker for the self-contained HTML briefing of the analysed surveys. */
  requestBriefing(dataNotice?: string, surveyIndices?: number[]): Promise<string> {
    if (!this.#analyser) return Promise.reject(new Error("The analysis worker is not running."));
    return this.#analyser.api.briefing(
      $state.snapshot(this.workspace.basemap),
      dataNotice,
      surveyIndices,
      $state.snapshot(this.settings.archive),
    );
  }

  destroy(): void {
    this.#stopPartner();
    this.#analyser?.terminate();
    this.#reader?.terminate();
    this.#analyser = undefined;
    this.#reader = undefined;
  }
}
