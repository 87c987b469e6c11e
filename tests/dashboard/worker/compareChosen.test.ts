/**
 * Compare over the chosen surveys: the worker's `compare(indices)` compares exactly the surveys picked
 * in the survey picker (the first chosen is the reference), with the workspace API's comparison
 * (common practice: a comparison states which surveys it compares). Demo data are invented.
 */
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { readSurveyText, type Survey } from "../../../analysis/index.ts";
import { createWorkerApi } from "../../../dashboard/src/worker/api.ts";
import type { AnalysisEvent } from "../../../dashboard/src/worker/protocol.ts";
import { Settings } from "../../../dashboard/src/state/settings.svelte.ts";

const demo = (p: string) => readFileSync(new URL(`../../../data-demo/${p}`, import.meta.url), "utf8");

function surveysOf(file: string, rename?: string): Survey[] {
  const s = readSurveyText(demo(`surveys/${file}`), { fileName: file }).surveys;
  return rename ? s.map((x) => ({ ...x, name: rename })) : s;
}

describe("WorkerApi.compare(): the comparison of exactly the chosen surveys", () => {
  it("three surveys held, two chosen: the comparison names those two, the first chosen as the reference", async () => {
    const api = createWorkerApi();
    const surveys = [
      ...surveysOf("wet-2025-03.csv"),
      ...surveysOf("dry-2025-09.csv"),
      ...surveysOf("wet-2025-03.csv", "wet-copy"),
    ];
    const events: AnalysisEvent[] = [];
    await api.run(
      {
        kind: "setSurveys",
        surveys,
        centerline: { name: "centerline.geojson", text: demo("centerline.geojson") },
        settings: new Settings().analysis,
      },
      (e) => events.push(e),
    );
    const all = events.find((e) => e.type === "comparison");
    expect(all?.type === "comparison" && all.comparison?.surveys).toEqual(["wet-2025-03", "dry-2025-09", "wet-copy"]);

    const chosen = api.compare([1, 2]);
    expect(chosen.reason).toBeUndefined();
    expect(chosen.comparison?.surveys).toEqual(["dry-2025-09", "wet-copy"]);
    expect(chosen.comparison?.referenceSurvey).toBe("dry-2025-09");
    expect(new Set(chosen.comparison?.intrusion.map((r) => r.survey))).toEqual(new Set(["dry-2025-09", "wet-copy"]));
    expect(api.compare([0]).reason).toMatch(/two or more/);
  }, 120_000);
});
