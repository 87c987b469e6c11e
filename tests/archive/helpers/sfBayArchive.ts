/**
 * The USGS San Francisco Bay cruise archive 2016–2022 in ../shared/data (read at test time, never
 * copied into the repository): file list, a centerline through the North-Bay channel stations, and
 * an independent list of the North-Bay transects that carry nutrients.
 */
import { existsSync, readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { fileURLToPath } from "node:url";

export const SF_DIR = fileURLToPath(new URL("../../../../shared/data/usgs-sfbay-2016-2022/", import.meta.url));
export const SF_PRESENT = existsSync(join(SF_DIR, "USGSSFBayStations_from_xlsx.csv"));
export const STATION_FILE = "USGSSFBayStations_from_xlsx.csv";

/** The seven yearly survey files. */
export function surveyFiles(): string[] {
  return readdirSync(SF_DIR)
    .filter((f) => f.endsWith(".csv") && f !== STATION_FILE)
    .sort();
}

/**
 * North-Bay channel stations in order from the Golden Gate (19) up the channel to Rio Vista (657),
 * by the program's station numbering (SOURCE.md: the transect follows the deep channel from the
 * Sacramento River through Suisun Bay, Carquinez Strait and San Pablo Bay to the Central Bay).
 */
export const NORTH_BAY_ORDER = [19, 18, 17, 16, 15, 14, 13, 12, 11, 10, 9, 8, 7, 6, 5, 4, 3, 2, 649, 657];

function csvRows(text: string): string[][] {
  return text
    .replace(/^\uFEFF/, "")
    .split(/\r?\n/)
    .filter((l) => l.trim() !== "")
    .map((l) => l.split(",").map((c) => c.replace(/^"|"$/g, "")));
}

/** A GeoJSON centerline through the North-Bay stations (mouth = Golden Gate = first vertex). */
export function northBayCenterline(): string {
  const rows = csvRows(readFileSync(join(SF_DIR, STATION_FILE), "utf8"));
  const h = rows[0]!;
  const [si, la, lo] = ["Station", "Latitude degree", "Longitude degree"].map((k) => h.indexOf(k));
  const pos = new Map(rows.slice(1).map((r) => [Number(r[si!]), [Number(r[lo!]), Number(r[la!])]]));
  const coordinates = NORTH_BAY_ORDER.map((s) => pos.get(s)!);
  return JSON.stringify({
    type: "FeatureCollection",
    features: [
      { type: "Feature", properties: { name: "North Bay channel" }, geometry: { type: "LineString", coordinates } },
    ],
  });
}

/**
 * Dates (YYYY-MM-DD) of the North-Bay transects with nutrients, read independently of Brackline:
 * silicate measured at Rio Vista (657) or the Sacramento River station (649) and at a Central/San
 * Pablo Bay station (13–18) on the same date.
 */
export function northBayNutrientTransects(): string[] {
  const dates = new Map<string, { river: boolean; bay: boolean }>();
  for (const f of surveyFiles()) {
    const rows = csvRows(readFileSync(join(SF_DIR, f), "utf8"));
    const h = rows[0]!;
    const di = h.indexOf("Date");
    const st = h.findIndex((c) => c === "Station_Number" || c === "Station");
    const si = h.findIndex((c) => c === "Silicate" || c === "Si (Micromolar)");
    for (const r of rows.slice(1)) {
      if (!r[si] || r[si]!.trim() === "") continue;
      const d = r[di]!;
      const m = /^(\d+)\/(\d+)\/(\d+)$/.exec(d);
      const iso = m ? `20${m[3]!.padStart(2, "0")}-${m[1]!.padStart(2, "0")}-${m[2]!.padStart(2, "0")}` : d;
      const s = Number(r[st]);
      const e = dates.get(iso) ?? { river: false, bay: false };
      if (s === 657 || s === 649) e.river = true;
      if (s >= 13 && s <= 18) e.bay = true;
      dates.set(iso, e);
    }
  }
  return [...dates.entries()]
    .filter(([, e]) => e.river && e.bay)
    .map(([d]) => d)
    .sort();
}

/**
 * For every cruise date (YYYY-MM-DD), the most landward North-Bay channel station with a salinity
 * and that salinity (shallowest sample), read from the raw files independently of Brackline.
 */
export function northBayReachByDate(): Map<string, { station: number; salinity: number; stations: number }> {
  const rank = new Map(NORTH_BAY_ORDER.map((s, i) => [s, i]));
  const byDate = new Map<string, Map<number, { depthM: number; salinity: number }>>();
  for (const f of surveyFiles()) {
    const rows = csvRows(readFileSync(join(SF_DIR, f), "utf8"));
    const h = rows[0]!;
    const di = h.indexOf("Date");
    const st = h.findIndex((c) => c === "Station_Number" || c === "Station");
    const sal = h.indexOf("Salinity");
    const dep = h.findIndex((c) => c === "Depth" || c === "Depth (m)");
    for (const r of rows.slice(1)) {
      const s = Number(r[st]);
      const text = r[sal]?.trim() ?? "";
      if (!rank.has(s) || text === "") continue;
      const m = /^(\d+)\/(\d+)\/(\d+)$/.exec(r[di]!);
      const iso = m ? `20${m[3]!.padStart(2, "0")}-${m[1]!.padStart(2, "0")}-${m[2]!.padStart(2, "0")}` : r[di]!;
      const stations = byDate.get(iso) ?? new Map<number, { depthM: number; salinity: number }>();
      const depthM = Number(r[dep]);
      const had = stations.get(s);
      if (!had || depthM < had.depthM) stations.set(s, { depthM, salinity: Number(text) });
      byDate.set(iso, stations);
    }
  }
  const out = new Map<string, { station: number; salinity: number; stations: number }>();
  for (const [date, stations] of byDate) {
    const landward = [...stations.keys()].sort((a, b) => rank.get(b)! - rank.get(a)!)[0]!;
    out.set(date, { station: landward, salinity: stations.get(landward)!.salinity, stations: stations.size });
  }
  return out;
}
