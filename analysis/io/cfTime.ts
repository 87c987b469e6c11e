/** A CF time unit "<unit> since <reference>" resolved to milliseconds. */
export interface CfTimeUnit {
  /** Milliseconds per unit. */
  msPerUnit: number;
  /** Reference epoch [ms since 1970-01-01T00:00:00Z]. */
  epochMs: number;
}

const UNIT_MS: Record<string, number> = {
  day: 86_400_000,
  days: 86_400_000,
  d: 86_400_000,
  hour: 3_600_000,
  hours: 3_600_000,
  hr: 3_600_000,
  h: 3_600_000,
  minute: 60_000,
  minutes: 60_000,
  min: 60_000,
  second: 1000,
  seconds: 1000,
  sec: 1000,
  s: 1000,
};

/**
 * Reads a CF-convention time unit such as "days since 1970-01-01", "hours since 2016-01-21 00:00:00",
 * "seconds since 1990-1-1T00:00:00Z". A reference without a zone is UTC (CF Conventions 1.11 §4.4).
 * Only the standard/gregorian/proleptic_gregorian calendars are read (months and years as units are
 * not, CF §4.4 advises against them).
 *
 * @param units the variable's units attribute
 * @param calendar the calendar attribute, if any
 * @returns the resolved unit, or undefined when it cannot be read exactly
 * @see Eaton, B. et al., 2023. NetCDF Climate and Forecast (CF) Metadata Conventions 1.11, §4.4 Time Coordinate.
 */
export function parseCfTimeUnits(units: string, calendar?: string): CfTimeUnit | undefined {
  if (calendar !== undefined && !/^(standard|gregorian|proleptic_gregorian)$/i.test(calendar.trim())) return undefined;
  const m =
    /^\s*(\w+)\s+since\s+(\d{1,4})-(\d{1,2})-(\d{1,2})(?:[ T](\d{1,2}):(\d{1,2})(?::(\d{1,2}(?:\.\d+)?))?)?\s*(Z|UTC|[+-]\d{1,2}(?::?\d{2})?)?\s*$/i.exec(
      units,
    );
  if (m === null) return undefined;
  const msPerUnit = UNIT_MS[m[1].toLowerCase()];
  if (msPerUnit === undefined) return undefined;
  let epochMs =
    Date.UTC(Number(m[2]), Number(m[3]) - 1, Number(m[4]), Number(m[5] ?? 0), Number(m[6] ?? 0), 0) +
    Number(m[7] ?? 0) * 1000;
  if (Number(m[2]) < 100) epochMs = new Date(epochMs).setUTCFullYear(Number(m[2]));
  const zone = m[8];
  if (zone !== undefined && /^[+-]/.test(zone)) {
    const z = /^([+-])(\d{1,2}):?(\d{2})?$/.exec(zone);
    if (z === null) return undefined;
    epochMs -= (z[1] === "+" ? 1 : -1) * (Number(z[2]) * 60 + Number(z[3] ?? 0)) * 60_000;
  }
  return Number.isFinite(epochMs) ? { msPerUnit, epochMs } : undefined;
}

/**
 * Converts a CF time value to ISO 8601 UTC ("...Z"; milliseconds dropped when zero).
 *
 * @param value time value in the unit
 * @param unit resolved unit (parseCfTimeUnits)
 * @returns ISO text, or undefined when outside the representable range
 */
export function cfTimeToIso(value: number, unit: CfTimeUnit): string | undefined {
  const ms = unit.epochMs + value * unit.msPerUnit;
  if (!Number.isFinite(ms) || Math.abs(ms) > 8.64e15) return undefined;
  return new Date(Math.round(ms)).toISOString().replace(/\.000Z$/, "Z");
}
