/**
 * The import flow and workspace persistence: reads dropped files in the
 * worker (mapping dialog for delimited text, saved mappings reused by file
 * shape), adds the surveys to the app's survey switcher, keeps the last import
 * report, and saves/restores the whole workspace in IndexedDB and as a file.
 */
import type { FeatureCollection } from "geojson";
import {
  exportWorkspace,
  findSavedMapping,
  importWorkspace,
  type ColumnMapping,
  type ImportIssue,
  type StationTable,
  type Survey,
} from "../../../analysis/index.ts";
import type { AppState } from "../state/app.svelte.ts";
import { demoBundle, type TextFile } from "../lib/demoData.ts";
import type { ImportClient } from "./importClient.ts";
import type { FileInspection, FileOutcome, ImportSource } from "./importTypes.ts";
import { fromWorkspaceDocument, toWorkspaceDocument, type ImportRecord, type WorkspaceParts } from "./workspaceDoc.ts";
import type { WorkspaceStore } from "./workspaceStore.ts";
import { uniqueSurveyNames } from "./surveyNames.ts";

/** The mapping dialog's open question. */
export interface MappingQuestion {
  inspection: FileInspection;
  mapping: ColumnMapping;
  answer: (mapping: ColumnMapping | undefined) => void;
}

/** One file of the last import, for the report. */
export interface ReportEntry {
  outcome: FileOutcome;
  /** ISO date of the saved mapping that was reused, when one was. */
  reusedFrom?: string;
}

/** The report entry of a file that is neither a survey, a station table nor a centerline. */
function unrecognised(inspection: FileInspection): FileOutcome {
  const why = inspection.message ? ` (${inspection.message})` : "";
  return {
    fileName: inspection.fileName,
    kind: "unknown",
    surveys: [],
    issues: [
      {
        file: inspection.fileName,
        row: 0,
        column: "",
        value: "",
        expected: `a survey table, GeoJSON points or centerline, netCDF survey or station table${why}`,
        severity: "error",
      },
    ],
  };
}

export class DataState {
  mappings = $state.raw<ColumnMapping[]>([]);
  mappingDates = $state.raw<Record<string, string>>({});
  imports = $state.raw<ImportRecord[]>([]);
  centerline = $state.raw<object | null>(null);
  demoBasemap = $state(true);
  question = $state.raw<MappingQuestion | null>(null);
  report = $state.raw<ReportEntry[]>([]);
  progress = $state<{ stage: string; fraction: number } | null>(null);
  /** Problems with the workspace itself (restore, open, save). */
  notices = $state.raw<ImportIssue[]>([]);
  /** True once the stored workspace (or the demo) has been loaded. */
  ready = $state(false);
  /** True once the user changed anything; the untouched demo is not stored, so it stays the default. */
  dirty = false;
  #baseline: string | undefined;

  constructor(
    readonly app: AppState,
    readonly client: ImportClient,
    readonly store: WorkspaceStore,
    readonly now: () => Date = () => new Date(),
  ) {}

  /** Restores the stored workspace, or starts the demo estuary when the store is empty. */
  async boot(): Promise<void> {
    const text = await this.store.load().catch(() => undefined);
    if (text === undefined || !this.openText(text)) this.startDemo();
    else this.dirty = true;
    this.ready = true;
  }

  startDemo(): void {
    const bundle = demoBundle();
    this.centerline = bundle.centerline ? (JSON.parse(bundle.centerline.text) as object) : null;
    this.demoBasemap = true;
    this.app.start(bundle);
  }

  /** Forgets the stored workspace and goes back to the demo estuary. */
  async resetToDemo(): Promise<void> {
    await this.store.clear();
    this.mappings = [];
    this.mappingDates = {};
    this.imports = [];
    this.report = [];
    this.notices = [];
    this.app.selection.surveyIndex = 0;
    this.dirty = false;
    this.#baseline = undefined;
    this.startDemo();
  }

  #basemap(): FeatureCollection | undefined {
    const text = this.demoBasemap ? demoBundle().basemap?.text : undefined;
    return text ? (JSON.parse(text) as FeatureCollection) : undefined;
  }

  /** The centerline the analysis uses now (the app's, which a drawn line may have replaced), else the stored one. */
  #centerlineFile(): TextFile | undefined {
    const current = this.app.centerlineFile;
    if (current) return current;
    return this.centerline ? { name: "centerline.geojson", text: JSON.stringify(this.centerline) } : undefined;
  }

  /** The current centerline as GeoJSON for the workspace document. */
  #centerlineObject(): object | null {
    const current = this.app.centerlineFile;
    if (!current) return this.centerline;
    try {
      return JSON.parse(current.text) as object;
    } catch {
      return this.centerline;
    }
  }

  /** Sends surveys (and the current centerline) to the analysis and saves the workspace. */
  setSurveys(surveys: Survey[], selectIndex?: number, centerline: TextFile | undefined = this.#centerlineFile()): void {
    this.app.loadSurveys(surveys, centerline, this.#basemap());
    if (selectIndex !== undefined) this.app.selection.surveyIndex = selectIndex;
    this.dirty = true;
  }

  /**
   * Called when settings or selection change (a key of their values): the first key seen once the
   * analysis is ready is the baseline; any other marks the workspace as changed by the user.
   */
  noteSettings(key: string): void {
    if (this.app.workspace.status !== "ready" || !this.ready) return;
    this.#baseline ??= key;
    if (key !== this.#baseline) this.dirty = true;
  }

  /** Changes one survey's name or river discharge [m³/s] and re-analyses. */
  editSurvey(index: number, patch: { name?: string; riverDischargeM3s?: number | undefined }): void {
    const surveys = this.app.workspace.surveys.map((s, i) => {
      if (i !== index) return s;
      const next: Survey = { ...s, ...(patch.name ? { name: patch.name } : {}) };
      if ("riverDischargeM3s" in patch) {
        if (patch.riverDischargeM3s === undefined) delete next.riverDischargeM3s;
        else next.riverDischargeM3s = patch.riverDischargeM3s;
      }
      return next;
    });
    this.setSurveys(uniqueSurveyNames(surveys), this.app.selection.surveyIndex);
  }

  /** Asks the user to confirm the mapping of a delimited file (resolves undefined on cancel). */
  #ask(inspection: FileInspection): Promise<ColumnMapping | undefined> {
    const mapping = structuredClone(inspection.suggested) as ColumnMapping;
    return new Promise((resolve) => {
      this.question = {
        inspection,
        mapping,
        answer: (m) => {
          this.question = null;
          resolve(m);
        },
      };
    });
  }

  #remember(mapping: ColumnMapping): void {
    this.mappings = [...this.mappings.filter((m) => m.shape !== mapping.shape), mapping];
    this.mappingDates = { ...this.mappingDates, [mapping.shape]: this.now().toISOString() };
  }

  #onProgress = (fraction: number, stage: string): void => {
    this.progress = { stage, fraction };
  };

  /** Imports dropped or picked files: recognise, confirm mappings, read, add the surveys. */
  async importFiles(files: ImportSource[]): Promise<void> {
    if (files.length === 0) return;
    this.progress = { stage: "Recognising files", fraction: 0 };
    const inspected = await Promise.all(
      files.map(async (file) => ({ file, inspection: await this.client.inspect(file) })),
    );
    const order = (k: string) => (k === "centerline" ? 0 : k === "stationTable" ? 1 : 2);
    inspected.sort((a, b) => order(a.inspection.kind) - order(b.inspection.kind));
    const entries: ReportEntry[] = [];
    let stationTable: StationTable | undefined;
    for (const { file, inspection } of inspected) {
      let mapping: ColumnMapping | undefined;
      let reusedFrom: string | undefined;
      if (inspection.kind === "surveyText" && inspection.suggested) {
        const saved = findSavedMapping(inspection.headers, this.mappings);
        if (saved) {
          mapping = saved;
          reusedFrom = this.mappingDates[saved.shape] ?? "an earlier import";
        } else {
          this.progress = null;
          mapping = await this.#ask(inspection);
          if (!mapping) continue;
          this.#remember(mapping);
        }
      }
      const outcome =
        inspection.kind === "unknown"
          ? unrecognised(inspection)
          : await this.client.read(
              file,
              { kind: inspection.kind, ...(mapping ? { mapping } : {}), ...(stationTable ? { stationTable } : {}) },
              this.#onProgress,
            );
      if (outcome.stationTable) stationTable = outcome.stationTable;
      entries.push({ outcome, ...(reusedFrom ? { reusedFrom } : {}) });
    }
    this.progress = null;
    this.#finish(entries);
  }

  #finish(entries: ReportEntry[]): void {
    if (entries.length === 0) return;
    this.report = entries;
    this.imports = [
      ...this.imports,
      ...entries.map(({ outcome: o }) => ({
        file: o.fileName,
        ...(o.mapping ? { shape: o.mapping.shape } : {}),
        ...(o.summary
          ? { rowsRead: o.summary.rowsRead, rowsAccepted: o.summary.rowsAccepted, rowsRejected: o.summary.rowsRejected }
          : {}),
        issues: o.issues,
      })),
    ];
    const lineEntry = entries.find((e) => e.outcome.centerline);
    const line = lineEntry?.outcome.centerline;
    if (line) {
      this.centerline = line;
      this.demoBasemap = false;
    }
    const lineFile = lineEntry && line ? { name: lineEntry.outcome.fileName, text: JSON.stringify(line) } : undefined;
    const before = this.app.workspace.surveys;
    const added = entries.flatMap((e) => e.outcome.surveys);
    const all = uniqueSurveyNames([...before, ...added]);
    this.setSurveys(all, added.length > 0 ? before.length : undefined, lineFile ?? this.#centerlineFile());
  }

  /** The workspace state as a document's parts. */
  parts(): WorkspaceParts {
    const { app } = this;
    const name = app.survey?.name;
    return {
      surveys: app.workspace.surveys,
      centerline: this.#centerlineObject(),
      demoBasemap: this.demoBasemap,
      mappings: this.mappings,
      mappingDates: this.mappingDates,
      imports: this.imports,
      colouring: app.settings.colouring,
      tileUrl: app.settings.tileUrl,
      useTiles: app.settings.useTiles,
      analysis: $state.snapshot(app.settings.analysis) as WorkspaceParts["analysis"],
      ...(name !== undefined ? { selectedSurvey: name } : {}),
      selectedConstituent: app.selection.constituent,
    };
  }

  /** The workspace as versioned JSON text. */
  exportText(): string {
    return exportWorkspace(toWorkspaceDocument(this.parts(), this.now().toISOString()));
  }

  /** Saves the workspace in the store (once the user changed something and there are surveys to keep). */
  async save(): Promise<void> {
    if (!this.ready || !this.dirty || this.app.workspace.surveys.length === 0) return;
    try {
      await this.store.save(this.exportText());
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
  openText(text: string): boolean {
    const { workspace, issues } = importWorkspace(text);
    this.notices = issues;
    if (!workspace) return false;
    this.dirty = true;
    const p = fromWorkspaceDocument(workspace);
    const { app } = this;
    this.mappings = p.mappings;
    this.mappingDates = p.mappingDates;
    this.imports = p.imports;
    this.centerline = p.centerline;
    this.demoBasemap = p.demoBasemap;
    const restoredLine = p.centerline ? { name: "centerline.geojson", text: JSON.stringify(p.centerline) } : undefined;
    app.settings.colouring = p.colouring;
    app.settings.tileUrl = p.tileUrl;
    app.settings.useTiles = p.useTiles;
    app.settings.updateAnalysis(p.analysis);
    const index = Math.max(
      0,
      p.surveys.findIndex((s) => s.name === p.selectedSurvey),
    );
    if (p.selectedConstituent) app.selection.constituent = p.selectedConstituent;
    app.loadSurveys(p.surveys, restoredLine, this.#basemap());
    app.selection.surveyIndex = index;
    return true;
  }
}
