/**
 * Parity of the CLI and the dashboard worker: the same inputs go through `brackline analyze` and
 * through the worker's API object (createWorkerApi, exposed with Comlink over a MessageChannel as the
 * browser worker exposes it) and must give identical station km, classes, C*₀ and intervals
 * (common practice: one input-to-results API, analysis/workspace, under both).
 */
import { mkdtempSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { proxy } from "comlink";
import { main } from "../../../cli/main.ts";
import type { AnalysisEvent, AnalysisJob, SourceFile, TextFile } from "../../../dashboard/src/worker/protocol.ts";
import { Settings } from "../../../dashboard/src/state/settings.svelte.ts";
import { readSurveyText, type SurveyAnalysis } from "../../../analysis/index.ts";
import { cfVariable, PRACTICAL_SALINITY, writeCfStationFile } from "../../io/helpers/cfStationFile.ts";
import { comlinkWorker } from "./helpers/comlinkWorker.ts";

const demo = (p: string) => readFileSync(new URL(`../../../data-demo/${p}`, import.meta.url), "utf8");
const dir = mkdtempSync(join(tmpdir(), "brackline-parity-"));

const worker = comlinkWorker();

/** The invented wet-season demo survey as rows of its CSV (no quoted fields in the demo files). */
function wetRows(): Array<Record<string, string>> {
  const [head, ...lines] = demo("surveys/wet-2025-03.csv").trim().split("\n");
  const keys = head!.split(",");
  return lines.map((l) => Object.fromEntries(l.split(",").map((v, i) => [keys[i]!, v])));
}

/** The wet demo survey as GeoJSON points (RFC 7946): position in the geometry, the rest as properties. */
function wetGeoJson(): string {
  return JSON.stringify({
    type: "FeatureCollection",
    features: wetRows().map(({ latitude, longitude, ...rest }) => ({
      type: "Feature",
      geometry: { type: "Point", coordinates: [Number(longitude), Number(latitude)] },
      properties: rest,
    })),
  });
}

/** The wet demo survey's salinity, Mn and Ba as a CF-netCDF station file (CF 1.11 timeSeries, one time per station). */
function wetNetcdf(): Uint8Array {
  const rows = wetRows();
  const num = (k: string) => rows.map((r) => Number(r[k]));
  return writeCfStationFile({
    featureType: "timeSeries",
    stations: {
      names: rows.map((r) => r["station"]!),
      timeDays: rows.map((_, i) => 0.4 + i * 0.01),
      timeUnits: "days since 2025-03-18 00:00:00",
      latDeg: num("latitude"),
      lonDeg: num("longitude"),
    },
    vars: [
      cfVariable("PSAL", ["station"], "double", PRACTICAL_SALINITY, num("salinity")),
      cfVariable("Mn", ["station"], "double", { units: "nmol/L" }, num("Mn (nmol/L)")),
      cfVariable("Ba", ["station"], "double", { units: "nmol/L" }, num("Ba (nmol/L)")),
    ],
  });
}

/** The demo centerline reversed, its mouth now at the last vertex, said only by `properties.mouth: "end"`. */
function mouthAtEnd(): string {
  const fc = JSON.parse(demo("centerline.geojson")) as {
    features: Array<{ geometry: { type: string; coordinates: unknown[] }; properties: Record<string, unknown> }>;
  };
  const features = fc.features
    .filter((f) => f.geometry.type !== "Point")
    .map((f) =>
      f.properties["role"] === "main" || fc.features.indexOf(f) === 0
        ? {
            ...f,
            properties: { ...f.properties, mouth: "end" },
            geometry: { ...f.geometry, coordinates: [...f.geometry.coordinates].reverse() },
          }
        : f,
    );
  return JSON.stringify({ ...fc, features });
}

interface Case {
  name: string;
  surveys: SourceFile[];
  /** Absent: both build the centerline from the station positions (one decision in readInputs). */
  centerline?: TextFile;
}

const line = { name: "centerline.geojson", text: demo("centerline.geojson") };
const CASES: Case[] = [
  {
    name: "the demo (both surveys, demo centerline)",
    surveys: [{ name: "both-surveys.csv", text: demo("surveys/both-surveys.csv") }],
    centerline: line,
  },
  { name: "a GeoJSON point survey", surveys: [{ name: "wet-points.geojson", text: wetGeoJson() }], centerline: line },
  { name: "a netCDF survey", surveys: [{ name: "wet-stations.nc", bytes: wetNetcdf() }], centerline: line },
  {
    name: 'a centerline marked properties.mouth "end"',
    surveys: [{ name: "wet-2025-03.csv", text: demo("surveys/wet-2025-03.csv") }],
    centerline: { name: "reversed.geojson", text: mouthAtEnd() },
  },
  {
    name: "no centerline (both use the centerline built from the stations, with the same notice)",
    surveys: [{ name: "wet-2025-03.csv", text: demo("surveys/wet-2025-03.csv") }],
  },
];

/** What must agree: per survey, station km and per constituent class, C*₀ and interval bounds. */
function essentials(analyses: Array<Pick<SurveyAnalysis, "survey" | "stations" | "constituents">>) {
  return analyses.map((a) => ({
    survey: a.survey.name,
    km: a.stations.map((s) => [s.id, s.alongChannelKm ?? null]),
    constituents: a.constituents.map((c) => ({
      name: c.name,
      class: c.class,
      effectiveEndmember: c.effectiveEndmember ?? null,
      percentChange: c.percentChange ?? null,
    })),
  }));
}

async function viaCli(c: Case): Promise<ReturnType<typeof essentials>> {
  const paths = c.surveys.map((f) => {
    const p = join(dir, f.name);
    writeFileSync(p, "text" in f ? f.text : f.bytes);
    return p;
  });
  const lineArgs: string[] = [];
  if (c.centerline) {
    const linePath = join(dir, c.centerline.name);
    writeFileSync(linePath, c.centerline.text);
    lineArgs.push("--centerline", linePath);
  }
  let out = "";
  const code = await main(["analyze", ...paths, ...lineArgs], { out: (t) => (out += t), err: () => {} });
  expect(code).toBe(0);
  const doc = JSON.parse(out) as {
    surveys: Array<SurveyAnalysis["survey"] & Pick<SurveyAnalysis, "stations" | "constituents">>;
  };
  return essentials(doc.surveys.map((s) => ({ survey: s, stations: s.stations, constituents: s.constituents })));
}

async function viaWorker(c: Case, notices: string[] = [], job?: AnalysisJob): Promise<ReturnType<typeof essentials>> {
  const analyses: SurveyAnalysis[] = [];
  const errors: string[] = [];
  // Events come back on the callback's own channel, so wait for "done" rather than for run() itself.
  await new Promise<void>((resolve) => {
    void worker.run(
      job ?? {
        kind: "load",
        surveys: c.surveys,
        ...(c.centerline ? { centerline: c.centerline } : {}),
        settings: new Settings().analysis,
      },
      proxy((e: AnalysisEvent) => {
        if (e.type === "loaded") notices.push(...(e.notices ?? []).map((n) => n.code));
        if (e.type === "analysis") analyses[e.surveyIndex] = e.analysis;
        if (e.type === "error") errors.push(e.message);
        if (e.type === "done") resolve();
      }),
    );
  });
  expect(errors).toEqual([]);
  // JSON round trip as the CLI's output takes (undefined fields dropped).
  return JSON.parse(JSON.stringify(essentials(analyses))) as ReturnType<typeof essentials>;
}

describe("CLI and dashboard worker parity (one input-to-results API)", () => {
  for (const c of CASES) {
    it(`${c.name}: identical station km, classes, C*₀ and intervals`, async () => {
      const [cli, dash] = [await viaCli(c), await viaWorker(c)];
      expect(cli.length).toBeGreaterThan(0);
      expect(cli.some((s) => s.km.some(([, km]) => km !== null))).toBe(true);
      expect(dash).toEqual(cli);
    });
  }

  it('the "end" mouth puts the seaward station near km 0 in both (mouth read from properties.mouth)', async () => {
    const c = CASES[3]!;
    const [cli, dash] = [await viaCli(c), await viaWorker(c)];
    const kmOf = (r: ReturnType<typeof essentials>, id: string) => r[0]!.km.find(([s]) => s === id)?.[1] as number;
    // W01 is the saltiest, seaward station of the invented wet survey.
    expect(kmOf(cli, "W01")).toBeLessThan(kmOf(cli, "W25") ?? Infinity);
    expect(kmOf(dash, "W01")).toBe(kmOf(cli, "W01"));
  });

  it("without a centerline both place every station by the station-built line and say so; an import (surveys already read) too", async () => {
    const c = CASES[4]!;
    const notices: string[] = [];
    const [cli, dash] = [await viaCli(c), await viaWorker(c, notices)];
    expect(notices).toContain("centerlineFromStations");
    const placed = cli[0]!.km.filter(([, km]) => km !== null);
    expect(placed.length).toBe(cli[0]!.km.length);
    expect(dash).toEqual(cli);
    // The dashboard's import path: surveys read in the reading worker, sent with setSurveys.
    const surveys = readSurveyText(demo("surveys/wet-2025-03.csv"), { fileName: "wet-2025-03.csv" }).surveys;
    const imported: string[] = [];
    const viaImport = await viaWorker(c, imported, { kind: "setSurveys", surveys, settings: new Settings().analysis });
    expect(imported).toContain("centerlineFromStations");
    expect(viaImport).toEqual(cli);
  });
});
