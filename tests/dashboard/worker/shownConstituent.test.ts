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
