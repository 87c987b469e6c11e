/**
 * Cold start order: the worker analyses the survey on screen (`firstSurvey`) first, posts it, waits
 * for the main thread's `resumeBackground` (the first view drawn), then analyses the others. Only the
 * order changes, never the results (common practice: scheduling must not change a computed value).
 * Demo data are invented.
 */
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { readSurveyText, type Survey } from "../../../analysis/index.ts";
import { createWorkerApi } from "../../../dashboard/src/worker/api.ts";
import type { AnalysisEvent, AnalysisJob } from "../../../dashboard/src/worker/protocol.ts";
import { Settings } from "../../../dashboard/src/state/settings.svelte.ts";

const demo = (p: string) => readFileSync(new URL(`../../../data-demo/${p}`, import.meta.url), "utf8");
const surveys: Survey[] = ["wet-2025-03.csv", "dry-2025-09.csv"].flatMap(
  (file) => readSurveyText(demo(`surveys/${file}`), { fileName: file }).surveys,
);
const job = (firstSurvey?: number): AnalysisJob => ({
  kind: "setSurveys",
  surveys,
  centerline: { name: "centerline.geojson", text: demo("centerline.geojson") },
  settings: new Settings().analysis,
  ...(firstSurvey !== undefined ? { firstSurvey } : {}),
});

describe("WorkerApi.run(): the survey on screen first, the rest after the first view", () => {
  it("firstSurvey 1: survey 1 is posted first, the others wait for resumeBackground, results equal the in-order run", async () => {
    const inOrder: AnalysisEvent[] = [];
    await createWorkerApi().run(job(), (e) => inOrder.push(e));

    const api = createWorkerApi();
    const events: AnalysisEvent[] = [];
    let resumedAfter: number | undefined;
    await api.run(job(1), (e) => {
      events.push(e);
      if (e.type === "analysis" && resumedAfter === undefined) {
        resumedAfter = events.length;
        // As the main thread does once the first view is drawn.
        setTimeout(() => api.resumeBackground(), 0);
      }
    });
    const order = events.flatMap((e) => (e.type === "analysis" ? [e.surveyIndex] : []));
    expect(order).toEqual([1, 0]);
    // Progress names the survey being analysed and how many are done.
    expect(events.some((e) => e.type === "progress" && e.stage.startsWith("Analysing survey 2 of 2"))).toBe(true);
    const byIndex = (es: AnalysisEvent[], i: number) =>
      es.find((e): e is Extract<AnalysisEvent, { type: "analysis" }> => e.type === "analysis" && e.surveyIndex === i);
    for (const i of [0, 1]) {
      expect(byIndex(events, i)?.analysis).toEqual(byIndex(inOrder, i)?.analysis);
      expect(byIndex(events, i)?.overlay).toEqual(byIndex(inOrder, i)?.overlay);
    }
    const comparison = (es: AnalysisEvent[]) => es.find((e) => e.type === "comparison");
    expect(comparison(events)).toEqual(comparison(inOrder));
    expect(events.at(-1)?.type).toBe("done");
  }, 180_000);

  it("a newer job cancels the background surveys of an older one", async () => {
    const api = createWorkerApi();
    const first: AnalysisEvent[] = [];
    const older = api.run(job(0), (e) => first.push(e));
    // The newer job starts while the older one waits for its first view (no resumeBackground).
    const second: AnalysisEvent[] = [];
    await new Promise<void>((resolve) => {
      const poll = () => (first.some((e) => e.type === "analysis") ? resolve() : setTimeout(poll, 5));
      poll();
    });
    const newer = api.run({ kind: "analyze", settings: new Settings().analysis, firstSurvey: 1 }, (e) => {
      second.push(e);
      if (e.type === "analysis" && e.surveyIndex === 1) setTimeout(() => api.resumeBackground(), 0);
    });
    await Promise.all([older, newer]);
    expect(first.filter((e) => e.type === "analysis").map((e) => e.type === "analysis" && e.surveyIndex)).toEqual([0]);
    expect(first.some((e) => e.type === "done")).toBe(false);
    expect(second.filter((e) => e.type === "analysis").map((e) => e.type === "analysis" && e.surveyIndex)).toEqual([
      1, 0,
    ]);
  }, 180_000);
});
