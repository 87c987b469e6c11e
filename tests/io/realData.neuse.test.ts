import path from "node:path";
import { describe, expect, it } from "vitest";
import { readSurveyText } from "../../analysis/io/readSurvey.ts";
import type { ImportedStation } from "../../analysis/io/importSummary.ts";
import { expectWithin } from "../helpers/tolerance.ts";
import { readIfExists, sharedData } from "./helpers/paths.ts";

// Real data: Hounshell, Paerl, Hall, Braddy, Rossignol, Sloup — Neuse River Estuary ModMon surveys 2015–2016,
// EDI data package edi.181, CC BY 4.0 (see ../shared/data/neuse-estuary-2015/SOURCE.md).
const file = path.join(sharedData, "neuse-estuary-2015/NRE_Stats.csv");
const text = readIfExists(file);
if (text === undefined) console.warn(`${file} is absent (../shared not mounted): Neuse real-data import tests skipped`);

describe.skipIf(text === undefined)(
  "readSurveyText() on NRE_Stats.csv (Hounshell et al., EDI edi.181, CC BY 4.0)",
  () => {
    const first = readSurveyText(text ?? "", {
      fileName: "NRE_Stats.csv",
      layer: { kind: "surface" },
      grouping: { by: "date" },
    });

    it("reads all 484 rows (22 dates × 11 stations × 2 depths, SOURCE.md) without rejecting any", () => {
      expect(first.summary).toMatchObject({ rowsRead: 484, rowsAccepted: 484, rowsRejected: 0 });
      expect(first.summary.valuesByStatus.invalid).toBe(0);
    });

    it("groups by Date into 22 surveys 2015-07-20 … 2016-07-18 with 11 surface stations each (S labels, SOURCE.md)", () => {
      expect(first.surveys.length).toBe(22);
      expect(first.surveys[0].name).toBe("2015-07-20");
      expect(first.surveys[21].startDate).toBe("2016-07-18");
      for (const s of first.surveys) expect(s.stations.length).toBe(11);
      const st0 = first.surveys[0].stations[0] as ImportedStation;
      expect(st0.layer).toBe("surface");
      expect(st0.contributingRows).toEqual([2]);
      expectWithin(st0.salinity.value, 0.07, 0, "Sal_ppt, 7/20/2015 station 0 S");
      expectWithin(st0.temperatureC?.value, 30.93, 0, "Temp_C");
      expectWithin(st0.values.DOC.value, 460.3077354, 0, "DOC_uM");
    });

    it("flags the _uM POC and PN columns whose numbers are POC_mgL × 1000, i.e. µg/L (SOURCE.md), as a unit problem", () => {
      const warn = first.issues.filter((i) => i.expected.includes("fit µg/L"));
      expect(warn.map((i) => i.column).sort()).toEqual(["PN_uM", "POC_uM"]);
      expect(first.issues.some((i) => i.column === "DOC_uM" && i.expected.includes("check the column unit"))).toBe(
        false,
      );
    });

    it("reports the missing coordinates once per station (11 stations, no positions in the file) and keeps the along-axis station label as id", () => {
      const pos = first.issues.filter((i) => i.expected.startsWith("a position"));
      expect(pos.map((i) => i.value)).toEqual(["0", "20", "30", "50", "60", "70", "100", "120", "140", "160", "180"]);
      expect(pos.every((i) => i.severity === "warning" && i.column === "Station")).toBe(true);
    });

    it("after the user corrects POC_uM/PN_uM to µg/L in the mapping, the unit warning is gone and the NA markers are read as missing (13 rows without salinity: 484 − 471, SOURCE.md)", () => {
      const mapping = {
        ...first.mapping,
        columns: first.mapping.columns.map((c) =>
          c.header === "POC_uM" || c.header === "PN_uM" ? { ...c, unit: "µg/L" } : c,
        ),
      };
      const all = readSurveyText(text ?? "", {
        fileName: "NRE_Stats.csv",
        mapping,
        grouping: { by: "date" },
        layer: { kind: "all" },
      });
      expect(all.issues.some((i) => i.expected.includes("check the column unit"))).toBe(false);
      const rows = all.surveys.flatMap((s) => s.stations);
      expect(rows.filter((r) => r.salinity.status === "missing").length).toBe(13);
      const sal = rows.map((r) => r.salinity.value).filter((v): v is number => v !== undefined);
      expectWithin(
        Math.min(...sal),
        0.04,
        0.005,
        "minimum salinity (SOURCE.md, 2 decimals; the file holds 0.039999962)",
      );
      expectWithin(Math.max(...sal), 19.96, 0.005, "maximum salinity (SOURCE.md, 2 decimals)");
      const poc = all.surveys[0].constituents.find((c) => c.header === "POC_uM");
      expect(poc?.unit).toBe("µg/L");
    });
  },
);
