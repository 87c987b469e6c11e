/**
 * Display text for panel values: behaviour classes in plain words, numbers
 * and estimates with their 95 % interval and unit. Numbers go through the one
 * formatter of the output spec (analysis/output formatSignificant/formatFixed,
 * the same as the CLI and the briefing); the caution is its SCREENING_CAUTION.
 * Formatting only; no value is computed here.
 */
import {
  BEHAVIOUR_STYLE,
  SCREENING_CAUTION,
  formatFixed as fixedText,
  formatSignificant,
} from "../../../../analysis/index.ts";
import type { BehaviourClass, Estimate } from "./types.ts";

/** Behaviour classes in plain words (the output spec's colour-and-symbol code, analysis/output). */
export const behaviourLabel = Object.fromEntries(
  Object.entries(BEHAVIOUR_STYLE).map(([k, v]) => [k, v.label]),
) as Record<BehaviourClass, string>;

/** Short class names for tight spaces (legends, map tooltips), from the same code. */
export const behaviourShort = Object.fromEntries(
  Object.entries(BEHAVIOUR_STYLE).map(([k, v]) => [k, v.short]),
) as Record<BehaviourClass, string>;

/** Formats a number with `digits` significant digits, trimming to a plain form. */
export function formatNumber(value: number | undefined, digits = 3): string {
  return value === undefined ? "—" : formatSignificant(value, digits);
}

/** Formats a number with a fixed count of decimals (salinity, km). */
export function formatFixed(value: number | undefined, decimals = 1): string {
  return value === undefined ? "—" : fixedText(value, decimals);
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

/** The caution shown wherever results are shown (the output spec's one text). */
export const cautionText = SCREENING_CAUTION;
