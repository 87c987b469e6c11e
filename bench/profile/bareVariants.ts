// What the shared work of a cold start costs: the bare MapLibre + deck.gl page as it was before the
// dashboard drew its channel with MapLibre (basemap, channel as a deck.gl PathLayer, points as a deck.gl
// ScatterplotLayer; `mlChannel` gives today's bench/fixtures/bareMap.ts) built once with switches read from its URL, each variant loaded in a freshly launched Chromium (the
// bench's flags), variants in rotating order over N rounds, medians. Not a bench row: a tool to see which
// part of the bare page's own time (worker start, deck.gl's context, style layers, pixel ratio) a
// change to both pages could save.
// Usage: npx tsx bench/profile/bareVariants.ts [--runs N] [VARIANT ...]
//   a variant is a query string of switches, e.g. "" (no switch), "mlChannel", "prewarm", "aa=0&interleaved"
//   switches: prewarm (MapLibre's workers before the map), aa=0 (deck.gl without multisampling),
//   interleaved (deck.gl in MapLibre's context; deck.gl 9.4's @deck.gl/mapbox reads map.transform, which
//   MapLibre 6 removed, so the probe stands in for it), nodeck, nooutline (water without fill-outline-color),
//   nolabels (no symbol layers), pdb0 (MapLibre's canvas without preserveDrawingBuffer), nodots (no circle layer), pr=X (canvas pixel ratio),
//   deckOnLoad (deck.gl's layers from the map's load), deckLayers=path|scatter|none (one deck.gl layer or none),
//   scatter4 / scatter4fn (four point layers as the dashboard's, accessors partly constants / all functions),
//   scatter1 (the same points in one layer),
//   mlChannel (the channel as a MapLibre line layer, no deck.gl PathLayer),
//   lineLayer (the channel as deck.gl LineLayer segments instead of a PathLayer)
import { mkdtempSync, rmSync } from "node:fs";
import { loadavg, tmpdir } from "node:os";
import { join } from "node:path";
import { launchChromium } from "../../tests/e2e/browser.ts";
import { REPO } from "../fixtures/dashboardDist.ts";
import { serveStaticPage } from "../fixtures/staticPage.ts";
import { browserCpuS, threadCpuMs } from "./browserCpu.ts";

const MAIN = `
import * as maplibregl from "maplibre-gl";
import workerUrl from "maplibre-gl/dist/maplibre-gl-worker.mjs?url";
import "maplibre-gl/dist/maplibre-gl.css";
import { MapboxOverlay } from "@deck.gl/mapbox";
import { LineLayer, PathLayer, ScatterplotLayer } from "@deck.gl/layers";
import { buildStyle } from "${REPO}/dashboard/src/map/style.ts";
import basemapText from "${REPO}/data-demo/basemap.geojson?raw";
import centerlineText from "${REPO}/data-demo/centerline.geojson?raw";
const q = new URLSearchParams(location.search);
maplibregl.setWorkerUrl(workerUrl);
if (q.has("prewarm")) maplibregl.prewarm();
const basemap = JSON.parse(basemapText);
const lines = JSON.parse(centerlineText).features.filter((f) => f.geometry.type === "LineString").map((f) => f.geometry.coordinates);
const pts = lines.flat();
const lons = pts.map((p) => p[0]);
const lats = pts.map((p) => p[1]);
const style = buildStyle({ basemap });
if (q.has("nooutline")) for (const l of style.layers) if (l.paint) delete l.paint["fill-outline-color"];
if (q.has("nolabels")) style.layers = style.layers.filter((l) => l.type !== "symbol");
if (q.has("nodots")) style.layers = style.layers.filter((l) => l.type !== "circle");
// the channel as a MapLibre line layer (its line program is the shoreline's) instead of a deck.gl PathLayer
if (q.has("mlChannel")) {
  style.sources.channel = { type: "geojson", data: { type: "FeatureCollection", features: lines.map((c) => ({ type: "Feature", properties: {}, geometry: { type: "LineString", coordinates: c } })) } };
  const at = style.layers.findIndex((l) => l.type === "symbol");
  style.layers.splice(at, 0, { id: "channel", type: "line", source: "channel", layout: { "line-join": "round" }, paint: { "line-color": "rgba(52, 84, 102, 0.9)", "line-width": 2.5 } });
}
const pr = q.has("pr") ? Number(q.get("pr")) : undefined;
const map = new maplibregl.Map({
  container: "map",
  style,
  bounds: [[Math.min(...lons), Math.min(...lats)], [Math.max(...lons), Math.max(...lats)]],
  fitBoundsOptions: { padding: 48 },
  attributionControl: false,
  canvasContextAttributes: { preserveDrawingBuffer: !q.has("pdb0") },
  fadeDuration: 0,
  ...(pr ? { pixelRatio: pr } : {}),
});
const only = q.get("deckLayers"); // path | scatter | none: one of the two deck.gl layers, or neither
const segments = lines.flatMap((l) => l.slice(1).map((p, i) => [l[i], p]));
const scatterMix = (fn) => {
  const c = (v) => (fn ? () => v : v);
  const p = pts.filter((_, i) => i % 10 === 0);
  return [
    new ScatterplotLayer({ id: "ticks", data: p.slice(0, 20), getPosition: (d) => d, getRadius: (_, { index }) => (index % 5 ? 2 : 3.5), radiusUnits: "pixels", getFillColor: c([52, 84, 102, 230]) }),
    new ScatterplotLayer({ id: "iso", data: p.slice(20, 30), getPosition: (d) => d, getRadius: c(5), radiusUnits: "pixels", stroked: true, filled: true, getFillColor: c([250, 250, 247, 235]), getLineColor: c([20, 110, 140, 255]), getLineWidth: c(2), lineWidthUnits: "pixels" }),
    new ScatterplotLayer({ id: "stations", data: p, getPosition: (d) => d, getRadius: (_, { index }) => 6 + (index % 2), radiusUnits: "pixels", stroked: true, getFillColor: (_, { index }) => [index % 255, 90, 120, 255], getLineColor: (_, { index }) => (index % 3 ? [33, 41, 48, 255] : [255, 255, 255, 220]), getLineWidth: (_, { index }) => 1 + (index % 2), lineWidthUnits: "pixels" }),
    new ScatterplotLayer({ id: "maximum", data: p.slice(5, 6), getPosition: (d) => d, getRadius: c(14), radiusUnits: "pixels", stroked: true, filled: false, getLineColor: c([150, 60, 0, 255]), getLineWidth: c(3), lineWidthUnits: "pixels" }),
  ];
};
const layers = () => [
  ...(q.has("lineLayer") ? [new LineLayer({ id: "channel-segments", data: segments, getSourcePosition: (s) => s[0], getTargetPosition: (s) => s[1], getColor: [52, 84, 102], getWidth: 2.5, widthUnits: "pixels" })] : []),
  ...((only === null && !q.has("lineLayer") && !q.has("mlChannel")) || only === "path" ? [new PathLayer({ id: "channel", data: lines, getPath: (p) => p, getColor: [52, 84, 102], getWidth: 2.5, widthUnits: "pixels" })] : []),
  // the dashboard's mix of point layers: some accessors constants, some functions (scatter4), or all functions (scatter4fn)
  ...(q.has("scatter4") || q.has("scatter4fn") ? scatterMix(q.has("scatter4fn")) : []),
  ...(q.has("scatter1") ? [new ScatterplotLayer({ id: "merged", data: pts.filter((_, i) => i % 5 === 0), getPosition: (d) => d, getRadius: (_, { index }) => 3 + (index % 4), radiusUnits: "pixels", stroked: true, getFillColor: (_, { index }) => [index % 255, 90, 120, 255], getLineColor: (_, { index }) => (index % 3 ? [33, 41, 48, 255] : [255, 255, 255, 220]), getLineWidth: (_, { index }) => 1 + (index % 2), lineWidthUnits: "pixels" })] : []),
  ...(only === null || only === "scatter" ? [new ScatterplotLayer({ id: "points", data: pts.filter((_, i) => i % 10 === 0), getPosition: (p) => p, getRadius: 6, radiusUnits: "pixels", getFillColor: [30, 60, 90] })] : []),
];
// deck.gl 9.4's interleaved mode reads map.transform, which MapLibre 6 removed: a stand-in for the probe
if (q.has("interleaved") && !("transform" in map))
  Object.defineProperty(map, "transform", { get: () => ({ height: map.getCanvas().clientHeight, elevation: 0 }) });
if (!q.has("nodeck")) {
  const overlay = new MapboxOverlay({
    interleaved: q.has("interleaved"),
    ...(q.get("aa") === "0" ? { deviceProps: { webgl: { antialias: false } } } : {}),
    ...(pr ? { useDevicePixels: pr } : {}),
    layers: q.has("deckOnLoad") ? [] : layers(),
  });
  map.addControl(overlay);
  if (q.has("deckOnLoad")) map.once("load", () => overlay.setProps({ layers: layers() }));
}
window.__brackline = { map };
map.once("load", () => map.once("idle", () => (document.body.dataset.ready = "true")));
`;

const HTML = `<!doctype html><html><head><meta charset="utf-8"><title>bare map variants</title>
<style>html,body,#map{margin:0;height:100%}</style></head>
<body><div id="map"></div><script type="module" src="./main.js"></script></body></html>`;

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;
const argv = process.argv.slice(2);
const runsAt = argv.indexOf("--runs");
const runs = runsAt >= 0 ? Number(argv[runsAt + 1]) : 3;
const variants = argv.filter((a, i) => !a.startsWith("--") && (runsAt < 0 || i !== runsAt + 1));
if (variants.length === 0) variants.push("", "prewarm");

/** One cold load of the page with `query` in a fresh Chromium: ms to ready, CPU ms of all its processes meanwhile. */
async function coldLoad(url: string): Promise<{ ms: number; cpuMs: number; threads: Map<string, number> }> {
  const profile = mkdtempSync(join(tmpdir(), "brackline-variants-"));
  const context = await launchChromium(profile);
  try {
    const page = context.pages()[0] ?? (await context.newPage());
    page.on("pageerror", (e) => console.log(`page error (${url}): ${e.message}`));
    const cpu0 = browserCpuS(profile);
    const threads0 = threadCpuMs(profile);
    await page.goto(url, { waitUntil: "load" });
    const h = await page.waitForFunction(
      () => (document.body.dataset.ready === "true" ? performance.now() : false),
      undefined,
      { polling: "raf", timeout: 60_000 },
    );
    const ms = (await h.jsonValue()) as number;
    const threads = threadCpuMs(profile);
    for (const [k, v] of threads0) threads.set(k, (threads.get(k) ?? 0) - v);
    return { ms, cpuMs: (browserCpuS(profile) - cpu0) * 1000, threads };
  } finally {
    await context.close();
    rmSync(profile, { recursive: true, force: true });
  }
}

const page = await serveStaticPage("bare variants", HTML, MAIN);
if (argv.includes("--serve")) {
  // keep the page served for a look by hand (Ctrl-C ends)
  console.log(page.url);
  await new Promise(() => undefined);
}
const results = new Map<string, Array<{ ms: number; cpuMs: number; threads: Map<string, number> }>>(
  variants.map((v) => [v, []]),
);
/** Thread groups summed for the table: the software GPU's threads, the renderer's main thread, workers. */
const GROUPS: Array<[string, RegExp]> = [
  ["gpu main", /^gpu-process\/chromium$/],
  ["gpu pool", /^gpu-process\/ThreadPoolForeg$/],
  ["gpu raster", /^gpu-process\/Thread<\d+>$/],
  ["renderer main", /^renderer\/chromium$/],
  ["workers", /^renderer\/DedicatedWorker$/],
];
try {
  for (let i = 0; i < runs; i++) {
    // rotate the order each round so no variant always follows the same one
    const order = variants.map((_, k) => variants[(k + i) % variants.length]!);
    const parts: string[] = [];
    for (const v of order) {
      const r = await coldLoad(`${page.url}?${v}`);
      results.get(v)!.push(r);
      parts.push(`${v || "(bare)"} ${r.ms.toFixed(0)} (cpu ${r.cpuMs.toFixed(0)})`);
    }
    console.log(
      `round ${i + 1}: ${parts.join(", ")}; load ${loadavg()
        .map((l) => l.toFixed(1))
        .join(" ")}`,
    );
  }
  const base = median(results.get(variants[0]!)!.map((r) => r.ms));
  const baseCpu = median(results.get(variants[0]!)!.map((r) => r.cpuMs));
  console.log(`medians, CPU ms since navigation (${GROUPS.map(([g]) => g).join(", ")})`);
  for (const v of variants) {
    const rs = results.get(v)!;
    const m = median(rs.map((r) => r.ms));
    const c = median(rs.map((r) => r.cpuMs));
    const groups = GROUPS.map(([, re]) =>
      median(rs.map((r) => [...r.threads].filter(([k]) => re.test(k)).reduce((a, [, ms]) => a + ms, 0))).toFixed(0),
    );
    console.log(
      `${(v || "(bare)").padEnd(30)} ${m.toFixed(0)} ms ${(m / base).toFixed(2)}×, cpu ${c.toFixed(0)} ms ${(c / baseCpu).toFixed(2)}× (${groups.join(", ")})`,
    );
  }
} finally {
  page.close();
}
