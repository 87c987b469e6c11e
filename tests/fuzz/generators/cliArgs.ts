import { mkdirSync, mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import type { Rnd } from "./random.ts";
import { HOSTILE_TEXT, int, pick } from "./random.ts";
import { DEMO_SURVEY, demoColumn, withCell, withCellLine } from "./surveys.ts";
import { malformedCenterline } from "./centerlines.ts";

/** Files the generated command lines refer to, written once into a fresh temporary folder. */
export interface CliFixtures {
  dir: string;
  surveys: string[];
  centerlines: string[];
  missing: string;
}

/** A survey whose station ids and cells carry formula text and terminal escape sequences. */
export function hostileSurvey(): string {
  let text = DEMO_SURVEY;
  const st = demoColumn("station");
  HOSTILE_TEXT.forEach((h, i) => {
    text = withCell(text, 1 + (i % 30), st, `"${h.replace(/"/g, '""')}${i}"`);
  });
  // Survey names become CSV cells: formula text there must be neutralised.
  const sv = demoColumn("survey");
  const rows = text.trim().split("\n").length - 1;
  for (let i = 1; i <= rows; i += 1)
    text = withCell(text, i, sv, i <= rows / 2 ? '"=HYPERLINK(""http://x.invalid"")"' : "@SUM(1)");
  return text;
}

/** The demo survey with a river discharge of 0 on every row (was an internal error, exit 70). */
export function zeroDischargeSurvey(): string {
  const q = demoColumn("discharge (m³/s)");
  return DEMO_SURVEY.split("\n")
    .map((l, i) => (i === 0 || l === "" ? l : withCellLine(l, q, "0")))
    .join("\n");
}

/** Writes the fixture files (good, hostile and malformed surveys; good and malformed centerlines). */
export function writeCliFixtures(r: Rnd): CliFixtures {
  const dir = mkdtempSync(join(tmpdir(), "brackline-fuzz-"));
  const put = (name: string, text: string | Uint8Array): string => {
    const p = join(dir, name);
    writeFileSync(p, text);
    return p;
  };
  mkdirSync(join(dir, "a-folder"));
  const surveys = [
    put("good.csv", DEMO_SURVEY),
    put("hostile.csv", hostileSurvey()),
    put("empty.csv", ""),
    put("header-only.csv", `${DEMO_SURVEY.split("\n")[0] ?? ""}\n`),
    put(
      "binary.csv",
      Uint8Array.from({ length: 600 }, () => int(r, 256)),
    ),
    put("esc\u001b[31m-name.csv", DEMO_SURVEY),
    put("unclosed.csv", DEMO_SURVEY.replace(",W11,", ',"W11,')),
    join(dir, "a-folder"),
    put("zero-discharge.csv", zeroDischargeSurvey()),
  ];
  const centerlines = [
    put("line.geojson", JSON.stringify(malformedCenterline(r, "good"))),
    put("swapped.geojson", JSON.stringify(malformedCenterline(r, "swapped"))),
    put("broken.geojson", "{ not json"),
    ...Array.from({ length: 4 }, (_, i) => put(`bad${i}.geojson`, JSON.stringify(malformedCenterline(r)))),
  ];
  return { dir, surveys, centerlines, missing: join(dir, "does-not-exist.csv") };
}

const COMMANDS = ["analyze", "analyze", "analyze", "compare", "report", "salinity", "underway", "demo"];

/** One seeded command line: a command (sometimes wrong), files (sometimes bad) and options (sometimes wrong). */
export function cliArguments(r: Rnd, f: CliFixtures): string[] {
  const k = r();
  if (k < 0.05) return [pick(r, ["", "bogus", "--version", "-x", "\u001b[2J"])];
  if (k < 0.08) return [];
  const cmd = pick(r, COMMANDS);
  const args: string[] = [cmd];
  for (let i = int(r, 3); i >= 0; i -= 1) args.push(r() < 0.1 ? f.missing : pick(r, f.surveys));
  const options: Array<() => string[]> = [
    () => ["--format", pick(r, ["json", "csv", "csv", "xml", ""])],
    () => ["--draws", pick(r, ["20", "30", "-1", "abc", "0", "1.5"])],
    () => ["--seed", pick(r, ["1", "x", "-3"])],
    () => ["--centerline", r() < 0.1 ? f.missing : pick(r, f.centerlines)],
    () => ["--mouth", pick(r, ["start", "end", "1,2", "garbage", "1,2,3", "NaN,NaN"])],
    () => ["--layer", pick(r, ["surface", "bottom", "average", "0-2", "weird", "5-1"])],
    () => ["--discharge", pick(r, ["450", "-5", "abc", "wet-2025-03=300", "0"])],
    () => ["--out", join(f.dir, "no-such-folder", "x.out")],
    () => ["--stations", f.missing],
    () => [pick(r, ["--unknown-flag", "--format", "-q"])],
  ];
  for (let i = int(r, 4); i > 0; i -= 1) args.push(...pick(r, options)());
  if ((cmd === "report" || cmd === "compare") && r() < 0.7) args.push("--centerline", pick(r, f.centerlines));
  if (cmd === "report" && r() < 0.8) args.push("--out", join(f.dir, `briefing-${int(r, 1e6)}.html`));
  // Keep most runs quick: the bootstrap size is small unless a case sets it.
  if (!args.includes("--draws")) args.push("--draws", "20");
  return args;
}

/** Command lines every run includes: one per defect of issue 15 that the CLI shows. */
export function fixedCommandLines(f: CliFixtures): string[][] {
  const [good, hostile, , headerOnly, , escName] = f.surveys as [string, string, string, string, string, string];
  const [line, swapped] = f.centerlines as [string, string];
  return [
    ["analyze", hostile, "--format", "csv", "--draws", "20"],
    ["analyze", good, "--centerline", swapped, "--draws", "20"],
    ["analyze", good, "--centerline", line, "--draws", "20"],
    ["analyze", headerOnly],
    ["analyze", escName, "--out", join(f.dir, "no-such-folder", "x.json"), "--draws", "20"],
    ["analyze", f.missing],
    ["analyze", good, "--format", "xml"],
    ["analyze", f.surveys[8] as string, "--draws", "20"],
  ];
}
