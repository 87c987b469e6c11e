/**
 * The worker's comparison and speciation: the comparison the dashboard shows is the workspace API's
 * (`analyzeInputs(…, { compare })` → `comparison`), and the speciation context comes back over Comlink
 * as plain data equal to analysis/seawater's own results (common practice: one source for every number).
 */
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { proxy } from "comlink";
import { readFiles, workspaceSettings } from "../../../dashboard/src/worker/engine.ts";
import type { AnalysisEvent } from "../../../dashboard/src/worker/protocol.ts";
import { defaultSpeciationSettings } from "../../../dashboard/src/worker/speciation.ts";
import { Settings } from "../../../dashboard/src/state/settings.svelte.ts";
import { analyzeInputs, stationSpeciation } from "../../../analysis/index.ts";
import { comlinkWorker } from "./helpers/comlinkWorker.ts";

const demo = (p: string) => readFileSync(new URL(`../../../data-demo/${p}`, import.meta.url), "utf8");
const surveys = [
  { name: "wet-2025-03.csv", text: demo("surveys/wet-2025-03.csv") },
  { name: "dry-2025-09.csv", text: demo("surveys/dry-2025-09.csv") },
];
const centerline = { name: "centerline.geojson", text: demo("centerline.geojson") };

const worker = comlinkWorker();

describe("worker comparison and speciation", () => {
  it("the worker's comparison of the invented demo surveys equals analyzeInputs' comparison", async () => {
    const settings = new Settings().analysis;
    const events: AnalysisEvent[] = [];
    await new Promise<void>((resolve) => {
      void worker.run(
        { kind: "load", surveys, centerline, settings },
        proxy((e: AnalysisEvent) => {
          events.push(e);
          if (e.type === "done") resolve();
        }),
      );
    });
    const got = events.find((e) => e.type === "comparison");
    expect(got?.type === "comparison" && got.reason).toBeFalsy();
    const expected = analyzeInputs(readFiles(surveys, centerline), { ...workspaceSettings(settings), compare: {} });
    expect(got?.type === "comparison" ? got.comparison : undefined).toEqual(expected.comparison);
  });

  it("the worker's speciation at a station equals stationSpeciation() and crosses Comlink as plain data", async () => {
    const model = await worker.speciation({
      station: { id: "S1", salinity: 5, temperatureC: 15, pH: 7.6 },
      measuredPh: [{ stationId: "S1", salinity: 5, pH: 7.6 }],
      settings: defaultSpeciationSettings,
    });
    const direct = stationSpeciation(
      { pH: 7.6, salinity: 5, temperatureC: 15 },
      {
        feConstantSet: defaultSpeciationSettings.feSetId,
        cdConstantSet: defaultSpeciationSettings.cdSetId,
        mixing: { riverSalinity: 0, seaSalinity: 35 },
      },
    );
    expect(model.atStation).toEqual({ ok: true, value: direct });
    expect(model.temperatureAssumed).toBe(false);
    expect(model.fe.ok && model.cd.ok && model.ions.ok).toBe(true);
    expect(model.carbonate).toBeUndefined();
  });

  it("the worker says why, as text, when the analysis cannot compute (an unknown constant set)", async () => {
    const model = await worker.speciation({
      measuredPh: [],
      settings: { ...defaultSpeciationSettings, feSetId: "no-such-set" },
    });
    expect(model.fe.ok).toBe(false);
    expect(model.fe.ok ? "" : model.fe.error).toMatch(/no-such-set/);
    expect(model.temperatureAssumed).toBe(true);
  });
});
