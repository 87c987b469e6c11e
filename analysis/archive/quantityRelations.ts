/**
 * Relations of one archive quantity (a constituent's % change, the salt intrusion, …): to river
 * discharge, across seasons, and year on year, each with its uncertainty and plain statements.
 */
import { formatSignificant } from "../output/formatNumber.ts";
import { dischargeRelation, pWords } from "./dischargeRelation.ts";
import { kruskalWallis, spreadOf } from "./groupStats.ts";
import type { Season } from "./seasons.ts";
import { yearOfDate } from "./seasons.ts";
import type { QuantityRelations, SeasonTest } from "./types.ts";
import { yearOnYear } from "./yearOnYear.ts";

/** A survey's value of the quantity with what the relations need. */
export interface QuantityPoint {
  date?: string;
  season?: string;
  dischargeM3s?: number;
  value: number;
}

/**
 * Kruskal–Wallis test across seasons, stated in words with the seasons of highest and lowest
 * median when p < 0.05.
 *
 * @param points dated points with seasons
 * @param seasons the seasons
 * @param quantity plain name for the statement
 * @param unit unit of the quantity
 * @returns the test, or undefined with fewer than 2 seasons holding values or fewer than 5 values
 * @see Kruskal & Wallis (1952) J. Am. Stat. Assoc. 47, 583–621.
 */
export function seasonTest(
  points: readonly QuantityPoint[],
  seasons: readonly Season[],
  quantity: string,
  unit: string,
): SeasonTest | undefined {
  const groups = seasons.map((s) => points.filter((p) => p.season === s.name).map((p) => p.value));
  const kw = kruskalWallis(groups);
  if (!kw) return undefined;
  const exceeds = kw.pValue < 0.05;
  const medians = seasons
    .map((s, i) => ({ name: s.name, spread: spreadOf(groups[i]!) }))
    .filter((m) => m.spread !== undefined)
    .sort((a, b) => b.spread!.median - a.spread!.median);
  const hi = medians[0]!;
  const lo = medians[medians.length - 1]!;
  const u = unit === "%" ? " %" : ` ${unit}`;
  const test = `Kruskal–Wallis H = ${formatSignificant(kw.h, 3)}, ${kw.degreesOfFreedom} degrees of freedom, ${pWords(kw.pValue)}, ${kw.n} surveys`;
  const statement = exceeds
    ? `${quantity} differs between seasons (${test}): median ${formatSignificant(hi.spread!.median, 3)}${u} in ${hi.name} (${hi.spread!.n} surveys), ${formatSignificant(lo.spread!.median, 3)}${u} in ${lo.name} (${lo.spread!.n} surveys); larger than the uncertainty.`
    : `${quantity}: seasons cannot be distinguished (${test}).`;
  return {
    method: "kruskal-wallis",
    statistic: kw.h,
    degreesOfFreedom: kw.degreesOfFreedom,
    pValue: kw.pValue,
    n: kw.n,
    exceedsUncertainty: exceeds,
    statement,
  };
}

/**
 * Discharge relation, season test and year-on-year rows of one quantity, and the statements
 * among them that exceed their uncertainty.
 *
 * @param points per survey
 * @param seasons the seasons
 * @param quantity plain name, e.g. "Salt intrusion (S = 2)"
 * @param unit unit of the quantity
 * @returns relations and the statements that exceed their uncertainty
 */
export function quantityRelations(
  points: readonly QuantityPoint[],
  seasons: readonly Season[],
  quantity: string,
  unit: string,
): { relations: QuantityRelations; statements: string[] } {
  const statements: string[] = [];
  const withQ = points.filter((p) => p.dischargeM3s !== undefined && p.dischargeM3s > 0);
  const vsDischarge =
    withQ.length > 0
      ? dischargeRelation(
          withQ.map((p) => ({ dischargeM3s: p.dischargeM3s!, value: p.value })),
          quantity,
          unit,
        )
      : undefined;
  if (vsDischarge?.exceedsUncertainty) statements.push(vsDischarge.statement);
  const dated = points.filter((p) => p.date !== undefined);
  const st = seasonTest(dated, seasons, quantity, unit);
  if (st?.exceedsUncertainty) statements.push(st.statement);
  const byYear = yearOnYear(
    dated.map((p) => ({ year: yearOfDate(p.date!), season: p.season, value: p.value })),
    unit,
  );
  const u = unit === "%" ? "percentage points" : unit;
  for (const y of byYear) {
    const d = y.differenceFromPrevious;
    if (!d?.exceedsUncertainty) continue;
    statements.push(
      `${quantity} in ${y.year} was ${formatSignificant(Math.abs(d.value), 2)} ${u} ${d.value > 0 ? "higher" : "lower"} than in ${y.year - 1} after removing the seasonal cycle (approx. simultaneous 95 % interval ${formatSignificant(d.lower, 2, true)} to ${formatSignificant(d.upper, 2, true)} ${u}): ${d.statement}.`,
    );
  }
  return {
    relations: {
      ...(vsDischarge ? { vsDischarge } : {}),
      ...(st ? { seasonTest: st } : {}),
      byYear,
    },
    statements,
  };
}
