/** Number formatting for display (never rounding inside analysis). */

/** Formats a number with `digits` significant digits, or "—" when absent. */
export function fmt(value: number | undefined | null, digits = 3): string {
  if (value === undefined || value === null || !Number.isFinite(value)) return "—";
  const abs = Math.abs(value);
  if (abs !== 0 && (abs >= 1e5 || abs < 1e-3)) return value.toExponential(digits - 1);
  if (abs >= 10 ** digits) return value.toFixed(0);
  return Number(value.toPrecision(digits)).toString();
}

/** Formats with a fixed number of decimals, or "—". */
export function fixed(value: number | undefined | null, decimals = 1): string {
  if (value === undefined || value === null || !Number.isFinite(value)) return "—";
  return value.toFixed(decimals);
}

/** "+1.2" / "−0.4": signed, with a true minus sign. */
export function signed(value: number | undefined | null, digits = 3): string {
  if (value === undefined || value === null || !Number.isFinite(value)) return "—";
  const text = fmt(Math.abs(value), digits);
  return value > 0 ? `+${text}` : value < 0 ? `−${text}` : text;
}
