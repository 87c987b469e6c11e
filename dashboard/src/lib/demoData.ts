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

const surveyFiles = import.meta.glob("../../../data-demo/surveys/*.csv", {
  query: "?raw",
  import: "default",
  eager: true,
}) as Record<string, string>;

const geojsonFiles = import.meta.glob("../../../data-demo/*.geojson", {
  query: "?raw",
  import: "default",
  eager: true,
}) as Record<string, string>;

function baseName(path: string): string {
  return path.slice(path.lastIndexOf("/") + 1);
}

function pick(files: Record<string, string>, name: string): TextFile | undefined {
  for (const [path, text] of Object.entries(files)) {
    if (baseName(path) === name) return { name, text };
  }
  return undefined;
}

/** The demo's file holding every survey; when present it is read alone (the others repeat it). */
const ALL_SURVEYS_FILE = "both-surveys.csv";

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
