/**
 * `--discharge-table` feeds each survey's own analysis (fluxes, facts, briefing) through the one
 * analysis API, in `analyze`, `compare` and `report`, against a real San Francisco Bay file (read at
 * test time from ../shared/data; skipped with a message when absent). The flows table is INVENTED
 * for the test (written to a temporary directory; its numbers are not measurements).
 */
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { main } from "../../cli/main.ts";
import { northBayCenterline, SF_DIR, SF_PRESENT, STATION_FILE } from "../archive/helpers/sfBayArchive.ts";

if (!SF_PRESENT) console.warn(`${SF_DIR} absent (../shared not mounted): --discharge-table CLI tests skipped`);

const dir = mkdtempSync(join(tmpdir(), "bl-discharge-table-"));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

/** INVENTED daily flows (not measurements): every day of 2018, 100 + day-of-year m³/s. */
function inventedFlows(): string {
  const lines = ["date,flow (m3/s)"];
  for (let d = Date.UTC(2018, 0, 1), k = 1; d < Date.UTC(2019, 0, 1); d += 86_400_000, k++)
    lines.push(`${new Date(d).toISOString().slice(0, 10)},${100 + k}`);
  return lines.join("\n");
}

async function run(argv: string[]) {
  let out = "";
  let err = "";
  const code = await main(argv, { out: (t) => (out += t), err: (t) => (err += `${t}\n`) });
  return { code, out, err };
}

interface Estimate {
  value: number;
}
interface SurveyJson {
  name: string;
  date: string;
  riverDischargeM3s?: number;
  dischargeSource?: { origin: string; statement: string; tableDate?: string; daysBefore?: number };
  constituents: Array<{ name: string; flux?: { dischargeM3s: number; grossRiver: Estimate; netChange: Estimate } }>;
}

describe.skipIf(!SF_PRESENT)("--discharge-table on the 2018 bay file (invented flows)", () => {
  const flows = join(dir, "flows.csv");
  const line = join(dir, "north-bay.geojson");
  writeFileSync(flows, inventedFlows());
  writeFileSync(line, northBayCenterline());
  const args = [
    join(SF_DIR, "2018SanFranciscoBayWaterQualityData.csv"),
    "--stations",
    join(SF_DIR, STATION_FILE),
    "--centerline",
    line,
    "--mouth",
    "start",
    "--unit",
    "Silicate=µmol/L",
    "--unit",
    "Phosphate=µmol/L",
    "--unit",
    "Nitrite=µmol/L",
    "--unit",
    "Nitrate_+_Nitrite=µmol/L",
    "--draws",
    "40",
    "--threads",
    "0",
    "--no-cache",
  ];
  /** Day of 2018 (1 = Jan 1) of an ISO date. */
  const dayOfYear = (iso: string) => Math.round((Date.parse(iso) - Date.UTC(2018, 0, 1)) / 86_400_000) + 1;
  let analyzed: SurveyJson[] = [];

  it("analyze: every survey takes its day's row, stated, and its fluxes use it", async () => {
    const r = await run(["analyze", ...args, "--discharge-table", flows]);
    expect(r.code, r.err).toBe(0);
    analyzed = (JSON.parse(r.out) as { surveys: SurveyJson[] }).surveys;
    expect(analyzed.length).toBeGreaterThan(10);
    for (const s of analyzed) {
      expect(s.dischargeSource, s.name).toMatchObject({ origin: "table", daysBefore: 0, tableDate: s.date });
      expect(s.riverDischargeM3s).toBe(100 + dayOfYear(s.date));
      expect(s.dischargeSource!.statement).toMatch(
        new RegExp(`^discharge of ${s.date} \\(the survey day\\) from flows\\.csv, row \\d+$`),
      );
    }
    const withFlux = analyzed.flatMap((s) => s.constituents.filter((c) => c.flux).map((c) => ({ s, c })));
    expect(withFlux.length).toBeGreaterThan(0);
    for (const { s, c } of withFlux) expect(c.flux!.dischargeM3s).toBe(s.riverDischargeM3s);
    expect(r.err).toMatch(
      /discharge table flows\.csv: 365 days, .*; \d+ survey\(s\) took a row \(\d+ of their own day\), 0 kept their own discharge/,
    );
  });

  it("analyze: without the table no survey has a discharge or a flux (the file has no discharge column)", async () => {
    const r = await run(["analyze", ...args]);
    expect(r.code, r.err).toBe(0);
    const plain = (JSON.parse(r.out) as { surveys: SurveyJson[] }).surveys;
    expect(plain.every((s) => s.riverDischargeM3s === undefined && s.dischargeSource === undefined)).toBe(true);
    expect(plain.every((s) => s.constituents.every((c) => c.flux === undefined))).toBe(true);
  });

  it("--discharge for one survey wins over the table, and says so (DISCHARGE_PRECEDENCE)", async () => {
    const first = analyzed[0]!;
    const r = await run(["analyze", ...args, "--discharge-table", flows, "--discharge", `${first.name}=777`]);
    expect(r.code, r.err).toBe(0);
    const s = (JSON.parse(r.out) as { surveys: SurveyJson[] }).surveys;
    expect(s[0]).toMatchObject({ riverDischargeM3s: 777, dischargeSource: { origin: "option" } });
    expect(s[1]!.dischargeSource!.origin).toBe("table");
  });

  it("compare (archive): the series points carry the same discharge and statement as each survey's analysis", async () => {
    const r = await run(["compare", ...args, "--discharge-table", flows]);
    expect(r.code, r.err).toBe(0);
    const j = JSON.parse(r.out) as { intrusion: Array<{ survey: string; dischargeM3s?: number }> };
    const byName = new Map(analyzed.map((s) => [s.name, s]));
    for (const p of j.intrusion) expect(p.dischargeM3s).toBe(byName.get(p.survey)!.riverDischargeM3s);
  });

  it("report: the archive briefing states how many surveys took their discharge from the table", async () => {
    const out = join(dir, "briefing.html");
    const r = await run(["report", ...args, "--discharge-table", flows, "--out", out]);
    expect(r.code, r.err).toBe(0);
    const html = readFileSync(out, "utf8");
    const n = analyzed.length;
    expect(html).toContain(`${n} of ${n} (${n} from a discharge table joined by date, ${n} of them on the survey day)`);
  });

  it("an unreadable or empty table is bad input (exit 2) naming the file", async () => {
    const empty = join(dir, "empty.csv");
    writeFileSync(empty, "date,flow\n2018-01-01,abc\n");
    const r = await run(["analyze", ...args, "--discharge-table", empty]);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/empty\.csv: no usable row .*row 2, column "flow", value "abc"/);
  });
});
