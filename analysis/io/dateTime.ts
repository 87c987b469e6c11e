/** Order of day, month and year in numeric dates such as "1/21/16" or "21.01.2016". */
export type DateOrder = "MDY" | "DMY" | "YMD";

const pad = (n: number, w = 2): string => String(n).padStart(w, "0");

/**
 * Two-digit years: 69–99 → 1969–1999, 00–68 → 2000–2068 (the POSIX strptime `%y` pivot; common practice).
 */
export function expandTwoDigitYear(yy: number): number {
  return yy >= 69 ? 1900 + yy : 2000 + yy;
}

function validDate(y: number, m: number, d: number): boolean {
  if (!(y >= 1000 && y <= 9999 && m >= 1 && m <= 12 && d >= 1)) return false;
  return d <= new Date(Date.UTC(y, m, 0)).getUTCDate();
}

/**
 * Guesses the day/month/year order from sample date texts: a 4-digit first part means YMD; a first
 * part above 12 means DMY; a second part above 12 means MDY.
 *
 * @param samples date texts from the file
 * @returns the order, or undefined when the samples do not decide it (ISO dates need no order)
 */
export function detectDateOrder(samples: readonly string[]): DateOrder | undefined {
  let dmy = false;
  let mdy = false;
  for (const s of samples) {
    const m = /^(\d{1,4})[/.-](\d{1,2})[/.-](\d{2,4})/.exec(s.trim());
    if (m === null) continue;
    if (m[1].length === 4) return "YMD";
    if (Number(m[1]) > 12) dmy = true;
    if (Number(m[2]) > 12) mdy = true;
  }
  if (dmy && !mdy) return "DMY";
  if (mdy && !dmy) return "MDY";
  return undefined;
}

/** Result of reading a date or time text. */
export interface ParsedDateTime {
  /** "YYYY-MM-DD" or "YYYY-MM-DDTHH:MM:SS" (local) or with "Z" (UTC) appended. */
  iso: string;
  /** True when the text carried a time of day. */
  hasTime: boolean;
}

/**
 * Reads a time of day: "13:46", "13:46:05", "804"/"0804" (HMM/HHMM), "8" (hour).
 *
 * @param text time text
 * @returns "HH:MM:SS", or undefined when not a valid time of day
 */
export function parseTimeOfDay(text: string): string | undefined {
  const t = text.trim();
  let h: number;
  let mi: number;
  let s = 0;
  const colon = /^(\d{1,2}):(\d{2})(?::(\d{2})(?:\.\d+)?)?$/.exec(t);
  const compact = /^(\d{1,4})(?:\.0+)?$/.exec(t);
  if (colon !== null) {
    h = Number(colon[1]);
    mi = Number(colon[2]);
    s = colon[3] === undefined ? 0 : Number(colon[3]);
  } else if (compact !== null) {
    const n = Number(compact[1]);
    h = compact[1].length <= 2 ? n : Math.floor(n / 100);
    mi = compact[1].length <= 2 ? 0 : n % 100;
  } else return undefined;
  if (h > 23 || mi > 59 || s > 59) return undefined;
  return `${pad(h)}:${pad(mi)}:${pad(s)}`;
}

function applyOffset(date: string, time: string, offset: string): string | undefined {
  if (offset === "Z" || offset === "z") return `${date}T${time}Z`;
  const m = /^([+-])(\d{2}):?(\d{2})$/.exec(offset);
  if (m === null) return undefined;
  const sign = m[1] === "+" ? 1 : -1;
  const ms = Date.parse(`${date}T${time}Z`) - sign * (Number(m[2]) * 60 + Number(m[3])) * 60000;
  return Number.isFinite(ms) ? new Date(ms).toISOString().replace(/\.000Z$/, "Z") : undefined;
}

/**
 * Reads a date or date-time text into ISO 8601.
 *
 * Accepts ISO 8601 ("2016-01-21", "2016-01-21T13:46:00Z", "2016-01-21 13:46", offsets "+01:00"),
 * and numeric dates with "/", "." or "-" in the given order, with 2- or 4-digit years and an optional
 * time after a space. Offsets are converted to UTC; `timeZone` ("Z", "+01:00") applies to times
 * without a zone; without either the time stays local (no suffix).
 *
 * @param text date (and time) text
 * @param order order of numeric dates (MDY when undefined and ambiguous)
 * @param timeText optional separate time-of-day text
 * @param timeZone optional zone of zone-less times
 * @returns the parsed value, or undefined when the text is not a valid date
 */
export function parseDateTimeText(
  text: string,
  order: DateOrder | undefined,
  timeText?: string,
  timeZone?: string,
): ParsedDateTime | undefined {
  const t = text.trim();
  let y: number;
  let mo: number;
  let d: number;
  let rest: string;
  const iso = /^(\d{4})-(\d{2})-(\d{2})(.*)$/.exec(t);
  const num = /^(\d{1,4})[/.-](\d{1,2})[/.-](\d{1,4})(.*)$/.exec(t);
  if (iso !== null) [y, mo, d, rest] = [Number(iso[1]), Number(iso[2]), Number(iso[3]), iso[4]];
  else if (num !== null) {
    const [a, b, c] = [num[1], num[2], num[3]];
    const o = a.length === 4 ? "YMD" : (order ?? "MDY");
    const [ys, ms, ds] = o === "YMD" ? [a, b, c] : o === "DMY" ? [c, b, a] : [c, a, b];
    if (ys.length !== 2 && ys.length !== 4) return undefined;
    y = ys.length === 2 ? expandTwoDigitYear(Number(ys)) : Number(ys);
    [mo, d, rest] = [Number(ms), Number(ds), num[4]];
  } else return undefined;
  if (!validDate(y, mo, d)) return undefined;
  const date = `${pad(y, 4)}-${pad(mo)}-${pad(d)}`;
  let zone: string | undefined;
  let time: string | undefined;
  const r = rest.trim().replace(/^T/, "");
  if (r.length > 0) {
    const tm = /^(\d{1,2}:\d{2}(?::\d{2}(?:\.\d+)?)?)\s*(Z|z|[+-]\d{2}:?\d{2})?$/.exec(r);
    if (tm === null) return undefined;
    time = parseTimeOfDay(tm[1]);
    if (time === undefined) return undefined;
    zone = tm[2];
  }
  if (timeText !== undefined && timeText.trim().length > 0 && time === undefined) {
    time = parseTimeOfDay(timeText);
    if (time === undefined) return undefined;
  }
  if (time === undefined) return { iso: date, hasTime: false };
  const z = zone ?? timeZone;
  if (z === undefined) return { iso: `${date}T${time}`, hasTime: true };
  const out = applyOffset(date, time, z);
  return out === undefined ? undefined : { iso: out, hasTime: true };
}
