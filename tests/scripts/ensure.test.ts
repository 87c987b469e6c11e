import { spawn, spawnSync } from "node:child_process";
import { existsSync, mkdtempSync, rmSync } from "node:fs";
import { get } from "node:http";
import { tmpdir } from "node:os";
import { join, resolve } from "node:path";
import { fileURLToPath } from "node:url";
import { afterAll, describe, expect, it } from "vitest";

// A fresh clone (no node_modules, no builds) must reach a served dashboard with the README's `npm start` alone,
// and a second start must skip the dependency step. Uses the committed tree (git clone of this repository).
const REPO_ROOT = resolve(fileURLToPath(new URL("../..", import.meta.url)));
const hasGit = spawnSync("git", ["-C", REPO_ROOT, "rev-parse", "HEAD"], { stdio: "ignore" }).status === 0;
if (!hasGit) console.log("ensure.test: skipped — this tree is not a git checkout, so it cannot be cloned");

function fetchText(url: string): Promise<{ status: number; body: string }> {
  return new Promise((resolvePage, reject) => {
    get(url, (res) => {
      let body = "";
      res.on("data", (chunk: Buffer) => (body += chunk.toString()));
      res.on("end", () => resolvePage({ status: res.statusCode ?? 0, body }));
    }).on("error", reject);
  });
}

describe.skipIf(!hasGit)("npm start on a fresh clone (scripts/ensure.js)", () => {
  const dir = mkdtempSync(join(tmpdir(), "brackline-fresh-"));
  const clone = join(dir, "brackline");
  afterAll(() => rmSync(dir, { recursive: true, force: true }), 300_000); // a whole node_modules to delete

  it("installs dependencies, builds and serves the dashboard; a second start skips the install", async () => {
    const cloned = spawnSync("git", ["clone", "--quiet", REPO_ROOT, clone], { encoding: "utf8" });
    expect(cloned.status, cloned.stderr).toBe(0);
    expect(existsSync(join(clone, "node_modules"))).toBe(false);

    const child = spawn("npm", ["start"], {
      cwd: clone,
      env: { ...process.env, PORT: "0", CI: "" },
      stdio: ["ignore", "pipe", "pipe"],
      detached: true, // its own process group, so npm and the server stop together
    });
    let out = "";
    try {
      const url = await new Promise<string>((resolveUrl, reject) => {
        const onData = (chunk: Buffer) => {
          out += chunk.toString();
          const match = /(http:\/\/127\.0\.0\.1:\d+\/)/.exec(out);
          if (match && out.includes("Ctrl+C")) resolveUrl(match[1]);
        };
        child.stdout.on("data", onData);
        child.stderr.on("data", onData);
        child.once("exit", (code) => reject(new Error(`npm start exited with ${code}:\n${out}`)));
      });
      expect(out).toContain("installing dependencies from package-lock.json");
      expect(out).toContain("Press Ctrl+C to stop");
      const page = await fetchText(url);
      expect(page.status).toBe(200);
      expect(page.body).toContain("<title>Brackline</title>");
    } finally {
      if (child.pid) process.kill(-child.pid, "SIGTERM");
    }

    const second = spawnSync(process.execPath, ["scripts/ensure.js", "start"], { cwd: clone, encoding: "utf8" });
    expect(second.status, second.stderr).toBe(0);
    expect(second.stdout).toContain("install skipped");
    expect(second.stdout).not.toContain("installing dependencies");
  }, 600_000);
});
