/**
 * What the archive view draws, laid out from the worker's archive summary (analysis/archive
 * `summarizeArchive`): positions of the small multiples, the discharge scatter and the
 * along-channel × time strip, season colours and marks, and the surveys inside a brushed date
 * range. No science here: every value is the summary's; this file only places it.
 */
import { scaleUtc } from "d3-scale";
import {
  classWords,
  dayMs,
  formatSignificant,
  maxOf,
  minOf,
  paddedTimeDomain,
  timeTicks,
  type ArchiveSummary,
  type Estimate,
} from "../../../analysis/index.ts";

export { dayMs };
import { okabeIto, neutral } from "../panels/lib/palette.ts";
import { linear, makeFrame, round, type Frame } from "../panels/lib/scales.ts";

/** Colour and mark of one season (colour-blind safe: Okabe & Ito 2008 colours, and a shape each). */
export interface SeasonStyle {
  name: string;
  colour: string;
  /** SVG path of the mark centred on (0, 0), about 7 px across. */
  mark: string;
  /** Months of the season as text, e.g. "Dec–Feb". */
  months: string;
}

const SEASON_COLOURS = [
  okabeIto.blue,
  okabeIto.bluishGreen,
  okabeIto.orange,
  okabeIto.reddishPurple,
  okabeIto.vermillion,
  okabeIto.skyBlue,
];
const MARKS = [
  "M0,-3.6A3.6,3.6 0 1 1 0,3.6A3.6,3.6 0 1 1 0,-3.6Z", // circle
  "M-3.2,-3.2H3.2V3.2H-3.2Z", // square
  "M0,-4L3.8,3H-3.8Z", // triangle
  "M0,-4.2L4.2,0L0,4.2L-4.2,0Z", // diamond
  "M0,4L3.8,-3H-3.8Z", // triangle down
  "M-1.3,-4H1.3V-1.3H4V1.3H1.3V4H-1.3V1.3H-4V-1.3H-1.3Z", // cross
];
const MONTHS = ["Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep", "Oct", "Nov", "Dec"];

/** The style of surveys whose month is in no season. */
export const NO_SEASON: SeasonStyle = { name: "no season", colour: neutral.muted, mark: MARKS[0]!, months: "" };

/** One style per season of the summary, in the summary's order. */
export function seasonStyles(seasons: ArchiveSummary["seasons"]): SeasonStyle[] {
  return seasons.map((s, i) => ({
    name: s.name,
    colour: SEASON_COLOURS[i % SEASON_COLOURS.length]!,
    mark: MARKS[i % MARKS.length]!,
    months:
      s.months.length > 1
        ? `${MONTHS[s.months[0]! - 1]}–${MONTHS[s.months[s.months.length - 1]! - 1]}`
        : (MONTHS[s.months[0]! - 1] ?? ""),
  }));
}

/** A shared time axis: px of a date, the date of a px, and ticks. */
export interface TimeAxis {
  x(ms: number): number;
  ms(x: number): number;
  ticks: Array<{ x: number; label: string }>;
  frame: Frame;
}

/** The time axis every time panel shares, over the summary's dates, on a frame of the given size. */
export function timeAxis(summary: ArchiveSummary, frame: Frame, nTicks = 5): TimeAxis {
  const ms = summary.intrusion.flatMap((p) => {
    const t = dayMs(p.date);
    return t === undefined ? [] : [t];
  });
  const domain = paddedTimeDomain(ms);
  const s = scaleUtc().domain(domain).range([frame.x0, frame.x1]);
  return {
    x: (t) => round(s(t)),
    ms: (x) => s.invert(x).getTime(),
    // A label centred on the frame's right edge would be cut by the panel: such a tick is left out.
    ticks: timeTicks(domain, nTicks)
      .map((t) => ({ x: round(s(t.ms)), label: t.label }))
      .filter((t) => t.x <= frame.x1 - 14),
    frame,
  };
}

/** One survey's mark in a panel: position, interval and style. */
export interface PanelPoint {
  survey: string;
  /** The survey's date (YYYY-MM-DD), when dated. */
  date?: string;
  x: number;
  y: number;
  /** Interval ends in px (absent: no interval). */
  y0?: number;
  y1?: number;
  colour: string;
  mark: string;
  /** Hover text: survey, date, season, value with its interval. */
  title: string;
}

/** A y axis: ticks in px with labels. */
export interface ValueAxis {
  ticks: Array<{ y: number; label: string }>;
  /** px of zero when zero is inside the axis. */
  zero?: number;
  title: string;
}

/** One small multiple: one constituent's quantity against date. */
export interface SmallMultiple {
  name: string;
  unit: string;
  axis: ValueAxis;
  points: PanelPoint[];
  /**
   * Dated surveys of the series without an estimate of the quantity (e.g. too little data): a
   * hollow mark on the bottom edge at their date, so every survey of the series shows.
   */
  unestimated: PanelPoint[];
  /** Surveys of the series without a date (not drawn). */
  undated: number;
}

/** The quantities the small multiples show. */
export type MultipleQuantity = "percentChange" | "effectiveEndmember";

export const styleOf = (p: { season?: string }, styles: ReadonlyMap<string, SeasonStyle>) =>
  (p.season !== undefined ? styles.get(p.season) : undefined) ?? NO_SEASON;

/** A number for people: three significant digits, true minus (the output spec's formatter). */
export const fmt = (v: number): string => formatSignificant(v, 3);

export function estimateText(e: Estimate | undefined, unit: string): string {
  return e ? `${fmt(e.value)} ${unit} (95 % ${fmt(e.lower)} to ${fmt(e.upper)})` : "not estimated";
}

export function valueAxis(values: number[], frame: Frame, title: string, zero: boolean) {
  const y = linear(values.length ? [minOf(values), maxOf(values)] : undefined, [frame.y1, frame.y0], {
    zero,
    ticks: 4,
  });
  const [d0, d1] = y.domain() as [number, number];
  const axis: ValueAxis = {
    ticks: y.ticks(4).map((v) => ({ y: round(y(v)), label: String(v).replace("-", "−") })),
    ...(d0 <= 0 && d1 >= 0 ? { zero: round(y(0)) } : {}),
    title,
  };
  return { y: (v: number) => round(y(v)), axis };
}

/** Frame of one small multiple (SVG units). */
export const MULTIPLE_FRAME = makeFrame(320, 150, { top: 8, right: 10, bottom: 22, left: 46 });

/**
 * One small multiple per constituent of `quantity` against date, each point with its 95 % interval,
 * coloured and marked by season, on the shared time axis.
 */
export function smallMultiples(
  summary: ArchiveSummary,
  quantity: MultipleQuantity,
  time: TimeAxis,
  styles: ReadonlyMap<string, SeasonStyle>,
): SmallMultiple[] {
  const frame = time.frame;
  return summary.series.map((s) => {
    const unit = quantity === "percentChange" ? "%" : s.unit;
    const pts = s.points.filter((p) => dayMs(p.date) !== undefined && p[quantity] !== undefined);
    const values = pts.flatMap((p) => [p[quantity]!.lower, p[quantity]!.upper, p[quantity]!.value]);
    const { y, axis } = valueAxis(
      values.filter(Number.isFinite),
      frame,
      quantity === "percentChange" ? "% change" : `C*₀ (${s.unit})`,
      quantity === "percentChange",
    );
    const points = pts.map((p): PanelPoint => {
      const e = p[quantity]!;
      const st = styleOf(p, styles);
      return {
        survey: p.survey,
        date: p.date!.slice(0, 10),
        x: time.x(dayMs(p.date)!),
        y: y(e.value),
        ...(Number.isFinite(e.lower) && Number.isFinite(e.upper) ? { y0: y(e.lower), y1: y(e.upper) } : {}),
        colour: st.colour,
        mark: st.mark,
        title: `${p.survey}, ${p.date}${p.season ? `, ${p.season}` : ""}: ${estimateText(e, unit)}`,
      };
    });
    const unestimated = s.points
      .filter((p) => dayMs(p.date) !== undefined && p[quantity] === undefined)
      .map((p): PanelPoint => {
        const st = styleOf(p, styles);
        return {
          survey: p.survey,
          date: p.date!.slice(0, 10),
          x: time.x(dayMs(p.date)!),
          y: frame.y1 - 4,
          colour: st.colour,
          mark: st.mark,
          title: `${p.survey}, ${p.date}${p.season ? `, ${p.season}` : ""}: no estimate (${classWords(p.class)})`,
        };
      });
    const undated = s.points.filter((p) => dayMs(p.date) === undefined).length;
    return { name: s.name, unit, axis, points, unestimated, undated };
  });
}
