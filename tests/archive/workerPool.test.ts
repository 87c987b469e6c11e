import { mkdtempSync, readdirSync, readFileSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { readInputs } from "../../analysis/index.ts";
import { analyzeArchive } from "../../cli/archive/analyzeArchive.ts";
import { surveySetup } from "../../cli/archive/surveyTask.ts";
import { CancelledError } from "../../cli/archive/workerPool.ts";
import { DEMO_DIR } from "../compare/helpers/demoAnalyses.ts";

// The two invented demo surveys (data-demo/), analysed with few draws to keep the test light.
const inputs = readInputs(
  [
    { name: "both-surveys.csv", content: readFileSync(join(DEMO_DIR, "surveys/both-surveys.csv"), "utf8") },
    { name: "centerline.geojson", content: readFileSync(join(DEMO_DIR, "centerline.geojson"), "utf8") },
  ],
  {},
);
const surveys = inputs.surveys;
const setup = { surveys, ...surveySetup(inputs, { bootstrapDraws: 50, seed: 3 }) };
const dirs: string[] = [];
const tmp = () => {
  const d = mkdtempSync(join(tmpdir(), "bl-archive-"));
  dirs.push(d);
  return d;
};
afterAll(() => dirs.forEach((d) => rmSync(d, { recursive: true, force: true })));
const quiet = { out: () => undefined, err: () => undefined };

describe("analyzeArchive() (worker threads, cache, cancel)", () => {
  it("gives the same analyses on 2 threads (this one and a worker taking from one queue) as on this thread alone, in survey order", async () => {
    const one = await analyzeArchive(setup, { threads: 0, io: quiet });
    const two = await analyzeArchive(setup, { threads: 2, io: quiet });
    expect(two.stats.threads).toBe(2);
    expect(two.analyses.map((a) => a.survey.name)).toEqual(surveys.map((s) => s.name));
    expect(JSON.stringify(two.analyses)).toBe(JSON.stringify(one.analyses));
  });

  it("caches each survey: a second run analyses nothing, a changed setting re-analyses", async () => {
    const dir = tmp();
    const lines: string[] = [];
    const io = { out: () => undefined, err: (t: string) => void lines.push(t) };
    const first = await analyzeArchive(setup, { threads: 0, cacheDir: dir, io });
    expect(first.stats).toMatchObject({ analysed: 2, cached: 0 });
    expect(readdirSync(dir).filter((f) => f.endsWith(".json"))).toHaveLength(2);
    const again = await analyzeArchive(setup, { threads: 0, cacheDir: dir, io });
    expect(again.stats).toMatchObject({ analysed: 0, cached: 2 });
    expect(JSON.stringify(again.analyses)).toBe(JSON.stringify(first.analyses));
    const other = await analyzeArchive(
      { ...setup, settings: { ...setup.settings, seed: 4 } },
      { threads: 0, cacheDir: dir, io },
    );
    expect(other.stats).toMatchObject({ analysed: 2, cached: 0 });
    const oneMore = await analyzeArchive(
      { ...setup, surveys: [...surveys, { ...surveys[0]!, name: "copy" }] },
      { threads: 0, cacheDir: dir, io },
    );
    expect(oneMore.stats).toMatchObject({ analysed: 1, cached: 2 });
    expect(lines.some((l) => /^archive: 2 surveys, 0 from the cache, 2 to analyse on this thread$/.test(l))).toBe(true);
    expect(lines.some((l) => /^\[1\/2\] .+ analysed \(\d+\.\d\d s\)$/.test(l))).toBe(true);
  });

  it("cancel stops the run with CancelledError and keeps what finished in the cache", async () => {
    const dir = tmp();
    const ac = new AbortController();
    const io = { out: () => undefined, err: (t: string) => (t.startsWith("[1/") ? ac.abort() : undefined) };
    await expect(analyzeArchive(setup, { threads: 0, cacheDir: dir, io, signal: ac.signal })).rejects.toBeInstanceOf(
      CancelledError,
    );
    const resumed = await analyzeArchive(setup, { threads: 0, cacheDir: dir, io: quiet });
    expect(resumed.stats).toMatchObject({ analysed: 1, cached: 1 });
  });
});
