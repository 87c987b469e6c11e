import { describe, expect, it } from "vitest";
import { mkdtempSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { main } from "../../cli/main.ts";
import { inventedChannel, underwayCsv } from "../../bench/fixtures/underwayLog.ts";

const dir = mkdtempSync(join(tmpdir(), "brackline-underway-"));
const LOG = join(dir, "log.csv");
const LINE = join(dir, "line.geojson");
writeFileSync(LOG, underwayCsv(6000, 11));
writeFileSync(LINE, JSON.stringify(inventedChannel()));

async function run(args: string[]): Promise<{ code: number; out: string; err: string }> {
  let out = "";
  let err = "";
  const code = await main(args, { out: (t) => (out += t), err: (t) => (err += `${t}\n`) });
  return { code, out, err };
}

describe("brackline underway", () => {
  it("bins an invented log along the channel and prints the import summary, column roles and per-bin statistics as JSON", async () => {
    const { code, out, err } = await run(["underway", LOG, "--centerline", LINE, "--mouth", "start", "--width", "2"]);
    expect(code).toBe(0);
    const doc = JSON.parse(out) as {
      caution: string;
      import: { summary: { rowsRead: number; rowsAccepted: number }; columns: Array<{ header: string; role: string }> };
      bins: {
        by: string;
        width: number;
        bins: Array<{ n: number; lower: number; stats: Record<string, { mean: number }> }>;
      };
    };
    expect(doc.caution).toMatch(/screening/i);
    expect(doc.import.summary).toMatchObject({ rowsRead: 6000, rowsAccepted: 6000 });
    expect(doc.import.columns.map((c) => c.role)).toContain("fluorescence");
    expect(doc.bins.by).toBe("km");
    expect(doc.bins.bins.reduce((a, b) => a + b.n, 0)).toBe(6000);
    expect(err).toMatch(/reading log\.csv: 100 %/);
  });

  it("gives byte-identical output for identical input (CSV, salinity classes)", async () => {
    const a = await run(["underway", LOG, "--bin", "salinity", "--width", "2", "--format", "csv"]);
    const b = await run(["underway", LOG, "--bin", "salinity", "--width", "2", "--format", "csv"]);
    expect(a.code).toBe(0);
    expect(a.out).toBe(b.out);
    expect(a.out.split("\n")[0]).toMatch(/^salinity_lower,salinity_upper,n,/);
  });

  it("runs the mixing analysis on the bins with --mixing and writes to --out", async () => {
    const out = join(dir, "mix.json");
    const r = await run([
      "underway",
      LOG,
      "--centerline",
      LINE,
      "--mouth",
      "start",
      "--bin",
      "salinity",
      "--mixing",
      "--draws",
      "100",
      "--out",
      out,
    ]);
    expect(r.code).toBe(0);
    const doc = JSON.parse(readFileSync(out, "utf8")) as {
      mixing: { constituents: Array<{ name: string; class: string }> };
    };
    expect(doc.mixing.constituents.map((c) => c.name)).toEqual(["fluorescence", "turbidity"]);
  });

  it("exits 2 naming file, row, column and value when no record has a readable position", async () => {
    const bad = join(dir, "bad.csv");
    writeFileSync(bad, "time,lat,lon,salinity\n2026-05-04T10:00:00Z,far north,-76,3\n");
    const r = await run(["underway", bad]);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/bad\.csv: row 2, column "lat", value "far north"/);
  });

  it("exits 64 for --bin km without a centerline and 2 for a missing file", async () => {
    expect((await run(["underway", LOG, "--bin", "km"])).code).toBe(64);
    expect((await run(["underway", join(dir, "none.csv")])).code).toBe(2);
  });
});
