/** Small invented import files for the dashboard import tests (not measurements). */
import { exportWorkspace, importWorkspace, type Survey } from "../../../analysis/index.ts";
import { createWorkerApi } from "../../../dashboard/src/worker/api.ts";
import type { RemoteApi } from "../../../dashboard/src/worker/client.ts";
import type { ImportSource } from "../../../dashboard/src/worker/importTypes.ts";
import { Selection } from "../../../dashboard/src/state/selection.svelte.ts";
import { Settings } from "../../../dashboard/src/state/settings.svelte.ts";
import { SavedWorkspace, type WorkspaceHost } from "../../../dashboard/src/state/savedWorkspace.svelte.ts";
import { ImportFlow } from "../../../dashboard/src/state/importFlow.svelte.ts";
import type { WorkspaceStore } from "../../../dashboard/src/state/workspaceStore.ts";

/** Semicolons, decimal commas, a censored value, a bad cell, a salinity header no pattern knows, a row without id. */
export const QUIRKY_CSV = [
  "Cruise;Stn;Date;Lat;Lon;S_field;Fe (nmol/L);Mn (nmol/L)",
  "autumn-2025-11;N01;2025-11-04;45,04869;-35,30269;33,2;<0,05;3,1",
  "autumn-2025-11;N02;2025-11-04;45,05041;-35,30234;30,1;5,5;4,2",
  "autumn-2025-11;N03;2025-11-04;45,05351;-35,30693;25,4;abc;6,0",
  "autumn-2025-11;;2025-11-04;45,0600;-35,3100;12,5;30,2;9,5",
  "autumn-2025-11;N05;2025-11-04;45,0650;-35,3150;2,5;40,2;19,5",
].join("\n");

export function file(name: string, content: string | Uint8Array): ImportSource {
  return new File([content as BlobPart], name);
}

/** The worker's API without a worker: the same object the worker exposes, called in-process. */
export function directClient(): Pick<RemoteApi, "inspect" | "read"> {
  return createWorkerApi() as unknown as Pick<RemoteApi, "inspect" | "read">;
}

export type FakeApp = WorkspaceHost & { started: number; results: { surveys: Survey[] } };

/** The parts of the app root the saved workspace uses; loadSurveys answers at once as the worker's "loaded" would. */
export function fakeApp(): FakeApp {
  const app = {
    started: 0,
    results: { surveys: [] as Survey[], status: "ready" },
    settings: new Settings(),
    selection: new Selection(),
    loadSurveys(surveys: Survey[]) {
      app.results.surveys = surveys;
      return Promise.resolve();
    },
    workspaceIo: () => ({
      importWorkspace: (text: string) => Promise.resolve(importWorkspace(text)),
      exportWorkspace: (doc: Parameters<typeof exportWorkspace>[0]) => Promise.resolve(exportWorkspace(doc)),
    }),
    load() {
      app.started += 1;
      app.results.surveys = [];
      return Promise.resolve();
    },
  };
  return app as unknown as FakeApp;
}

/** The saved workspace with its import flow (reading in-process), as the app root wires them. */
export class DataState extends SavedWorkspace {
  readonly flow: ImportFlow;
  constructor(app: FakeApp, store: WorkspaceStore, now?: () => Date) {
    super(app, store, now);
    const reader = directClient();
    this.flow = new ImportFlow(this, () => reader);
  }
}
