import { rmSync } from "node:fs";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { main } from "../../cli/main.ts";
import { cliArguments, fixedCommandLines, writeCliFixtures } from "./generators/cliArgs.ts";
import type { CliFixtures } from "./generators/cliArgs.ts";
import { seeded } from "./generators/random.ts";
import { CONTROL_CHARS, formulaCells, hasStackTrace, numberProblems } from "./invariants.ts";
import { cases } from "./scale.ts";

interface Run {
  args: string[];
  code: number;
  out: string;
  err: string;
}

const N = cases(40);
const runs: Run[] = [];
let fixtures: CliFixtures;

const show = (r: Run): string => JSON.stringify(r.args.map((a) => a.replace(fixtures.dir, "$TMP")));

beforeAll(async () => {
  const r = seeded(4242);
  fixtures = writeCliFixtures(r);
  const lines = [...fixedCommandLines(fixtures), ...Array.from({ length: N }, () => cliArguments(r, fixtures))];
  for (const args of lines) {
    let out = "";
    let err = "";
    let code: number;
    try {
      code = await main(args, { out: (t) => (out += t), err: (t) => (err += `${t}\n`) });
    } catch (e) {
      code = -1;
      err += `main() threw: ${e instanceof Error ? (e.stack ?? e.message) : String(e)}`;
    }
    runs.push({ args, code, out, err });
  }
}, 240_000);

afterAll(() => rmSync(fixtures.dir, { recursive: true, force: true }));

describe(`fuzz: ${N} seeded command lines and the fixed ones through brackline (main() in process)`, () => {
  it("the runs reach every documented outcome (0 ok, 2 bad input, 64 usage)", () => {
    const codes = new Set(runs.map((r) => r.code));
    for (const c of [0, 2, 64]) expect(codes.has(c), `exit ${c} never reached`).toBe(true);
  });

  it("item 6: a centerline written as [lat, lon] exits 2 and says so (RFC 7946 position order)", () => {
    const run = runs[1] as Run;
    expect(run.code).toBe(2);
    expect(run.err).toContain("[lat, lon]");
    expect((runs[2] as Run).code).toBe(0);
  });

  it("item 13: a header-only file exits 2 naming row 1 and the header", () => {
    const run = runs[3] as Run;
    expect(run.code).toBe(2);
    expect(run.err).toMatch(/row 1, (column "", )?value "survey,station/);
  });

  it("a river discharge of 0 in the file is warned and not used (was an internal error, exit 70)", () => {
    const run = runs[7] as Run;
    expect(run.code).toBe(0);
    expect(run.err).toMatch(/discharge.*value "0": expected a river discharge above 0/);
  });

  it("item 7: the exit code is 0, 2 or 64 as documented, never 70 (internal) for user input", () => {
    const bad = runs
      .filter((r) => ![0, 2, 64].includes(r.code))
      .map((r) => `${r.code} ${show(r)}: ${r.err.slice(-300)}`);
    expect(bad).toEqual([]);
  });

  it("item 7: no stack trace on stderr", () => {
    const bad = runs.filter((r) => hasStackTrace(r.err)).map((r) => `${show(r)}: ${r.err.slice(-300)}`);
    expect(bad).toEqual([]);
  });

  it("item 10: control characters (terminal escape sequences) are stripped from stderr", () => {
    const bad = runs.filter((r) => CONTROL_CHARS.test(r.err)).map((r) => show(r));
    expect(bad).toEqual([]);
  });

  it("a run that fails says why on stderr (file, row or option named), and prints no results", () => {
    // No arguments at all prints the usage (on stdout) with exit 64.
    const says = (r: Run): boolean => r.err.trim() !== "" || (r.code === 64 && r.out.includes("Usage"));
    const bad = runs.filter((r) => r.code !== 0 && (!says(r) || r.out.includes('"constituents"')));
    expect(bad.map(show)).toEqual([]);
  });

  it("item 11: JSON results hold no NaN, Infinity or null numbers, and every estimate lies inside its interval", () => {
    const bad: string[] = [];
    for (const r of runs) {
      if (r.code !== 0 || !r.out.trimStart().startsWith("{")) continue;
      const doc = JSON.parse(r.out) as { surveys?: unknown };
      for (const p of numberProblems(doc.surveys, "surveys").filter((p) => !/\.date = null$/.test(p)))
        bad.push(`${show(r)} ${p}`);
    }
    expect(bad.slice(0, 10)).toEqual([]);
  });

  it("item 4: CSV cells beginning with = + - @ tab or CR are neutralised (OWASP CSV injection guidance)", () => {
    const bad: string[] = [];
    for (const r of runs) {
      if (r.code !== 0 || !r.args.includes("csv")) continue;
      for (const c of formulaCells(r.out)) bad.push(`${show(r)}: ${JSON.stringify(c.slice(0, 60))}`);
    }
    expect(bad.slice(0, 10)).toEqual([]);
  });
});
