/**
 * Series points from per-survey analyses: one point per survey and constituent, one
 * salt-intrusion point per survey, and month/season summaries of them.
 */
import { maxOf, minOf } from "../survey/arrayExtent.ts";
import type { ComparableSurvey } from "../compare/types.ts";
import type { MixingWarning } from "../mixing/result.ts";
import { spreadOf } from "./groupStats.ts";
import { MONTH_LABELS, monthOfDate, seasonOf, type Season } from "./seasons.ts";
import type { GroupRow, IntrusionPoint, SeriesPoint } from "./types.ts";

/** The date-like text of a survey as YYYY-MM-DD when it starts with one. */
export function isoDay(date: string | undefined): string | undefined {
  return date !== undefined && /^\d{4}-\d{2}-\d{2}/.test(date) ? date.slice(0, 10) : undefined;
}

/** Reaction-zone centre [km] of a point, when it has a zone on the channel. */
export function zoneCentreKm(p: SeriesPoint): number | undefined {
  return p.reactionZoneKm ? (p.reactionZoneKm[0] + p.reactionZoneKm[1]) / 2 : undefined;
}

/**
 * Points of every constituent (grouped by name; first unit kept) and of the salt intrusion.
 * A constituent measured in another unit in some survey keeps its % change (unitless) there
 * but not its C*₀ (warning).
 *
 * @param analyses analysed surveys, in any order (points come out in date order)
 * @param seasons seasons for labelling points (each survey's discharge is the one its analysis used,
 *   decided by surveyDischarge, with its statement)
 * @returns series points by constituent, intrusion points, warnings
 */
export function buildSeriesPoints(
  analyses: readonly ComparableSurvey[],
  seasons: readonly Season[],
): {
  byConstituent: Map<string, { unit: string; points: SeriesPoint[] }>;
  intrusion: IntrusionPoint[];
  warnings: MixingWarning[];
} {
  const warnings: MixingWarning[] = [];
  const ordered = [...analyses].sort((a, b) => (a.survey.startDate ?? "~").localeCompare(b.survey.startDate ?? "~"));
  const byConstituent = new Map<string, { unit: string; points: SeriesPoint[] }>();
  const intrusion: IntrusionPoint[] = [];
  for (const a of ordered) {
    const f = a.survey;
    const date = isoDay(f.startDate);
    const season = date ? seasonOf(date, seasons) : undefined;
    const q = f.riverDischargeM3s;
    const qSource = q !== undefined ? (f.dischargeSource?.statement ?? "the survey's own discharge") : undefined;
    const common = {
      survey: f.name,
      ...(date ? { date } : {}),
      ...(q !== undefined ? { dischargeM3s: q } : {}),
      ...(season !== undefined ? { season } : {}),
    };
    intrusion.push({
      ...common,
      ...(f.saltIntrusionKm !== undefined ? { saltIntrusionKm: f.saltIntrusionKm } : {}),
      saltIntrusionSalinity: f.saltIntrusionSalinity,
      ...intrusionBound(a, f.saltIntrusionSalinity),
    });
    for (const c of a.constituents) {
      let entry = byConstituent.get(c.name);
      if (!entry) byConstituent.set(c.name, (entry = { unit: c.unit, points: [] }));
      const sameUnit = c.unit === entry.unit;
      if (!sameUnit)
        warnings.push({
          code: "unit-mismatch",
          message: `${c.name} is in ${c.unit} in ${f.name} but ${entry.unit} elsewhere: its C*₀ there is left out of the series.`,
        });
      const z = c.reactionZone;
      const ends = z ? z.km.flat() : [];
      entry.points.push({
        ...common,
        ...(qSource !== undefined && q !== undefined ? { dischargeSource: qSource } : {}),
        class: c.class,
        confidence: c.confidence,
        ...(c.percentChange ? { percentChange: c.percentChange } : {}),
        ...(c.effectiveEndmember && sameUnit ? { effectiveEndmember: c.effectiveEndmember } : {}),
        ...(ends.length ? { reactionZoneKm: [minOf(ends), maxOf(ends)] as [number, number] } : {}),
        ...(z ? { reactionZoneSalinity: z.salinity, reactionZoneKind: z.kind } : {}),
        ...(c.maximum && c.maximum.km.length ? { maximumKm: maxOf(c.maximum.km) } : {}),
        ...(c.maximum ? { maximumSalinity: c.maximum.salinity } : {}),
      });
    }
  }
  const undated = ordered.filter((a) => isoDay(a.survey.startDate) === undefined).map((a) => a.survey.name);
  if (undated.length)
    warnings.push({
      code: "no-date",
      message: `${undated.length} survey(s) without a date (${undated.slice(0, 3).join(", ")}${undated.length > 3 ? ", …" : ""}): left out of month, season and year summaries.`,
    });
  return { byConstituent, intrusion, warnings };
}

/**
 * Bound on the intrusion when the isohaline is not crossed within the surveyed reach: salinity above
 * it at the landward-most point of S(x) → at least that km; below it everywhere → at most the
 * seaward-most km.
 */
function intrusionBound(
  a: ComparableSurvey,
  isohaline: number,
): { saltIntrusionAtLeastKm?: number; saltIntrusionAtMostKm?: number } {
  const p = a.salinityProfile;
  if (a.survey.saltIntrusionKm !== undefined || !p || p.km.length === 0) return {};
  const last = p.salinity[p.salinity.length - 1]!;
  if (last > isohaline) return { saltIntrusionAtLeastKm: p.km[p.km.length - 1]! };
  if (maxOf(p.salinity) < isohaline) return { saltIntrusionAtMostKm: p.km[0]! };
  return {};
}

type Dated = { date?: string; season?: string };

/**
 * Month and season summaries (median, quartiles, extremes) of the given quantities.
 *
 * @param points dated points
 * @param quantities functions reading each summarised quantity from a point
 * @param seasons season order for the season rows
 * @returns rows by month (only months with surveys) and by season (in the given order)
 */
export function groupRows<P extends Dated>(
  points: readonly P[],
  quantities: Partial<
    Record<"percentChange" | "reactionZoneCentreKm" | "saltIntrusionKm", (p: P) => number | undefined>
  >,
  seasons: readonly Season[],
): { byMonth: GroupRow[]; bySeason: GroupRow[] } {
  const row = (key: string, members: readonly P[], month?: number): GroupRow => {
    const out: GroupRow = { key, ...(month !== undefined ? { month } : {}), nSurveys: members.length };
    for (const [name, read] of Object.entries(quantities) as Array<
      [keyof typeof quantities, (p: P) => number | undefined]
    >) {
      const s = spreadOf(
        members.flatMap((p) => {
          const v = read(p);
          return v !== undefined ? [v] : [];
        }),
      );
      if (s) out[name] = s;
    }
    return out;
  };
  const dated = points.filter((p) => p.date !== undefined);
  const byMonth: GroupRow[] = [];
  for (let m = 1; m <= 12; m++) {
    const members = dated.filter((p) => monthOfDate(p.date!) === m);
    if (members.length) byMonth.push(row(MONTH_LABELS[m - 1]!, members, m));
  }
  const bySeason = seasons.map((s) =>
    row(
      s.name,
      dated.filter((p) => p.season === s.name),
    ),
  );
  return { byMonth, bySeason };
}
