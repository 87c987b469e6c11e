/**
 * The dashboard's cold-start job on the invented demo files (both surveys in one file, the centerline,
 * default settings, the second survey on screen), and a run of a job on one worker API that resumes
 * the background surveys after the first analysis, as the main thread does once the first view is drawn.
 */
import { readFileSync } from "node:fs";
import { createWorkerApi } from "../../../../dashboard/src/worker/api.ts";
import type { AnalysisEvent, AnalysisJob } from "../../../../dashboard/src/worker/protocol.ts";
import { Settings } from "../../../../dashboard/src/state/settings.svelte.ts";

const demo = (p: string) => readFileSync(new URL(`../../../../data-demo/${p}`, import.meta.url), "utf8");

/** The demo's load job, with `extra` (e.g. another first survey, a first constituent, parts). */
export const demoJob = (extra: Partial<AnalysisJob> = {}): AnalysisJob =>
  ({
    kind: "load",
    surveys: [{ name: "both-surveys.csv", text: demo("surveys/both-surveys.csv") }],
    centerline: { name: "centerline.geojson", text: demo("centerline.geojson") },
    settings: new Settings().analysis,
    firstSurvey: 1,
    ...extra,
  }) as AnalysisJob;

/** The events of one type. */
export const eventsOf = <T extends AnalysisEvent["type"]>(es: AnalysisEvent[], type: T) =>
  es.filter((e): e is Extract<AnalysisEvent, { type: T }> => e.type === type);

/**
 * Runs `job` on a new worker API and returns its events; `onMixing` is called once, on that API, when
 * the first mixing analysis has begun.
 */
export async function runJob(
  job: AnalysisJob,
  onMixing?: (api: ReturnType<typeof createWorkerApi>) => void,
): Promise<AnalysisEvent[]> {
  const api = createWorkerApi();
  const events: AnalysisEvent[] = [];
  let started = false;
  await api.run(job, (e) => {
    events.push(e);
    if (!started && e.type === "progress" && e.stage.includes("mixing analysis")) {
      started = true;
      if (onMixing) setTimeout(() => onMixing(api), 0);
    }
    if (e.type === "analysis" && eventsOf(events, "analysis").length === 1) setTimeout(() => api.resumeBackground(), 0);
  });
  return events;
}
