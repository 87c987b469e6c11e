// `npm run bench`: runs every benchmark case and prints one table.
import { benchCases } from "./cases/index.ts";
import type { BenchRow } from "./benchCase.ts";
// @ts-expect-error plain-JavaScript build script without type declarations
import { buildCli, cliBuildIsStale } from "../cli/build.js";

// the CLI cases run cli/dist/, which the launcher builds only when missing: rebuild it here when stale
if (cliBuildIsStale()) await buildCli();

function fmt(x: number): string {
  if (!Number.isFinite(x)) return String(x);
  const a = Math.abs(x);
  return a >= 100 ? x.toFixed(0) : a >= 1 ? x.toFixed(2) : x.toPrecision(3);
}

const only = process.argv.slice(2);
/** A case runs when an argument names it exactly, or is part of its name and names no case exactly. */
function selected(name: string): boolean {
  if (only.length === 0) return true;
  return only.some((o) => o === name || (name.includes(o) && !benchCases.some((c) => c.name === o)));
}
const rows: BenchRow[] = [];
for (const c of benchCases) {
  if (!selected(c.name)) continue;
  process.stderr.write(`bench: ${c.name} ...\n`);
  try {
    rows.push(...(await c.run()));
  } catch (error) {
    rows.push({ name: c.name, value: Number.NaN, unit: "", note: `failed: ${(error as Error).message}` });
  }
}
const header = ["measure", "value", "unit", "baseline (same run)", "ratio", "goal", "note"];
const table = rows.map((r) => [
  r.name,
  fmt(r.value),
  r.unit,
  r.baseline ? `${r.baseline.name}: ${fmt(r.baseline.value)} ${r.unit}` : "",
  r.ratio !== undefined ? `${fmt(r.ratio)} ${r.ratioLabel ?? "×"}` : "",
  r.goal ?? "",
  r.note ?? "",
]);
const widths = header.map((h, i) => Math.max(h.length, ...table.map((t) => t[i]!.length)));
const line = (cells: string[]) => `| ${cells.map((c, i) => c.padEnd(widths[i]!)).join(" | ")} |`;
console.log(line(header));
console.log(`|${widths.map((w) => "-".repeat(w + 2)).join("|")}|`);
for (const t of table) console.log(line(t));
if (rows.length === 0) console.log("(no benchmark rows)");
console.log(
  `\nNode ${process.version}, ${process.platform}/${process.arch}; times are wall-clock medians unless noted.`,
);
