/**
 * User-defined seasons: named sets of calendar months, e.g. "wet=Dec-Apr,dry=Aug-Nov".
 */

/** A season: its name and the months (1–12) it holds. */
export interface Season {
  name: string;
  months: number[];
}

const MONTHS = ["jan", "feb", "mar", "apr", "may", "jun", "jul", "aug", "sep", "oct", "nov", "dec"];

/** Month names for labels (index 0 = January). */
export const MONTH_LABELS = ["Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep", "Oct", "Nov", "Dec"];

/**
 * Meteorological seasons of the northern hemisphere (winter = Dec–Feb, spring = Mar–May,
 * summer = Jun–Aug, autumn = Sep–Nov): common practice.
 */
export const DEFAULT_SEASONS: readonly Season[] = [
  { name: "winter", months: [12, 1, 2] },
  { name: "spring", months: [3, 4, 5] },
  { name: "summer", months: [6, 7, 8] },
  { name: "autumn", months: [9, 10, 11] },
];

function monthOf(token: string, spec: string): number {
  const t = token.trim().toLowerCase();
  const byNumber = Number(t);
  if (Number.isInteger(byNumber) && byNumber >= 1 && byNumber <= 12) return byNumber;
  const i = MONTHS.indexOf(t.slice(0, 3));
  if (t.length < 3 || i < 0)
    throw new RangeError(`parseSeasons: "${token}" in "${spec}" is not a month (Jan…Dec or 1…12)`);
  return i + 1;
}

/**
 * Parses seasons written as `name=Mon-Mon` or `name=Mon+Mon+…` pairs separated by commas or
 * semicolons, e.g. "wet=Dec-Apr,transition=May-Jul,dry=Aug-Nov". Ranges wrap over the new year
 * (Dec-Feb = Dec, Jan, Feb). A month may belong to one season only; months in no season are
 * left out of season summaries.
 *
 * @param spec the season text
 * @returns the seasons in the order given
 * @throws RangeError naming the bad part (unknown month, empty name, month in two seasons)
 */
export function parseSeasons(spec: string): Season[] {
  if (typeof spec !== "string" || spec.trim() === "") throw new RangeError(`parseSeasons: spec is empty`);
  const seen = new Map<number, string>();
  const out: Season[] = [];
  for (const part of spec.split(/[;,]/).filter((p) => p.trim() !== "")) {
    const eq = part.indexOf("=");
    const name = eq > 0 ? part.slice(0, eq).trim() : "";
    if (!name) throw new RangeError(`parseSeasons: "${part}" must be name=months, e.g. wet=Dec-Apr`);
    const months: number[] = [];
    for (const piece of part.slice(eq + 1).split("+")) {
      const [a, b] = piece.split("-");
      if (a === undefined || a.trim() === "") throw new RangeError(`parseSeasons: "${part}" has no months`);
      const from = monthOf(a, spec);
      const to = b === undefined ? from : monthOf(b, spec);
      for (let m = from; ; m = (m % 12) + 1) {
        months.push(m);
        if (m === to) break;
      }
    }
    for (const m of months) {
      const other = seen.get(m);
      if (other !== undefined)
        throw new RangeError(`parseSeasons: ${MONTH_LABELS[m - 1]} is in both "${other}" and "${name}"`);
      seen.set(m, name);
    }
    out.push({ name, months });
  }
  return out;
}

/**
 * Season of an ISO 8601 date (YYYY-MM-DD…), or undefined when its month is in no season.
 *
 * @param isoDate date text starting with YYYY-MM
 * @param seasons seasons from {@link parseSeasons} or {@link DEFAULT_SEASONS}
 * @throws RangeError when the date does not start with YYYY-MM
 */
export function seasonOf(isoDate: string, seasons: readonly Season[]): string | undefined {
  return seasons.find((s) => s.months.includes(monthOfDate(isoDate)))?.name;
}

/** Month 1–12 of an ISO 8601 date. */
export function monthOfDate(isoDate: string): number {
  const m = /^(\d{4})-(\d{2})/.exec(isoDate);
  const month = m ? Number(m[2]) : NaN;
  if (!(month >= 1 && month <= 12)) throw new RangeError(`monthOfDate: "${isoDate}" is not an ISO 8601 date`);
  return month;
}

/** Year of an ISO 8601 date. */
export function yearOfDate(isoDate: string): number {
  const m = /^(\d{4})-\d{2}/.exec(isoDate);
  if (!m) throw new RangeError(`yearOfDate: "${isoDate}" is not an ISO 8601 date`);
  return Number(m[1]);
}
