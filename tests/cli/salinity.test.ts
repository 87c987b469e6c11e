import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import Papa from "papaparse";
import { expectWithin } from "../helpers/tolerance.ts";
import gsw from "../reference/gsw-examples.json";
import { main } from "../../cli/main.ts";

const dir = mkdtempSync(join(tmpdir(), "brackline-salinity-"));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function fixture(name: string, text: string): string {
  const path = join(dir, name);
  writeFileSync(path, text, "utf8");
  return path;
}

async function run(args: string[]): Promise<{ code: number; out: string; err: string }> {
  let out = "";
  let err = "";
  const code = await main(args, { out: (t) => (out += t), err: (t) => (err += `${t}\n`) });
  return { code, out, err };
}

function table(out: string): string[][] {
  return Papa.parse<string[]>(out.trim(), { header: false }).data;
}

describe("brackline salinity", () => {
  it("adds PSS-78 salinity equal to the TEOS-10 gsw_SP_from_C published example within 1e-10 (GSW, teos-10.org)", async () => {
    const rows = gsw.SP_from_C.map((c) => `${c.inputs.C},${c.inputs.t90},${c.inputs.pDbar}`);
    const file = fixture("gsw.csv", ["Conductivity (mS/cm),Temperature (°C),Pressure (dbar)", ...rows].join("\n"));
    const r = await run(["salinity", file]);
    expect(r.code).toBe(0);
    const t = table(r.out);
    expect(t[0]).toEqual(["Conductivity (mS/cm)", "Temperature (°C)", "Pressure (dbar)", "salinity"]);
    gsw.SP_from_C.forEach((c, i) => expectWithin(Number(t[i + 1][3]), c.expected, 1e-10, `row ${i + 2}`));
    expect(t[1][0]).toBe("34.5487"); // original text kept
  });

  it("recognises 'cond_mScm', 'temp', 'pres' and 'C [mS/cm]' headers and converts S/m and µS/cm (UNESCO 1983: C(35, t68 = 15, 0) = 42.914 mS/cm = 4.2914 S/m)", async () => {
    const t15 = String(15 / 1.00024);
    const a = await run(["salinity", fixture("a.csv", `id,cond_mScm,temp,pres\n1,42.914,${t15},0\n`)]);
    expectWithin(Number(table(a.out)[1][4]), 35, 1e-6, "mS/cm");
    const b = await run(["salinity", fixture("b.csv", `C [S/m];T [°C];P [dbar]\n4.2914;${t15};0\n`)]);
    expectWithin(Number(table(b.out)[1][3]), 35, 1e-6, "S/m");
    const c = await run(["salinity", fixture("c.csv", `Conductivity (µS/cm),Temperature (°C)\n42914,${t15}\n`)]);
    expectWithin(Number(table(c.out)[1][2]), 35, 1e-6, "µS/cm");
    expect(c.err).toMatch(/no pressure column; using 0 dbar/);
    expect(b.err).toMatch(/converted from S\/m/);
  });

  it("reads an IPTS-68 temperature column (header 't68') and converts it, so R = 1 at t68 = 15 gives S = 35 (UNESCO 1983 check value)", async () => {
    const r = await run(["salinity", fixture("t68.csv", "cond (mS/cm),t68 (°C),p (dbar)\n42.914,15,0\n")]);
    expect(r.code).toBe(0);
    expectWithin(Number(table(r.out)[1][3]), 35, 1e-6, "S");
    expect(r.err).toMatch(/IPTS-68/);
  });

  it("reports bad cells with file, row, column and value on stderr, leaves that salinity empty and exits 0 when other rows converted", async () => {
    const file = fixture(
      "bad.csv",
      "station,Conductivity (mS/cm),Temperature (°C),Pressure (dbar)\nA,30,15,0\nB,abc,15,0\nC,30,,0\nD,-1,15,0\n",
    );
    const r = await run(["salinity", file]);
    expect(r.code).toBe(0);
    const t = table(r.out);
    expect(t.length).toBe(5);
    expect(t[2][4]).toBe("");
    expect(t[3][4]).toBe("");
    expect(t[4][4]).toBe("");
    expect(Number(t[1][4])).toBeGreaterThan(20);
    expect(r.err).toContain(`${file}: row 3, column "Conductivity (mS/cm)": value "abc" is not a number`);
    expect(r.err).toContain(`${file}: row 4, column "Temperature (°C)": value "" is missing`);
    expect(r.err).toMatch(/row 5.*negative conductivity/);
  });

  it("exits 2 when no row can be converted, and when no conductivity column exists", async () => {
    const none = await run(["salinity", fixture("none.csv", "cond,temp,pres\nx,y,z\n")]);
    expect(none.code).toBe(2);
    expect(none.err).toMatch(/no row could be converted/);
    const missing = await run(["salinity", fixture("missing.csv", "depth,temp\n1,10\n")]);
    expect(missing.code).toBe(2);
    expect(missing.err).toMatch(/no conductivity column/);
  });

  it("refuses specific conductance (25 °C-referenced), which PSS-78 cannot use (common practice)", async () => {
    const r = await run(["salinity", fixture("spc.csv", "SpCond (µS/cm),temp\n500,10\n")]);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/specific conductance/);
  });

  it("asks to choose when two columns look like conductivity, and --cond resolves it", async () => {
    const file = fixture("two.csv", "C0 (mS/cm),C1 (mS/cm),temp,pres\n30,31,15,0\n");
    const r = await run(["salinity", file]);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/several columns look like conductivity.*--cond/);
    const ok = await run(["salinity", file, "--cond", "C1 (mS/cm)"]);
    expect(ok.code).toBe(0);
  });

  it("uses --pressure for files without a pressure column and names the added column salinity_pss78 if 'salinity' exists", async () => {
    const file = fixture("press.csv", "salinity,Conductivity (mS/cm),Temperature (°C)\n,35.2039,2\n");
    const r = await run(["salinity", file, "--pressure", "1000"]);
    expect(r.code).toBe(0);
    const t = table(r.out);
    expect(t[0][3]).toBe("salinity_pss78");
    // TEOS-10 (IOC et al. 2010) via python3-gsw: (35.2039, 2 °C, 1000 dbar) → 40.0000516292 (python3-gsw)
    expectWithin(Number(t[1][3]), 40.0000516292, 1e-8, "S at 1000 dbar");
  });

  it("does not pick an 'EC' column automatically and takes a depth column chosen with --pres as dbar, with notes", async () => {
    const ec = await run(["salinity", fixture("ec.csv", "EC (mS/cm),temp\n30,15\n")]);
    expect(ec.code).toBe(2);
    const file = fixture("depth.csv", 'Depth (m),Conductivity (mS/cm),"Temperature (°C, ITS-90)"\n1000,35.2039,2\n');
    const hinted = await run(["salinity", file]);
    expect(hinted.err).toMatch(/--pres "Depth \(m\)"/);
    const r = await run(["salinity", file, "--pres", "Depth (m)"]);
    expect(r.code).toBe(0);
    expect(r.err).toMatch(/depth in m, taken as dbar/);
    // TEOS-10 (IOC et al. 2010) via python3-gsw: 1000 dbar → 40.0000516292
    expectWithin(Number(table(r.out)[1][3]), 40.0000516292, 1e-8, "S");
  });

  it("prints help with the exit-code policy, and exits 64 without a file or with an unknown option", async () => {
    const h = await run(["salinity", "--help"]);
    expect(h.code).toBe(0);
    expect(h.out).toMatch(/Exit codes: 0 when at least one row/);
    expect((await run(["salinity"])).code).toBe(64);
    expect((await run(["salinity", "x.csv", "--bogus"])).code).toBe(64);
    expect((await run(["salinity", "x.csv", "--pressure", "-3"])).code).toBe(64);
  });

  it("exits 2 naming the file when it cannot be read", async () => {
    const r = await run(["salinity", join(dir, "nope.csv")]);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/nope\.csv: cannot read/);
  });
});
