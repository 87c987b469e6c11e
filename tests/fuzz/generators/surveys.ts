import { readFileSync } from "node:fs";
import type { Rnd } from "./random.ts";
import { HOSTILE_TEXT, int, pick } from "./random.ts";

/** The invented demo survey (data-demo/): a well-formed file the mutations start from. */
export const DEMO_SURVEY = readFileSync(new URL("../../../data-demo/surveys/wet-2025-03.csv", import.meta.url), "utf8");

/** A survey file that went wrong in one known way, and what a correct reader must report. */
export interface MalformedSurvey {
  name: string;
  text: string;
}

const lines = (t: string): string[] => t.replace(/\n$/, "").split("\n");
const join = (ls: readonly string[], eol = "\n"): string => `${ls.join(eol)}${eol}`;

/** Replaces cell `col` of data line `row` (1-based data row) of the demo file. */
export function withCell(text: string, row: number, col: number, value: string): string {
  const ls = lines(text);
  const cells = (ls[row] ?? "").split(",");
  cells[col] = value;
  ls[row] = cells.join(",");
  return join(ls);
}

/** One CSV line with cell `col` replaced. */
export function withCellLine(line: string, col: number, value: string): string {
  const cells = line.split(",");
  cells[col] = value;
  return cells.join(",");
}

/** Column index of a header in the demo file. */
export function demoColumn(header: string): number {
  return (lines(DEMO_SURVEY)[0] ?? "").split(",").indexOf(header);
}

/**
 * One seeded mutation of the demo survey: a malformed line, cell, header or line ending of the
 * kinds a survey export goes wrong in (the bad-input campaign of issue 15).
 */
export function mutateSurvey(r: Rnd): MalformedSurvey {
  const ls = lines(DEMO_SURVEY);
  const width = (ls[0] ?? "").split(",").length;
  const row = 1 + int(r, ls.length - 1);
  const col = int(r, width);
  const kind = int(r, 15);
  switch (kind) {
    case 0:
      return { name: "unclosed quote", text: withCell(DEMO_SURVEY, row, col, `"${(ls[row] ?? "").split(",")[col]}`) };
    case 1:
      return {
        name: "hostile cell",
        text: withCell(DEMO_SURVEY, row, col, `"${pick(r, HOSTILE_TEXT).replace(/"/g, '""')}"`),
      };
    case 2: {
      const h = (ls[0] ?? "").split(",");
      h[int(r, width)] = h[col] ?? "";
      ls[0] = h.join(",");
      return { name: "duplicate header", text: join(ls) };
    }
    case 3:
      return {
        name: "negative concentration",
        text: withCell(DEMO_SURVEY, row, demoColumn("Fe (nmol/L)"), `-${1 + int(r, 50)}`),
      };
    case 4:
      return {
        name: "salinity above 42",
        text: withCell(DEMO_SURVEY, row, demoColumn("salinity"), String(43 + int(r, 27))),
      };
    case 5:
      return {
        name: "NaN text",
        text: withCell(DEMO_SURVEY, row, col, pick(r, ["NaN", "nan", "Infinity", "-Infinity"])),
      };
    case 6:
      return {
        name: "ragged row",
        text: join(ls.map((l, i) => (i === row ? l.split(",").slice(0, col).join(",") : l))),
      };
    case 7:
      return { name: "CR-only line ends", text: join(ls, "\r") };
    case 8:
      return { name: "CRLF line ends", text: join(ls, "\r\n") };
    case 9:
      return { name: "truncated file", text: DEMO_SURVEY.slice(0, int(r, DEMO_SURVEY.length)) };
    case 10:
      return { name: "header only", text: `${ls[0] ?? ""}\n` };
    case 11:
      return { name: "missing station id", text: withCell(DEMO_SURVEY, row, demoColumn("station"), "") };
    case 12: {
      const copy = (ls[row] ?? "").split(",");
      const lat = demoColumn("latitude");
      copy[lat] = (Number(copy[lat]) + 0.05 + r()).toFixed(5);
      return { name: "conflicting position", text: join([...ls, copy.join(",")]) };
    }
    case 13: {
      const q = demoColumn("discharge (m³/s)");
      const value = pick(r, ["0", "-5", "1e308", "abc"]);
      return { name: `discharge ${value}`, text: join(ls.map((l, i) => (i === 0 ? l : withCellLine(l, q, value)))) };
    }
    default:
      return { name: "blank lines", text: join(ls.flatMap((l, i) => (i === row ? [l, "", " "] : [l]))) };
  }
}
