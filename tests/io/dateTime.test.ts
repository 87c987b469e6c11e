import { describe, expect, it } from "vitest";
import { detectDateOrder, expandTwoDigitYear, parseDateTimeText, parseTimeOfDay } from "../../analysis/io/dateTime.ts";

describe("date and time parsing (ISO 8601 output)", () => {
  it.each([
    ["2025-03-18T07:30:00-02:00", undefined, undefined, "2025-03-18T09:30:00Z"],
    ["2025-09-09T08:00:00Z", undefined, undefined, "2025-09-09T08:00:00Z"],
    ["2016-01-21 13:46", undefined, undefined, "2016-01-21T13:46:00"],
    ["2016-01-21", undefined, undefined, "2016-01-21"],
    ["1/21/16", "MDY", "629", "2016-01-21T06:29:00"],
    ["7/20/2015", "MDY", undefined, "2015-07-20"],
    ["21.01.2016", "DMY", "13:46", "2016-01-21T13:46:00"],
    ["2016/01/21", undefined, undefined, "2016-01-21"],
  ] as const)("parseDateTimeText(%j, %s, time %j) = %s", (text, order, time, iso) => {
    expect(parseDateTimeText(text, order, time)?.iso).toBe(iso);
  });

  it("parseDateTimeText() applies the mapping time zone to zone-less times and converts to UTC", () => {
    expect(parseDateTimeText("2016-01-21", "MDY", "13:46", "+01:00")?.iso).toBe("2016-01-21T12:46:00Z");
  });

  it.each(["2/30/2016", "13/13/2016", "2016-02-30", "hello", "2016-01-21T25:00", "1/2"])(
    "parseDateTimeText(%j) is undefined (no such date)",
    (t) => {
      expect(parseDateTimeText(t, "MDY")).toBeUndefined();
    },
  );

  it("parseTimeOfDay() reads HMM, HHMM, HH:MM, HH:MM:SS and rejects 2460", () => {
    expect(parseTimeOfDay("804")).toBe("08:04:00");
    expect(parseTimeOfDay("0804")).toBe("08:04:00");
    expect(parseTimeOfDay("1346")).toBe("13:46:00");
    expect(parseTimeOfDay("13:46")).toBe("13:46:00");
    expect(parseTimeOfDay("13:46:05")).toBe("13:46:05");
    expect(parseTimeOfDay("2460")).toBeUndefined();
    expect(parseTimeOfDay("7:61")).toBeUndefined();
  });

  it("detectDateOrder() decides from a day > 12 and leaves ambiguous samples undecided", () => {
    expect(detectDateOrder(["1/21/16", "2/3/16"])).toBe("MDY");
    expect(detectDateOrder(["21/1/2016"])).toBe("DMY");
    expect(detectDateOrder(["2016/1/21"])).toBe("YMD");
    expect(detectDateOrder(["1/2/2016", "3/4/2016"])).toBeUndefined();
  });

  it("expandTwoDigitYear() uses the POSIX %y pivot (69–99 → 19xx, 00–68 → 20xx; common practice)", () => {
    expect(expandTwoDigitYear(16)).toBe(2016);
    expect(expandTwoDigitYear(68)).toBe(2068);
    expect(expandTwoDigitYear(69)).toBe(1969);
  });
});
