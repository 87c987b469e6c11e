// Benchmark: wall time of the built `brackline` CLI (cli/bin/brackline.js → cli/dist/) for `--help` and
// for `analyze` of one demo survey with the centerline, against `node -e 0` measured in the same run.
import { spawnSync } from "node:child_process";
import { fileURLToPath } from "node:url";
import type { BenchCase, BenchRow } from "../benchCase.ts";

const REPO = fileURLToPath(new URL("../..", import.meta.url));
const BIN = "cli/bin/brackline.js";

function medianSeconds(args: string[], runs: number): number {
  const times: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t0 = process.hrtime.bigint();
    const r = spawnSync(process.execPath, args, { cwd: REPO, stdio: ["ignore", "ignore", "pipe"] });
    const t1 = process.hrtime.bigint();
    if (r.status !== 0) throw new Error(`node ${args.join(" ")} exited ${r.status}: ${String(r.stderr).slice(0, 200)}`);
    times.push(Number(t1 - t0) / 1e9);
  }
  times.sort((a, b) => a - b);
  return times[Math.floor(times.length / 2)]!;
}

export const cliStartBench: BenchCase = {
  name: "CLI start",
  async run(): Promise<BenchRow[]> {
    medianSeconds([BIN, "--help"], 1); // builds cli/dist/ when missing or stale, outside the timing
    const nodeOnly = medianSeconds(["-e", "0"], 7);
    const help = medianSeconds([BIN, "--help"], 7);
    const analyze = medianSeconds(
      [
        BIN,
        "analyze",
        "data-demo/surveys/wet-2025-03.csv",
        "--centerline",
        "data-demo/centerline.geojson",
        "--draws",
        "2000",
      ],
      3,
    );
    const baseline = { name: "node -e 0", value: nodeOnly };
    return [
      {
        name: "brackline --help (built CLI), wall time",
        value: help,
        unit: "s",
        baseline,
        ratio: help / nodeOnly,
        ratioLabel: "× node start",
        goal: "≤ 0.3 s",
        note: `${(help - nodeOnly).toFixed(3)} s above node start`,
      },
      {
        name: "brackline analyze (demo wet survey + centerline, 2000 draws), wall time",
        value: analyze,
        unit: "s",
        baseline,
        ratio: analyze / nodeOnly,
        ratioLabel: "× node start",
      },
    ];
  },
};
