/**
 * Display text for panel values: behaviour classes in plain words, numbers
 * with sensible precision, estimates with their 95 % interval and unit.
 * Formatting only; no value is computed here.
 */
import type { BehaviourClass, Estimate } from "./types.ts";

/** Behaviour classes in plain words. */
export const behaviourLabel: Record<BehaviourClass, string> = {
  conservative: "Mixes conservatively",
  removal: "Removed in the estuary",
  addition: "Added in the estuary",
  "removal-then-conservative": "Removed at low salinity, then conservative",
  "maximum-then-conservative": "Mid-estuary maximum, then conservative",
  "insufficient-data": "Not enough data to say",
};

/** Short class names for tight spaces (legends, map tooltips). */
export const behaviourShort: Record<BehaviourClass, string> = {
  conservative: "conservative",
  removal: "removal",
  addition: "addition",
  "removal-then-conservative": "removal, then conservative",
  "maximum-then-conservative": "maximum, then conservative",
  "insufficient-data": "insufficient data",
};

/** Formats a number with `digits` significant digits, trimming to a plain form. */
export function formatNumber(value: number | undefined, digits = 3): string {
  if (value === undefined || !Number.isFinite(value)) return "—";
  if (value === 0) return "0";
  const abs = Math.abs(value);
  if (abs >= 1e6 || abs < 1e-3) return value.toExponential(digits - 1).replace("e", "×10^");
  const decimals = Math.max(0, digits - 1 - Math.floor(Math.log10(abs)));
  return value.toFixed(Math.min(decimals, 6)).replace("-", "−");
}

/** Formats a number with a fixed count of decimals (salinity, km). */
export function formatFixed(value: number | undefined, decimals = 1): string {
  if (value === undefined || !Number.isFinite(value)) return "—";
  return value.toFixed(decimals).replace("-", "−");
}

/** "12.3 (10.1–14.6) nmol/L": value with its 95 % interval and unit. */
export function formatEstimate(e: Estimate | undefined, digits = 3): string {
  if (!e) return "—";
  const unit = e.unit ? ` ${e.unit}` : "";
  return `${formatNumber(e.value, digits)} (${formatNumber(e.lower, digits)} to ${formatNumber(e.upper, digits)})${unit}`;
}

/** "S 2.0–8.5" style interval. */
export function formatRange(range: readonly [number, number] | undefined, decimals = 1): string {
  if (!range) return "—";
  return `${formatFixed(range[0], decimals)}–${formatFixed(range[1], decimals)}`;
}

/** Axis title with unit in parentheses, e.g. "Fe (nmol/L)". */
export function axisTitle(name: string, unit: string | undefined): string {
  return unit ? `${name} (${unit})` : name;
}

/** The caution shown wherever results are shown. */
export const cautionText =
  "Screening analysis, not a compliance assessment. Defer to local regulations and licensed practice.";
