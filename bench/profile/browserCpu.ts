// CPU time of one freshly launched Chromium and its child processes, read from /proc: what a cold
// start costs the machine in all, and by process type and thread (the software GPU's threads, the
// renderer's main thread, workers). Less sensitive to other load than wall time. Linux only.
import { readFileSync, readdirSync } from "node:fs";

/** CPU ms by process type and thread name of a Chromium's processes (see browserCpuS). */
export function threadCpuMs(profile: string): Map<string, number> {
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
export function browserCpuS(profile: string): number {
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
