/**
 * The dashboard's worker: exposes the worker API (api.ts) through Comlink. The main thread starts
 * one instance for the analysis and others for long reads (import, underway log), so reading a
 * large file never holds up the analysis on screen.
 */
import { expose, transfer } from "comlink";
import { createWorkerApi } from "./api.ts";
import { pointsTransfer, underwayTransfer } from "./underwayEngine.ts";
import { browserResultCache } from "./resultCache.ts";
import { demoJob, EARLY_DEMO_MESSAGE } from "./earlyJob.ts";
import { readDemoFiles } from "./demoFiles.ts";

const api = createWorkerApi(browserResultCache());

// A first visit (the built page's head script says so, dashboard/sharedWorker.ts): begin the demo's
// job now, while the page's main bundle loads; the page's same job attaches to it (earlyJob.ts).
// Registered before Comlink's listener, which never sees this message.
self.addEventListener("message", (event: MessageEvent) => {
  const data: unknown = event.data;
  if (typeof data !== "object" || data === null || !(EARLY_DEMO_MESSAGE in data)) return;
  event.stopImmediatePropagation();
  void readDemoFiles({ basemap: false }).then(
    (bundle) => {
      if (bundle.surveys.length > 0) api.startEarly(demoJob(bundle));
    },
    () => undefined,
  );
});

expose({
  ...api,
  /** The underway result with its typed arrays transferred, not copied. */
  async underway(...args: Parameters<typeof api.underway>) {
    const result = await api.underway(...args);
    return transfer(result, underwayTransfer(result));
  },
  /** A view's points with their typed arrays transferred. */
  underwayView(...args: Parameters<typeof api.underwayView>) {
    const points = api.underwayView(...args);
    return transfer(points, pointsTransfer(points));
  },
} satisfies typeof api);
