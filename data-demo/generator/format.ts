/** Fixed-decimal number formatting shared by every output (byte-stable across runs). */

/**
 * Formats a number with exactly `decimals` decimals; negative zero is written "0".
 *
 * @throws RangeError when the value is not finite
 */
export function fixed(value: number, decimals: number): string {
  if (!Number.isFinite(value)) throw new RangeError(`fixed(): value must be finite, got ${String(value)}`);
  const s = value.toFixed(decimals);
  return /^-0(\.0*)?$/.test(s) ? s.slice(1) : s;
}

/** Rounds to `decimals` decimals and returns a number (for JSON outputs). */
export function roundTo(value: number, decimals: number): number {
  return Number(fixed(value, decimals));
}

/** Quotes a CSV field when it contains a comma, quote or line break (RFC 4180). */
export function csvField(text: string): string {
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}
