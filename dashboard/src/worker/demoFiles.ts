/**
 * The invented demo estuary's files, bundled at build time so the dashboard works offline, and how
 * they are read: by the page (lib/demoData.ts, every file) and by the analysis worker at a first visit
 * (earlyJob.ts, the survey and centerline files only), so both send the analysis the same files.
 * Files are picked up by glob so the app still builds while a file is missing; the app then shows
 * what is there and says what is absent.
 */
import type { TextFile } from "./protocol.ts";

export interface DemoBundle {
  /** Survey CSV files, sorted by name. */
  surveys: TextFile[];
  /** Channel centerline GeoJSON text, when present. */
  centerline?: TextFile;
  /** Basemap GeoJSON text (water, land, marsh, place labels), when present. */
  basemap?: TextFile;
}

/** The demo's file holding every survey; when present it is read alone (the others repeat it). */
const ALL_SURVEYS_FILE = "both-surveys.csv";

/**
 * The built dashboard ships the files as data files beside the JavaScript (Vite `?url` assets,
 * fetched; index.html preloads the ones read, see dashboard/demoPreload.ts), not as strings inside a
 * chunk. The dev server and the unit tests take the text inlined (`?raw`).
 */
const rawSurveys = import.meta.glob("../../../data-demo/surveys/*.csv", {
  query: "?raw",
  import: "default",
  eager: true,
}) as Record<string, string>;

const rawGeojson = import.meta.glob("../../../data-demo/*.geojson", {
  query: "?raw",
  import: "default",
  eager: true,
}) as Record<string, string>;

const surveyUrls = import.meta.glob("../../../data-demo/surveys/*.csv", {
  query: "?url",
  import: "default",
  eager: true,
}) as Record<string, string>;

const geojsonUrls = import.meta.glob("../../../data-demo/*.geojson", {
  query: "?url",
  import: "default",
  eager: true,
}) as Record<string, string>;

/** Fetches the text of every file in `urls`; a file that cannot be fetched is left out (and reported as absent). */
async function fetchAll(
  urls: Record<string, string>,
  wanted: (path: string) => boolean,
): Promise<Record<string, string>> {
  const entries = Object.entries(urls).filter(([path]) => wanted(path));
  const texts = await Promise.all(
    entries.map(async ([path, url]) => {
      const response = await fetch(url).catch(() => undefined);
      return response?.ok ? ([path, await response.text()] as const) : undefined;
    }),
  );
  return Object.fromEntries(texts.filter((t) => t !== undefined));
}

function baseName(path: string): string {
  return path.slice(path.lastIndexOf("/") + 1);
}

/** Survey files read: the combined file alone when it is there (the others repeat it), else all. */
function surveyWanted(path: string): boolean {
  return !Object.keys(surveyUrls).some((p) => baseName(p) === ALL_SURVEYS_FILE) || baseName(path) === ALL_SURVEYS_FILE;
}

function pick(files: Record<string, string>, name: string): TextFile | undefined {
  for (const [path, text] of Object.entries(files)) {
    if (baseName(path) === name) return { name, text };
  }
  return undefined;
}

/**
 * Reads the demo's files: the surveys, the centerline and, unless `basemap` is false, the basemap.
 * Fetched in the built dashboard, inlined in the dev server and tests.
 */
export async function readDemoFiles(options: { basemap?: boolean } = {}): Promise<DemoBundle> {
  const geojsonWanted = (path: string) => options.basemap !== false || baseName(path) !== "basemap.geojson";
  const [surveyFiles, geojsonFiles] = import.meta.env.PROD
    ? await Promise.all([fetchAll(surveyUrls, surveyWanted), fetchAll(geojsonUrls, geojsonWanted)])
    : [rawSurveys, rawGeojson];
  const all = Object.entries(surveyFiles)
    .map(([path, text]) => ({ name: baseName(path), text }))
    .sort((a, b) => a.name.localeCompare(b.name));
  const combined = all.find((f) => f.name === ALL_SURVEYS_FILE);
  return {
    surveys: combined ? [combined] : all,
    centerline: pick(geojsonFiles, "centerline.geojson"),
    ...(options.basemap !== false ? { basemap: pick(geojsonFiles, "basemap.geojson") } : {}),
  };
}
