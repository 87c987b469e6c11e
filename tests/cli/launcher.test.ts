import { spawnSync } from "node:child_process";
import { cpSync, existsSync, mkdtempSync, rmSync, statSync, symlinkSync, utimesSync } from "node:fs";
import { tmpdir } from "node:os";
import { join, resolve } from "node:path";
import { fileURLToPath } from "node:url";
import { afterAll, describe, expect, it } from "vitest";

// cli/bin/brackline.js builds cli/dist/ only when it is missing (a fresh clone, `npx brackline`), with no
// walk over the sources on every run. A copy of cli/ without dist/ stands for the fresh clone; the other
// source folders and node_modules are linked, not copied.
const REPO_ROOT = resolve(fileURLToPath(new URL("../..", import.meta.url)));

describe("the brackline launcher (cli/bin/brackline.js)", () => {
  const dir = mkdtempSync(join(tmpdir(), "brackline-launcher-"));
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  it("builds cli/dist/ when it is missing, then runs it without rebuilding, even when a source is newer", () => {
    cpSync(join(REPO_ROOT, "cli"), join(dir, "cli"), {
      recursive: true,
      filter: (src) => !src.startsWith(join(REPO_ROOT, "cli", "dist")),
    });
    for (const name of ["analysis", "data-demo", "node_modules", "package.json"])
      symlinkSync(join(REPO_ROOT, name), join(dir, name));
    const main = join(dir, "cli", "dist", "main.js");
    expect(existsSync(main)).toBe(false);
    const run = () =>
      spawnSync(process.execPath, [join(dir, "cli", "bin", "brackline.js"), "--help"], { encoding: "utf8" });

    const first = run();
    expect(first.status, first.stderr).toBe(0);
    expect(first.stdout).toMatch(/Commands:\n {2}analyze/);
    expect(existsSync(main)).toBe(true);

    // a source newer than the build: the launcher leaves the build alone (npm run build:cli, npm start/test rebuild it)
    const builtMs = statSync(main).mtimeMs;
    const later = new Date(builtMs + 60_000);
    utimesSync(join(dir, "cli", "main.ts"), later, later);
    const second = run();
    expect(second.status, second.stderr).toBe(0);
    expect(statSync(main).mtimeMs).toBe(builtMs);
  }, 120_000);
});
