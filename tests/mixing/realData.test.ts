import { describe, expect, it } from "vitest";
import { existsSync, readFileSync } from "node:fs";
import Papa from "papaparse";
import { expectWithin } from "../helpers/tolerance.ts";
import { analyzeConstituent } from "../../analysis/mixing/analyzeConstituent.ts";

// Real data: USGS San Francisco Bay water-quality cruises (Schraga & Cloern 2017, Sci. Data 4:170098),
// shared/data/usgs-sfbay-2016-2022 (see its SOURCE.md). Read at test time, never copied.
const file = new URL(
  "../../../shared/data/usgs-sfbay-2016-2022/2018SanFranciscoBayWaterQualityData.csv",
  import.meta.url,
);
const present = existsSync(file);
if (!present) console.log("realData: ../shared/data/usgs-sfbay-2016-2022 absent, real-data mixing tests skipped");

function readRows(): Array<Record<string, string>> {
  const text = readFileSync(file, "utf8").replace(/^\uFEFF/, "");
  return Papa.parse<Record<string, string>>(text, { header: true, skipEmptyLines: true }).data;
}

/** North-Bay samples of `column` on `date`, shallowest sample per station. */
function northBay(date: string, column: string) {
  const seen = new Set<string>();
  return readRows()
    .filter((r) => r.Date === date && (r[column] ?? "") !== "" && (r.Salinity ?? "") !== "")
    .filter((r) => Number(r.Station_Number) <= 18 || Number(r.Station_Number) >= 649)
    .sort((a, b) => Number(a.Depth) - Number(b.Depth))
    .filter((r) => !seen.has(r.Station_Number!) && seen.add(r.Station_Number!))
    .map((r) => ({
      stationId: r.Station_Number!,
      salinity: Number(r.Salinity),
      conc: Number(r[column]),
      censored: false,
      accepted: true,
    }));
}

function northBaySilicate(date: string) {
  const rows = readRows();
  // River → Golden Gate branch: Sacramento River stations 649/657 and channel stations ≤ 18 (SOURCE.md notes).
  return rows
    .filter(
      (r) =>
        r.Date === date &&
        (r.Silicate ?? "") !== "" &&
        (Number(r.Station_Number) <= 18 || Number(r.Station_Number) >= 649),
    )
    .map((r) => ({
      stationId: r.Station_Number!,
      salinity: Number(r.Salinity),
      conc: Number(r.Silicate),
      censored: false,
      accepted: true,
    }));
}

function allFinite(v: unknown): boolean {
  if (typeof v === "number") return Number.isFinite(v);
  if (Array.isArray(v)) return v.every(allFinite);
  if (v && typeof v === "object") return Object.values(v).every(allFinite);
  return true;
}

describe.skipIf(!present)(
  "real survey: USGS San Francisco Bay silicate transects, 2018 (Schraga & Cloern 2017)",
  () => {
    it.each(["5/7/18", "6/11/18", "9/18/18"])(
      "analyzeConstituent() on the %s North Bay transect classifies Si with finite numbers and a river end-member at S = 0",
      (date) => {
        const samples = northBaySilicate(date);
        expectWithin(samples.length >= 6 ? 1 : 0, 1, 0, `${samples.length} stations with silicate`);
        const r = analyzeConstituent(samples, { name: "Si", unit: "µmol/L", seed: 2018, bootstrapDraws: 300 });
        expectWithin(r.class !== "insufficient-data" ? 1 : 0, 1, 0, `class ${r.class}`);
        expectWithin(allFinite(r) ? 1 : 0, 1, 0, "only finite numbers");
        // River end-member (issue 14): the fitted curve at S = 0, extrapolated from the freshest stations;
        // where no curve can be extrapolated (straight line rejected yet kept, or an unstable extrapolation)
        // the freshest stations' mean at their own salinity, stated in the river's method.
        const river = r.endmembers!.river;
        if (river.salinity !== 0) expect(river.method ?? "").toContain("mean of the freshest stations");
        expectWithin(river.salinity, 0, 0.5, "river reference salinity");
        const e = r.effectiveEndmember;
        if (e) expectWithin(e.lower <= e.value && e.value <= e.upper ? 1 : 0, 1, 0, "C*₀ inside its own interval");
        // No C*₀ only when the class is non-conservative but no straight seaward line could be separated:
        // then the tool says the % change is not determined instead of a "0 %" with a zero-width interval.
        else expect(r.warnings.map((w) => w.code)).toContain("percent-not-determined");
      },
    );
  },
);

describe.skipIf(!present)(
  "real survey: class and reaction zone agree (issue 14 'coherent verdicts'; common practice)",
  () => {
    it("on every 2018 North-Bay transect and nutrient, a removal class comes with a removal zone and an addition class with an addition zone", () => {
      const dates = [...new Set(readRows().map((r) => r.Date!))];
      let checked = 0;
      const disagreements: string[] = [];
      for (const date of dates)
        for (const column of ["Silicate", "Phosphate", "Ammonium", "Nitrate_+_Nitrite", "Nitrite"]) {
          const samples = northBay(date, column);
          if (samples.length < 8) continue;
          const r = analyzeConstituent(samples, { name: column, unit: "µmol/L", seed: 2018, bootstrapDraws: 100 });
          if (!r.reactionZone) continue;
          checked++;
          const removal = r.class === "removal" || r.class === "removal-then-conservative";
          if ((r.reactionZone.kind === "removal") !== removal)
            disagreements.push(`${date} ${column}: ${r.class} with a ${r.reactionZone.kind} zone`);
        }
      expectWithin(checked >= 20 ? 1 : 0, 1, 0, `${checked} constituent analyses with a reaction zone`);
      expect(disagreements).toEqual([]);
    });
  },
);
