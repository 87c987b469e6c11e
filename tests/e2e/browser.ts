/**
 * End-to-end harness: serves dashboard/dist with scripts/serve.js on a free
 * port, launches Debian's Chromium (never a downloaded browser) headless with
 * software WebGL, collects console errors and saves screenshots.
 */
import { spawn, type ChildProcess } from "node:child_process";
import { existsSync, mkdirSync, mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join, resolve } from "node:path";
import { fileURLToPath } from "node:url";
import { chromium, type BrowserContext, type Page } from "playwright-core";

export const REPO_ROOT = resolve(fileURLToPath(new URL("../..", import.meta.url)));
export const CHROMIUM_PATH = process.env.BRACKLINE_CHROMIUM ?? "/usr/bin/chromium";
export const SCREENSHOT_DIR = join(REPO_ROOT, "tests", "e2e", "screenshots");
const DIST_INDEX = join(REPO_ROOT, "dashboard", "dist", "index.html");

/** Flags that give WebGL2 through SwiftShader without a GPU (see TOOLCHAIN notes). */
export const CHROMIUM_FLAGS = [
  "--headless",
  "--no-sandbox",
  "--disable-gpu",
  "--disable-quic",
  "--no-first-run",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
  "--enable-unsafe-swiftshader",
];

/** Whether the browser tests can run here. */
export const chromiumAvailable = existsSync(CHROMIUM_PATH);

/**
 * In CI a missing browser is a failure, not a skip: returns the message to
 * fail with, or undefined when tests may run or skip.
 */
export function missingBrowserMessage(): string | undefined {
  if (chromiumAvailable) return undefined;
  return (
    `Chromium not found at ${CHROMIUM_PATH}. Install Debian's package: apt-get install -y chromium ` +
    `(browsers are never downloaded by the tests).`
  );
}

/** True when the suite should skip (no browser, and not in CI). */
export const skipBrowser = !chromiumAvailable && process.env.CI !== "true";
if (skipBrowser) console.warn(`e2e: skipped locally. ${missingBrowserMessage()}`);

export interface Session {
  context: BrowserContext;
  page: Page;
  url: string;
  /** Console errors, page errors and failed requests seen so far. */
  errors: string[];
  close(): Promise<void>;
}

function startServer(): Promise<{ child: ChildProcess; url: string }> {
  if (!existsSync(DIST_INDEX)) {
    return Promise.reject(
      new Error(`${DIST_INDEX} is missing: run \`npm run build\` (npm run test:e2e builds first).`),
    );
  }
  return new Promise((resolveServer, reject) => {
    const child = spawn(process.execPath, [join(REPO_ROOT, "scripts", "serve.js")], {
      env: { ...process.env, PORT: "0" },
      stdio: ["ignore", "pipe", "pipe"],
    });
    let out = "";
    const timer = setTimeout(() => reject(new Error(`static server did not start: ${out}`)), 15_000);
    child.stdout?.on("data", (chunk: Buffer) => {
      out += chunk.toString();
      const match = /(http:\/\/127\.0\.0\.1:\d+\/)/.exec(out);
      if (match) {
        clearTimeout(timer);
        resolveServer({ child, url: match[1] });
      }
    });
    child.stderr?.on("data", (chunk: Buffer) => (out += chunk.toString()));
    child.once("exit", (code) => {
      clearTimeout(timer);
      reject(new Error(`static server exited with ${code}: ${out}`));
    });
  });
}

/**
 * Debian's headless Chromium with the software-WebGL flags on a profile directory of its own
 * (Playwright passes it as --user-data-dir): the one launch every browser test and bench uses.
 */
export function launchChromium(
  profile: string,
  viewport: { width: number; height: number } = { width: 1440, height: 900 },
): Promise<BrowserContext> {
  return chromium.launchPersistentContext(profile, {
    executablePath: CHROMIUM_PATH,
    headless: true,
    args: CHROMIUM_FLAGS,
    viewport,
  });
}

/** Starts the server and the browser and opens the dashboard. */
export async function openDashboard(viewport = { width: 1440, height: 900 }): Promise<Session> {
  const missing = missingBrowserMessage();
  if (missing) throw new Error(missing);
  const server = await startServer();
  const profile = mkdtempSync(join(tmpdir(), "brackline-chromium-"));
  let context: BrowserContext;
  try {
    // A fresh profile directory per session (Playwright passes it as --user-data-dir).
    context = await launchChromium(profile, viewport);
  } catch (error) {
    server.child.kill();
    throw error;
  }
  const page = context.pages()[0] ?? (await context.newPage());
  page.setDefaultTimeout(15_000);
  const errors: string[] = [];
  page.on("console", (msg) => {
    if (msg.type() === "error") errors.push(`console: ${msg.text()}`);
  });
  page.on("pageerror", (error) => errors.push(`page: ${error.message}`));
  page.on("requestfailed", (req) => {
    const reason = req.failure()?.errorText ?? "";
    // A blob: fetch (MapLibre's worker reading an image or tile it was handed) cut off because the page
    // reloads or the map is torn down is not a failure the user sees; any other failed request is.
    if (req.url().startsWith("blob:") && reason === "net::ERR_ABORTED") return;
    errors.push(`request failed: ${req.url()} ${reason}`);
  });
  page.on("response", (res) => {
    if (res.status() >= 400) errors.push(`HTTP ${res.status()}: ${res.url()}`);
  });
  page.on("request", (req) => {
    if (!req.url().startsWith(server.url) && !req.url().startsWith("data:") && !req.url().startsWith("blob:")) {
      errors.push(`off-line rule broken: request to ${req.url()}`);
    }
  });
  await page.goto(server.url, { waitUntil: "load" });
  return {
    context,
    page,
    url: server.url,
    errors,
    async close() {
      await context.close().catch(() => undefined);
      server.child.kill();
      rmSync(profile, { recursive: true, force: true });
    },
  };
}

/** Waits until the map has loaded, drawn its style and gone idle. */
export async function waitForMap(page: Page): Promise<void> {
  await page.waitForSelector('[data-map-ready="true"]', { timeout: 90_000 });
}

/**
 * Waits until the survey on screen has its analysis (its panels can draw); the other surveys may
 * still be analysing (the worker analyses them after the first view).
 */
export async function waitForFirstView(page: Page): Promise<void> {
  await page.waitForSelector('[data-active-analysis="ready"]', { timeout: 90_000 });
}

/**
 * Waits until the worker has analysed every survey (Compare, the archive view and the briefing
 * need them all); not only the one on screen.
 */
export async function waitForAnalysis(page: Page): Promise<void> {
  await page.waitForSelector('[data-analysis-status="ready"]', { timeout: 90_000 });
}

/** Saves a screenshot to tests/e2e/screenshots/<name>.png and returns the PNG bytes. */
export async function screenshot(page: Page, name: string): Promise<Buffer> {
  mkdirSync(SCREENSHOT_DIR, { recursive: true });
  return page.screenshot({ path: join(SCREENSHOT_DIR, `${name}.png`) });
}

/** Page position of a station on the map, from the dashboard's automation hook. */
export async function stationPixel(page: Page, id: string): Promise<[number, number]> {
  const p = await page.evaluate(
    (sid) =>
      (
        window as unknown as { __brackline?: { stationPixel(id: string): [number, number] | null } }
      ).__brackline?.stationPixel(sid) ?? null,
    id,
  );
  if (!p) throw new Error(`station ${id} is not on the map`);
  return p;
}

/** Waits for the map to finish drawing after a change (MapLibre idle + two frames for deck.gl). */
export async function settle(page: Page): Promise<void> {
  await page.evaluate(
    () => new Promise<void>((resolve) => requestAnimationFrame(() => requestAnimationFrame(() => resolve()))),
  );
  await page.waitForTimeout(300);
}

/** The text of the aria-live selection status under the map. */
export async function selectionStatus(page: Page): Promise<string> {
  return ((await page.locator('[data-testid="selection-status"]').textContent()) ?? "").trim();
}

/**
 * Opens the dashboard and waits until the map has drawn and the analysis has finished: the set-up
 * every browser test starts from. Fails with the clear message when Chromium is missing.
 */
export async function openReadyDashboard(options: { settled?: boolean } = {}): Promise<Session> {
  const missing = missingBrowserMessage();
  if (missing) throw new Error(missing);
  const s = await openDashboard();
  await waitForMap(s.page);
  await waitForAnalysis(s.page);
  if (options.settled ?? true) await settle(s.page);
  return s;
}
