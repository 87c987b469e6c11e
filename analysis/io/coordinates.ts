import { parseNumberText } from "./valueText.ts";

/** Which coordinate a text is read as. */
export type CoordinateAxis = "latitude" | "longitude";

const HEMI_SIGN: Record<string, number> = { N: 1, S: -1, E: 1, W: -1, O: 1 };

/**
 * Reads a latitude or longitude in decimal degrees, degrees–decimal minutes or
 * degrees–minutes–seconds: "45.2083", "-45.2083", "45.2083 N", "45°12.5'N", "45 12.50 N",
 * "N45 12.5", "45°12'30\"N", "45:12:30 S", "45d12.5m" (decimal comma with `decimalComma`).
 * A hemisphere letter (N/S for latitude, E/W/O for longitude) sets the sign; a letter of the other
 * axis is an error. Minutes and seconds must be below 60.
 *
 * Degrees = d + m/60 + s/3600 (sexagesimal degrees; common practice).
 *
 * @param text coordinate text
 * @param axis which coordinate is expected (checks the hemisphere letter and the range)
 * @param decimalComma whether "," is the decimal separator
 * @returns decimal degrees (latitude −90…90, longitude −180…180), or undefined when not readable
 */
export function parseCoordinateText(text: string, axis: CoordinateAxis, decimalComma = false): number | undefined {
  const plain = parseNumberText(text, { decimalComma });
  if (plain !== undefined) return Math.abs(plain) <= (axis === "latitude" ? 90 : 180) ? plain : undefined;
  let t = text.trim().toUpperCase();
  if (t.length === 0 || t.length > 40) return undefined;
  let sign = 1;
  const hemi = /^([NSEWO])\s*|\s*([NSEWO])$/.exec(t);
  if (hemi !== null) {
    const letter = hemi[1] ?? hemi[2];
    const okLetters = axis === "latitude" ? "NS" : "EWO";
    if (!okLetters.includes(letter)) return undefined;
    sign = HEMI_SIGN[letter];
    t = t.replace(hemi[0], "").trim();
  }
  const parts = t
    .replace(/[°º˚D:'′’"″]|M(?=\s|$|\d)/g, " ")
    .trim()
    .split(/\s+/)
    .filter((p) => p.length > 0);
  if (parts.length === 0 || parts.length > 3) return undefined;
  const nums = parts.map((p) => parseNumberText(p, { decimalComma }));
  if (nums.some((n) => n === undefined)) return undefined;
  const [d, m = 0, s = 0] = nums as number[];
  if (parts.length > 1 && (!Number.isInteger(Math.abs(d)) || m < 0 || m >= 60 || s < 0 || s >= 60)) return undefined;
  if (parts.length > 2 && !Number.isInteger(m)) return undefined;
  const negative = d < 0 || Object.is(d, -0) || parts[0].startsWith("-");
  if (negative && hemi !== null) return undefined;
  const value = (Math.abs(d) + m / 60 + s / 3600) * (negative ? -1 : sign);
  const limit = axis === "latitude" ? 90 : 180;
  return Math.abs(value) <= limit ? value : undefined;
}
