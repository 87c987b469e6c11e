/**
 * The date axis of the archive's time figures, shared by the dashboard's archive view and the
 * briefing: a padded domain over the survey days and calendar ticks (years, quarters, months or
 * days, whichever suits the span) with their labels, from d3's UTC time scale.
 */
import { scaleUtc } from "d3-scale";
import { maxOf, minOf } from "../survey/arrayExtent.ts";

const DAY_MS = 86_400_000;

/** One tick of a date axis: its time [ms since 1970-01-01 UTC] and its label ("2018", "April"). */
export interface TimeTick {
  ms: number;
  label: string;
}

/**
 * Milliseconds (UTC) of an ISO 8601 date's day (its first ten characters), or undefined for text
 * that is not a date.
 *
 * @param date ISO 8601 date or date-time text
 * @returns ms since 1970-01-01T00:00Z of that day
 */
export function dayMs(date: string | undefined): number | undefined {
  if (date === undefined || !/^\d{4}-\d{2}-\d{2}/.test(date)) return undefined;
  const ms = Date.parse(`${date.slice(0, 10)}T00:00:00Z`);
  return Number.isFinite(ms) ? ms : undefined;
}

/**
 * The time domain of a set of survey days, padded by 3 % of the span on each side and at least 15
 * days, so that the first and last survey do not sit on the frame (common practice).
 *
 * @param ms survey times [ms]
 * @returns [from, to] in ms; one day from 1970-01-01 when there is no time
 */
export function paddedTimeDomain(ms: readonly number[]): [number, number] {
  const lo = ms.length ? minOf(ms) : 0;
  const hi = ms.length ? maxOf(ms) : DAY_MS;
  const pad = Math.max((hi - lo) * 0.03, 15 * DAY_MS);
  return [lo - pad, hi + pad];
}

/**
 * About `count` calendar ticks over a time domain with d3's multi-scale labels: years over several
 * years ("2016"), months within one or two years ("April", the year at January), days within weeks.
 *
 * @param domain [from, to] in ms since 1970-01-01 UTC
 * @param count wanted number of ticks (d3 picks a calendar interval near it)
 * @returns the ticks in time order
 * @see the d3-scale library's `scaleUtc` ticks and tickFormat (Bostock, Ogievetsky & Heer 2011, IEEE Trans.
 *   Vis. Comput. Graph. 17, 2301–2309; from memory).
 */
export function timeTicks(domain: readonly [number, number], count: number): TimeTick[] {
  const s = scaleUtc().domain([domain[0], domain[1]]);
  const format = s.tickFormat(count);
  return s.ticks(count).map((d) => ({ ms: d.getTime(), label: format(d) }));
}
