/**
 * The dashboard's state root: workspace, settings and selection, the worker
 * that fills the workspace, and the values derived from them for the header
 * and the map. Every number shown comes from analysis/ through the worker.
 */
import type { FeatureCollection } from "geojson";
import type { Survey } from "../../../analysis/index.ts";
import { Selection } from "./selection.svelte.ts";
import { Settings, type AnalysisSettings } from "./settings.svelte.ts";
import { Workspace } from "./workspace.svelte.ts";
import { AnalysisClient } from "../worker/client.ts";
import type { WorkerResponse } from "../worker/protocol.ts";
import type { DemoBundle, TextFile } from "../lib/demoData.ts";
import type { MapData, MapStation } from "../map/mapData.ts";
import { deviationsById, placementsById } from "../lib/analysisView.ts";
import { withObservations } from "../panels/lib/observations.ts";
import { brushStretch, networkOf } from "../lib/brushStretch.ts";
import type { SurveyAnalysisView } from "../panels/lib/types.ts";

/** Parses GeoJSON text for the basemap, reporting (not throwing) problems. */
function parseGeoJson(text: string | undefined): FeatureCollection | undefined {
  if (!text) return undefined;
  const parsed = JSON.parse(text) as FeatureCollection;
  return parsed.type === "FeatureCollection" ? parsed : undefined;
}

export class AppState {
  readonly workspace = new Workspace();
  readonly settings = new Settings();
  readonly selection = new Selection();
  #client: AnalysisClient | undefined;
  /** The channel centerline file the analysis uses now (demo, imported, drawn or restored). */
  centerlineFile = $state.raw<TextFile | undefined>(undefined);
  /** Waiting briefing request (resolved with the HTML when the worker answers). */
  #briefing: { resolve: (html: string) => void; reject: (error: Error) => void } | undefined;

  /** The active survey. */
  readonly survey: Survey | undefined = $derived(this.workspace.surveys[this.selection.surveyIndex]);
  /** The active survey's analysis (undefined while the worker works). */
  readonly analysis = $derived(this.workspace.analyses[this.selection.surveyIndex]);
  /** Channel network of the active centerline (for placing a brushed salinity range on the channel). */
  readonly #network = $derived(networkOf(this.centerlineFile?.text));
  /** The channel stretch where salinity lies in the brushed range (km intervals and map paths). */
  readonly brushedStretch = $derived(
    brushStretch(this.#network, this.analysis?.salinityProfile, this.selection.salinityBrush),
  );
  /** The analysis as the panels take it: with every observation, QC-rejected ones included, for drawing. */
  readonly panelAnalysis: SurveyAnalysisView | undefined = $derived(
    this.analysis && this.survey ? withObservations(this.analysis, this.survey) : undefined,
  );
  readonly overlay = $derived(this.workspace.overlays[this.selection.surveyIndex]);
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

  readonly mapData: MapData = $derived({
    basemap: this.workspace.basemap,
    channel: this.workspace.channel,
    overlay: this.overlay,
    zone: this.overlay?.constituents[this.selection.constituent],
    brushPaths: this.brushedStretch.paths,
    stations: this.mapStations,
    constituent: this.selection.constituent,
    unit: this.unit,
    colouring: this.settings.colouring,
  });

  /** Starts the worker on a bundle of files (the demo by default). */
  start(bundle: DemoBundle): void {
    try {
      this.workspace.basemap = parseGeoJson(bundle.basemap?.text);
    } catch (error) {
      this.workspace.errors = [...this.workspace.errors, `basemap.geojson: ${String(error)}`];
    }
    this.#client ??= new AnalysisClient((m) => this.#receive(m));
    this.workspace.begin(true);
    this.centerlineFile = bundle.centerline;
    this.#client.send({
      type: "load",
      surveys: bundle.surveys,
      centerline: bundle.centerline,
      settings: this.#settingsSnapshot(),
    });
  }

  /** Changes analysis settings and re-runs the analysis in the worker. */
  updateSettings(patch: Partial<AnalysisSettings>): void {
    this.settings.updateAnalysis(patch);
    if (!this.#client) return;
    this.workspace.begin(false);
    this.#client.send({ type: "analyze", settings: this.#settingsSnapshot() });
  }

  /** Replaces the channel centerline (e.g. one drawn on the map) and re-analyses every survey in the worker. */
  setCenterline(file: TextFile): void {
    if (!this.#client) return;
    this.workspace.begin(false);
    this.centerlineFile = file;
    this.#client.send({ type: "centerline", centerline: file, settings: this.#settingsSnapshot() });
  }

  /** Asks the worker for the self-contained HTML briefing of the analysed surveys. */
  requestBriefing(dataNotice?: string): Promise<string> {
    const client = this.#client;
    if (!client) return Promise.reject(new Error("The analysis worker is not running."));
    this.#briefing?.reject(new Error("Superseded by a newer briefing request."));
    return new Promise<string>((resolve, reject) => {
      this.#briefing = { resolve, reject };
      client.send({
        type: "briefing",
        basemap: $state.snapshot(this.workspace.basemap),
        ...(dataNotice ? { dataNotice } : {}),
      });
    });
  }

  /** Replaces the loaded surveys with surveys already read (an import or a restored workspace) and analyses them. */
  loadSurveys(surveys: Survey[], centerline: TextFile | undefined, basemap: FeatureCollection | undefined): void {
    this.workspace.basemap = basemap;
    this.#client ??= new AnalysisClient((m) => this.#receive(m));
    this.workspace.begin(false);
    this.centerlineFile = centerline;
    this.#client.send({
      type: "setSurveys",
      surveys,
      ...(centerline ? { centerline } : {}),
      settings: this.#settingsSnapshot(),
    });
  }

  #settingsSnapshot(): AnalysisSettings {
    return $state.snapshot(this.settings.analysis) as AnalysisSettings;
  }

  #receive(message: WorkerResponse): void {
    if (message.type === "briefing" || (message.type === "error" && this.#briefing)) {
      const pending = this.#briefing;
      this.#briefing = undefined;
      if (message.type === "briefing") pending?.resolve(message.html);
      else pending?.reject(new Error(message.message));
      if (message.type === "briefing") return;
    }
    this.workspace.receive(message);
    if (message.type === "loaded") {
      if (this.selection.surveyIndex >= message.surveys.length) this.selection.surveyIndex = 0;
      const names = message.surveys[this.selection.surveyIndex]?.constituents.map((c) => c.name) ?? [];
      if (names.length > 0 && !names.includes(this.selection.constituent)) this.selection.constituent = names[0];
    }
  }

  destroy(): void {
    this.#client?.terminate();
  }
}
