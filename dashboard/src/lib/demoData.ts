/**
 * The invented demo estuary, bundled at build time so the dashboard works
 * offline. Files are picked up by glob so the app still builds while a file is
 * missing; the app then shows what is there and says what is absent.
 */

import type { TextFile } from "../worker/protocol.ts";

export type { TextFile };

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
 * The demo's files. The built dashboard ships them as data files beside the JavaScript (Vite `?url`
 * assets, fetched once when this module loads; index.html preloads the ones read, see
 * dashboard/demoPreload.ts), not as strings inside the main chunk. The dev server and the unit tests
 * take the text inlined (`?raw`). Either way `demoBundle()` stays synchronous.
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

/** Survey files read: the combined file alone when it is there (the others repeat it), else all. */
function surveyWanted(path: string): boolean {
  return !Object.keys(surveyUrls).some((p) => baseName(p) === ALL_SURVEYS_FILE) || baseName(path) === ALL_SURVEYS_FILE;
}

const [surveyFiles, geojsonFiles] = import.meta.env.PROD
  ? await Promise.all([fetchAll(surveyUrls, surveyWanted), fetchAll(geojsonUrls, () => true)])
  : [rawSurveys, rawGeojson];

function baseName(path: string): string {
  return path.slice(path.lastIndexOf("/") + 1);
}

function pick(files: Record<string, string>, name: string): TextFile | undefined {
  for (const [path, text] of Object.entries(files)) {
    if (baseName(path) === name) return { name, text };
  }
  return undefined;
}

/** The demo files bundled into this build. */
export function demoBundle(): DemoBundle {
  const all = Object.entries(surveyFiles)
    .map(([path, text]) => ({ name: baseName(path), text }))
    .sort((a, b) => a.name.localeCompare(b.name));
  const combined = all.find((f) => f.name === ALL_SURVEYS_FILE);
  const surveys = combined ? [combined] : all;
  return {
    surveys,
    centerline: pick(geojsonFiles, "centerline.geojson"),
    basemap: pick(geojsonFiles, "basemap.geojson"),
  };
}
