import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { main } from "../../cli/main.ts";

async function run(args: string[]): Promise<{ code: number; out: string; err: string }> {
  let out = "";
  let err = "";
  const code = await main(args, { out: (t) => (out += t), err: (t) => (err += `${t}\n`) });
  return { code, out, err };
}

const dir = mkdtempSync(join(tmpdir(), "brackline-choices-"));
const file = (name: string, text: string): string => {
  const p = join(dir, name);
  writeFileSync(p, text);
  return p;
};
// A small invented profile file: stations on a line of longitude, CTD rows at 1 m and bottles at 2 m.
const rows = ["Station,Date,Latitude,Longitude,Depth,Salinity,Silicate,Oxygen (mg/L),Extinction_Coefficient"];
for (let i = 0; i < 8; i++) {
  const s = 4 * i;
  rows.push(`S${i},2024-02-01,${(45 + 0.02 * i).toFixed(2)},-1.0,1,${s - 0.1},,${8 + i / 10},1.${i}`);
  rows.push(`S${i},2024-02-01,${(45 + 0.02 * i).toFixed(2)},-1.0,2,${s},${150 - 4 * s},${8 + i / 10},`);
}
const SURVEY = file("profiles.csv", `${rows.join("\n")}\n`);

describe("brackline input choices (issue: real monitoring exports out of the box)", () => {
  it("exits 2 listing the unit-less constituent and the --unit option; with it, analyses one station per id from the 2 m bottles", async () => {
    const bad = await run(["analyze", SURVEY, "--draws", "20"]);
    expect(bad.code).toBe(2);
    expect(bad.err).toContain('--unit "Silicate=µmol/L"');
    const ok = await run(["analyze", SURVEY, "--unit", "Silicate=µmol/L", "--draws", "50"]);
    expect(ok.code, ok.err).toBe(0);
    const doc = JSON.parse(ok.out) as {
      stations: Array<{ id: string }>;
      constituents: Array<{ name: string; class: string }>;
      import: { notUsed: Array<{ header: string; reason: string }>; notices: Array<{ code: string }> };
    };
    expect(doc.stations.map((s) => s.id)).toEqual(["S0", "S1", "S2", "S3", "S4", "S5", "S6", "S7"]);
    expect(doc.constituents.map((c) => c.name)).toEqual(["Si"]);
    expect(doc.constituents[0]!.class).not.toBe("insufficient-data");
    expect(doc.import.notUsed.map((u) => u.header)).toEqual(["Extinction_Coefficient"]);
    expect(doc.import.notices.map((n) => n.code)).toContain("centerlineFromStations");
    expect(ok.err).toContain("layer");
  });

  it("--unit for a column that is not there, and a bad --layer, are clear errors", async () => {
    expect((await run(["analyze", SURVEY, "--unit", "Silicon=µmol/L"])).code).toBe(2);
    expect((await run(["analyze", SURVEY, "--unit", "Silicate=µmol/L", "--layer", "middle"])).code).toBe(64);
  });

  it("a malformed mapping file exits 2 naming the field (never 70 with a stack trace); a partial one is merged", async () => {
    const bad = file("bad.json", JSON.stringify({ columns: [{ header: "Silicate", role: "colour" }] }));
    const r = await run(["analyze", SURVEY, "--mapping", bad]);
    expect(r.code).toBe(2);
    expect(r.err).toContain("columns.0.role");
    expect(r.err).not.toContain("internal error");
    const partial = file("partial.json", JSON.stringify({ columns: [{ header: "Silicate", unit: "µmol/L" }] }));
    const ok = await run(["analyze", SURVEY, "--mapping", partial, "--draws", "20"]);
    expect(ok.code, ok.err).toBe(0);
    expect((JSON.parse(ok.out) as { stations: unknown[] }).stations).toHaveLength(8);
  });

  it("brackline mapping prints the suggested mapping with kinds and units, ready to edit", async () => {
    const r = await run(["mapping", SURVEY, "--unit", "Silicate=µmol/L"]);
    expect(r.code).toBe(0);
    const m = JSON.parse(r.out) as { columns: Array<{ header: string; role: string; unit?: string; kind?: string }> };
    expect(m.columns.find((c) => c.header === "Silicate")).toMatchObject({
      role: "constituent",
      unit: "µmol/L",
      kind: "tracer",
    });
    expect(m.columns.find((c) => c.header === "Oxygen (mg/L)")).toMatchObject({ kind: "nonMixing", unit: "mg/L" });
  });

  it("compare and report take --layer and --unit", async () => {
    for (const cmd of ["compare", "report"]) {
      const r = await run([cmd, "--help"]);
      expect(r.out).toContain("--layer");
      expect(r.out).toContain("--unit");
      expect(r.out).toContain("--off-channel-km");
    }
  });
});
