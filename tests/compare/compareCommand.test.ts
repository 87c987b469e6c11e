import { describe, it, expect } from "vitest";
import { main } from "../../cli/main.ts";
import { DEMO_DIR } from "./helpers/demoAnalyses.ts";

async function run(argv: string[]): Promise<{ code: number; out: string; err: string }> {
  let out = "";
  let err = "";
  const code = await main(argv, { out: (t) => (out += t), err: (t) => (err += `${t}\n`) });
  return { code, out, err };
}

const files = [`${DEMO_DIR}surveys/wet-2025-03.csv`, `${DEMO_DIR}surveys/dry-2025-09.csv`];
const common = [
  "--centerline",
  `${DEMO_DIR}centerline.geojson`,
  "--discharge",
  "wet-2025-03=450,dry-2025-09=60",
  "--draws",
  "40",
  "--seed",
  "3",
];

describe("brackline compare", () => {
  it("brackline compare writes JSON with the comparison (intrusion wet < dry, exponent, shifts), progress on stderr, identical for the same seed", async () => {
    const a = await run(["compare", ...files, ...common]);
    expect(a.code, a.err).toBe(0);
    expect(a.err).toMatch(/analysing survey 1\/2: wet-2025-03/);
    const json = JSON.parse(a.out) as {
      caution: string;
      comparison: {
        intrusion: Array<{ saltIntrusionKm: number }>;
        scaling: Array<{ exponent: number }>;
        shifts: unknown[];
      };
    };
    expect(json.caution).toMatch(/Screening analysis/);
    expect(json.comparison.intrusion[0]!.saltIntrusionKm).toBeLessThan(json.comparison.intrusion[1]!.saltIntrusionKm);
    expect(json.comparison.scaling[0]!.exponent).toBeLessThan(0);
    expect(json.comparison.shifts.length).toBe(9);
    const b = await run(["compare", ...files, ...common]);
    expect(b.out === a.out).toBe(true);
  });

  it("brackline compare --format csv writes the long table; one survey only is bad input (exit 2); without --centerline the line built from the stations is used, as in analyze", async () => {
    const c = await run(["compare", ...files, ...common, "--format", "csv"]);
    expect(c.code).toBe(0);
    expect(c.out.split("\n")[0]).toMatch(/^section,reference_survey,survey,constituent,quantity,unit/);
    const one = await run(["compare", files[0]!, ...common]);
    expect(one.code).toBe(2);
    expect(one.err).toMatch(/compare needs at least 2/);
    const built = await run(["compare", ...files, "--draws", "20"]);
    expect(built.code).toBe(0);
    expect(built.err).toMatch(/No centerline given: one was built from the station positions/);
  });
});
