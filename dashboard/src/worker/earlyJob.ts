/**
 * The cold start's first job, begun by the analysis worker itself. At a first visit (no saved
 * workspace) the page always starts with the demo's job; the built page's head script, which starts
 * the worker before the main bundle is fetched (dashboard/sharedWorker.ts), tells it so with one
 * message, and the worker reads the demo's files and begins that job at once, while the main bundle
 * loads. The page's own job, when it comes, attaches to it if it is the same job (`sameJob`):
 * same files, same settings, same survey first; any other job supersedes it as usual. The numbers
 * come from the one analysis path either way; only the start moves earlier.
 */
import type { AnalysisJob } from "./protocol.ts";
import type { DemoBundle } from "./demoFiles.ts";
import { defaultAnalysisSettings } from "./defaultSettings.ts";

/** The message (its one key) the head script posts to the early worker at a first visit. */
export const EARLY_DEMO_MESSAGE = "bracklineEarlyDemo";

/** The job a first visit's page sends (SavedWorkspace.startDemo → AppState.load → run): the demo's files, default settings, survey 0 first. */
export function demoJob(bundle: Pick<DemoBundle, "surveys" | "centerline">): AnalysisJob {
  return {
    kind: "load",
    surveys: bundle.surveys,
    ...(bundle.centerline ? { centerline: bundle.centerline } : {}),
    settings: defaultAnalysisSettings(),
    firstSurvey: 0,
  };
}

/** JSON text with object keys sorted (undefined members left out, as JSON does), so equal jobs give equal text. */
function canonical(value: unknown): string {
  return JSON.stringify(value, (_key, v: unknown) => {
    if (v === null || typeof v !== "object" || Array.isArray(v) || ArrayBuffer.isView(v)) {
      return ArrayBuffer.isView(v) ? Array.from(new Uint8Array(v.buffer, v.byteOffset, v.byteLength)) : v;
    }
    const o = v as Record<string, unknown>;
    return Object.fromEntries(
      Object.keys(o)
        .sort()
        .map((k) => [k, o[k]]),
    );
  });
}

/** True when two jobs ask for the same work: the same kind, files, settings and order. */
export function sameJob(a: AnalysisJob, b: AnalysisJob): boolean {
  return canonical(a) === canonical(b);
}
