import { readFileSync, readdirSync, statSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { buildChannelNetwork } from "../../analysis/geometry/buildNetwork.ts";
import type { CenterlineGeoJson } from "../../analysis/geometry/geojsonInput.ts";
import { centerlinePlausibility, centerlineVertices } from "../../analysis/geometry/centerlinePlausibility.ts";
import { readSurveyText } from "../../analysis/io/readSurvey.ts";
import { DEMO_SURVEY } from "./generators/surveys.ts";
import { demoLine, malformedCenterline, swappedCenterline, DEMO_CENTERLINE } from "./generators/centerlines.ts";
import { seeded } from "./generators/random.ts";
import { cases, LARGE } from "./scale.ts";

const demoStations = readSurveyText(DEMO_SURVEY, { fileName: "wet.csv" }).surveys.flatMap((s) =>
  s.stations.flatMap((st) => (st.lonLat ? [st.lonLat] : [])),
);

describe("fuzz: malformed centerlines", () => {
  const N = cases(200);
  it(`${N} seeded malformed centerlines: buildChannelNetwork() returns or throws RangeError/TypeError (exit 2), nothing else`, () => {
    const r = seeded(45);
    const bad: string[] = [];
    for (let n = 0; n < N; n += 1) {
      const g = malformedCenterline(r);
      try {
        buildChannelNetwork(g as CenterlineGeoJson);
      } catch (e) {
        if (!(e instanceof RangeError || e instanceof TypeError)) bad.push(`#${n} ${String(e)}`);
      }
      expect(() => centerlinePlausibility(centerlineVertices(g), demoStations)).not.toThrow();
    }
    expect(bad.slice(0, 10)).toEqual([]);
  });

  it("item 6: a centerline written as [lat, lon] is an error, the demo line is plausible (RFC 7946 §3.1.1 position order)", () => {
    expect(centerlinePlausibility(centerlineVertices(DEMO_CENTERLINE), demoStations)).toBeUndefined();
    const p = centerlinePlausibility(centerlineVertices(swappedCenterline()), demoStations);
    expect(p?.severity).toBe("error");
    expect(p?.medianDistanceKm).toBeGreaterThan(1000);
  });

  it("stations far from a line that swapping does not bring closer give a warning", () => {
    const shifted = demoLine().map(([x, y]) => [x + 3, y] as [number, number]);
    expect(centerlinePlausibility(shifted, demoStations)?.severity).toBe("warning");
  });

  it(`item 5: a ${LARGE ? "1,000,000" : "130,000"}-vertex centerline builds a network (no argument-spread stack overflow)`, () => {
    const line = demoLine();
    const n = LARGE ? 1_000_000 : 130_000;
    const per = Math.ceil(n / (line.length - 1));
    const dense: [number, number][] = [];
    for (let i = 0; i + 1 < line.length; i += 1) {
      const [a, b] = [line[i] as [number, number], line[i + 1] as [number, number]];
      for (let k = 0; k < per; k += 1) dense.push([a[0] + ((b[0] - a[0]) * k) / per, a[1] + ((b[1] - a[1]) * k) / per]);
    }
    dense.push(line[line.length - 1] as [number, number]);
    const net = buildChannelNetwork({ type: "LineString", coordinates: dense });
    expect(net).toBeDefined();
    expect(centerlinePlausibility(dense, demoStations)).toBeUndefined();
  });
});

/** Source files of the three programs (analysis core, CLI, dashboard). */
function sources(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const p = join(dir, name);
    if (statSync(p).isDirectory()) return name === "node_modules" ? [] : sources(p);
    return /\.(ts|svelte)$/.test(name) ? [p] : [];
  });
}

describe("item 5: large inputs never pass an array as call arguments", () => {
  // Arrays of a fixed small size (two-element ranges, a handful of species) may still be spread.
  const SMALL_ONLY = [
    "analysis/survey/arrayExtent.ts",
    "analysis/seawater/cdSeries.ts",
    "analysis/seawater/feHydrolysis.ts",
    "dashboard/src/panels/MixingPlot.svelte",
  ];
  it("no Math.min(...x) / Math.max(...x) / fn.apply(null, x) over data-sized arrays in analysis/, cli/, dashboard/src/", () => {
    const bad: string[] = [];
    for (const f of [...sources("analysis"), ...sources("cli"), ...sources("dashboard/src")]) {
      if (SMALL_ONLY.some((s) => f.endsWith(s))) continue;
      readFileSync(f, "utf8")
        .split("\n")
        .forEach((line, i) => {
          if (
            /Math\.(min|max)\(\s*\.\.\.|\.apply\(\s*(null|Math|undefined)\s*,|String\.fromCharCode\(\s*\.\.\./.test(
              line,
            )
          )
            bad.push(`${f}:${i + 1}: ${line.trim()}`);
        });
    }
    expect(bad).toEqual([]);
  });
});
