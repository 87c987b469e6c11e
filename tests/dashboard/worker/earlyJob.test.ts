/**
 * The cold start's early job (dashboard/src/worker/earlyJob.ts): at a first visit the analysis worker
 * begins the demo's job before the page asks, and the page's same job attaches to that run. Only the
 * start moves, never a result (common practice: scheduling must not change a computed value): the
 * attached page hears the same events as a plain run; a different job is run as usual. Demo data are invented.
 */
import { describe, expect, it } from "vitest";
import { AppState } from "../../../dashboard/src/state/app.svelte.ts";
import { memoryStore } from "../../../dashboard/src/state/workspaceStore.ts";
import { createWorkerApi } from "../../../dashboard/src/worker/api.ts";
import type { WorkerHandle, RemoteApi } from "../../../dashboard/src/worker/client.ts";
import { demoJob, sameJob } from "../../../dashboard/src/worker/earlyJob.ts";
import { readDemoFiles } from "../../../dashboard/src/worker/demoFiles.ts";
import type { AnalysisEvent, AnalysisJob } from "../../../dashboard/src/worker/protocol.ts";

/** Runs `job` through `api.run`, resuming the background surveys after the first, as the main thread does. */
async function collect(api: ReturnType<typeof createWorkerApi>, job: AnalysisJob): Promise<AnalysisEvent[]> {
  const events: AnalysisEvent[] = [];
  let first = true;
  await api.run(job, (e) => {
    events.push(e);
    if (e.type === "analysis" && first) {
      first = false;
      setTimeout(() => api.resumeBackground(), 0);
    }
  });
  return events;
}

/** Structured-clone round trip, as a job crossing to the worker. */
const cloned = <T>(value: T): T => structuredClone(value);

describe("the worker's early demo job", () => {
  it("equals the job the page sends at a first visit (SavedWorkspace.boot → startDemo → AppState.run)", async () => {
    const sent: AnalysisJob[] = [];
    const connect = (): WorkerHandle => ({
      api: {
        run: (job: AnalysisJob) => {
          sent.push(cloned(job));
          return Promise.resolve();
        },
      } as unknown as RemoteApi,
      terminate: () => undefined,
    });
    const app = new AppState({ store: memoryStore(), connect });
    await app.workspace.boot();
    expect(sent.length).toBe(1);
    const early = demoJob(await readDemoFiles({ basemap: false }));
    expect(sameJob(sent[0], early)).toBe(true);
    // A changed setting is another job.
    expect(sameJob({ ...sent[0], settings: { ...early.settings, saltIntrusionSalinity: 5 } }, early)).toBe(false);
  });

  it("the page's same job attaches: the same events, in order, as a plain run", async () => {
    const job = demoJob(await readDemoFiles({ basemap: false }));
    const plain = await collect(createWorkerApi(), cloned(job));
    const api = createWorkerApi();
    api.startEarly(job);
    const attached = await collect(api, cloned(job));
    expect(attached).toEqual(plain);
    expect(attached.filter((e) => e.type === "analysis").length).toBe(2);
  });

  it("a different job supersedes the early one and is analysed as usual", async () => {
    const job = demoJob(await readDemoFiles({ basemap: false }));
    const other = { ...cloned(job), firstSurvey: 1 };
    const plain = await collect(createWorkerApi(), other);
    const api = createWorkerApi();
    api.startEarly(job);
    expect(await collect(api, other)).toEqual(plain);
  });

  it("is ignored once the page has run a job", async () => {
    const job = demoJob(await readDemoFiles({ basemap: false }));
    const api = createWorkerApi();
    const first = collect(api, cloned(job));
    api.startEarly({ ...cloned(job), firstSurvey: 1 });
    const events = await first;
    expect(events.find((e) => e.type === "analysis")).toMatchObject({ surveyIndex: 0 });
  });
});
