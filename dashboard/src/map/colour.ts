/**
 * Colour scales for the map and its legend. Both are colour-blind safe:
 * cividis (sequential, designed for colour-vision deficiency) for salinity and
 * the ColorBrewer purple–orange diverging scheme for deviations.
 */
import { interpolateCividis, interpolatePuOr } from "d3-scale-chromatic";
import { color } from "d3-color";
import { scaleDiverging, scaleSequential } from "d3-scale";

export type RGBA = [number, number, number, number];

/** A scale from a value to a colour, with what the legend needs. */
export interface ColourScale {
  kind: "sequential" | "diverging";
  domain: [number, number];
  /** Legend title including the unit. */
  title: string;
  /** Colour of a value (grey for undefined). */
  rgba(value: number | undefined): RGBA;
  /** CSS colours sampled evenly over the domain, for a gradient legend. */
  stops: string[];
  /** Labels under the legend bar: [min, middle, max]. */
  ticks: Array<{ value: number; label: string }>;
}

/** Removal (below the line) and addition (above) colours, taken from the same diverging scheme. */
export const REMOVAL_CSS = interpolatePuOr(0.2);
export const ADDITION_CSS = interpolatePuOr(0.8);
export const ADDITION_DARK_CSS = interpolatePuOr(0.95);

const NO_VALUE: RGBA = [150, 150, 150, 200];

/** A CSS colour as deck.gl RGBA (alpha 0–255). */
export function toRgba(css: string, alpha = 235): RGBA {
  const c = color(css)?.rgb();
  return c ? [Math.round(c.r), Math.round(c.g), Math.round(c.b), alpha] : NO_VALUE;
}

/** An RGBA colour (alpha 0–255) as a CSS `rgba()` colour, for MapLibre paint properties. */
export function cssRgba([r, g, b, a]: RGBA): string {
  return `rgba(${r}, ${g}, ${b}, ${Number((a / 255).toFixed(3))})`;
}

function formatTick(value: number): string {
  const abs = Math.abs(value);
  if (abs === 0) return "0";
  if (abs >= 100) return value.toFixed(0);
  if (abs >= 10) return value.toFixed(1).replace(/\.0$/, "");
  return value.toPrecision(2);
}

function sampleStops(interpolate: (t: number) => string, n = 9): string[] {
  return Array.from({ length: n }, (_, i) => interpolate(i / (n - 1)));
}

/** Salinity from fresh to the largest of 35 and the data's maximum. */
export function salinityScale(maxSalinity: number | undefined): ColourScale {
  const top = Math.max(35, Math.ceil(maxSalinity ?? 0));
  const scale = scaleSequential(interpolateCividis).domain([0, top]).clamp(true);
  return {
    kind: "sequential",
    domain: [0, top],
    title: "Salinity (PSS-78, dimensionless)",
    rgba: (v) => (v === undefined || !Number.isFinite(v) ? NO_VALUE : toRgba(scale(v))),
    stops: sampleStops(interpolateCividis),
    ticks: [0, top / 2, top].map((value) => ({ value, label: formatTick(value) })),
  };
}

/**
 * Deviation from the dilution line, symmetric about zero: purple = below the
 * line (removal), orange = above (addition).
 */
export function deviationScale(maxAbsDeviation: number | undefined, constituent: string, unit: string): ColourScale {
  const m = maxAbsDeviation && maxAbsDeviation > 0 ? maxAbsDeviation : 1;
  const scale = scaleDiverging(interpolatePuOr).domain([-m, 0, m]).clamp(true);
  return {
    kind: "diverging",
    domain: [-m, m],
    title: `${constituent} observed − dilution line (${unit})`,
    rgba: (v) => (v === undefined || !Number.isFinite(v) ? NO_VALUE : toRgba(scale(v))),
    stops: sampleStops(interpolatePuOr),
    ticks: [-m, 0, m].map((value) => ({ value, label: (value > 0 ? "+" : "") + formatTick(value) })),
  };
}
