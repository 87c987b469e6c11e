// Benchmark: streaming import of a seeded 1e6-record invented underway CSV into typed columns,
// against a plain papaparse parse of the same text (whole file read, one array per row), each in a
// fresh child process so peak memory (maxRSS) is the process's own.
import { execFile } from "node:child_process";
import { createWriteStream, mkdtempSync, rmSync, statSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import type { BenchCase, BenchRow } from "../benchCase.ts";
import { underwayCsvChunks } from "../fixtures/underwayLog.ts";

const N = 1_000_000;
const CHILD = fileURLToPath(new URL("../fixtures/importChild.ts", import.meta.url));

interface ChildResult {
  ms: number;
  rows: number;
  maxRssMB: number;
}

function child(mode: string, file: string): Promise<ChildResult> {
  return new Promise((resolve, reject) => {
    execFile(
      process.execPath,
      ["--import", "tsx", CHILD, mode, file],
      { maxBuffer: 1 << 20 },
      (error, stdout, stderr) => {
        if (error) reject(new Error(`${mode}: ${error.message} ${stderr}`));
        else resolve(JSON.parse(stdout.trim().split("\n").at(-1)!) as ChildResult);
      },
    );
  });
}

async function writeLog(path: string): Promise<void> {
  const out = createWriteStream(path);
  for (const chunk of underwayCsvChunks(N, 20261202, 20_000)) {
    if (!out.write(chunk)) await new Promise<void>((r) => out.once("drain", () => r()));
  }
  await new Promise<void>((r, j) => out.end((e?: Error | null) => (e ? j(e) : r())));
}

export const underwayImportBench: BenchCase = {
  name: "underway-import",
  async run(): Promise<BenchRow[]> {
    const dir = mkdtempSync(join(tmpdir(), "brackline-bench-"));
    const file = join(dir, "underway-1e6.csv");
    try {
      await writeLog(file);
      const mb = statSync(file).size / 2 ** 20;
      const idle = await child("idle", file);
      const stream = await child("stream", file);
      const papa = await child("papaparse", file);
      if (stream.rows !== N || papa.rows !== N)
        throw new Error(`rows read: stream ${stream.rows}, papaparse ${papa.rows}, expected ${N}`);
      return [
        {
          name: `import a 1e6-record underway CSV (${mb.toFixed(0)} MB, 7 columns) streaming into typed columns`,
          value: stream.ms / 1000,
          unit: "s",
          baseline: { name: "plain papaparse parse of the whole text", value: papa.ms / 1000 },
          ratio: papa.ms / stream.ms,
          ratioLabel: "× baseline speed",
          goal: "streaming; memory bounded",
        },
        {
          name: "peak memory of that import above an idle process (maxRSS)",
          value: stream.maxRssMB - idle.maxRssMB,
          unit: "MB",
          baseline: { name: "plain papaparse parse", value: papa.maxRssMB - idle.maxRssMB },
          ratio: (stream.maxRssMB - idle.maxRssMB) / (papa.maxRssMB - idle.maxRssMB),
          ratioLabel: "of baseline",
          goal: "streaming; memory bounded",
          note: `columns kept: 6 × 8 B + status bytes per record ≈ ${((N * (6 * 8 + 4 + 4 + 1)) / 2 ** 20).toFixed(0)} MB; idle process ${idle.maxRssMB.toFixed(0)} MB; one run each in fresh processes`,
        },
      ];
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  },
};
