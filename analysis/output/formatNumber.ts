/**
 * Deterministic number formatting for text meant for people (comparison statements,
 * briefing): significant digits, no exponent for everyday magnitudes, U+2212 minus.
 */

/** Typographic minus sign used in all human-readable numbers. */
export const MINUS = "\u2212";

/**
 * Formats a number with a given count of significant digits (trailing zeros after the
 * decimal point removed), with a true minus sign. Magnitudes below 1e-4 or from 1e7 use
 * exponent notation ("1.2×10⁻⁵").
 *
 * @param x the number
 * @param digits significant digits, 1…10 (default 3)
 * @param signed prefix "+" for positive numbers
 * @returns the text; "—" for a non-finite number
 * @throws RangeError for digits outside 1…10
 */
export function formatSignificant(x: number, digits = 3, signed = false): string {
  if (!(digits >= 1 && digits <= 10 && Number.isInteger(digits)))
    throw new RangeError(`formatSignificant: digits must be an integer 1…10, got ${digits}`);
  if (!Number.isFinite(x)) return "—";
  if (x === 0 || Object.is(x, -0)) return "0";
  const sign = x < 0 ? MINUS : signed ? "+" : "";
  const a = Math.abs(x);
  if (a < 1e-4 || a >= 1e7) {
    const [m, e] = a.toExponential(digits - 1).split("e");
    const mant = m!.includes(".") ? m!.replace(/0+$/, "").replace(/\.$/, "") : m!;
    const sup = String(Number(e))
      .replace(/-/g, "⁻")
      .replace(/\d/g, (d) => "⁰¹²³⁴⁵⁶⁷⁸⁹"[Number(d)]!);
    return `${sign}${mant}×10${sup}`;
  }
  let t = Number(a.toPrecision(digits)).toString();
  if (t.includes("e")) t = Number(a.toPrecision(digits)).toFixed(0);
  return sign + t;
}

/**
 * Formats a number with fixed decimals and a true minus sign ("−0" shown as "0").
 *
 * @param x the number
 * @param decimals decimals, 0…10
 * @param signed prefix "+" for positive numbers
 * @returns the text; "—" for a non-finite number
 * @throws RangeError for decimals outside 0…10
 */
export function formatFixed(x: number, decimals: number, signed = false): string {
  if (!(decimals >= 0 && decimals <= 10 && Number.isInteger(decimals)))
    throw new RangeError(`formatFixed: decimals must be an integer 0…10, got ${decimals}`);
  if (!Number.isFinite(x)) return "—";
  const t = Math.abs(x).toFixed(decimals);
  if (Number(t) === 0) return t;
  return (x < 0 ? MINUS : signed ? "+" : "") + t;
}
