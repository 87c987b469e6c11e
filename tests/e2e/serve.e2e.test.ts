import { spawn, type ChildProcess } from "node:child_process";
import { existsSync } from "node:fs";
import { request } from "node:http";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { REPO_ROOT } from "./browser.ts";

function get(url: string, path: string): Promise<{ status: number; type: string; body: string }> {
  return new Promise((resolve, reject) => {
    // A raw path (not normalised by URL) so "../" reaches the server as sent.
    const u = new URL(url);
    const req = request({ host: u.hostname, port: u.port, path, method: "GET" }, (res) => {
      let body = "";
      res.on("data", (c: Buffer) => (body += c.toString()));
      res.on("end", () => resolve({ status: res.statusCode ?? 0, type: String(res.headers["content-type"]), body }));
    });
    req.on("error", reject);
    req.end();
  });
}

describe("scripts/serve.js serves dashboard/dist on 127.0.0.1 and nothing outside it", () => {
  let child: ChildProcess;
  let url = "";

  beforeAll(async () => {
    expect(existsSync(join(REPO_ROOT, "dashboard", "dist", "index.html"))).toBe(true);
    child = spawn(process.execPath, [join(REPO_ROOT, "scripts", "serve.js")], {
      env: { ...process.env, PORT: "0" },
      stdio: ["ignore", "pipe", "pipe"],
    });
    url = await new Promise<string>((resolve, reject) => {
      let out = "";
      child.stdout?.on("data", (c: Buffer) => {
        out += c.toString();
        const m = /(http:\/\/127\.0\.0\.1:\d+\/)/.exec(out);
        if (m) resolve(m[1]);
      });
      child.once("exit", (code) => reject(new Error(`serve.js exited with ${code}: ${out}`)));
    });
  });

  afterAll(() => {
    child?.kill();
  });

  it("prints a 127.0.0.1 URL and serves index.html as HTML", async () => {
    expect(url).toMatch(/^http:\/\/127\.0\.0\.1:\d+\/$/);
    const res = await get(url, "/");
    expect(res.status).toBe(200);
    expect(res.type).toContain("text/html");
    expect(res.body).toContain("<title>Brackline</title>");
  });

  it("refuses paths that climb out of dist (../package.json, encoded %2e%2e)", async () => {
    for (const path of ["/../package.json", "/%2e%2e/%2e%2e/package.json", "/..%2f..%2fpackage.json"]) {
      const res = await get(url, path);
      expect(res.status, path).toBeGreaterThanOrEqual(400);
      expect(res.body, path).not.toContain('"name": "brackline"');
    }
  });

  it("answers 404 for a missing file", async () => {
    expect((await get(url, "/no-such-file.js")).status).toBe(404);
  });
});
