import { describe, expect, it } from "vitest";
import { mkdirSync, mkdtempSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { main } from "../../cli/main.ts";
import { csvField, neutraliseFormula, stripControl, toCsv } from "../../analysis/index.ts";

const WET = "data-demo/surveys/wet-2025-03.csv";
const LINE = "data-demo/centerline.geojson";
const dir = mkdtempSync(join(tmpdir(), "brackline-bad-"));
const fixture = (name: string, text: string | Uint8Array): string => {
  const p = join(dir, name);
  writeFileSync(p, text);
  return p;
};

async function run(args: string[]): Promise<{ code: number; out: string; err: string }> {
  let out = "";
  let err = "";
  const code = await main(args, { out: (t) => (out += t), err: (t) => (err += `${t}\n`) });
  return { code, out, err };
}

describe("CSV formula neutralisation (OWASP CSV injection guidance)", () => {
  it("csvField() prefixes text cells starting with = + - @ TAB CR with an apostrophe, and keeps plain numbers", () => {
    expect(neutraliseFormula("=HYPERLINK(1)")).toBe("'=HYPERLINK(1)");
    expect(csvField("+1+2")).toBe("'+1+2");
    expect(csvField("@SUM(A1)")).toBe("'@SUM(A1)");
    expect(csvField("\tx")).toBe("'\tx");
    expect(csvField("\rx")).toBe(`"'\rx"`);
    expect(csvField("-cmd")).toBe("'-cmd");
    expect(csvField("-3.25")).toBe("-3.25");
    expect(csvField("+2e-3")).toBe("+2e-3");
    expect(csvField(-3.25)).toBe("-3.25");
    expect(toCsv(["a"], [["=1"]])).toBe("a\r\n'=1\r\n");
  });

  it("brackline analyze --format csv neutralises a survey name that starts with =", async () => {
    const text = readFileSync(WET, "utf8").replace(/^wet-2025-03,/gm, "=cmd|' /C calc'!A0,");
    const r = await run(["analyze", fixture("inj.csv", text), "--format", "csv", "--draws", "20"]);
    expect(r.code).toBe(0);
    const rows = r.out.split("\r\n").slice(1, -1);
    expect(rows.length).toBeGreaterThan(0);
    for (const row of rows) expect(row.startsWith(`"'=cmd`) || row.startsWith("'=cmd")).toBe(true);
  });
});

describe("exit codes for user mistakes (2 bad input, 64 command line; never 70)", () => {
  it("--out to a missing directory or to a directory is exit 2 with a message", async () => {
    const missing = await run(["analyze", WET, "--draws", "10", "--out", join(dir, "no-such-dir", "x.json")]);
    expect(missing.code).toBe(2);
    expect(missing.err).toMatch(/does not exist/);
    mkdirSync(join(dir, "adir"), { recursive: true });
    const isDir = await run(["analyze", WET, "--draws", "10", "--out", join(dir, "adir")]);
    expect(isDir.code).toBe(2);
    expect(isDir.err).toMatch(/is a directory/);
  });

  it("--draws abc, --draws 1000000000, --layer 5-2 and --mouth bogus are exit 64 in every command", async () => {
    for (const cmd of ["analyze", "compare", "report"]) {
      for (const bad of [
        ["--draws", "abc"],
        ["--draws", "1000000000"],
        ["--layer", "5-2"],
        ["--mouth", "bogus"],
      ]) {
        const r = await run([cmd, WET, "--centerline", LINE, "--out", join(dir, "o.html"), ...bad]);
        expect(r.code, `${cmd} ${bad.join(" ")}`).toBe(64);
        expect(r.err).toMatch(new RegExp(`--${bad[0]!.slice(2)}`));
      }
    }
    expect((await run(["underway", WET, "--draws", "abc"])).code).toBe(64);
  });

  it("a mapping file that is a JSON array is exit 2 naming the file", async () => {
    const r = await run(["analyze", WET, "--mapping", fixture("m.json", "[1,2]")]);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/m\.json: expected a column mapping object/);
  });

  it("report with a basemap or centerline holding features:[null] is exit 2, not an internal error", async () => {
    const nulls = fixture("nulls.geojson", '{"type":"FeatureCollection","features":[null]}');
    const out = join(dir, "b.html");
    const basemap = await run(["report", WET, "--centerline", LINE, "--basemap", nulls, "--out", out]);
    expect(basemap.code).toBe(2);
    expect(basemap.err).toMatch(/features\[0\] is null/);
    const line = await run(["report", WET, "--centerline", nulls, "--out", out, "--draws", "10"]);
    expect(line.code).toBe(2);
    expect(line.err).not.toMatch(/internal error/);
  });

  it("unknown content given to analyze is exit 2 naming the file and what was expected", async () => {
    const r = await run(["analyze", fixture("x.bin", new Uint8Array([0, 159, 146, 150, 0, 1, 2]))]);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/x\.bin: not a file Brackline reads.*expected delimited text.*GeoJSON.*netCDF/);
  });
});

describe("terminal output without control characters (ECMA-48)", () => {
  it("stripControl() removes CSI, OSC, C0/C1 controls and lone CR, keeping tabs, newlines and CRLF", () => {
    expect(stripControl("a\u001b[31mred\u001b[0m\tb\nc")).toBe("ared\tb\nc");
    expect(stripControl("\u001b]0;title\u0007x\u009b2Jy\u0007")).toBe("x2Jy");
    expect(stripControl("a\rb\r\n")).toBe("ab\r\n");
  });

  it("a station id and a file name with escape sequences reach stderr and stdout without them", async () => {
    const text = readFileSync(WET, "utf8").replace(/,W01,/, ",W\u001b[2J\u001b]0;pwned\u0007 01,");
    const r = await run(["analyze", fixture("esc\u001b[1m.csv", text), "--draws", "10", "--format", "csv"]);
    expect(r.code).toBe(0);
    expect(r.err + r.out).not.toContain("\u001b");
    expect(r.err).toMatch(/esc\.csv|rows read/);
  });
});

describe("brackline salinity recognises the import's header spellings", () => {
  it("conductivity_mS_cm, Cond (S/m), temp_degC and pres_dbar are found and converted (PSS-78, UNESCO 1983 check value C=42.914 mS/cm, t68=15 °C, p=0 → S=35; ITS-90 input moves it by 0.003)", async () => {
    const a = await run(["salinity", fixture("a.csv", "conductivity_mS_cm,temp_degC,pres_dbar\n42.914,15,0\n")]);
    expect(a.code).toBe(0);
    expect(Number(a.out.split("\r\n")[1]!.split(",")[3])).toBeCloseTo(35, 2);
    const b = await run(["salinity", fixture("b.csv", "Cond (S/m),Temp (°C),Pres (dbar)\n4.2914,15,0\n")]);
    expect(b.code).toBe(0);
    expect(Number(b.out.split("\r\n")[1]!.split(",")[3])).toBeCloseTo(35, 2);
  });
});
