/**
 * The surveys an archive brush or a click chooses, and the table of the chosen surveys for one
 * constituent. The survey set is the app's shared Selection (`comparedSurveys`), so the map of
 * zones, the overlaid mixing plot, the tables, Compare and the Briefing all follow it.
 */
import type {
  ArchiveSummary,
  ConstituentSeries,
  Estimate,
  IntrusionPoint,
  SeriesPoint,
} from "../../../analysis/index.ts";
import { formatSignificant } from "../../../analysis/index.ts";
import { behaviourShort } from "../panels/lib/format.ts";
import { dayMs } from "./archiveModel.ts";

/**
 * Names of the surveys dated inside [fromMs, toMs] (either order), in date order.
 *
 * @param summary the archive summary (its intrusion list holds every survey once)
 * @param range brushed dates in UTC milliseconds
 */
export function surveysInRange(summary: ArchiveSummary, range: readonly [number, number]): string[] {
  const lo = Math.min(range[0], range[1]);
  const hi = Math.max(range[0], range[1]);
  return summary.intrusion
    .filter((p) => {
      const t = dayMs(p.date);
      return t !== undefined && t >= lo && t <= hi;
    })
    .map((p) => p.survey);
}

/** The chosen set after clicking a survey with shift/ctrl: added when absent, removed when present. */
export function toggleSurvey(chosen: readonly string[], survey: string): string[] {
  return chosen.includes(survey) ? chosen.filter((n) => n !== survey) : [...chosen, survey];
}

/** One row of the chosen-surveys table (text cells). */
export interface ChosenRow {
  survey: string;
  date: string;
  season: string;
  discharge: string;
  behaviour: string;
  percentChange: string;
  endmember: string;
  zoneKm: string;
  intrusionKm: string;
}

const num = (v: number | undefined) => (v === undefined ? "—" : formatSignificant(v, 3));
const est = (e: Estimate | undefined) =>
  e ? `${formatSignificant(e.value, 3)} [${formatSignificant(e.lower, 3)}, ${formatSignificant(e.upper, 3)}]` : "—";

/** Table rows of the chosen surveys for one constituent, in date order. */
export function chosenRows(
  summary: ArchiveSummary,
  series: ConstituentSeries | undefined,
  chosen: ReadonlySet<string>,
): ChosenRow[] {
  const byName = new Map((series?.points ?? []).map((p) => [p.survey, p]));
  return summary.intrusion
    .filter((ip) => chosen.has(ip.survey))
    .map((ip) => {
      const p = byName.get(ip.survey);
      const l = ip.saltIntrusionKm;
      return {
        survey: ip.survey,
        date: ip.date ?? "—",
        season: ip.season ?? "—",
        discharge: num(ip.dischargeM3s),
        behaviour: p ? behaviourShort[p.class] : "not measured",
        percentChange: est(p?.percentChange),
        endmember: est(p?.effectiveEndmember),
        zoneKm: p?.reactionZoneKm ? `${num(p.reactionZoneKm[0])}–${num(p.reactionZoneKm[1])}` : "—",
        intrusionKm:
          l !== undefined
            ? num(l)
            : ip.saltIntrusionAtLeastKm !== undefined
              ? `≥ ${num(ip.saltIntrusionAtLeastKm)}`
              : ip.saltIntrusionAtMostKm !== undefined
                ? `≤ ${num(ip.saltIntrusionAtMostKm)}`
                : "—",
      };
    });
}

/**
 * One survey in words for the line under the legend: name, date, season, discharge, and the focus
 * constituent's behaviour and % change with its interval (the summary's values, formatted).
 */
export function hoverWords(
  survey: string,
  ip: IntrusionPoint | undefined,
  p: SeriesPoint | undefined,
  constituent: string,
): string {
  const parts = [survey];
  if (ip?.date && ip.date !== survey) parts.push(ip.date);
  if (ip?.season) parts.push(ip.season);
  if (ip?.dischargeM3s !== undefined) parts.push(`${num(ip.dischargeM3s)} m³/s`);
  if (p) {
    parts.push(`${constituent}: ${behaviourShort[p.class]}`);
    if (p.percentChange) parts.push(`% change ${est(p.percentChange)}`);
  }
  return parts.join(" · ");
}
