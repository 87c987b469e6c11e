import Papa from "papaparse";
import { randomLcg } from "d3-random";
import { describe, expect, it } from "vitest";
import { readSurveyText } from "../../analysis/io/readSurvey.ts";
import type { ImportResult } from "../../analysis/io/importPipeline.ts";
import { readGeoJsonPoints } from "../../analysis/io/geojsonPoints.ts";
import { readNetcdfStations } from "../../analysis/io/netcdfStations.ts";
import { importWorkspace } from "../../analysis/io/workspace.ts";
import { cases } from "./scale.ts";

/** Malformed files per run (FUZZ_SCALE multiplies). */
const FILES = cases(2000);
const OTHER = cases(500);

type Rnd = () => number;
const pick = <T>(r: Rnd, xs: readonly T[]): T => xs[Math.floor(r() * xs.length)];
const int = (r: Rnd, n: number): number => Math.floor(r() * n);

const HEADERS = [
  "station",
  "survey",
  "date",
  "time",
  "date_time",
  "latitude",
  "longitude",
  "x (EPSG:32633)",
  "y (EPSG:32633)",
  "depth_m",
  "Depth",
  "salinity",
  "Cond (mS/cm)",
  "temperature_C",
  "pH",
  "Fe (nmol/L)",
  "Fe_flag",
  "Silicate_uM",
  "NO3 [µmol/l]",
  "Cd_ngL",
  "Ba, nmol kg-1",
  "flag",
  "discharge (m3/s)",
  "Cu (ppb)",
  "",
  "station",
];
const HOSTILE = [
  "<script>alert(1)</script>",
  "<img src=x onerror=alert(1)>",
  '=HYPERLINK("http://x")',
  "'; DROP TABLE s;--",
  "\u0000\u0001\u0002",
  "\uFEFF",
  "\u202Eevil",
  "1e308",
  "-1e308",
  "1e999",
  "9".repeat(400),
  "NaN",
  "Infinity",
  "-0",
  "0x1F",
  "١٢٣",
  "１２",
  "<0.05",
  "< 0,05",
  "BDL",
  "n.d.",
  "NA",
  "-999",
  "",
  "45°12.5'N",
  "200 61 X",
  "2/30/2016",
  "2016-13-01",
  "25:61",
  '"',
  '"""',
  "a\nb",
  "\r",
  "\t",
  ";",
  ",",
  "S",
  "B",
  "4",
  "9",
  "Z",
];

function cell(r: Rnd): string {
  const k = r();
  if (k < 0.45) return (r() * 60 - 10).toFixed(int(r, 5));
  if (k < 0.8) return pick(r, HOSTILE);
  const n = int(r, 12);
  let s = "";
  for (let i = 0; i < n; i += 1) s += String.fromCharCode(int(r, 0x3000));
  return s;
}

function quoteMaybe(r: Rnd, v: string, d: string): string {
  if (r() < 0.1) return `"${v}`; // truncated quote
  if (v.includes(d) || v.includes('"') || v.includes("\n") || r() < 0.2) return `"${v.replace(/"/g, '""')}"`;
  return v;
}

/** One seeded malformed or hostile delimited file. */
function makeInput(r: Rnd): string {
  const kind = int(r, 12);
  if (kind === 0) return pick(r, ["", "\n", "\r\n\r\n", "\uFEFF", " ", "\u0000"]);
  if (kind === 1) {
    let s = "";
    for (let i = int(r, 300); i > 0; i -= 1) s += String.fromCharCode(int(r, 256));
    return s; // binary junk
  }
  const d = kind === 2 ? pick(r, [";", "\t", "|"]) : ",";
  const cols = 1 + int(r, 10);
  const headers = Array.from({ length: cols }, () => pick(r, HEADERS));
  const lines = [headers.map((h) => quoteMaybe(r, h, d)).join(d)];
  if (kind === 3) return lines[0]; // header only
  const rows = int(r, 12);
  for (let i = 0; i < rows; i += 1) {
    const width = r() < 0.8 ? cols : int(r, cols * 2 + 1); // ragged rows
    const dl = r() < 0.1 ? pick(r, [",", ";", "\t"]) : d; // wrong delimiter on a line
    lines.push(Array.from({ length: width }, () => quoteMaybe(r, cell(r), dl)).join(dl));
    if (r() < 0.05) lines.push("");
  }
  const eol = pick(r, ["\n", "\r\n", "\r"]);
  let text = lines.join(eol);
  if (r() < 0.1) text = `\uFEFF${text}`;
  if (r() < 0.1) text = text.slice(0, int(r, text.length + 1)); // truncated file
  return text;
}

/** Data records papaparse itself finds (header and blank lines excluded): the count nothing may drop. */
function expectedRows(text: string, delimiter: string): number {
  const recs = Papa.parse<string[]>(text.replace(/^\uFEFF/, ""), { delimiter, skipEmptyLines: false }).data;
  const nonBlank = recs.filter((f) => !(f.length === 1 && f[0].trim() === ""));
  return Math.max(0, nonBlank.length - 1);
}

/** Checks the invariants of one import; returns the broken ones (empty when all hold). */
function brokenInvariants(res: ImportResult, file: string, text: string): string[] {
  const bad: string[] = [];
  const s = res.summary;
  const lastRow = 2 + text.length;
  // An unclosed quote rejects only its own line; the lines papaparse would have swallowed are read again.
  const recovered = res.issues.some((i) => i.expected.includes("is never closed"));
  const papaRows = expectedRows(text, res.dialect.delimiter);
  if (recovered ? s.rowsRead < papaRows : s.rowsRead !== papaRows)
    bad.push(`rowsRead ${s.rowsRead} vs papaparse data records ${papaRows}`);
  if (s.rowsRead !== s.rowsAccepted + s.rowsRejected) bad.push("rowsRead ≠ accepted + rejected");
  if (Object.values(s.rejectedByReason).reduce((a, b) => a + b, 0) !== s.rowsRejected)
    bad.push("rejectedByReason does not sum to rowsRejected");
  const kept = res.surveys.flatMap((sv) => sv.stations.map((st) => st.sourceRow));
  if (kept.length !== s.rowsAccepted) bad.push("stations ≠ rowsAccepted");
  for (const i of res.issues) {
    if (
      i.file !== file ||
      !Number.isInteger(i.row) ||
      i.row < 0 ||
      i.row > lastRow ||
      typeof i.column !== "string" ||
      typeof i.value !== "string" ||
      i.value.length > 201
    ) {
      bad.push(`malformed issue ${JSON.stringify(i).slice(0, 200)}`);
    }
    if (i.severity !== "error" && i.severity !== "warning") bad.push("bad severity");
  }
  for (const sv of res.surveys)
    for (const st of sv.stations)
      if (st.salinity.value !== undefined && !Number.isFinite(st.salinity.value)) bad.push("non-finite salinity");
  // every rejected row has an issue naming the file, that row and a column
  const keptSet = new Set(kept);
  const rejectedWithIssue = new Set(
    res.issues.filter((i) => i.row > 1 && !keptSet.has(i.row) && i.column !== "").map((i) => i.row),
  );
  if (rejectedWithIssue.size !== s.rowsRejected)
    bad.push(`${s.rowsRejected} rejected rows but ${rejectedWithIssue.size} with a row/column issue`);
  return bad;
}

describe(`fuzz: ${FILES} seeded malformed and hostile delimited files (d3-random randomLcg seed 20261202)`, () => {
  it(
    "readSurveyText() never throws, drops no row silently (rowsRead = papaparse's data records = accepted + rejected), and every issue names file/row/column",
    { timeout: 240_000 },
    () => {
      const r = randomLcg(20261202);
      let rejectedSeen = 0;
      const failures: string[] = [];
      for (let n = 0; n < FILES; n += 1) {
        const text = makeInput(r);
        const file = `fuzz-${n}.csv`;
        try {
          const res = readSurveyText(text, { fileName: file, layer: { kind: "all" } });
          for (const b of brokenInvariants(res, file, text))
            failures.push(`#${n} ${b}: ${JSON.stringify(text.slice(0, 100))}`);
          rejectedSeen += res.summary.rowsRejected;
        } catch (err) {
          failures.push(`#${n} threw ${String(err)}: ${JSON.stringify(text.slice(0, 100))}`);
        }
      }
      expect(failures.slice(0, 10)).toEqual([]);
      expect(rejectedSeen).toBeGreaterThan(FILES / 100);
    },
  );

  it(`readGeoJsonPoints(), readNetcdfStations() and importWorkspace() never throw on ${3 * OTHER} seeded hostile inputs`, () => {
    const r = randomLcg(7);
    for (let n = 0; n < OTHER; n += 1) {
      const props = Object.fromEntries(
        Array.from({ length: int(r, 5) }, () => [pick(r, HEADERS), r() < 0.5 ? cell(r) : r() * 1e6]),
      );
      const geom = pick(r, [
        null,
        { type: "Point", coordinates: [r() * 400 - 200, r() * 200 - 100] },
        { type: "Point", coordinates: ["x", {}] },
        { type: "Polygon" },
        5,
      ]);
      const doc = pick(r, [
        { type: "FeatureCollection", features: [{ type: "Feature", geometry: geom, properties: props }, null, 3] },
        { type: "Feature", geometry: geom, properties: null },
        [],
        "text",
      ]);
      const text = r() < 0.2 ? JSON.stringify(doc).slice(0, int(r, 40)) : JSON.stringify(doc);
      const res = readGeoJsonPoints(text, { fileName: "f.geojson" });
      expect(res.summary.rowsRead).toBe(res.summary.rowsAccepted + res.summary.rowsRejected);
      expect(res.issues.every((i) => i.file === "f.geojson")).toBe(true);
    }
    for (let n = 0; n < OTHER; n += 1) {
      const bytes = Uint8Array.from({ length: int(r, 400) }, (_, i) =>
        i < 4 && r() < 0.7 ? [67, 68, 70, 1][i] : int(r, 256),
      );
      const res = readNetcdfStations(bytes, { fileName: "f.nc" });
      expect(res.summary.rowsRead).toBe(res.summary.rowsAccepted + res.summary.rowsRejected);
    }
    for (let n = 0; n < OTHER; n += 1) {
      const doc = pick(r, [
        { version: 1, surveys: [cell(r)] },
        { version: 2, format: "brackline-workspace" },
        { version: int(r, 5) - 1 },
        [cell(r)],
        cell(r),
        null,
      ]);
      expect(() => importWorkspace(r() < 0.3 ? String(doc) : JSON.stringify(doc))).not.toThrow();
    }
  });
});
