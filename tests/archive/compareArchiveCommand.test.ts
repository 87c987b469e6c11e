import { mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { main } from "../../cli/main.ts";
import { DEMO_DIR } from "../compare/helpers/demoAnalyses.ts";

// Invented demo surveys (data-demo/) copied under new names and dates to make a small archive; the
// 2025 copies lose their discharge cells, so the (invented) flows table gives theirs.
const dir = mkdtempSync(join(tmpdir(), "bl-archive-cli-"));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

/** A demo survey under a new name and date; discharge q [m³/s] in its file, or no discharge cells. */
function copySurvey(from: string, name: string, date: string, q: number | undefined): string {
  const text = readFileSync(join(DEMO_DIR, "surveys", `${from}.csv`), "utf8")
    .replaceAll(from, name)
    .replace(/\d{4}-\d{2}-\d{2}T/g, `${date}T`)
    .replace(/,(450|60),/g, `,${q ?? ""},`);
  const path = join(dir, `${name}.csv`);
  writeFileSync(path, text);
  return path;
}
const files = [
  copySurvey("wet-2025-03", "w2024", "2024-03-18", 420),
  copySurvey("dry-2025-09", "d2024", "2024-09-10", 70),
  copySurvey("wet-2025-03", "w2025", "2025-03-18", undefined),
  copySurvey("dry-2025-09", "d2025", "2025-09-10", undefined),
];
writeFileSync(
  join(dir, "flows.csv"),
  "date,discharge (m3/s)\n2024-03-17,400\n2024-09-10,75\n2025-03-10,500\n2025-09-01,55\n",
);

async function run(argv: string[]) {
  let out = "";
  let err = "";
  const code = await main(argv, { out: (t) => (out += t), err: (t) => (err += `${t}\n`) });
  return { code, out, err };
}
const common = ["--centerline", `${DEMO_DIR}centerline.geojson`, "--draws", "30", "--seed", "2", "--threads", "0"];

describe("brackline compare with three or more surveys (invented demo archive)", () => {
  it("writes series[] and intrusion[] with the README's field names; the table gives the surveys without a discharge theirs, with its row", async () => {
    const cache = join(dir, "cache");
    const r = await run([
      "compare",
      ...files,
      ...common,
      "--cache-dir",
      cache,
      "--discharge-table",
      join(dir, "flows.csv"),
      "--seasons",
      "wet=Dec-May,dry=Jun-Nov",
    ]);
    expect(r.code, r.err).toBe(0);
    const j = JSON.parse(r.out);
    expect(j.surveys).toBe("4 surveys, 2024-03-18 to 2025-09-10");
    const si = j.series.find((s: { name: string }) => s.name === "Si");
    expect(si.unit).toBe("µmol/L");
    expect(si.points).toHaveLength(4);
    const p = si.points[0];
    for (const k of ["survey", "date", "dischargeM3s", "class", "percentChange", "effectiveEndmember"])
      expect(p).toHaveProperty(k);
    // The file's own discharge wins over the table (DISCHARGE_PRECEDENCE).
    expect(p.dischargeM3s).toBe(420);
    expect(p.dischargeSource).toBe("the survey's own discharge (its file's discharge column)");
    expect(si.points[2].dischargeM3s).toBe(500);
    expect(si.points[2].dischargeSource).toBe(
      "discharge of 2025-03-10 (8 days before the survey) from flows.csv, row 4",
    );
    expect(si.points[3].dischargeSource).toMatch(/2025-09-01 \(9 days before the survey\)/);
    expect(r.err).toMatch(
      /discharge table flows\.csv: 4 days, .*; 2 survey\(s\) took a row \(0 of their own day\), 2 kept their own discharge/,
    );
    expect(si).toHaveProperty("byMonth");
    expect(si).toHaveProperty("vsDischarge");
    expect(j.intrusion.map((x: { survey: string }) => x.survey)).toEqual(["w2024", "d2024", "w2025", "d2025"]);
    expect(j.intrusion[0]).toMatchObject({ date: "2024-03-18", dischargeM3s: 420, season: "wet" });
    expect(j.intrusion[2]).toMatchObject({ date: "2025-03-18", dischargeM3s: 500 });
    expect(j.intrusion[0].saltIntrusionKm).toBeLessThan(j.intrusion[1].saltIntrusionKm);
    expect(j.comparison.surveys).toHaveLength(4);
    expect(r.err).toMatch(/archive: 4 surveys, 0 from the cache, 4 to analyse on this thread/);
    const again = await run([
      "compare",
      ...files,
      ...common,
      "--cache-dir",
      cache,
      "--discharge-table",
      join(dir, "flows.csv"),
      "--seasons",
      "wet=Dec-May,dry=Jun-Nov",
    ]);
    expect(again.err).toMatch(/archive: 4 surveys, 4 from the cache, 0 to analyse/);
    expect(again.out).toBe(r.out);
  });

  it("--format csv writes the series as one long table", async () => {
    const r = await run(["compare", ...files, ...common, "--no-cache", "--format", "csv"]);
    expect(r.code, r.err).toBe(0);
    const lines = r.out.trim().split("\r\n");
    expect(lines[0]).toBe(
      "survey,date,season,discharge_m3s,discharge_source,constituent,class,quantity,unit,value,lower95,upper95",
    );
    expect(
      lines.some(
        (l) => l.startsWith("w2024,2024-03-18,spring,420,") && l.includes(",Si,") && l.includes(",percent_change,%,"),
      ),
    ).toBe(true);
  });

  it("a bad --seasons is a command-line mistake naming the month", async () => {
    const r = await run(["compare", ...files, ...common, "--no-cache", "--seasons", "wet=Dex-Apr"]);
    expect(r.code).toBe(64);
    expect(r.err).toMatch(/--seasons: "Dex"/);
  });
});
