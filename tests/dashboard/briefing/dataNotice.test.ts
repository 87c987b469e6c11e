import { describe, expect, it } from "vitest";
import { briefingFileName } from "../../../dashboard/src/briefing/dataNotice.ts";

describe("briefing file name", () => {
  it("names one or two surveys in full", () => {
    expect(briefingFileName(["wet-2025-03", "dry-2025-09"])).toBe("briefing-wet-2025-03-dry-2025-09.html");
  });
  it("names the first and last of more surveys and how many, not every name", () => {
    const names = Array.from({ length: 22 }, (_, i) => `2018-${String(i + 1).padStart(2, "0")}-10`);
    expect(briefingFileName(names)).toBe("briefing-2018-01-10-to-2018-22-10-22-surveys.html");
  });
});
