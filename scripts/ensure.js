#!/usr/bin/env node
// Brings a checkout up to what `npm start` or `npm test` needs, doing only what is missing or stale:
//   deps      npm ci from package-lock.json, when node_modules is absent or older than the lockfile
//   builds    every `build:*` step listed in BUILD_STEPS whose output is absent or older than its sources
//   browser   (test only) Debian's Chromium, installed with apt-get when this user may install packages;
//             otherwise a message naming the one command to run. Browsers are never downloaded elsewhere.
// Plain Node with no dependencies, so it runs on a fresh clone before `npm ci`.
// Usage: node scripts/ensure.js start|test
import { spawnSync } from "node:child_process";
import { existsSync, readdirSync, readFileSync, statSync } from "node:fs";
import { join, resolve } from "node:path";
import { fileURLToPath } from "node:url";

const root = resolve(fileURLToPath(new URL("..", import.meta.url)));
const purpose = process.argv[2];
if (purpose !== "start" && purpose !== "test") {
  console.error("ensure: usage: node scripts/ensure.js start|test");
  process.exit(64);
}
const say = (text) => console.log(`brackline: ${text}`);

/** Newest modification time (ms) of a file or of any file below a folder; 0 when absent. */
function newestMtimeMs(path) {
  if (!existsSync(path)) return 0;
  const info = statSync(path);
  if (!info.isDirectory()) return info.mtimeMs;
  let newest = 0;
  for (const entry of readdirSync(path, { withFileTypes: true })) {
    if (entry.name === "node_modules" || entry.name === "dist" || entry.name.startsWith(".")) continue;
    newest = Math.max(newest, newestMtimeMs(join(path, entry.name)));
  }
  return newest;
}

function run(command, args, what) {
  say(`${what}: ${[command, ...args].join(" ")}`);
  const result = spawnSync(command, args, { cwd: root, stdio: "inherit", env: process.env });
  if (result.status !== 0) {
    console.error(`brackline: ${what} failed (exit ${result.status ?? result.signal}).`);
    process.exit(result.status || 1);
  }
}

const npm = process.platform === "win32" ? "npm.cmd" : "npm";

// 1. Dependencies from the lockfile. npm writes node_modules/.package-lock.json on every install.
const installedMarker = join(root, "node_modules", ".package-lock.json");
const lockMs = newestMtimeMs(join(root, "package-lock.json"));
if (!existsSync(installedMarker) || newestMtimeMs(installedMarker) < lockMs) {
  run(npm, ["ci", "--no-audit", "--no-fund", "--prefer-offline"], "installing dependencies from package-lock.json");
} else {
  say("dependencies up to date with package-lock.json (install skipped)");
}

// 2. Builds: each step's output against the sources it is built from.
const scripts = JSON.parse(readFileSync(join(root, "package.json"), "utf8")).scripts ?? {};
const shared = ["analysis", "package-lock.json", "tsconfig.json"];
const BUILD_STEPS = [
  {
    script: "build:cli",
    args: [],
    output: "cli/dist/main.js",
    sources: ["cli", "data-demo/generator", ...shared],
    for: ["start", "test"],
  },
  {
    script: "build",
    args: ["--", "--logLevel", "warn"],
    output: "dashboard/dist/index.html",
    sources: ["dashboard", "data-demo", ...shared],
    for: ["start"], // `npm test` builds the dashboard itself before the browser tests
  },
];
for (const step of BUILD_STEPS) {
  if (!step.for.includes(purpose) || !scripts[step.script]) continue;
  const builtMs = newestMtimeMs(join(root, step.output));
  const sourceMs = Math.max(...step.sources.map((s) => newestMtimeMs(join(root, s))));
  if (builtMs === 0 || builtMs < sourceMs)
    run(npm, ["run", "--silent", step.script, ...step.args], `building (${step.script})`);
  else say(`${step.output} up to date (${step.script} skipped)`);
}

// 3. The browser for the end-to-end tests, and the TEOS-10 reference library the cross-checks use.
if (purpose === "test") {
  const chromium = process.env.BRACKLINE_CHROMIUM ?? "/usr/bin/chromium";
  const pythonGsw = spawnSync("/usr/bin/python3", ["-c", "import gsw"], { stdio: "ignore" }).status === 0;
  const wanted = [];
  if (!existsSync(chromium)) wanted.push("chromium");
  if (!pythonGsw) wanted.push("python3-gsw");
  if (wanted.length > 0) {
    const isRoot = typeof process.getuid === "function" && process.getuid() === 0;
    const hasApt = spawnSync("sh", ["-c", "command -v apt-get"], { stdio: "ignore" }).status === 0;
    const sudo = !isRoot && spawnSync("sudo", ["-n", "true"], { stdio: "ignore" }).status === 0;
    if (hasApt && (isRoot || sudo)) {
      const env = { ...process.env, DEBIAN_FRONTEND: "noninteractive" };
      const [command, ...head] = sudo ? ["sudo", "-n"] : [];
      const install = (args) =>
        (command
          ? spawnSync(command, [...head, ...args], { stdio: "inherit", env })
          : spawnSync(args[0], args.slice(1), { stdio: "inherit", env })
        ).status === 0;
      say(`installing Debian packages for the tests: ${wanted.join(" ")}`);
      const ok =
        install(["apt-get", "install", "-y", ...wanted]) ||
        (install(["apt-get", "update"]) && install(["apt-get", "install", "-y", ...wanted]));
      if (!ok) say(`could not install ${wanted.join(" ")}; the tests that need them will say so.`);
    } else if (wanted.includes("chromium")) {
      const command = `sudo apt-get install -y ${wanted.join(" ")}`;
      if (process.env.CI === "true") {
        console.error(`brackline: the browser tests need Debian's Chromium at ${chromium}. Run: ${command}`);
        process.exit(1);
      }
      say(`the browser tests need Debian's Chromium at ${chromium}; they are skipped until you run: ${command}`);
    } else {
      say(`optional: \`sudo apt-get install -y python3-gsw\` adds the TEOS-10 cross-checks (skipped without it).`);
    }
  }
}
