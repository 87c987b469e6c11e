// @vitest-environment jsdom
import { beforeAll, describe, expect, it } from "vitest";
import { render } from "@testing-library/svelte";
import { flushSync } from "svelte";
import Papa from "papaparse";
import MixingPlot from "../../../dashboard/src/panels/MixingPlot.svelte";
import ChannelProfile from "../../../dashboard/src/panels/ChannelProfile.svelte";
import BehaviourTable from "../../../dashboard/src/panels/BehaviourTable.svelte";
import { Selection } from "../../../dashboard/src/state/selection.svelte.ts";
import { surveyObservations } from "../../../analysis/index.ts";
import { behaviourLabel, formatNumber } from "../../../dashboard/src/panels/lib/format.ts";
import { resultsCsv } from "../../../dashboard/src/panels/lib/export.ts";
import type { SurveyAnalysisView } from "../../../dashboard/src/panels/lib/types.ts";
import type { Survey } from "../../../analysis/survey/survey.ts";
import { demoAnalysis } from "./demoAnalysis.ts";

let survey: Survey;
let analysis: SurveyAnalysisView;

beforeAll(() => {
  ({ survey, analysis } = demoAnalysis());
});

describe("panels on the real analysis of the invented demo survey", () => {
  it("MixingPlot draws one mark per Fe value in the survey file, censored ones as triangles", () => {
    const selection = new Selection();
    const { container } = render(MixingPlot, { analysis, selection, idPrefix: "d" });
    const obs = surveyObservations(survey, "Fe");
    expect(container.querySelectorAll(".point")).toHaveLength(obs.length);
    expect(container.querySelectorAll(".point-belowDetection")).toHaveLength(
      obs.filter((o) => o.kind === "belowDetection").length,
    );
    expect(obs.filter((o) => o.kind === "belowDetection").length).toBeGreaterThan(0);
  });

  it("MixingPlot labels C*₀ with the value analyzeSurvey() returned", () => {
    const selection = new Selection();
    const { container } = render(MixingPlot, { analysis, selection, idPrefix: "d" });
    const fe = analysis.constituents.find((c) => c.name === "Fe")!;
    expect(fe.effectiveEndmember).toBeDefined();
    expect(container.querySelector(".effective-endmember")?.textContent).toContain(
      `C*₀ ${formatNumber(fe.effectiveEndmember!.value)} ${fe.unit}`,
    );
  });

  it("ChannelProfile shades one stretch per reaction-zone km interval and marks each maximum km (Ba)", () => {
    const selection = new Selection();
    selection.constituent = "Ba";
    const { container } = render(ChannelProfile, { analysis, selection, idPrefix: "d" });
    const ba = analysis.constituents.find((c) => c.name === "Ba")!;
    expect(container.querySelectorAll(".reaction-zone")).toHaveLength(ba.reactionZone?.km.length ?? 0);
    expect(container.querySelectorAll("line.maximum")).toHaveLength(ba.maximum?.km.length ?? 0);
  });

  it("BehaviourTable shows a row per analysed constituent with its class in plain words", () => {
    const selection = new Selection();
    const { container } = render(BehaviourTable, { analysis, selection });
    const rows = [...container.querySelectorAll("tbody tr")];
    expect(rows.map((r) => r.getAttribute("data-constituent"))).toEqual(analysis.constituents.map((c) => c.name));
    for (const c of analysis.constituents) {
      expect(container.querySelector(`tr[data-constituent='${c.name}']`)?.textContent).toContain(
        behaviourLabel[c.class],
      );
    }
    selection.constituent = "Cu";
    flushSync();
    expect(container.querySelector("tr.selected")?.getAttribute("data-constituent")).toBe("Cu");
  });

  it("resultsCsv() of the real analysis keeps every estimate at full precision", () => {
    const rows = Papa.parse<Record<string, string>>(resultsCsv(analysis), { header: true, skipEmptyLines: true }).data;
    for (const c of analysis.constituents) {
      const row = rows.find((r) => r.constituent === c.name)!;
      expect(row.class).toBe(c.class);
      if (c.effectiveEndmember) expect(Number(row.effective_river_endmember)).toBe(c.effectiveEndmember.value);
    }
  });
});
