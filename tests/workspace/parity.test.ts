/**
 * Parity: the same inputs through the CLI (`brackline analyze`) and through the input-to-results API
 * called the way the dashboard worker calls it (bytes + names → readInputs → analyzeInputs) give
 * identical station km, classes, C*0 and intervals. `analyzeLikeWorker` is the one place to point at
 * the worker module once it exposes the API.
 */
import { describe, expect, it } from "vitest";
import { mkdtempSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { basename, join } from "node:path";
import Papa from "papaparse";
import { main } from "../../cli/main.ts";
import { analyzeInputs, readInputs, type InputChoices, type WorkspaceSettings } from "../../analysis/index.ts";
import {
  cfVariable,
  PRACTICAL_SALINITY,
  SILICATE_UMOL_L,
  writeCfStationFile,
  type CfVariableMeta,
} from "../io/helpers/cfStationFile.ts";
import { expectWithin } from "../helpers/tolerance.ts";

const DRAWS = 200;
const SEED = 3;
const dir = mkdtempSync(join(tmpdir(), "brackline-parity-"));
const WET = "data-demo/surveys/wet-2025-03.csv";
const LINE = "data-demo/centerline.geojson";

/** What both sides are compared on. */
interface Essentials {
  stations: Array<{ id: string; km: number | null }>;
  constituents: Array<{ name: string; class: string; c0: (number | null)[]; change: (number | null)[] }>;
}

interface AnalysisLike {
  stations: Array<{ id: string; alongChannelKm?: number }>;
  constituents: Array<{
    name: string;
    class: string;
    effectiveEndmember?: { value: number; lower: number; upper: number };
    percentChange?: { value: number; lower: number; upper: number };
  }>;
}

function essentials(a: AnalysisLike): Essentials {
  const est = (e: { value: number; lower: number; upper: number } | undefined) =>
    e ? [e.value, e.lower, e.upper] : [null, null, null];
  return {
    stations: a.stations.map((s) => ({ id: s.id, km: s.alongChannelKm ?? null })),
    constituents: a.constituents.map((c) => ({
      name: c.name,
      class: c.class,
      c0: est(c.effectiveEndmember),
      change: est(c.percentChange),
    })),
  };
}

/** The dashboard worker's way: file bytes and names, the user's choices, then the analysis settings. */
function analyzeLikeWorker(paths: string[], choices: InputChoices, settings: WorkspaceSettings): Essentials[] {
  const files = paths.map((p) => ({ name: basename(p), content: new Uint8Array(readFileSync(p)) }));
  const inputs = readInputs(files, choices);
  return analyzeInputs(inputs, settings).surveys.map((s) => essentials(s.analysis));
}

async function analyzeWithCli(args: string[]): Promise<Essentials[]> {
  let out = "";
  const code = await main(["analyze", ...args, "--draws", String(DRAWS), "--seed", String(SEED)], {
    out: (t) => (out += t),
    err: () => undefined,
  });
  expect(code).toBe(0);
  return (JSON.parse(out) as { surveys: AnalysisLike[] }).surveys.map(essentials);
}

const rows = Papa.parse<Record<string, string>>(readFileSync(WET, "utf8"), { header: true, skipEmptyLines: true }).data;

/** The demo survey as GeoJSON points (RFC 7946), properties as in the table. */
function geojsonSurvey(): string {
  const features = rows.map((r) => {
    const { latitude, longitude, ...props } = r;
    return {
      type: "Feature",
      geometry: { type: "Point", coordinates: [Number(longitude), Number(latitude)] },
      properties: props,
    };
  });
  const p = join(dir, "wet-points.geojson");
  writeFileSync(p, JSON.stringify({ type: "FeatureCollection", features }));
  return p;
}

/** The demo survey as a CF-netCDF profile file (one depth per station; censored cells as fill values). */
function netcdfSurvey(): string {
  const FILL = -999;
  const num = (t: string | undefined) => (t !== undefined && /^[\d.+-]+$/.test(t.trim()) ? Number(t) : FILL);
  const days = rows.map((r) => Date.parse(r["date_time"]!) / 86_400_000);
  const v = (name: string, column: string, meta: CfVariableMeta) =>
    cfVariable(
      name,
      ["station", "z"],
      "double",
      { ...meta, fill: FILL },
      rows.map((r) => num(r[column])),
    );
  const bytes = writeCfStationFile({
    featureType: "profile",
    stations: {
      names: rows.map((r) => r["station"]!),
      timeDays: days,
      timeUnits: "days since 1970-01-01 00:00:00",
      latDeg: rows.map((r) => Number(r["latitude"])),
      lonDeg: rows.map((r) => Number(r["longitude"])),
    },
    depthsM: [1],
    vars: [
      v("PSAL", "salinity", PRACTICAL_SALINITY),
      v("Mn", "Mn (nmol/L)", { longName: "dissolved manganese", units: "nmol/L" }),
      v("silicate", "Si (µmol/L)", SILICATE_UMOL_L),
    ],
  });
  const p = join(dir, "wet.nc");
  writeFileSync(p, bytes);
  return p;
}

/** The demo centerline with the main line reversed, marked `properties.mouth: "end"`, and no mouth Point. */
function centerlineMouthAtEnd(): string {
  const doc = JSON.parse(readFileSync(LINE, "utf8")) as {
    features: Array<{ geometry: { type: string; coordinates: number[][] }; properties: Record<string, unknown> }>;
  };
  doc.features = doc.features
    .filter((f) => f.geometry.type !== "Point")
    .map((f) =>
      f.properties["role"] === "main"
        ? {
            ...f,
            properties: { ...f.properties, mouth: "end" },
            geometry: { ...f.geometry, coordinates: [...f.geometry.coordinates].reverse() },
          }
        : f,
    );
  const p = join(dir, "centerline-mouth-end.geojson");
  writeFileSync(p, JSON.stringify(doc));
  return p;
}

const SETTINGS: WorkspaceSettings = { bootstrapDraws: DRAWS, seed: SEED };

describe("parity: brackline analyze and the worker's readInputs → analyzeInputs give identical results", () => {
  const cases: Array<[string, () => string[]]> = [
    ["demo survey table with the demo centerline", () => [WET]],
    ["GeoJSON point survey", () => [geojsonSurvey()]],
    ["CF-netCDF survey", () => [netcdfSurvey()]],
  ];
  for (const [label, files] of cases) {
    it(`${label}: identical station km, classes, C*0 and intervals`, async () => {
      const paths = files();
      const cli = await analyzeWithCli([...paths, "--centerline", LINE]);
      const api = analyzeLikeWorker([...paths, LINE], {}, SETTINGS);
      expect(cli.length).toBeGreaterThan(0);
      expect(cli[0]!.stations.filter((s) => s.km !== null).length).toBeGreaterThan(10);
      expect(cli[0]!.constituents.length).toBeGreaterThan(0);
      expect(api).toEqual(cli);
    });
  }

  it("no centerline: the CLI and readInputs' default both use the centerline built from the stations, with the same notice", async () => {
    const cli = await analyzeWithCli([WET]);
    const files = [WET].map((p) => ({ name: basename(p), content: new Uint8Array(readFileSync(p)) }));
    const inputs = readInputs(files, {});
    expect(inputs.notices.map((n) => n.code)).toContain("centerlineFromStations");
    expect(inputs.channel).toBeDefined();
    const api = analyzeInputs(inputs, SETTINGS).surveys.map((s) => essentials(s.analysis));
    expect(cli[0]!.stations.every((s) => s.km !== null)).toBe(true);
    expect(api).toEqual(cli);
    // Only offered when the caller says so (stations then keep no channel position of a line).
    const offered = readInputs(files, { useStationCenterline: false });
    expect(offered.channel).toBeUndefined();
    expect(offered.offeredCenterline).toBeDefined();
  });

  it('a centerline marked properties.mouth "end" (reversed line): identical on both sides and the same km as the original', async () => {
    const line = centerlineMouthAtEnd();
    const cli = await analyzeWithCli([WET, "--centerline", line]);
    const api = analyzeLikeWorker([WET, line], {}, SETTINGS);
    expect(api).toEqual(cli);
    const original = analyzeLikeWorker([WET, LINE], {}, SETTINGS);
    cli[0]!.stations.forEach((s, i) => {
      const o = original[0]!.stations[i]!;
      expect(s.id).toBe(o.id);
      // Same channel, measured from the same end: km agree to the metre (common practice).
      if (s.km !== null && o.km !== null) expectWithin(s.km, o.km, 1e-3, `station ${s.id} km`);
    });
  });
});
