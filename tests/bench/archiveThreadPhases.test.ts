// The archive bench's per-thread reading and analysis phases, read from a CLI timeline
// (cli/archive/phaseLog.ts marks with cpu= and gc=; common practice: plain differences of counters).
import { describe, expect, it } from "vitest";
import { marks } from "../../bench/cases/archivePhases.ts";
import { threadPhases } from "../../bench/cases/archiveThreadPhases.ts";

const TIMELINE = [
  "phase 1000.0 0 process start",
  "phase 1100.0 0 cpu=90.0 gc=0.0 CLI entry loaded",
  "phase 1170.0 0 cpu=160.0 gc=3.5 command loaded",
  "phase 1190.0 1 cpu=70.0 gc=0.0 worker loaded",
  "phase 1200.0 1 cpu=80.0 gc=1.0 task 4 start",
  "phase 1700.0 1 cpu=500.0 gc=101.0 task 4 end",
  "phase 1800.0 0 cpu=760.0 gc=153.5 inputs ready",
  "phase 1801.0 0 cpu=760.0 gc=153.5 analysis start",
  "phase 1802.0 1 cpu=520.0 gc=102.0 survey set-up done",
  "phase 1803.0 1 cpu=520.0 gc=102.0 task 7 start",
  "phase 2803.0 1 cpu=1500.0 gc=152.0 task 7 end",
  "phase 2900.0 0 cpu=1760.0 gc=213.5 analysis end",
].join("\n");

describe("threadPhases()", () => {
  it("reads cpu= and gc= of each mark, and marks without them as NaN (common practice)", () => {
    const ms = marks(TIMELINE);
    expect(ms[0]).toMatchObject({ thread: 0, label: "process start" });
    expect(ms[0]!.cpu).toBeNaN();
    expect(ms[2]).toMatchObject({ t: 1170, thread: 0, cpu: 160, gc: 3.5, label: "command loaded" });
  });

  it("splits each thread's CPU and GC pauses into reading and analysis (common practice)", () => {
    const p = threadPhases(TIMELINE);
    expect(p.mainRead).toEqual({ cpuMs: 600, gcMs: 150 });
    expect(p.mainAnalysis).toEqual({ cpuMs: 1000, gcMs: 60 });
    expect(p.workerRead).toEqual({ cpuMs: 450, gcMs: 102 });
    expect(p.workerAnalysis).toEqual({ cpuMs: 980, gcMs: 50 });
  });

  it("gives NaN for the worker's phases of a one-thread run (common practice)", () => {
    const p = threadPhases(
      TIMELINE.split("\n")
        .filter((l) => !/ 1 /.test(l))
        .join("\n"),
    );
    expect(p.workerRead.cpuMs).toBeNaN();
    expect(p.workerAnalysis.gcMs).toBeNaN();
  });
});
