// shownConstituent (dashboard/src/worker/shownConstituent.ts): the one rule for which constituent the
// dashboard shows, used by the selection and by the worker's marks posted first (common practice:
// a non-mixing variable such as oxygen has no mixing diagram, so it is never the default).
import { describe, expect, it } from "vitest";
import { shownConstituent } from "../../../dashboard/src/worker/shownConstituent.ts";

const constituents = [{ name: "DO", kind: "nonMixing" }, { name: "Fe", kind: "tracer" }, { name: "Si" }];

describe("shownConstituent()", () => {
  it("keeps the chosen constituent when the survey mixes it", () => {
    expect(shownConstituent(constituents, "Si")).toBe("Si");
  });
  it("otherwise gives the survey's first mixing constituent, never a non-mixing variable", () => {
    expect(shownConstituent(constituents, "Ba")).toBe("Fe");
    expect(shownConstituent(constituents, "DO")).toBe("Fe");
  });
  it("gives nothing for a survey without a mixing constituent", () => {
    expect(shownConstituent([{ name: "DO", kind: "nonMixing" }], "DO")).toBeUndefined();
  });
});

describe("shownConstituent() with the survey's stations", () => {
  const cell = (status: string) => ({ status });
  // A bay cruise whose file has an NO2 column it never filled, Si measured, NO3 below detection.
  const stations = [
    { values: { NO2: cell("missing"), Si: cell("measured"), NO3: cell("belowDetection") } },
    { values: { NO2: cell("missing"), Si: cell("measured") } },
  ];
  const bay = [{ name: "NO2" }, { name: "Si" }, { name: "NO3" }];

  it("passes over a constituent the survey never observed, chosen or first", () => {
    expect(shownConstituent(bay, "Fe", stations)).toBe("Si");
    expect(shownConstituent(bay, "NO2", stations)).toBe("Si");
  });
  it("keeps a chosen constituent with observations, below-detection results included", () => {
    expect(shownConstituent(bay, "NO3", stations)).toBe("NO3");
  });
  it("falls back to the mixing constituents when none has an observation", () => {
    const empty = [{ values: { NO2: cell("missing"), Si: cell("invalid") } }];
    expect(shownConstituent(bay, "Si", empty)).toBe("Si");
    expect(shownConstituent(bay, "Fe", empty)).toBe("NO2");
  });
});
