import { describe, expect, it } from "vitest";
import { existsSync, readFileSync } from "node:fs";
import { expectWithin } from "../helpers/tolerance.ts";
import { analyzeInputs, readInputs } from "../../analysis/index.ts";

// Real data: Neuse River Estuary axial surveys 2015–2016 (Hounshell et al., EDI edi.181; see ../shared/data/
// neuse-estuary-2015/SOURCE.md). Read at test time, never copied.
const file = new URL("../../../shared/data/neuse-estuary-2015/NRE_Stats.csv", import.meta.url);
const present = existsSync(file);
if (!present) console.log("realDataNeuse: ../shared/data/neuse-estuary-2015 absent, Neuse mixing tests skipped");

function allFinite(v: unknown): boolean {
  if (typeof v === "number") return Number.isFinite(v);
  if (Array.isArray(v)) return v.every(allFinite);
  if (v && typeof v === "object") return Object.values(v).every(allFinite);
  return true;
}

describe.skipIf(!present)(
  "real surveys: Neuse River Estuary DOC, 22 axial surveys (Hounshell et al., EDI edi.181)",
  () => {
    it("analyzeInputs() gives every DOC analysis a positive river value, estimates inside their intervals, finite numbers, and 'conservative' only with C*₀ = C₀ (issue 14 coherence; Boyle et al. 1974 tangent)", () => {
      const inputs = readInputs([{ name: "NRE_Stats.csv", content: readFileSync(file, "utf8") }], {});
      const result = analyzeInputs(inputs, { bootstrapDraws: 150, seed: 1 });
      expectWithin(result.surveys.length, 22, 0, "surveys");
      let analysed = 0;
      for (const s of result.surveys) {
        const c = s.analysis.constituents.find((x) => x.name === "DOC");
        if (!c || c.class === "insufficient-data") continue;
        analysed++;
        const label = `${s.name} DOC`;
        expect(allFinite(c), `${label}: only finite numbers`).toBe(true);
        // Two near-tied freshest stations that disagree by ~150 µmol/L once gave C₀ = −1536 µmol/L (a break between them).
        expect(c.endmembers!.river.conc, `${label}: river C₀`).toBeGreaterThan(0);
        for (const e of [c.effectiveEndmember, c.percentChange])
          if (e) expect(e.lower <= e.value && e.value <= e.upper, `${label}: estimate inside its interval`).toBe(true);
        if (c.class === "conservative" && c.effectiveEndmember)
          expectWithin(c.effectiveEndmember.value, c.endmembers!.river.conc, 1e-9, `${label}: conservative C*₀ = C₀`);
      }
      expectWithin(analysed >= 20 ? 1 : 0, 1, 0, `${analysed} DOC analyses`);
    }, 60_000);
  },
);
