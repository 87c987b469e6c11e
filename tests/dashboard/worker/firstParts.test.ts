/**
 * Cold start on two threads: the first survey's constituents split in two parts, one analysed by the
 * worker that runs the job and one by a second worker (`analysePart` → `receivePart`), merged in the
 * survey's order. Only the work is split, never a result changes (common practice: scheduling must
 * not change a computed value): every event equals the single-worker run's. Demo data are invented.
 */
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { readSurveyText } from "../../../analysis/index.ts";
import { createWorkerApi } from "../../../dashboard/src/worker/api.ts";
import type { AnalysisEvent, AnalysisJob } from "../../../dashboard/src/worker/protocol.ts";
import { demoJob as job, eventsOf, runJob } from "./helpers/demoJob.ts";

const demo = (p: string) => readFileSync(new URL(`../../../data-demo/${p}`, import.meta.url), "utf8");
const analysed = (es: AnalysisEvent[]) => eventsOf(es, "analysis");
const notProgress = (es: AnalysisEvent[]) => es.filter((e) => e.type !== "progress");

describe("the first survey analysed in two parts on two workers equals the single-worker analysis", () => {
  it("part 1 from a second worker: the same events, results and comparison as one worker", async () => {
    const single = await runJob(job());
    const split = job({ firstParts: { count: 2, token: 7 } });
    const helper = createWorkerApi();
    const part = await helper.analysePart(split, 1, { index: 1, count: 2 });
    const names = part?.constituents.map((c) => c.name) ?? [];
    const all = analysed(single)
      .find((e) => e.surveyIndex === 1)!
      .analysis.constituents.map((c) => c.name);
    // A real split: part 1 holds some constituents, not all, in the survey's order.
    expect(names.length).toBeGreaterThan(0);
    expect(names.length).toBeLessThan(all.length);
    expect(all.filter((n) => names.includes(n))).toEqual(names);
    let delivered = false;
    const events = await runJob(split, (api) => {
      delivered = true;
      api.receivePart(7, 1, part);
    });
    expect(delivered).toBe(true);
    expect(analysed(events).map((e) => e.surveyIndex)).toEqual([1, 0]);
    expect(notProgress(events)).toEqual(notProgress(single));
    // The delivered part is the one merged in (a marked copy shows up in the result).
    const marked = { constituents: part!.constituents.map((c) => ({ ...c, unit: `${c.unit} (part 1)` })) };
    const markedRun = await runJob(job({ firstParts: { count: 2, token: 8 } }), (api) => api.receivePart(8, 1, marked));
    const units = analysed(markedRun)[0]!.analysis.constituents.map((c) => c.unit);
    expect(units.filter((u) => u.endsWith("(part 1)"))).toHaveLength(names.length);
  }, 240_000);

  it("a restored workspace (setSurveys job, surveys already read): the same analysis from two parts", async () => {
    const surveys = readSurveyText(demo("surveys/both-surveys.csv"), { fileName: "both-surveys.csv" }).surveys;
    const restored = (extra: Partial<AnalysisJob> = {}) =>
      job({ kind: "setSurveys", surveys, firstSurvey: 0, ...extra } as Partial<AnalysisJob>);
    const single = await runJob(restored());
    const split = restored({ firstParts: { count: 2, token: 5 } });
    const part = await createWorkerApi().analysePart(split, 0, { index: 1, count: 2 });
    expect(part?.constituents.length).toBeGreaterThan(0);
    const events = await runJob(split, (api) => api.receivePart(5, 1, part));
    expect(notProgress(events)).toEqual(notProgress(single));
  }, 240_000);

  it("a part that is not there (a second worker that failed or found the cache) is analysed by the first; a stale token is ignored", async () => {
    const single = await runJob(job());
    const split = job({ firstParts: { count: 2, token: 3 } });
    const events = await runJob(split, (api) => {
      api.receivePart(2, 1, { constituents: [] }); // another job's part: ignored
      api.receivePart(3, 1, undefined);
    });
    expect(notProgress(events)).toEqual(notProgress(single));
  }, 240_000);
});
