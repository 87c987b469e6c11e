/**
 * Layout and scale helpers shared by the SVG and canvas renderers of a panel:
 * one frame (size and margins) and one pair of linear scales per chart.
 */
import { scaleLinear, type ScaleLinear } from "d3-scale";
import { area, line } from "d3-shape";

export interface Margin {
  top: number;
  right: number;
  bottom: number;
  left: number;
}

/** Outer size and margins of a chart, with the inner plotting box derived. */
export interface Frame {
  width: number;
  height: number;
  margin: Margin;
  /** Inner box in SVG pixels. */
  x0: number;
  x1: number;
  y0: number;
  y1: number;
}

/** Builds a {@link Frame}; throws when the inner box would be empty. */
export function makeFrame(width: number, height: number, margin: Margin): Frame {
  const x0 = margin.left;
  const x1 = width - margin.right;
  const y0 = margin.top;
  const y1 = height - margin.bottom;
  if (!(x1 > x0 && y1 > y0)) {
    throw new RangeError(`makeFrame(): ${width}×${height} leaves no room inside margins ${JSON.stringify(margin)}`);
  }
  return { width, height, margin, x0, x1, y0, y1 };
}

/** Finite minimum and maximum of the given values, or undefined when none are finite. */
export function extent(values: Iterable<number | undefined>): [number, number] | undefined {
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of values) {
    if (v === undefined || !Number.isFinite(v)) continue;
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  return lo <= hi ? [lo, hi] : undefined;
}

/**
 * A niced linear scale over `domain` (padded when empty) onto `range`.
 * `zero` forces the domain to include 0 (concentrations, salinity).
 */
export function linear(
  domain: [number, number] | undefined,
  range: [number, number],
  options: { zero?: boolean; ticks?: number } = {},
): ScaleLinear<number, number> {
  let [lo, hi] = domain ?? [0, 1];
  if (options.zero) {
    lo = Math.min(0, lo);
    hi = Math.max(0, hi);
  }
  if (lo === hi) {
    const pad = lo === 0 ? 1 : Math.abs(lo) * 0.1;
    lo -= pad;
    hi += pad;
  }
  return scaleLinear()
    .domain([lo, hi])
    .range(range)
    .nice(options.ticks ?? 6);
}

/** SVG path through the points, lifting the pen over non-finite values (d3-shape line). */
export function linePath(xs: readonly number[], ys: readonly number[]): string {
  const idx = xs.map((_, i) => i);
  return (
    line<number>()
      .defined((i) => Number.isFinite(xs[i]) && Number.isFinite(ys[i]))
      .x((i) => xs[i])
      .y((i) => ys[i])
      .digits(2)(idx) ?? ""
  );
}

/** Closed SVG path of the band between `lower` and `upper` over `xs` (d3-shape area). */
export function bandPath(xs: readonly number[], lower: readonly number[], upper: readonly number[]): string {
  const idx = xs.map((_, i) => i).filter((i) => [xs[i], lower[i], upper[i]].every(Number.isFinite));
  if (idx.length < 2) return "";
  return (
    area<number>()
      .x((i) => xs[i])
      .y0((i) => lower[i])
      .y1((i) => upper[i])
      .digits(2)(idx) ?? ""
  );
}

/** Rounds to 0.01 px so saved SVG output is stable and small. */
export function round(v: number): number {
  return Math.round(v * 100) / 100;
}
