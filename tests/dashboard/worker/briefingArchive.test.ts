/**
 * The dashboard's briefing states the archive the archive view shows: the worker's `briefing()` takes
 * the user's seasons (and discharge table) and passes that archive summary to the briefing, so the
 * view and the document never disagree (common practice: one source for every number). Demo data
 * are invented; the season names below are invented too.
 */
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { parseSeasons, readSurveyText, type Survey } from "../../../analysis/index.ts";
import { createWorkerApi } from "../../../dashboard/src/worker/api.ts";
import { Settings } from "../../../dashboard/src/state/settings.svelte.ts";

const demo = (p: string) => readFileSync(new URL(`../../../data-demo/${p}`, import.meta.url), "utf8");

function surveysOf(file: string, rename?: string): Survey[] {
  const s = readSurveyText(demo(`surveys/${file}`), { fileName: file }).surveys;
  return rename ? s.map((x) => ({ ...x, name: rename })) : s;
}

describe("WorkerApi.briefing(): the archive section uses the archive view's seasons", () => {
  it("three surveys and user seasons 'lowwater=Jun-Nov, highwater=Dec-May': the briefing names them; without them it does not", async () => {
    const api = createWorkerApi();
    await api.run(
      {
        kind: "setSurveys",
        surveys: [
          ...surveysOf("wet-2025-03.csv"),
          ...surveysOf("dry-2025-09.csv"),
          ...surveysOf("wet-2025-03.csv", "wet-copy"),
        ],
        centerline: { name: "centerline.geojson", text: demo("centerline.geojson") },
        settings: new Settings().analysis,
      },
      () => {},
    );
    const seasons = parseSeasons("lowwater=Jun-Nov, highwater=Dec-May");
    const withSeasons = await api.briefing(undefined, undefined, undefined, { seasons });
    expect(withSeasons).toContain("lowwater");
    expect(withSeasons).toContain("highwater");
    const view = api.archive(seasons);
    expect(view.summary).toBeDefined();
    const plain = await api.briefing(undefined, undefined, undefined);
    expect(plain).not.toContain("lowwater");
  }, 120_000);
});
