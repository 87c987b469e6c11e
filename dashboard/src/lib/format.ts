/**
 * Number text for the dashboard's own components (station list, survey facts, map tooltip): the
 * output spec's one formatter (analysis/output formatSignificant/formatFixed, as the panels, the CLI
 * and the briefing use), with "—" for an absent value. Never rounds inside the analysis.
 */
import { formatFixed, formatSignificant } from "../../../analysis/index.ts";

const absent = (value: number | undefined | null): value is undefined | null =>
  value === undefined || value === null || !Number.isFinite(value);

/** Formats a number with `digits` significant digits, or "—" when absent. */
export function fmt(value: number | undefined | null, digits = 3): string {
  return absent(value) ? "—" : formatSignificant(value, digits);
}

/** Formats with a fixed number of decimals, or "—". */
export function fixed(value: number | undefined | null, decimals = 1): string {
  return absent(value) ? "—" : formatFixed(value, decimals);
}

/** "+1.2" / "−0.4": signed, with a true minus sign. */
export function signed(value: number | undefined | null, digits = 3): string {
  return absent(value) ? "—" : formatSignificant(value, digits, true);
}
