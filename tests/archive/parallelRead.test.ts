import { mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import type { InputFile, InputFileKind, PreReadFiles } from "../../analysis/index.ts";
import { detectFileKind, readInputs, readSurveyFileAs } from "../../analysis/index.ts";
import { columnReport } from "../../analysis/workspace/stationPlacement.ts";
import { main } from "../../cli/main.ts";
import { DEMO_DIR } from "../compare/helpers/demoAnalyses.ts";

// Invented demo surveys (data-demo/), copied under new names and dates to make a small archive.
const dir = mkdtempSync(join(tmpdir(), "bl-parallel-read-"));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function copySurvey(from: string, name: string, date: string): string {
  const text = readFileSync(join(DEMO_DIR, "surveys", `${from}.csv`), "utf8")
    .replaceAll(from, name)
    .replace(/\d{4}-\d{2}-\d{2}T/g, `${date}T`);
  const path = join(dir, `${name}.csv`);
  writeFileSync(path, text);
  return path;
}
const paths = [
  copySurvey("wet-2025-03", "w2024", "2024-03-18"),
  copySurvey("dry-2025-09", "d2024", "2024-09-10"),
  copySurvey("wet-2025-03", "w2025", "2025-03-18"),
];
const LINE = join(DEMO_DIR, "centerline.geojson");

async function run(argv: string[]) {
  let out = "";
  let err = "";
  const code = await main(argv, { out: (t) => (out += t), err: (t) => (err += `${t}\n`) });
  return { code, out, err };
}

describe("survey files read elsewhere (worker threads) and handed to readInputs", () => {
  it("readInputs with preRead from readSurveyFileAs gives the inputs readInputs reads itself", () => {
    const files: InputFile[] = [
      ...paths.map((p) => ({ name: p.split("/").at(-1)!, content: new Uint8Array(readFileSync(p)) })),
      { name: "centerline.geojson", content: readFileSync(LINE, "utf8") },
    ];
    const choices = {
      kindByFile: { "centerline.geojson": "centerline" as InputFileKind },
      layer: { kind: "all" as const },
    };
    const preRead = new Map<
      string,
      { kind: InputFileKind; result: ReturnType<typeof readSurveyFileAs>; columns: ReturnType<typeof columnReport> }
    >();
    for (const f of files.slice(0, 3)) {
      const kind = detectFileKind(f.content).kind;
      // A structured clone, as a worker thread's answer arrives.
      const result = readSurveyFileAs(f, kind, choices);
      preRead.set(f.name, structuredClone({ kind, result, columns: columnReport(f, kind, result.mapping) }));
    }
    const here = readInputs(files, choices);
    const there = readInputs(files, choices, preRead as PreReadFiles);
    expect(JSON.stringify(there)).toBe(JSON.stringify(here));
  });

  it("brackline compare reads and analyses on this thread and a worker thread with the same output as on this thread", async () => {
    const common = ["--centerline", LINE, "--draws", "30", "--seed", "2", "--no-cache"];
    const one = await run(["compare", ...paths, ...common, "--threads", "0"]);
    const two = await run(["compare", ...paths, ...common, "--threads", "2"]);
    expect(one.code, one.err).toBe(0);
    expect(two.code, two.err).toBe(0);
    expect(two.err).toMatch(/3 to analyse on 2 threads \(this one and 1 worker thread\)/);
    expect(two.out).toBe(one.out);
  }, 180_000);
});
