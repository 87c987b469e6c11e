import type { ColumnMapping } from "./columnMapping.ts";
import type { CompiledMapping } from "./compileMapping.ts";
import type { CellContext } from "./cellReaders.ts";
import { readNumberCell } from "./cellReaders.ts";
import { parseCoordinateText } from "./coordinates.ts";
import { parseDateTimeText, parseTimeOfDay } from "./dateTime.ts";
import type { ImportedStation } from "./importSummary.ts";
import { makeIssue } from "./importSummary.ts";
import { projectedToLonLat } from "./projection.ts";
import { parseNumberText } from "./valueText.ts";

/** Where and when a row was sampled. */
export type RowPlace = Pick<ImportedStation, "time" | "lonLat" | "depthM" | "layer">;

const LAYER_WORDS: Record<string, "surface" | "bottom" | "middle"> = {
  s: "surface",
  surf: "surface",
  surface: "surface",
  b: "bottom",
  bot: "bottom",
  bottom: "bottom",
  m: "middle",
  mid: "middle",
  middle: "middle",
};

/**
 * Reads time, position, depth and layer label of one row; problems become issues, never throws.
 *
 * @param ctx row context
 * @param compiled compiled mapping
 * @param mapping the mapping (date order, time zone, EPSG, depth labels)
 * @param fields the row's fields
 * @returns the fields that could be read
 */
export function readRowPlace(
  ctx: CellContext,
  compiled: CompiledMapping,
  mapping: ColumnMapping,
  fields: readonly string[],
): RowPlace {
  const s = compiled.single;
  const h = (i: number): string => compiled.headers[i] ?? "";
  const text = (i: number | undefined): string => (i === undefined ? "" : (fields[i] ?? ""));
  const out: RowPlace = {};
  const dateIdx = s.dateTime ?? s.date;
  if (dateIdx !== undefined && text(dateIdx).trim() !== "") {
    let timeText: string | undefined;
    if (s.time !== undefined && text(s.time).trim() !== "") {
      if (parseTimeOfDay(text(s.time)) === undefined) {
        ctx.issues.push(
          makeIssue(ctx.file, ctx.row, h(s.time), text(s.time), "a time of day (HH:MM, HH:MM:SS or HMM)", "warning"),
        );
      } else timeText = text(s.time);
    }
    const dt = parseDateTimeText(text(dateIdx), mapping.dateOrder, timeText, mapping.timeZone);
    if (dt === undefined)
      ctx.issues.push(
        makeIssue(
          ctx.file,
          ctx.row,
          h(dateIdx),
          text(dateIdx),
          "a date (ISO 8601 or numeric in the mapping's day/month/year order)",
        ),
      );
    else out.time = dt.iso;
  } else if (dateIdx !== undefined) {
    ctx.issues.push(makeIssue(ctx.file, ctx.row, h(dateIdx), "", "a sampling date", "warning"));
  }
  if (s.latitude !== undefined || s.longitude !== undefined) {
    const latT = text(s.latitude);
    const lonT = text(s.longitude);
    const lat = parseCoordinateText(latT, "latitude", ctx.decimalComma);
    const lon = parseCoordinateText(lonT, "longitude", ctx.decimalComma);
    if (lat !== undefined && lon !== undefined) out.lonLat = [lon, lat];
    else {
      if (lat === undefined)
        ctx.issues.push(
          makeIssue(
            ctx.file,
            ctx.row,
            s.latitude === undefined ? "" : h(s.latitude),
            latT,
            "a latitude (decimal degrees or degrees-minutes like 45°12.5'N)",
            "warning",
          ),
        );
      if (lon === undefined)
        ctx.issues.push(
          makeIssue(
            ctx.file,
            ctx.row,
            s.longitude === undefined ? "" : h(s.longitude),
            lonT,
            "a longitude (decimal degrees or degrees-minutes like 2°03.1'W)",
            "warning",
          ),
        );
    }
  } else if (s.x !== undefined && s.y !== undefined && mapping.epsg !== undefined) {
    const x = parseNumberText(text(s.x), { decimalComma: ctx.decimalComma });
    const y = parseNumberText(text(s.y), { decimalComma: ctx.decimalComma });
    const ll = x === undefined || y === undefined ? undefined : projectedToLonLat(x, y, mapping.epsg);
    if (ll !== undefined) out.lonLat = ll;
    else
      ctx.issues.push(
        makeIssue(
          ctx.file,
          ctx.row,
          h(s.x),
          `${text(s.x)} ${text(s.y)}`,
          `projected x/y in EPSG:${mapping.epsg}`,
          "warning",
        ),
      );
  }
  if (s.depth !== undefined) {
    const d = readNumberCell(ctx, h(s.depth), text(s.depth), 0);
    if (d !== undefined) out.depthM = d;
  }
  if (s.depthLabel !== undefined) {
    const label = text(s.depthLabel).trim();
    const layer = LAYER_WORDS[label.toLowerCase()];
    const depth = mapping.depthLabels?.[label];
    if (layer !== undefined) out.layer = layer;
    if (depth !== undefined && out.depthM === undefined) out.depthM = depth;
    if (layer === undefined && depth === undefined && label !== "" && label.toUpperCase() !== "NA") {
      ctx.issues.push(
        makeIssue(
          ctx.file,
          ctx.row,
          h(s.depthLabel),
          label,
          "a layer label (S/surface, B/bottom, M/mid) or a label listed in the mapping",
          "warning",
        ),
      );
    }
  }
  return out;
}
