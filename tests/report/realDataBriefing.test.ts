/**
 * `brackline report` on a raw cruise export as a new user runs it: no centerline (the line built from
 * the stations is used, as by analyze and the dashboard), a station table, unit-less nutrients.
 */
import { mkdtempSync, readFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { main } from "../../cli/main.ts";
import { readIfExists, sharedData } from "../io/helpers/paths.ts";

// Real data, read at test time (never copied into the repository): USGS San Francisco Bay water-quality
// cruises (public domain; Schraga & Cloern 2017, Sci. Data 4:170098), ../shared/data/usgs-sfbay-2016-2022/SOURCE.md.
const bay = path.join(sharedData, "usgs-sfbay-2016-2022");
const FILE = path.join(bay, "2018SanFranciscoBayWaterQualityData.csv");
const TABLE = path.join(bay, "USGSSFBayStations_from_xlsx.csv");
const present = [FILE, TABLE].every((f) => readIfExists(f) !== undefined);
if (!present) console.warn(`${bay} absent (../shared not mounted): real-data briefing test skipped`);

/** The four nutrients of the 2016–2019 headers, in µmol/L (SOURCE.md). */
const UNITS = ["Silicate", "Nitrate_+_Nitrite", "Phosphate", "Ammonium"].flatMap((c) => ["--unit", `${c}=µmol/L`]);

describe.skipIf(!present)("brackline report on the 2018 San Francisco Bay cruise export", () => {
  it("needs no centerline, lists the station table in the provenance and dates the archive figures by month", async () => {
    const out = path.join(mkdtempSync(path.join(tmpdir(), "brackline-bay-brief-")), "briefing.html");
    let err = "";
    const code = await main(["report", FILE, "--stations", TABLE, ...UNITS, "--draws", "40", "--out", out], {
      out: () => undefined,
      err: (t) => (err += `${t}\n`),
    });
    expect(code, err).toBe(0);
    expect(err).toMatch(/No centerline given: one was built from the station positions/);
    const html = readFileSync(out, "utf8");
    expect(html).toMatch(/USGSSFBayStations_from_xlsx\.csv<\/td>\s*<td>station table<\/td>/);
    expect(html).toMatch(/a line built from the station positions/);
    // One year of surveys: month ticks on the date axes, not "2018" repeated.
    const ticks = [...html.matchAll(/<text\s+class="tick"[^>]*>([^<]+)<\/text/g)].map((m) => m[1]!.trim());
    expect(ticks).toContain("April");
    expect(ticks.filter((t) => t === "2019").length).toBeLessThanOrEqual(6);
    expect(html).not.toMatch(/>2000</);
  }, 120_000);
});
