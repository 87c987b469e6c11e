/**
 * The workspace the user keeps: the surveys sent to the analysis, the one centerline file, saved
 * column mappings and import records, change tracking, and persistence (IndexedDB and workspace
 * files). Starts the demo when nothing is stored. It owns the centerline; the worker builds the
 * channel from it.
 */
import type { FeatureCollection } from "geojson";
import type { ColumnMapping, ImportIssue, LayerChoice, Survey, WorkspaceDocument } from "../../../analysis/index.ts";

import { demoBundle } from "../lib/demoData.ts";
import { DEMO_CARBONATE } from "../lib/panelExtras.ts";
import type { TextFile } from "../worker/protocol.ts";
import type { Selection } from "./selection.svelte.ts";
import type { Settings } from "./settings.svelte.ts";
import type { AnalysisResults } from "./results.svelte.ts";
import { fromWorkspaceDocument, toWorkspaceDocument, type ImportRecord, type WorkspaceParts } from "./workspaceDoc.ts";
import type { WorkspaceStore } from "./workspaceStore.ts";
import { uniqueSurveyNames } from "./surveyNames.ts";

/** What the saved workspace needs from the root: the settings and selection it saves, and the analysis it feeds. */
export interface WorkspaceHost {
  readonly settings: Settings;
  readonly selection: Selection;
  readonly results: AnalysisResults;
  load(surveys: TextFile[], centerline: TextFile | undefined): Promise<void>;
  loadSurveys(surveys: Survey[], centerline: TextFile | undefined): Promise<void>;
  /**
   * The workspace reader and writer (analysis/io, with their schema validation). The app root runs
   * them in the analysis worker, so neither the first page nor any other main-thread chunk carries
   * the schema library.
   */
  workspaceIo(): WorkspaceIo;
}

/** Reads and writes workspace text (analysis/io importWorkspace and exportWorkspace, possibly in a worker). */
export interface WorkspaceIo {
  importWorkspace(text: string): Promise<{ workspace: WorkspaceDocument | undefined; issues: ImportIssue[] }>;
  exportWorkspace(doc: WorkspaceDocument): Promise<string>;
}

/** Parses GeoJSON text for the basemap, or undefined. */
function parseBasemap(text: string | undefined): FeatureCollection | undefined {
  if (!text) return undefined;
  try {
    const parsed = JSON.parse(text) as FeatureCollection;
    return parsed.type === "FeatureCollection" ? parsed : undefined;
  } catch {
    return undefined;
  }
}

const DEMO_BASEMAP = parseBasemap(demoBundle().basemap?.text);

function fileOf(centerline: object | null): TextFile | undefined {
  return centerline ? { name: "centerline.geojson", text: JSON.stringify(centerline) } : undefined;
}

export class SavedWorkspace {
  mappings = $state.raw<ColumnMapping[]>([]);
  mappingDates = $state.raw<Record<string, string>>({});
  imports = $state.raw<ImportRecord[]>([]);
  /** The channel centerline file the analysis uses (demo, imported, drawn or restored); the only copy kept. */
  centerline = $state.raw<TextFile | undefined>(undefined);
  /** Depth layer kept from depth-resolved files at import (undefined: the reader's default, the shallowest sample). */
  layer = $state.raw<LayerChoice | undefined>(undefined);
  /** True while the invented demo basemap fits the data (no centerline of the user's own). */
  demoBasemap = $state(true);
  /** True while the workspace holds the invented demo (its surveys and centerline); an import replaces it. */
  isDemo = $state(false);
  /** Basemap drawn by MapLibre (the invented demo's, or none). */
  readonly basemap: FeatureCollection | undefined = $derived(this.demoBasemap ? DEMO_BASEMAP : undefined);
  /** Problems with the workspace itself (restore, open, save). */
  notices = $state.raw<ImportIssue[]>([]);
  /** True once the stored workspace (or the demo) has been loaded. */
  ready = $state(false);
  /** True once the user changed anything; the untouched demo is not stored, so it stays the default. */
  dirty = false;
  #baseline: string | undefined;

  constructor(
    readonly host: WorkspaceHost,
    readonly store: WorkspaceStore,
    readonly now: () => Date = () => new Date(),
  ) {}

  /**
   * Restores the stored workspace, or starts the demo estuary when the store is empty. When the
   * store's hint says it holds nothing (a first visit), the demo starts at once, without waiting for
   * IndexedDB to open; a workspace found there all the same (saved before the hint existed) then
   * replaces the demo, as opening it would.
   */
  async boot(): Promise<void> {
    const maybeStored = this.store.mayHold?.() ?? true;
    if (!maybeStored) this.startDemo();
    const text = await this.store.load().catch(() => undefined);
    if (text !== undefined && (await this.openText(text))) this.dirty = true;
    else if (maybeStored) this.startDemo();
    this.ready = true;
  }

  startDemo(): void {
    const bundle = demoBundle();
    this.centerline = bundle.centerline;
    this.demoBasemap = true;
    this.isDemo = true;
    this.host.settings.carbonate = { ...DEMO_CARBONATE, invented: true };
    void this.host.load(bundle.surveys, bundle.centerline);
  }

  /** Forgets the stored workspace and goes back to the demo estuary. */
  async resetToDemo(): Promise<void> {
    await this.store.clear();
    this.mappings = [];
    this.mappingDates = {};
    this.imports = [];
    this.layer = undefined;
    this.notices = [];
    this.host.selection.surveyIndex = 0;
    this.dirty = false;
    this.#baseline = undefined;
    this.startDemo();
  }

  /** Sends surveys (and the current centerline) to the analysis. */
  setSurveys(surveys: Survey[], selectIndex?: number): void {
    void this.host.loadSurveys(surveys, this.centerline);
    if (selectIndex !== undefined) this.host.selection.surveyIndex = selectIndex;
    this.dirty = true;
  }

  /**
   * Called when settings or selection change (a key of their values): the first key seen once the
   * analysis is ready is the baseline; any other marks the workspace as changed by the user.
   */
  noteSettings(key: string): void {
    if (this.host.results.status !== "ready" || !this.ready) return;
    this.#baseline ??= key;
    if (key !== this.#baseline) this.dirty = true;
  }

  /** Changes one survey's name or river discharge [m³/s] and re-analyses. */
  editSurvey(index: number, patch: { name?: string; riverDischargeM3s?: number | undefined }): void {
    const surveys = this.host.results.surveys.map((s, i) => {
      if (i !== index) return s;
      const next: Survey = { ...s, ...(patch.name ? { name: patch.name } : {}) };
      if ("riverDischargeM3s" in patch) {
        if (patch.riverDischargeM3s === undefined) delete next.riverDischargeM3s;
        else next.riverDischargeM3s = patch.riverDischargeM3s;
      }
      return next;
    });
    this.setSurveys(uniqueSurveyNames(surveys), this.host.selection.surveyIndex);
  }

  /** Keeps a confirmed mapping (one per file shape) with the date it was confirmed. */
  remember(mapping: ColumnMapping): void {
    this.mappings = [...this.mappings.filter((m) => m.shape !== mapping.shape), mapping];
    this.mappingDates = { ...this.mappingDates, [mapping.shape]: this.now().toISOString() };
  }

  /**
   * Adds what an import read: its records, a new centerline (which retires the demo basemap) and
   * surveys. Real data replace the invented demo: the demo surveys, centerline and basemap leave
   * ("Reset to demo" brings them back).
   */
  addImport(records: ImportRecord[], surveys: Survey[], centerline: TextFile | undefined): void {
    this.imports = [...this.imports, ...records];
    this.#dropInventedCarbonate();
    const leaveDemo = this.isDemo && (surveys.length > 0 || centerline !== undefined);
    if (leaveDemo) {
      this.isDemo = false;
      this.demoBasemap = false;
      this.centerline = undefined;
    }
    if (centerline) {
      this.centerline = centerline;
      this.demoBasemap = false;
    }
    const before = leaveDemo ? [] : this.host.results.surveys;
    this.setSurveys(uniqueSurveyNames([...before, ...surveys]), surveys.length > 0 ? before.length : undefined);
  }

  /** Real data never get the demo's invented carbonate end-members. */
  #dropInventedCarbonate(): void {
    if (this.host.settings.carbonate?.invented) this.host.settings.carbonate = undefined;
  }

  /** The workspace state as a document's parts. */
  parts(): WorkspaceParts {
    const { settings, selection, results } = this.host;
    const name = results.surveys[selection.surveyIndex]?.name;
    let centerline: object | null = null;
    try {
      centerline = this.centerline ? (JSON.parse(this.centerline.text) as object) : null;
    } catch {
      // A centerline that is not JSON cannot be saved; the analysis has reported it.
    }
    return {
      surveys: results.surveys,
      centerline,
      demoBasemap: this.demoBasemap,
      mappings: this.mappings,
      mappingDates: this.mappingDates,
      imports: this.imports,
      colouring: settings.colouring,
      tileUrl: settings.tileUrl,
      useTiles: settings.useTiles,
      worldLand: settings.worldLand,
      ...(this.layer ? { layer: $state.snapshot(this.layer) as LayerChoice } : {}),
      analysis: $state.snapshot(settings.analysis) as WorkspaceParts["analysis"],
      ...(name !== undefined ? { selectedSurvey: name } : {}),
      selectedConstituent: selection.constituent,
      archive: $state.snapshot(settings.archive) as WorkspaceParts["archive"],
    };
  }

  /** The workspace as versioned JSON text. */
  async exportText(): Promise<string> {
    const doc = toWorkspaceDocument(this.parts(), this.now().toISOString());
    return this.host.workspaceIo().exportWorkspace(doc);
  }

  /** Saves the workspace in the store (once the user changed something and there are surveys to keep). */
  async save(): Promise<void> {
    if (!this.ready || !this.dirty || this.host.results.surveys.length === 0) return;
    try {
      await this.store.save(await this.exportText());
    } catch (error) {
      this.notices = [
        {
          file: "workspace",
          row: 0,
          column: "",
          value: "",
          expected: `a saved workspace (${String(error)})`,
          severity: "warning",
        },
      ];
    }
  }

  /** Opens a workspace text (a file, or the stored one); false when it cannot be read. */
  async openText(text: string): Promise<boolean> {
    const { workspace, issues } = await this.host.workspaceIo().importWorkspace(text);
    this.notices = issues;
    if (!workspace) return false;
    this.dirty = true;
    const p = fromWorkspaceDocument(workspace);
    const { settings, selection } = this.host;
    this.mappings = p.mappings;
    this.mappingDates = p.mappingDates;
    this.imports = p.imports;
    this.layer = p.layer;
    // The demo's invented carbonate end-members stay only with the demo (a workspace with no imports).
    settings.carbonate = p.imports.length === 0 ? { ...DEMO_CARBONATE, invented: true } : undefined;
    this.centerline = fileOf(p.centerline);
    this.demoBasemap = p.demoBasemap;
    this.isDemo = p.imports.length === 0 && p.demoBasemap;
    settings.colouring = p.colouring;
    settings.tileUrl = p.tileUrl;
    settings.useTiles = p.useTiles;
    settings.worldLand = p.worldLand;
    // Settings the document does not hold go back to their defaults (a workspace saved before they existed).
    settings.updateAnalysis({ mouth: undefined, offChannelM: undefined, keepOffChannel: undefined, ...p.analysis });
    settings.archive = p.archive ?? {};
    const index = Math.max(
      0,
      p.surveys.findIndex((s) => s.name === p.selectedSurvey),
    );
    if (p.selectedConstituent) selection.constituent = p.selectedConstituent;
    void this.host.loadSurveys(p.surveys, this.centerline);
    selection.surveyIndex = index;
    return true;
  }
}
