// Benchmark: the whole San Francisco Bay cruise archive 2016–2022 (../shared/data, read at run time)
// analysed on 2 worker threads against the same work on one thread, each in a fresh process from the
// same plain-JavaScript bundle (so both pay their cold start), 2,000 bootstrap draws per constituent.
import { execFile } from "node:child_process";
import { mkdirSync } from "node:fs";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import type { BenchCase, BenchRow } from "../benchCase.ts";
import { SF_PRESENT } from "../../tests/archive/helpers/sfBayArchive.ts";

const ROOT = fileURLToPath(new URL("../../", import.meta.url));
const OUT = join(ROOT, "node_modules", ".cache", "brackline-bench-archive");

interface ChildResult {
  readMs: number;
  analyseMs: number;
  cpuMs: number;
  taskMs: number;
  surveys: number;
  constituentAnalyses: number;
}

async function bundle(): Promise<void> {
  const esbuild = await import("esbuild");
  mkdirSync(OUT, { recursive: true });
  esbuild.buildSync({
    absWorkingDir: ROOT,
    entryPoints: { archiveChild: "bench/fixtures/archiveChild.ts", surveyWorker: "cli/archive/surveyWorker.ts" },
    outdir: OUT,
    bundle: true,
    splitting: true,
    format: "esm",
    platform: "node",
    target: "node20",
    packages: "external",
    logLevel: "warning",
  });
}

function child(threads: number): Promise<ChildResult & { wallMs: number }> {
  const t0 = performance.now();
  return new Promise((resolve, reject) => {
    execFile(
      process.execPath,
      [join(OUT, "archiveChild.js"), String(threads), "2000"],
      { maxBuffer: 1 << 20 },
      (e, out, err) => {
        if (e) reject(new Error(`threads ${threads}: ${e.message} ${err}`));
        else
          resolve({ ...(JSON.parse(out.trim().split("\n").at(-1)!) as ChildResult), wallMs: performance.now() - t0 });
      },
    );
  });
}

export const archiveBench: BenchCase = {
  name: "archive",
  async run(): Promise<BenchRow[]> {
    if (!SF_PRESENT) return [{ name: "archive", value: Number.NaN, unit: "s", note: "skipped: ../shared/data absent" }];
    await bundle();
    const one = await child(0);
    const two = await child(2);
    const ratio = one.analyseMs / two.analyseMs;
    return [
      {
        name: `archive: analyse ${two.surveys} surveys of the 2016–2022 SF Bay archive (${two.constituentAnalyses} constituent analyses, 2,000 draws) on 2 worker threads`,
        value: two.analyseMs / 1000,
        unit: "s",
        baseline: { name: "same work on one thread", value: one.analyseMs / 1000 },
        ratio,
        ratioLabel: "× speed-up",
        goal: "≥ 1.7× on 2 cores",
        note: `CPU ${(two.cpuMs / 1000).toFixed(1)} s (one thread ${(one.cpuMs / 1000).toFixed(1)} s); time inside the survey tasks ${(two.taskMs / 1000).toFixed(1)} s (one thread ${(one.taskMs / 1000).toFixed(1)} s); reading the files ${(two.readMs / 1000).toFixed(2)} s; whole child process ${(two.wallMs / 1000).toFixed(1)} s (one thread ${(one.wallMs / 1000).toFixed(1)} s)`,
      },
      {
        name: "archive: read + analyse the whole archive, 2 worker threads (process wall time)",
        value: two.wallMs / 1000,
        unit: "s",
        goal: "≤ 5 s",
      },
    ];
  },
};
