/**
 * Parity of the discharge table between the CLI and the dashboard worker: the same survey (the
 * invented demo's wet survey with its discharge cells removed) and the same INVENTED flows table go
 * through `brackline analyze --discharge-table` and through the worker API (`run` with the archive
 * view's table in the analysis settings, over Comlink on a MessageChannel); the fluxes and the
 * stated discharge source must be identical (common practice: one input-to-results API).
 */
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { proxy } from "comlink";
import { main } from "../../../cli/main.ts";
import type { AnalysisEvent, TextFile } from "../../../dashboard/src/worker/protocol.ts";
import { Settings } from "../../../dashboard/src/state/settings.svelte.ts";
import type { SurveyAnalysis } from "../../../analysis/index.ts";
import { comlinkWorker } from "./helpers/comlinkWorker.ts";

const demo = (p: string) => readFileSync(new URL(`../../../data-demo/${p}`, import.meta.url), "utf8");
const dir = mkdtempSync(join(tmpdir(), "brackline-discharge-parity-"));
const worker = comlinkWorker();
afterAll(() => {
  rmSync(dir, { recursive: true, force: true });
});

/** The invented wet survey without its discharge cells (so the table gives its discharge). */
const survey: TextFile = { name: "wet-no-q.csv", text: demo("surveys/wet-2025-03.csv").replace(/,450,/g, ",,") };
/** INVENTED flows (not measurements). */
const flows: TextFile = { name: "invented-flows.csv", text: "date,flow (m3/s)\n2025-03-10,310\n2025-03-16,333.5\n" };
const line: TextFile = { name: "centerline.geojson", text: demo("centerline.geojson") };

function fluxes(a: Pick<SurveyAnalysis, "survey" | "constituents">) {
  return {
    discharge: a.survey.riverDischargeM3s ?? null,
    source: a.survey.dischargeSource ?? null,
    flux: a.constituents.map((c) => ({ name: c.name, flux: c.flux ?? null })),
  };
}

describe("discharge table: CLI and dashboard worker give the same fluxes", () => {
  it("analyze --discharge-table and the worker with the archive view's table agree, source and fluxes included", async () => {
    for (const f of [survey, flows, line]) writeFileSync(join(dir, f.name), f.text);
    let out = "";
    const code = await main(
      [
        "analyze",
        join(dir, survey.name),
        "--centerline",
        join(dir, line.name),
        "--discharge-table",
        join(dir, flows.name),
      ],
      { out: (t) => (out += t), err: () => {} },
    );
    expect(code).toBe(0);
    const cliSurvey = (
      JSON.parse(out) as { surveys: Array<SurveyAnalysis["survey"] & Pick<SurveyAnalysis, "constituents">> }
    ).surveys[0]!;
    const cli = fluxes({ survey: cliSurvey, constituents: cliSurvey.constituents });

    const analyses: SurveyAnalysis[] = [];
    await new Promise<void>((resolve) => {
      void worker.run(
        {
          kind: "load",
          surveys: [survey],
          centerline: line,
          settings: { ...new Settings().analysis, dischargeTable: flows },
        },
        proxy((e: AnalysisEvent) => {
          if (e.type === "analysis") analyses[e.surveyIndex] = e.analysis;
          if (e.type === "done" || e.type === "error") resolve();
        }),
      );
    });
    const viaWorker = JSON.parse(JSON.stringify(fluxes(analyses[0]!))) as typeof cli;

    expect(cli.discharge).toBe(333.5);
    expect(cli.source).toMatchObject({ origin: "table", tableDate: "2025-03-16", daysBefore: 2 });
    expect(cli.flux.filter((c) => c.flux !== null).length).toBeGreaterThan(0);
    expect(viaWorker).toEqual(cli);
  });
});
