// The dashboard's trimmed proj4 (dashboard/proj4Trim.ts: our list of projections, no WKT or MGRS)
// gives the same coordinates as proj4 as published, for every EPSG code analysis/io/projection.ts
// lists and for UTM zones. Builds analysis/io/projection.ts with Vite and the plugin, then compares.
import { mkdirSync, mkdtempSync, readFileSync, rmSync } from "node:fs";
import { join } from "node:path";
import { pathToFileURL } from "node:url";
import { build } from "vite";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { EPSG_DEFINITIONS, projectedToLonLat } from "../../../analysis/io/projection.ts";
import { proj4Trim } from "../../../dashboard/proj4Trim.ts";
import { expectWithin } from "../../helpers/tolerance.ts";

const REPO = join(import.meta.dirname, "..", "..", "..");
let dir = "";
let trimmed: typeof projectedToLonLat;

beforeAll(async () => {
  const cache = join(REPO, "node_modules", ".cache");
  mkdirSync(cache, { recursive: true });
  dir = mkdtempSync(join(cache, "brackline-proj4trim-"));
  await build({
    configFile: false,
    logLevel: "silent",
    plugins: [proj4Trim],
    build: {
      outDir: dir,
      emptyOutDir: true,
      minify: false,
      lib: { entry: join(REPO, "analysis", "io", "projection.ts"), formats: ["es"], fileName: "projection" },
    },
  });
  ({ projectedToLonLat: trimmed } = (await import(pathToFileURL(join(dir, "projection.js")).href)) as {
    projectedToLonLat: typeof projectedToLonLat;
  });
}, 120_000);

afterAll(() => rmSync(dir, { recursive: true, force: true }));

/** A point near the middle of each grid's area of use (easting, northing [m]); common practice. */
const SAMPLE_XY: Record<number, [number, number]> = {
  27700: [530_000, 180_000],
  2154: [650_000, 6_860_000],
  3035: [4_000_000, 3_000_000],
  3857: [-13_600_000, 4_550_000],
  28992: [120_000, 480_000],
  2193: [1_750_000, 5_900_000],
  3577: [1_000_000, -3_000_000],
  32633: [500_000, 5_000_000],
  32756: [330_000, 6_250_000],
  25832: [500_000, 5_500_000],
  26910: [550_000, 4_180_000],
};

describe("dashboard proj4 build (proj4Trim) against proj4 as published", () => {
  it("the build holds our projections and datums only (no Equal Earth, no Potsdam datum, no WKT parser)", () => {
    const code = readFileSync(join(dir, "projection.js"), "utf8");
    expect(code).toContain("Lambert_Azimuthal_Equal_Area");
    expect(code).not.toContain("Equal_Earth");
    expect(code).not.toContain("PROJCRS");
    expect(code).toContain("North_American_Datum_1983");
    expect(code).not.toContain("Potsdam");
  });
  it("every EPSG code of EPSG_DEFINITIONS has a sample point", () => {
    for (const code of Object.keys(EPSG_DEFINITIONS)) expect(SAMPLE_XY[Number(code)]).toBeDefined();
  });
  for (const [code, [x, y]] of Object.entries(SAMPLE_XY)) {
    it(`projectedToLonLat(${x}, ${y}, ${code}) equals the published proj4 result within 1e-12°`, () => {
      const want = projectedToLonLat(x, y, Number(code));
      const got = trimmed(x, y, Number(code));
      expect(want).toBeDefined();
      expectWithin(got![0], want![0], 1e-12, `lon EPSG:${code}`);
      expectWithin(got![1], want![1], 1e-12, `lat EPSG:${code}`);
    });
  }
});
