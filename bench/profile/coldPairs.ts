// Cold starts of the bare map page and the built dashboard, each page load in its own freshly
// launched Chromium (bench flags, fresh profile), alternating bare / dashboard, N pairs. Prints each
// pair and the medians. Not a bench row: a quick way to compare builds on a noisy shared machine.
// Usage: npx tsx bench/profile/coldPairs.ts [--runs N] [--warm-bare]   (build dashboard/dist first)
import { mkdtempSync, readFileSync, readdirSync, rmSync } from "node:fs";
import { tmpdir, loadavg } from "node:os";
import { join } from "node:path";
import { launchChromium } from "../../tests/e2e/browser.ts";
import { serveBareMap } from "../fixtures/bareMap.ts";
import { DIST, ensureDist, serveDist } from "../fixtures/dashboardDist.ts";
import { BARE, FIRST_VIEW, type ReadySpec } from "../fixtures/readySpecs.ts";

/** CPU ms by process type and thread name of a Chromium's processes (see browserCpuS). */
function threadCpuMs(profile: string): Map<string, number> {
  const out = new Map<string, number>();
  for (const pid of browserPids(profile)) {
    try {
      const type =
        /--type=([\w-]+)/.exec(readFileSync(`/proc/${pid}/cmdline`, "utf8").replace(/\0/g, " "))?.[1] ?? "browser";
      for (const tid of readdirSync(`/proc/${pid}/task`)) {
        const stat = readFileSync(`/proc/${pid}/task/${tid}/stat`, "utf8");
        const comm = stat.slice(stat.indexOf("(") + 1, stat.lastIndexOf(")")).replace(/\d+$/, "");
        const f = stat.slice(stat.lastIndexOf(")") + 2).split(" ");
        const key = `${type}/${comm}`;
        out.set(key, (out.get(key) ?? 0) + (Number(f[11]) + Number(f[12])) * 10);
      }
    } catch {
      // ended meanwhile
    }
  }
  return out;
}

/** CPU seconds (user + system) used so far by the Chromium whose profile directory is `profile` and all its child processes. */
function browserCpuS(profile: string): number {
  let ticks = 0;
  for (const pid of browserPids(profile)) {
    try {
      const stat = readFileSync(`/proc/${pid}/stat`, "utf8");
      const f = stat.slice(stat.lastIndexOf(")") + 2).split(" ");
      ticks += Number(f[11]) + Number(f[12]);
    } catch {
      // ended meanwhile
    }
  }
  return ticks / 100;
}

/** The pids of the Chromium whose profile directory is `profile` and of all its child processes. */
function browserPids(profile: string): Set<number> {
  const procs = new Map<number, { ppid: number; ticks: number; root: boolean }>();
  for (const name of readdirSync("/proc")) {
    if (!/^\d+$/.test(name)) continue;
    try {
      const stat = readFileSync(`/proc/${name}/stat`, "utf8");
      const f = stat.slice(stat.lastIndexOf(")") + 2).split(" ");
      const cmd = readFileSync(`/proc/${name}/cmdline`, "utf8");
      procs.set(Number(name), {
        ppid: Number(f[1]),
        ticks: Number(f[11]) + Number(f[12]),
        root: cmd.includes(profile) && !cmd.includes("--type="),
      });
    } catch {
      // the process ended meanwhile
    }
  }
  const roots = [...procs].filter(([, p]) => p.root).map(([pid]) => pid);
  const all = new Set(roots);
  for (let grew = true; grew;) {
    grew = false;
    for (const [pid, p] of procs)
      if (!all.has(pid) && all.has(p.ppid)) {
        all.add(pid);
        grew = true;
      }
  }
  return all;
}

async function coldLoad(url: string, spec: ReadySpec): Promise<Record<string, number>> {
  const profile = mkdtempSync(join(tmpdir(), "brackline-pairs-"));
  const context = await launchChromium(profile);
  try {
    const page = context.pages()[0] ?? (await context.newPage());
    await page.addInitScript({
      content: `globalThis.__name = globalThis.__name || ((f) => f);
      (() => { const m = (window.__marks = {}); const sels = ${JSON.stringify({ ...Object.fromEntries(FIRST_VIEW.all.map((s) => [s, s])), bare: BARE.all[0] })};
      const tick = () => { for (const [k, s] of Object.entries(sels)) if (!(k in m) && document.querySelector(s)) m[k] = performance.now(); requestAnimationFrame(tick); };
      requestAnimationFrame(tick); })();`,
    });
    const cpu0 = browserCpuS(profile);
    await page.goto(url, { waitUntil: "load" });
    const h = await page.waitForFunction(
      ({ all, none }) =>
        all.every((sel) => document.querySelector(sel)) && !none.some((sel) => document.querySelector(sel))
          ? performance.now()
          : false,
      { all: spec.all, none: spec.none ?? [] },
      { polling: "raf", timeout: 180_000 },
    );
    const t = (await h.jsonValue()) as number;
    const cpuMs = (browserCpuS(profile) - cpu0) * 1000;
    if (process.argv.includes("--threads")) {
      const rows = [...threadCpuMs(profile)].filter(([, ms]) => ms >= 30).sort((a, b) => b[1] - a[1]);
      console.log(`    threads (CPU ms since launch): ${rows.map(([k, ms]) => `${k} ${ms}`).join(", ")}`);
    }
    const marks = (await page.evaluate(() => (window as unknown as { __marks: Record<string, number> }).__marks)) ?? {};
    return { ready: t, cpuMs, ...marks };
  } finally {
    await context.close();
    rmSync(profile, { recursive: true, force: true });
  }
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;
const arg = (name: string) => process.argv[process.argv.indexOf(name) + 1];
ensureDist();
const runs = process.argv.includes("--runs") ? Number(arg("--runs")) : 3;
// --dist DIR (repeatable): the built dashboards to compare, each loaded after the bare page in every round
const dists = process.argv.flatMap((a, i) => (a === "--dist" ? [process.argv[i + 1]!] : []));
if (dists.length === 0) dists.push(DIST);
const bare = await serveBareMap();
const dashes = await Promise.all(dists.map(serveDist));
const b: number[] = [];
const d: number[][] = dists.map(() => []);
const bc: number[] = [];
const dc: number[][] = dists.map(() => []);
const short = (k: string) => k.replace(/^\[data-|"\]$|="true|="ready|\] svg$|\] table$/g, "").slice(0, 16);
try {
  for (let i = 0; i < runs; i++) {
    const rb = await coldLoad(bare.url, BARE);
    b.push(rb.ready!);
    bc.push(rb.cpuMs!);
    const parts = [`round ${i + 1}: bare ${rb.ready!.toFixed(0)} ms (cpu ${rb.cpuMs!.toFixed(0)} ms)`];
    for (const [k, dash] of dashes.entries()) {
      const rd = await coldLoad(dash.url, FIRST_VIEW);
      d[k]!.push(rd.ready!);
      dc[k]!.push(rd.cpuMs!);
      parts.push(
        `  ${dists[k]}: ${rd.ready!.toFixed(0)} ms = ${(rd.ready! / rb.ready!).toFixed(2)}× (${Object.entries(rd)
          .filter(([key]) => key !== "ready" && !/svg|table|bare/.test(key))
          .map(([key, v]) => `${short(key)} ${v.toFixed(0)}`)
          .join(", ")})`,
      );
    }
    console.log(
      `${parts.join("\n")}\n  load ${loadavg()
        .map((l) => l.toFixed(1))
        .join(" ")}`,
    );
  }
  console.log(
    `median CPU (all browser processes, navigation to ready): bare ${median(bc).toFixed(0)} ms; ${dists.map((x, k) => `${x} ${median(dc[k]!).toFixed(0)} ms`).join("; ")}`,
  );
  console.log(
    `median: bare ${median(b).toFixed(0)} ms; ${dists.map((x, k) => `${x} ${median(d[k]!).toFixed(0)} ms ${(median(d[k]!) / median(b)).toFixed(2)}×`).join("; ")}`,
  );
} finally {
  for (const x of dashes) x.kill();
  bare.close();
}
