import { describe, expect, it } from "vitest";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { main } from "../../cli/main.ts";

const WET = "data-demo/surveys/wet-2025-03.csv";
const BOTH = "data-demo/surveys/both-surveys.csv";
const LINE = "data-demo/centerline.geojson";

async function run(args: string[]): Promise<{ code: number; out: string; err: string }> {
  let out = "";
  let err = "";
  const code = await main(args, { out: (t) => (out += t), err: (t) => (err += `${t}\n`) });
  return { code, out, err };
}

describe("brackline analyze", () => {
  it("prints the documented JSON contract for one demo survey (stations with km and offset, constituents with end-members and dilution line)", async () => {
    const { code, out } = await run(["analyze", WET, "--centerline", LINE, "--draws", "200"]);
    expect(code).toBe(0);
    const doc = JSON.parse(out) as {
      stations: Array<{ id: string; alongChannelKm: number; offsetM: number }>;
      constituents: Array<Record<string, unknown> & { name: string; unit: string }>;
      surveys: unknown[];
      caution: string;
    };
    expect(doc.surveys).toHaveLength(1);
    expect(doc.stations.length).toBeGreaterThanOrEqual(25);
    for (const s of doc.stations) {
      expect(typeof s.id).toBe("string");
      expect(Number.isFinite(s.alongChannelKm)).toBe(true);
      expect(Number.isFinite(s.offsetM)).toBe(true);
    }
    const fe = doc.constituents.find((c) => c.name === "Fe")!;
    expect(fe.unit).toBe("nmol/L");
    for (const field of [
      "endmembers",
      "dilutionLine",
      "class",
      "effectiveEndmember",
      "percentChange",
      "reactionZone",
      "warnings",
    ])
      expect(fe).toHaveProperty(field);
    expect(doc.caution).toMatch(/screening/i);
  });

  it("splits a multi-survey file into surveys and is byte-identical for the same seed", async () => {
    const a = await run(["analyze", BOTH, "--centerline", LINE, "--draws", "100", "--seed", "7"]);
    const b = await run(["analyze", BOTH, "--centerline", LINE, "--draws", "100", "--seed", "7"]);
    expect(a.code).toBe(0);
    expect(a.out).toBe(b.out);
    const doc = JSON.parse(a.out) as {
      surveys: Array<{ name: string; date: string; stations: unknown[]; constituents: unknown[] }>;
    };
    expect(doc.surveys.map((s) => s.name)).toEqual(["wet-2025-03", "dry-2025-09"]);
    expect(a.err).toMatch(/64 rows read, 64 accepted, 0 rejected/);
  });

  it("writes CSV with one row per survey and constituent", async () => {
    const { code, out } = await run(["analyze", WET, "--format", "csv", "--draws", "50"]);
    expect(code).toBe(0);
    const lines = out.trim().split("\r\n");
    expect(lines[0]).toMatch(
      /^survey,constituent,unit,class,behaviour,confidence,percent_change,.*effective_river_endmember/,
    );
    expect(lines.length).toBe(1 + 9);
  });

  it("exits 2 naming the file when input is unusable, and 64 for a wrong command line", async () => {
    const dir = mkdtempSync(join(tmpdir(), "brackline-cli-"));
    const bad = join(dir, "bad.csv");
    writeFileSync(bad, "\u0000\u0001garbage");
    const missing = await run(["analyze", join(dir, "nope.csv")]);
    expect(missing.code).toBe(2);
    expect(missing.err).toContain("nope.csv");
    const junk = await run(["analyze", bad]);
    expect(junk.code).toBe(2);
    expect(junk.err).toContain("bad.csv");
    const usage = await run(["analyze", WET, "--format", "xml"]);
    expect(usage.code).toBe(64);
    const unknown = await run(["frobnicate"]);
    expect(unknown.code).toBe(64);
  });
});
