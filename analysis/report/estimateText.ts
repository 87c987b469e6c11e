/**
 * Estimates with their 95 % intervals as text, with units.
 */
import type { Estimate } from "../mixing/result.ts";
import { formatSignificant } from "../output/formatNumber.ts";

/** Unit text placed after a number: "%" and "salinity" are special-cased. */
export function unitSuffix(unit: string): string {
  if (unit === "salinity" || unit === "" || unit === "1") return "";
  if (unit === "%") return " %";
  return ` ${unit}`;
}

/**
 * Interval of an estimate as text: "−93 to −91 %".
 *
 * @param e estimate (95 % lower/upper, unit)
 * @param digits significant digits (default 2)
 * @param signed show "+" on positive limits
 */
export function intervalText(e: Estimate, digits = 2, signed = false): string {
  return `${formatSignificant(e.lower, digits, signed)} to ${formatSignificant(e.upper, digits, signed)}${unitSuffix(e.unit)}`;
}

/**
 * An estimate with its interval: "−92 % (95 % interval −93 to −91 %)".
 *
 * @param e estimate
 * @param digits significant digits (default 2)
 * @param signed show "+" on positive numbers (for changes)
 */
export function estimateText(e: Estimate, digits = 2, signed = false): string {
  return `${formatSignificant(e.value, digits, signed)}${unitSuffix(e.unit)} (95 % interval ${intervalText(e, digits, signed)})`;
}

/**
 * An estimate with its interval for use inside brackets: "−92 %, 95 % interval −93 to −91 %".
 *
 * @param e estimate
 * @param digits significant digits (default 2)
 * @param signed show "+" on positive numbers (for changes)
 */
export function estimateInline(e: Estimate, digits = 2, signed = false): string {
  return `${formatSignificant(e.value, digits, signed)}${unitSuffix(e.unit)}, 95 % interval ${intervalText(e, digits, signed)}`;
}

/** True when the 95 % interval includes zero (the estimate cannot be told from no change). */
export function intervalCrossesZero(e: Estimate): boolean {
  return e.lower <= 0 && e.upper >= 0;
}

/**
 * A flux in mol/s also as a daily amount: "0.35 mol/s (30 kmol/d)".
 *
 * @param molS flux [mol/s]
 * @returns text with both units
 */
export function fluxText(molS: number): string {
  const perDay = Math.abs(molS) * 86400;
  const [v, u] =
    perDay >= 1e6
      ? [perDay / 1e6, "Mmol/d"]
      : perDay >= 1e3
        ? [perDay / 1e3, "kmol/d"]
        : perDay >= 1
          ? [perDay, "mol/d"]
          : [perDay * 1e3, "mmol/d"];
  return `${formatSignificant(Math.abs(molS), 2)} mol/s (${formatSignificant(v, 2)} ${u})`;
}
