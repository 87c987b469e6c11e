/**
 * The import flow: dropped or picked files are recognised and read in the reading worker, the
 * column mapping of a delimited file is confirmed in the dialog (or a saved one reused by file
 * shape), and what was read is handed to the saved workspace. Keeps the last import's report.
 */
import {
  findSavedMapping,
  missingUnits,
  unusedColumns,
  type ColumnMapping,
  type LayerChoice,
  type StationTable,
} from "../../../analysis/index.ts";
import { proxyCallback, type RemoteApi } from "../worker/client.ts";
import type { FileInspection, FileOutcome, ImportSource } from "../worker/importTypes.ts";
import type { SavedWorkspace } from "./savedWorkspace.svelte.ts";

/** The mapping dialog's open question. */
export interface MappingQuestion {
  inspection: FileInspection;
  mapping: ColumnMapping;
  /** When the mapping shown is one saved earlier for files of this shape: the date it was confirmed. */
  savedOn?: string;
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

export class ImportFlow {
  question = $state.raw<MappingQuestion | null>(null);
  report = $state.raw<ReportEntry[]>([]);
  progress = $state<{ stage: string; fraction: number } | null>(null);
  /** Depth layer kept from depth-resolved files (undefined: the reader's default); saved with the workspace. */
  get layer(): LayerChoice | undefined {
    return this.workspace.layer;
  }
  set layer(choice: LayerChoice | undefined) {
    this.workspace.layer = choice;
    this.workspace.dirty = true;
  }

  constructor(
    readonly workspace: SavedWorkspace,
    readonly reader: () => Pick<RemoteApi, "inspect" | "read">,
  ) {}

  /**
   * Opens the saved mapping of a file's shape in the dialog again on the next imports instead of
   * reusing it silently (to add a unit or change a role); the edited mapping replaces the saved one.
   */
  reviewSaved = $state(false);

  /**
   * Asks the user to confirm the mapping of a delimited file, starting from a saved mapping of the
   * same shape when given, else from the suggestion (resolves undefined on cancel).
   */
  #ask(inspection: FileInspection, saved?: { mapping: ColumnMapping; on: string }): Promise<ColumnMapping | undefined> {
    const mapping = structuredClone(saved?.mapping ?? inspection.suggested) as ColumnMapping;
    return new Promise((resolve) => {
      this.question = {
        inspection,
        mapping,
        ...(saved ? { savedOn: saved.on } : {}),
        answer: (m) => {
          this.question = null;
          resolve(m);
        },
      };
    });
  }

  /** True while files are being read; progress callbacks arriving after the read (another port) are dropped. */
  #reading = false;

  #onProgress = (fraction: number, stage: string): void => {
    if (this.#reading) this.progress = { stage, fraction };
  };

  /** Imports dropped or picked files: recognise, confirm mappings, read, add the surveys. */
  async importFiles(files: ImportSource[]): Promise<void> {
    if (files.length === 0) return;
    const reader = this.reader();
    this.progress = { stage: "Recognising files", fraction: 0 };
    const inspected = await Promise.all(files.map(async (file) => ({ file, inspection: await reader.inspect(file) })));
    const order = (k: string) => (k === "centerline" ? 0 : k === "stationTable" ? 1 : 2);
    inspected.sort((a, b) => order(a.inspection.kind) - order(b.inspection.kind));
    const entries: ReportEntry[] = [];
    let stationTable: StationTable | undefined;
    for (const { file, inspection } of inspected) {
      let mapping: ColumnMapping | undefined;
      let reusedFrom: string | undefined;
      if (inspection.kind === "surveyText" && inspection.suggested) {
        const saved = findSavedMapping(inspection.headers, this.workspace.mappings);
        const savedOn = saved ? (this.workspace.mappingDates[saved.shape] ?? "an earlier import") : undefined;
        if (saved && savedOn && !this.reviewSaved) {
          mapping = saved;
          reusedFrom = savedOn;
        } else {
          this.progress = null;
          mapping = await this.#ask(inspection, saved && savedOn ? { mapping: saved, on: savedOn } : undefined);
          if (!mapping) continue;
          this.workspace.remember(mapping);
        }
      }
      const outcome =
        inspection.kind === "unknown"
          ? unrecognised(inspection)
          : await this.#read(() =>
              reader.read(
                file,
                {
                  kind: inspection.kind,
                  ...(mapping ? { mapping } : {}),
                  ...(stationTable ? { stationTable } : {}),
                  ...(this.layer ? { layer: $state.snapshot(this.layer) as LayerChoice } : {}),
                },
                proxyCallback(this.#onProgress),
              ),
            );
      if (inspection.kind === "surveyText" && outcome.mapping) {
        const used = outcome.mapping;
        outcome.notUsed = [
          ...unusedColumns(used, inspection.headers, inspection.previewRows),
          ...missingUnits(used).map((m) => ({
            header: m.header,
            reason: "no unit given (a unit typed in the column dialog makes it usable)",
          })),
        ];
      }
      if (outcome.stationTable) stationTable = outcome.stationTable;
      entries.push({ outcome, ...(reusedFrom ? { reusedFrom } : {}) });
    }
    this.progress = null;
    this.#finish(entries);
  }

  async #read<T>(call: () => Promise<T>): Promise<T> {
    this.#reading = true;
    try {
      return await call();
    } finally {
      this.#reading = false;
    }
  }

  #finish(entries: ReportEntry[]): void {
    if (entries.length === 0) return;
    this.report = entries;
    const records = entries.map(({ outcome: o }) => ({
      file: o.fileName,
      ...(o.mapping ? { shape: o.mapping.shape } : {}),
      ...(o.summary
        ? { rowsRead: o.summary.rowsRead, rowsAccepted: o.summary.rowsAccepted, rowsRejected: o.summary.rowsRejected }
        : {}),
      issues: o.issues,
    }));
    const lineEntry = entries.find((e) => e.outcome.centerline);
    const line = lineEntry?.outcome.centerline;
    const lineFile = lineEntry && line ? { name: lineEntry.outcome.fileName, text: JSON.stringify(line) } : undefined;
    this.workspace.addImport(
      records,
      entries.flatMap((e) => e.outcome.surveys),
      lineFile,
    );
  }

  /** Forgets the last report (the workspace was reset). */
  clear(): void {
    this.report = [];
  }
}
