/**
 * Cold start: in the first survey the worker analyses the constituent on screen first and posts its
 * map marks (an `overlay` event) before the survey's other constituents, so the map tiles them with its
 * basemap. Only the order of the work changes, never a result (common practice: scheduling must not
 * change a computed value): the analysis, its overlay and the comparison equal a run without it, and
 * the marks posted first are the final overlay's. Demo data are invented.
 */
import { describe, expect, it } from "vitest";
import { demoJob as job, eventsOf as ofType, runJob } from "./helpers/demoJob.ts";

describe("WorkerApi.run() with firstConstituent: the marks on screen first, the same results", () => {
  it("posts the first survey's marks for the constituent on screen before its analysis; every result equals the plain run's", async () => {
    const plain = await runJob(job());
    const shown = await runJob(job({ firstConstituent: "Ba" }));
    expect(ofType(plain, "overlay")).toHaveLength(0);
    const overlays = ofType(shown, "overlay");
    expect(overlays.map((e) => e.surveyIndex)).toEqual([1]);
    const types = shown.filter((e) => e.type !== "progress").map((e) => e.type);
    expect(types.indexOf("overlay")).toBeLessThan(types.indexOf("analysis"));
    expect(types.indexOf("overlay")).toBeGreaterThan(types.indexOf("loaded"));
    // Only the constituent on screen, with the isohalines; both as the final overlay has them.
    const early = overlays[0]!.overlay;
    expect(Object.keys(early.constituents)).toEqual(["Ba"]);
    const final = ofType(shown, "analysis").find((e) => e.surveyIndex === 1)!.overlay;
    expect(early.isohalines).toEqual(final.isohalines);
    expect(early.constituents.Ba).toEqual(final.constituents.Ba);
    // Analyses, overlays and the comparison as without the marks first.
    for (const i of [0, 1]) {
      const a = ofType(plain, "analysis").find((e) => e.surveyIndex === i)!;
      const b = ofType(shown, "analysis").find((e) => e.surveyIndex === i)!;
      expect(b.analysis).toEqual(a.analysis);
      expect(b.overlay).toEqual(a.overlay);
    }
    expect(ofType(shown, "comparison")).toEqual(ofType(plain, "comparison"));
    expect(shown.at(-1)?.type).toBe("done");
  }, 180_000);

  it("a constituent the survey does not mix gives the marks of its first mixing constituent (the selection's rule)", async () => {
    const events = await runJob(job({ firstSurvey: 0, firstConstituent: "no such constituent" }));
    const early = ofType(events, "overlay")[0]!.overlay;
    const first = ofType(events, "loaded")[0]!.surveys[0]!.constituents.find((c) => c.kind !== "nonMixing")!.name;
    expect(Object.keys(early.constituents)).toEqual([first]);
  }, 180_000);
});
