import path from "node:path";
import { describe, expect, it } from "vitest";
import { readSurveyText } from "../../analysis/io/readSurvey.ts";
import { expectWithin } from "../helpers/tolerance.ts";
import { readIfExists, repoRoot } from "./helpers/paths.ts";

const both = readIfExists(path.join(repoRoot, "data-demo/surveys/both-surveys.csv"));
if (both === undefined) console.warn("data-demo/surveys/both-surveys.csv is absent: demo import test skipped");

// INVENTED demo data (data-demo/README.md): used only to check that the reader takes the demo file cleanly.
describe.skipIf(both === undefined)("readSurveyText() on the invented demo surveys (data-demo)", () => {
  const r = readSurveyText(both ?? "", { fileName: "both-surveys.csv" });

  it("readSurveyText() imports both demo surveys with no issue and no rejected row", () => {
    expect(r.issues).toEqual([]);
    expect(r.summary.rowsRejected).toBe(0);
    expect(r.summary.rowsRead).toBe(64);
    expect(r.surveys.map((s) => `${s.name}:${s.stations.length}`)).toEqual(["wet-2025-03:34", "dry-2025-09:30"]);
    expect(r.surveys[0].constituents.map((c) => `${c.name} ${c.unit}`)).toEqual([
      "Fe nmol/L",
      "Mn nmol/L",
      "Cu nmol/L",
      "Ni nmol/L",
      "Cd nmol/L",
      "Ba nmol/L",
      "Si µmol/L",
      "NO3 µmol/L",
      "PO4 µmol/L",
    ]);
  });

  it("readSurveyText() keeps the demo's flagged Cu value (flag 4) but sets it aside, and reads <4.0 / <0.05 as censored", () => {
    const stations = r.surveys.flatMap((s) => s.stations);
    const flagged = stations.filter((s) => s.values.Cu.qcFlag === "4");
    expect(flagged.map((s) => s.id)).toEqual(["W20"]);
    expect(flagged[0].values.Cu.accepted).toBe(false);
    expect(flagged[0].values.Cu.status).toBe("measured");
    const fe = stations.find((s) => s.values.Fe.original === "<4.0");
    expect(fe?.values.Fe.status).toBe("belowDetection");
    expectWithin(fe?.values.Fe.detectionLimit, 4, 0, "Fe detection limit");
    expect(r.summary.valuesRejectedByFlag).toBe(1);
  });

  it("readSurveyText() converts the demo's -02:00 times to UTC and keeps [lon, lat] order", () => {
    const w01 = r.surveys[0].stations[0];
    expect(w01.time).toBe("2025-03-18T09:30:00Z");
    expectWithin(w01.lonLat?.[0], -35.30269, 1e-12, "W01 longitude first");
    expectWithin(w01.lonLat?.[1], 45.04869, 1e-12, "W01 latitude second");
    expect(r.surveys[0].startDate).toBe("2025-03-18T09:30:00Z");
  });
});
