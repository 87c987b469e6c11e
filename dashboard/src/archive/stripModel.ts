/**
 * The along-channel × time strip of the archive view: for each survey (at its date on the shared
 * time axis) the reaction zone of one constituent as a bar over its km from the mouth, its
 * mid-estuarine maximum, and the salt-intrusion distance (a bound where the isohaline lies beyond
 * the surveyed reach). Values are the archive summary's (analysis/archive); only placed here.
 */
import type { ArchiveSummary, ConstituentSeries } from "../../../analysis/index.ts";
import { behaviourColour } from "../panels/lib/palette.ts";
import { makeFrame, type Frame } from "../panels/lib/scales.ts";
import { dayMs, fmt, valueAxis, type TimeAxis, type ValueAxis } from "./archiveModel.ts";

/** Frame of the strip (its x axis is the shared time axis, laid out on this frame). */
export const STRIP_FRAME = makeFrame(420, 200, { top: 10, right: 12, bottom: 24, left: 50 });

/** One survey in the strip. */
export interface StripColumn {
  survey: string;
  x: number;
  /** Reaction zone bar [px top, px bottom] and its colour (removal / addition). */
  zone?: { y0: number; y1: number; colour: string; kind: "removal" | "addition" };
  maximumY?: number;
  /** Salt intrusion at y; `bound` marks a lower ("≥") or upper ("≤") bound. */
  intrusion?: { y: number; bound?: "≥" | "≤" };
  title: string;
}

export interface ZoneStrip {
  columns: StripColumn[];
  axis: ValueAxis;
  /** Colours of the legend entries. */
  removalColour: string;
  additionColour: string;
}

/**
 * The strip for one constituent: reaction zones and maxima of `series` and the salt intrusion of
 * every survey, against date (shared `time` axis laid out on `frame`) and km from the mouth.
 */
export function zoneStrip(
  summary: ArchiveSummary,
  series: ConstituentSeries | undefined,
  time: TimeAxis,
  frame: Frame = STRIP_FRAME,
): ZoneStrip {
  const byName = new Map((series?.points ?? []).map((p) => [p.survey, p]));
  const kms: number[] = [0];
  for (const p of series?.points ?? []) {
    if (p.reactionZoneKm) kms.push(...p.reactionZoneKm);
    if (p.maximumKm !== undefined) kms.push(p.maximumKm);
  }
  for (const p of summary.intrusion) {
    const km = p.saltIntrusionKm ?? p.saltIntrusionAtLeastKm ?? p.saltIntrusionAtMostKm;
    if (km !== undefined) kms.push(km);
  }
  const { y, axis } = valueAxis(kms.filter(Number.isFinite), frame, "km from the mouth", true);
  const columns: StripColumn[] = [];
  for (const ip of summary.intrusion) {
    const t = dayMs(ip.date);
    if (t === undefined) continue;
    const p = byName.get(ip.survey);
    const zone = p?.reactionZoneKm;
    const kind = p?.reactionZoneKind ?? "removal";
    const lKm = ip.saltIntrusionKm ?? ip.saltIntrusionAtLeastKm ?? ip.saltIntrusionAtMostKm;
    const bound = ip.saltIntrusionKm !== undefined ? undefined : ip.saltIntrusionAtLeastKm !== undefined ? "≥" : "≤";
    const parts = [`${ip.survey}, ${ip.date}`];
    if (zone) parts.push(`${kind} zone ${fmt(zone[0])}–${fmt(zone[1])} km`);
    if (p?.maximumKm !== undefined) parts.push(`maximum at ${fmt(p.maximumKm)} km`);
    parts.push(
      lKm !== undefined
        ? `salt intrusion (S = ${ip.saltIntrusionSalinity}) ${bound ?? ""}${fmt(lKm)} km`
        : "salt intrusion not found",
    );
    columns.push({
      survey: ip.survey,
      x: time.x(t),
      ...(zone
        ? {
            zone: {
              y0: y(Math.max(zone[0], zone[1])),
              y1: y(Math.min(zone[0], zone[1])),
              colour: behaviourColour[kind],
              kind,
            },
          }
        : {}),
      ...(p?.maximumKm !== undefined ? { maximumY: y(p.maximumKm) } : {}),
      ...(lKm !== undefined ? { intrusion: { y: y(lKm), ...(bound ? { bound } : {}) } } : {}),
      title: parts.join("; "),
    });
  }
  return { columns, axis, removalColour: behaviourColour.removal, additionColour: behaviourColour.addition };
}
