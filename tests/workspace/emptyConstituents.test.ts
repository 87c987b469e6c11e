// emptyConstituentsNotice / constituentsWithoutValues (analysis/workspace/emptyConstituents.ts): a
// survey file's constituent columns that none of its surveys filled are named once per import
// (common practice: a programme's export keeps every column of its format, filled or not). Checked
// through readInputs on small invented files, and on the 2022 SF Bay export when ../shared is present.
import { describe, expect, it } from "vitest";
import { existsSync, readFileSync } from "node:fs";
import {
  EMPTY_CONSTITUENTS_NOTICE,
  constituentsWithoutValues,
  readInputs,
  type InputFile,
} from "../../analysis/index.ts";

const text = (name: string, rows: string[]): InputFile => ({ name, content: rows.join("\n") });
const HEADER = "survey,station,latitude,longitude,salinity,Fe (nmol/L),Si (µmol/L),NO2 (µmol/L)";

describe("constituents without values", () => {
  it("names the columns no survey of a file filled, below-detection results counting as observations", () => {
    const inputs = readInputs([
      text("invented-a.csv", [
        HEADER,
        "A,1,45.0,-35.0,0.5,900,,<0.1",
        "A,2,45.1,-35.1,10.2,300,,",
        "B,1,45.0,-35.0,0.4,850,,",
      ]),
    ]);
    const notice = inputs.notices.find((n) => n.code === EMPTY_CONSTITUENTS_NOTICE);
    expect(notice?.message).toBe("invented-a.csv has no value of Si in any of its 2 surveys (the columns are empty).");
    expect(constituentsWithoutValues(inputs.surveys)).toEqual(["Si"]);
  });

  it("gives no notice when every column has an observation", () => {
    const inputs = readInputs([text("invented-b.csv", [HEADER, "A,1,45.0,-35.0,0.5,900,12,0.3"])]);
    expect(inputs.notices.map((n) => n.code)).not.toContain(EMPTY_CONSTITUENTS_NOTICE);
  });

  it("names each file apart in one notice", () => {
    const inputs = readInputs([
      text("invented-c.csv", [HEADER, "C,1,45.0,-35.0,0.5,900,,0.3"]),
      text("invented-d.csv", [HEADER, "D,1,45.0,-35.0,0.5,,12,"]),
    ]);
    const found = inputs.notices.filter((n) => n.code === EMPTY_CONSTITUENTS_NOTICE);
    expect(found).toHaveLength(1);
    expect(found[0]!.message).toBe(
      "invented-c.csv has no value of Si in its survey (the columns are empty); invented-d.csv has no value of Fe, NO2 in its survey (the columns are empty).",
    );
  });

  const BAY = "../shared/data/usgs-sfbay-2016-2022";
  const bayPresent = existsSync(`${BAY}/wqdata22.csv`) && existsSync(`${BAY}/USGSSFBayStations_from_xlsx.csv`);
  if (!bayPresent) console.warn(`emptyConstituents test: ${BAY} is absent, the real-export check is skipped`);
  it.skipIf(!bayPresent)(
    "the 2022 SF Bay export: every nutrient column is empty in all 8 cruises (SOURCE.md: 2022 rows with nutrients 0)",
    () => {
      const file = (name: string): InputFile => ({ name, content: readFileSync(`${BAY}/${name}`) });
      const inputs = readInputs([file("USGSSFBayStations_from_xlsx.csv"), file("wqdata22.csv")]);
      expect(inputs.surveys).toHaveLength(8);
      expect(constituentsWithoutValues(inputs.surveys)).toEqual(["NO2", "NO3+NO2", "NH4", "PO4", "Si"]);
      expect(inputs.notices.find((n) => n.code === EMPTY_CONSTITUENTS_NOTICE)?.message).toBe(
        "wqdata22.csv has no value of NO2, NO3+NO2, NH4, PO4, Si in any of its 8 surveys (the columns are empty).",
      );
    },
  );
});
