import { describe, expect, it } from "vitest";
import { readSurveyStream, readSurveyText } from "../../analysis/io/readSurvey.ts";
import type { ImportResult } from "../../analysis/io/importPipeline.ts";
import { DEMO_SURVEY, demoColumn, mutateSurvey, withCell } from "./generators/surveys.ts";
import { int, seeded } from "./generators/random.ts";
import { importProblems } from "./invariants.ts";
import { cases, LARGE } from "./scale.ts";

const FILE = "fuzz.csv";
const read = (text: string): ImportResult => readSurveyText(text, { fileName: FILE, layer: { kind: "all" } });
const stations = (r: ImportResult) => r.surveys.flatMap((s) => s.stations);
const chunked = (text: string, size: number): string[] => {
  const out: string[] = [];
  for (let i = 0; i < text.length; i += size) out.push(text.slice(i, i + size));
  return out;
};
const demoRows = DEMO_SURVEY.trim().split("\n").length - 1;

describe("fuzz: seeded mutations of the demo survey (issue 15 bad-input campaign)", () => {
  const N = cases(150);
  it(`${N} mutated surveys: the text and the stream reader agree, and every import keeps its promises`, async () => {
    const r = seeded(1515);
    const failures: string[] = [];
    for (let n = 0; n < N; n += 1) {
      const m = mutateSurvey(r);
      const text = read(m.text);
      for (const p of importProblems(text, FILE)) failures.push(`#${n} ${m.name}: ${p}`);
      const stream = await readSurveyStream(chunked(m.text, 1 + int(r, 400)), {
        fileName: FILE,
        layer: { kind: "all" },
      });
      if (JSON.stringify(stream.summary) !== JSON.stringify(text.summary))
        failures.push(`#${n} ${m.name}: stream summary ${JSON.stringify(stream.summary)} ≠ text summary`);
      if (stream.issues.length !== text.issues.length) failures.push(`#${n} ${m.name}: stream and text issues differ`);
    }
    expect(failures.slice(0, 10)).toEqual([]);
  });
});

describe("fuzz: the named defects of issue 15", () => {
  it("item 1: a repeated constituent header keeps each column's own values and is reported", () => {
    const r = read("station,salinity,Fe (nmol/L),Fe (nmol/L)\nA,1,10,20\nB,30,11,21\n");
    const [a] = stations(r);
    const keys = Object.keys(a?.values ?? {});
    expect(keys).toHaveLength(2);
    expect(a?.values[keys[0] ?? ""]?.original).toBe("10");
    expect(a?.values[keys[1] ?? ""]?.original).toBe("20");
    expect(r.issues.some((i) => i.row === 1 && i.column === "Fe (nmol/L)" && i.expected.includes("columns 3, 4"))).toBe(
      true,
    );
  });

  it.each(["salinity", "latitude", "station"])(
    "item 1: a second %s column is named in a warning, not ignored silently",
    (h) => {
      const header = ["station", "salinity", "latitude", "longitude", "Fe (nmol/L)", h];
      const r = read(`${header.join(",")}\nA,1,45.1,-35.3,10,X\n`);
      const warned = r.issues.filter((i) => i.row === 1 && i.column === h);
      expect(warned.length).toBeGreaterThan(0);
      expect(warned.some((i) => i.expected.includes("column 6"))).toBe(true);
    },
  );

  it("item 2: an unclosed quote rejects only its own row, named with row, column and value; no later row vanishes", async () => {
    const ls = DEMO_SURVEY.trim().split("\n");
    const bad = ls.map((l, i) => (i === 11 ? l.replace(",W11,", ',"W11,') : l)).join("\n");
    const r = read(`${bad}\n`);
    expect(r.summary.rowsRead).toBe(demoRows);
    expect(r.summary.rowsRejected).toBe(1);
    expect(r.summary.rowsAccepted).toBe(demoRows - 1);
    const issue = r.issues.find((i) => i.row === 12 && i.severity === "error");
    expect(issue?.column).toBe("station");
    expect(issue?.value).toContain('"W11');
    expect(stations(r).every((s) => s.id.length < 10)).toBe(true);
    const s = await readSurveyStream(chunked(`${bad}\n`, 97), { fileName: FILE, layer: { kind: "all" } });
    expect(s.summary).toEqual(r.summary);
  });

  it("item 6: a negative concentration is kept and warned with row, column and value", () => {
    const fe = demoColumn("Fe (nmol/L)");
    const r = read(withCell(DEMO_SURVEY, 5, fe, "-12.5"));
    expect(stations(r).find((s) => s.sourceRow === 6)?.values.Fe?.value).toBe(-12.5);
    expect(r.issues).toContainEqual(
      expect.objectContaining({ row: 6, column: "Fe (nmol/L)", value: "-12.5", severity: "warning" }),
    );
  });

  it("item 6: salinity 45 is warned as outside PSS-78's 2–42 (UNESCO 1981, 1983)", () => {
    const r = read(withCell(DEMO_SURVEY, 3, demoColumn("salinity"), "45"));
    const w = r.issues.find((i) => i.row === 4 && i.column === "salinity");
    expect(w?.expected).toContain("PSS-78");
  });

  it("item 6: one station id at two positions is warned naming both rows", () => {
    const ls = DEMO_SURVEY.trim().split("\n");
    const copy = (ls[3] ?? "").split(",");
    copy[demoColumn("latitude")] = "45.5";
    const r = read(`${[...ls, copy.join(",")].join("\n")}\n`);
    const w = r.issues.find((i) => i.expected.startsWith("one position per station id"));
    expect(w?.row).toBe(ls.length + 1);
    expect(w?.expected).toContain("row 4");
  });

  it(`item 6: a ${LARGE ? "10 MB" : "1 MB"} station id rejects its row with an error, not a silent cut`, () => {
    const id = "X".repeat(LARGE ? 10_000_000 : 1_000_000);
    const r = read(withCell(DEMO_SURVEY, 2, demoColumn("station"), id));
    expect(r.summary.rowsRejected).toBe(1);
    expect(r.issues).toContainEqual(expect.objectContaining({ row: 3, column: "station", severity: "error" }));
    expect(stations(r).every((s) => s.id.length <= 200)).toBe(true);
  });

  it("item 6: the text NaN is reported as a non-numeric value, not taken as missing", () => {
    const r = read(withCell(DEMO_SURVEY, 2, demoColumn("Mn (nmol/L)"), "NaN"));
    expect(r.issues).toContainEqual(
      expect.objectContaining({ row: 3, column: "Mn (nmol/L)", value: "NaN", severity: "error" }),
    );
  });

  it("item 12: CR-only line ends with a header longer than the first chunk: stream = text", async () => {
    const header = ["station", "salinity", ...Array.from({ length: 60 }, (_, i) => `Fe${i} (nmol/L)`)].join(",");
    const rows = Array.from({ length: 34 }, (_, i) => `S${i},${i}${",1".repeat(60)}`);
    const text = `${[header, ...rows].join("\r")}\r`;
    const t = read(text);
    const s = await readSurveyStream(chunked(text, 64), { fileName: FILE, layer: { kind: "all" } });
    expect(t.summary.rowsRead).toBe(34);
    expect(s.summary).toEqual(t.summary);
  });

  it.each([
    ["header only", "station,salinity,Fe (nmol/L)\n"],
    ["truncated header", "stat"],
    ["one long line", `station,${"x".repeat(LARGE ? 30_000_000 : 3_000_000)}`],
  ])("item 13: %s is an error naming row 1 and the text found", (_, text) => {
    const r = read(text);
    const e = r.issues.find((i) => i.severity === "error");
    expect(e?.row).toBe(1);
    expect(e?.value.length).toBeGreaterThan(0);
    expect(e?.value.length).toBeLessThanOrEqual(201);
  });

  it(`item 9: ${LARGE ? "100,000" : "20,000"} columns are read (header lookup is linear, was quadratic)`, () => {
    const n = LARGE ? 100_000 : 20_000;
    const h = ["station", "salinity", ...Array.from({ length: n }, (_, i) => `Fe${i} (nmol/L)`)];
    const r = read(`${h.join(",")}\nA,5${",1".repeat(n)}\n`);
    expect(r.headers).toHaveLength(n + 2);
    expect(r.mapping.columns).toHaveLength(n + 2);
    expect(r.summary.rowsAccepted).toBe(1);
  });

  it(`item 5: ${LARGE ? "130,000" : "30,000"} rows each with an unreadable cell: every issue kept, no stack overflow`, () => {
    const n = LARGE ? 130_000 : 30_000;
    const body = Array.from({ length: n }, (_, i) => `S${i % 500},${(i % 300) / 10},bad`).join("\n");
    const r = read(`station,salinity,Fe (nmol/L)\n${body}\n`);
    expect(r.summary.rowsRead).toBe(n);
    expect(r.issues.filter((i) => i.value === "bad")).toHaveLength(n);
  });
});
