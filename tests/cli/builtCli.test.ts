import { beforeAll, describe, expect, it } from "vitest";
import { spawnSync } from "node:child_process";
// @ts-expect-error plain-JavaScript build script without type declarations
import { buildCli, cliBuildIsStale } from "../../cli/build.js";

// the launcher builds cli/dist/ only when it is missing; these tests check the build of the current sources
beforeAll(async () => {
  if (cliBuildIsStale()) await buildCli();
}, 120_000);

/** The shipped command: cli/bin/brackline.js runs the plain-JavaScript build (cli/dist/). */
function brackline(args: string[], viaNpx = false): { code: number | null; out: string; err: string } {
  const r = viaNpx
    ? spawnSync("npx", ["--no-install", "brackline", ...args], { encoding: "utf8" })
    : spawnSync(process.execPath, ["cli/bin/brackline.js", ...args], { encoding: "utf8" });
  return { code: r.status, out: r.stdout, err: r.stderr };
}

describe("the built CLI (cli/dist via cli/bin/brackline.js)", () => {
  it("npx brackline --help lists the commands and exits 0", () => {
    const r = brackline(["--help"], true);
    expect(r.err).toBe("");
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/Commands:\n {2}analyze/);
  }, 120_000);

  it("analyzes a survey table and exits 2 for JSON that is not GeoJSON, naming the file", () => {
    const ok = brackline(["analyze", "data-demo/surveys/wet-2025-03.csv", "--draws", "20", "--format", "csv"]);
    expect(ok.code).toBe(0);
    expect(ok.out.split("\r\n")[0]).toMatch(/^survey,constituent,unit,class/);
    const bad = brackline(["analyze", "package-lock.json"]);
    expect(bad.code).toBe(2);
    expect(bad.err).toMatch(/package-lock\.json: not a file Brackline reads/);
  }, 120_000);
});
