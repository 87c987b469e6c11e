import { describe, expect, it } from "vitest";
import {
  CELL_DERIVED,
  CELL_INVALID,
  CELL_MEASURED,
  CELL_MISSING,
  practicalSalinityFromConductivity,
  readUnderwayStream,
  readUnderwayText,
} from "../../analysis/index.ts";
import { expectWithin } from "../helpers/tolerance.ts";
import { underwayCsv, underwayCsvChunks } from "../../bench/fixtures/underwayLog.ts";

const col = (r: ReturnType<typeof readUnderwayText>, name: string) => r.data.columns.find((c) => c.name === name)!;

describe("readUnderwayText() header recognition and cells", () => {
  const text = [
    "Time UTC,Lat,Lon,Sal (PSU),Temp (°C),Chl fluorescence (RFU),Turbidity (NTU)",
    "2026-05-04T10:00:00Z,35.1,-76.3,12.5,20.1,3.2,8.0",
    "2026-05-04T10:00:01Z,35.1001,-76.3001,NA,20.2,3.3,8.1",
    "2026-05-04T10:00:02Z,35.1002,-76.3002,12.x,20.3,-999,8.2",
    "2026-05-04T10:00:03Z,,,12.7,20.4,3.5,8.3",
    "2026-05-04T10:00:04Z,north,-76.3004,12.8,20.5,3.6,8.4",
  ].join("\n");
  const r = readUnderwayText(text, { fileName: "log.csv" });

  it("recognises time, position, salinity, temperature, fluorescence and turbidity from common-practice headers", () => {
    expect(r.roles).toEqual(["time", "latitude", "longitude", "salinity", "temperature", "fluorescence", "turbidity"]);
    expect(r.data.columns.map((c) => [c.name, c.unit])).toEqual([
      ["salinity", "PSU"],
      ["temperatureC", "°C"],
      ["fluorescence", "RFU"],
      ["turbidity", "NTU"],
    ]);
  });

  it("stores numbers as parsed, missing markers as missing and unreadable text as invalid with an issue holding the original text", () => {
    const s = col(r, "salinity");
    expect(Array.from(s.status)).toEqual([CELL_MEASURED, CELL_MISSING, CELL_INVALID, CELL_MEASURED, CELL_MEASURED]);
    expect(s.values[0]).toBe(12.5);
    expect(Number.isNaN(s.values[2]!)).toBe(true);
    expect(col(r, "fluorescence").status[2]).toBe(CELL_MISSING);
    const bad = r.issues.find((i) => i.column === "Sal (PSU)")!;
    expect(bad).toMatchObject({ file: "log.csv", row: 4, value: "12.x", expected: "a number" });
    expect(r.data.originalText["Sal (PSU)"]!.get(2)).toBe("12.x");
  });

  it("rejects records without a readable position, counted by reason, and keeps them in the columns", () => {
    expect(r.summary).toMatchObject({ rowsRead: 5, rowsAccepted: 3, rowsRejected: 2 });
    expect(r.summary.rejectedByReason).toEqual({ "no position": 1, "unreadable latitude": 1 });
    expect(Array.from(r.data.accepted)).toEqual([1, 1, 1, 0, 0]);
    expect(r.data.n).toBe(5);
    expect(r.data.originalText["Lat"]!.get(4)).toBe("north");
    expect(Array.from(r.data.sourceRow)).toEqual([2, 3, 4, 5, 6]);
  });

  it("reads ISO 8601 times to ms since 1970 UTC (Date.UTC as the reference)", () => {
    expect(r.data.timeMs[1]).toBe(Date.UTC(2026, 4, 4, 10, 0, 1));
    expect(r.summary.timesAssumedUtc).toBe(false);
  });
});

describe("readUnderwayText() dialects and coordinate forms", () => {
  it("reads a semicolon log with decimal commas, a BOM, degrees–minutes positions and a +02:00 offset", () => {
    const text =
      "\uFEFFdatetime;latitude;longitude;salinity;temperature\n" +
      "14.05.2026 12:00:00+02:00;35°06,0'N;76°18,0'W;12,5;20,1\n" +
      "14.05.2026 12:00:01+02:00;35°06,1'N;76°18,1'W;12,6;20,2\n";
    const r = readUnderwayText(text, { fileName: "eu.csv" });
    expect(r.dialect).toEqual({ delimiter: ";", decimalComma: true });
    expectWithin(r.data.latDeg[0], 35.1, 1e-12, "35°06.0'N = 35 + 6/60 (sexagesimal degrees, common practice)");
    expectWithin(r.data.lonDeg[0], -76.3, 1e-12, "76°18.0'W = −(76 + 18/60)");
    expect(col(r, "salinity").values[1]).toBe(12.6);
    expect(r.data.timeMs[0]).toBe(Date.UTC(2026, 4, 14, 10, 0, 0));
  });

  it("flags times without a zone as read in UTC", () => {
    const r = readUnderwayText("time,lat,lon,salinity\n2026-05-04 10:00:00,35,-76,1\n", { fileName: "z.csv" });
    expect(r.data.timeMs[0]).toBe(Date.UTC(2026, 4, 4, 10));
    expect(r.summary.timesAssumedUtc).toBe(true);
  });

  it("joins separate date and time-of-day columns", () => {
    const r = readUnderwayText("date,time,lat,lon,salinity\n2026-05-04,10:00:05,35,-76,1\n", { fileName: "d.csv" });
    expect(r.roles.slice(0, 2)).toEqual(["date", "timeOfDay"]);
    expect(r.data.timeMs[0]).toBe(Date.UTC(2026, 4, 4, 10, 0, 5));
  });
});

describe("readUnderwayText() salinity from conductivity", () => {
  it("derives practical salinity 35 from C = 42.914 mS/cm at t68 = 15 °C, 0 dbar (UNESCO 1983 PSS-78 definition, C(35,15,0); t90 = t68/1.00024, Saunders 1990)", () => {
    const t90 = 15 / 1.00024;
    const r = readUnderwayText(
      `time,lat,lon,Conductivity (mS/cm),Temperature (°C)\n2026-05-04T10:00:00Z,35,-76,42.914,${t90}\n`,
      {
        fileName: "c.csv",
      },
    );
    const s = col(r, "salinity");
    expect(s.status[0]).toBe(CELL_DERIVED);
    expectWithin(s.values[0], 35, 1e-4, "PSS-78 reference conductivity (UNESCO 1983)");
  });

  it("converts S/m headers and agrees with practicalSalinityFromConductivity() exactly", () => {
    const r = readUnderwayText("time,lat,lon,cond (S/m),temp (°C)\n2026-05-04T10:00:00Z,35,-76,1.2,18\n", {
      fileName: "c.csv",
    });
    expectWithin(
      col(r, "salinity").values[0],
      practicalSalinityFromConductivity(12, 18, 0),
      1e-12,
      "1.2 S/m = 12 mS/cm",
    );
  });

  it("refuses a conductivity column without a unit (file-level issue, no salinity guessed)", () => {
    const r = readUnderwayText("time,lat,lon,cond,temp\n2026-05-04T10:00:00Z,35,-76,12,18\n", { fileName: "c.csv" });
    expect(r.data.columns.find((c) => c.name === "salinity")).toBeUndefined();
    expect(r.summary.issuesByReason["unknown conductivity unit"]).toBe(1);
  });
});

describe("readUnderwayText() issue cap", () => {
  it("keeps at most issueCap issues but counts every bad cell by reason and keeps every original text", () => {
    const lines = ["time,lat,lon,salinity"];
    for (let i = 0; i < 50; i++) lines.push(`2026-05-04T10:00:${String(i).padStart(2, "0")}Z,35,-76,bad${i}`);
    const r = readUnderwayText(lines.join("\n"), { fileName: "bad.csv", issueCap: 10 });
    expect(r.issues).toHaveLength(10);
    expect(r.summary.issueCount).toBe(50);
    expect(r.summary.issuesByReason["unreadable salinity"]).toBe(50);
    expect(r.data.originalText["salinity"]!.size).toBe(50);
    expect(r.data.originalText["salinity"]!.get(49)).toBe("bad49");
  });
});

describe("readUnderwayStream()", () => {
  it("gives exactly the readUnderwayText() columns for a 5,000-record invented log split into odd chunks", async () => {
    const text = underwayCsv(5000, 7);
    const whole = readUnderwayText(text, { fileName: "log.csv" });
    const pieces: string[] = [];
    for (let i = 0; i < text.length; i += 4093) pieces.push(text.slice(i, i + 4093));
    const progress: number[] = [];
    const streamed = await readUnderwayStream(pieces, {
      fileName: "log.csv",
      totalSize: text.length,
      onProgress: (f) => progress.push(f),
    });
    expect(streamed.summary).toEqual(whole.summary);
    expect(Array.from(streamed.data.latDeg)).toEqual(Array.from(whole.data.latDeg));
    for (const c of whole.data.columns) {
      const s = streamed.data.columns.find((x) => x.name === c.name)!;
      expect(Array.from(s.values)).toEqual(Array.from(c.values));
      expect(Array.from(s.status)).toEqual(Array.from(c.status));
    }
    expect(progress.at(-1)).toBe(1);
    expect(progress.every((p, i) => i === 0 || p >= progress[i - 1]!)).toBe(true);
  });

  it("reads UTF-8 byte chunks split inside a multi-byte character (°)", async () => {
    const bytes = new TextEncoder().encode(underwayCsv(100, 2));
    const cut = bytes.indexOf(0xb0); // second byte of "°" in the header
    const r = await readUnderwayStream([bytes.slice(0, cut), bytes.slice(cut)], { fileName: "log.csv" });
    expect(r.headers[4]).toBe("temperature (°C)");
    expect(r.summary.rowsAccepted).toBe(100);
  });

  it("throws TypeError naming readUnderwayStream for a source that is not a stream", async () => {
    await expect(readUnderwayStream(42 as unknown as string[], { fileName: "x" })).rejects.toThrow(
      /readUnderwayStream\(\): source/,
    );
  });

  it("accepts the generator of the invented log directly and reads all its records", async () => {
    const r = await readUnderwayStream(underwayCsvChunks(25_000, 1), { fileName: "log.csv" });
    expect(r.summary).toMatchObject({ rowsRead: 25_000, rowsAccepted: 25_000, issueCount: 0 });
  });
});

describe("underway caller mistakes", () => {
  it("readUnderwayText() throws TypeError naming the function for text that is not a string and for missing options.fileName", () => {
    expect(() => readUnderwayText(42 as unknown as string, { fileName: "x" })).toThrow(/readUnderwayText\(\): text/);
    expect(() => readUnderwayText("a,b", {} as { fileName: string })).toThrow(/options.fileName/);
  });

  it("readUnderwayText() reports an empty file as an issue instead of throwing", () => {
    const r = readUnderwayText("", { fileName: "empty.csv" });
    expect(r.summary.rowsRead).toBe(0);
    expect(r.summary.issuesByReason["empty file"]).toBe(1);
  });
});
