/**
 * Year-on-year comparison of a quantity after removing the seasonal cycle: each survey's value
 * minus the median of its season over all years, averaged per year.
 */
import jStat from "jstat";
import { differenceOfEstimates } from "../compare/differenceOfEstimates.ts";
import type { YearRow } from "./types.ts";

/** One survey's value of the quantity, with its year and season. */
export interface YearValue {
  year: number;
  season: string | undefined;
  value: number;
}

/**
 * Per year: the mean seasonal anomaly (value − median of the same season over the whole archive)
 * with its t interval (mean ± t·sd/√n; needs ≥ 2 surveys in the year), and its difference from
 * the previous year with the two-survey comparison's interval and words
 * ({@link differenceOfEstimates}). With m consecutive-year comparisons the t quantile is taken at
 * 1 − 0.025/m (Bonferroni), so the m difference intervals hold together at about 95 % and a
 * seven-year archive does not flag a year by chance one time in four. Removing the season median keeps a year sampled mostly in the
 * dry season from looking different only for that reason. Surveys in no season are left out.
 *
 * @param values one per survey
 * @param unit unit of the quantity
 * @returns rows in year order
 * @throws RangeError for a non-finite value or year
 * @see Student (1908) Biometrika 6, 1–25 (t interval); Taylor (1997) §3.5 (difference in quadrature);
 *   Dunn, O.J. (1961) J. Am. Stat. Assoc. 56, 52–64 (Bonferroni simultaneous intervals).
 */
export function yearOnYear(values: readonly YearValue[], unit: string): YearRow[] {
  values.forEach((v, i) => {
    if (!Number.isFinite(v.value) || !Number.isInteger(v.year))
      throw new RangeError(
        `yearOnYear: values[${i}] must have a finite value and whole year, got ${v.value}, ${v.year}`,
      );
  });
  const bySeason = new Map<string, number[]>();
  for (const v of values)
    if (v.season !== undefined) bySeason.set(v.season, [...(bySeason.get(v.season) ?? []), v.value]);
  const median = new Map<string, number>();
  for (const [k, vs] of bySeason) {
    const s = [...vs].sort((a, b) => a - b);
    const h = (s.length - 1) / 2;
    median.set(k, (s[Math.floor(h)]! + s[Math.ceil(h)]!) / 2);
  }
  const years = [...new Set(values.map((v) => v.year))].sort((a, b) => a - b);
  const rows: YearRow[] = [];
  const comparisons = Math.max(1, years.filter((y) => years.includes(y - 1)).length);
  for (const year of years) {
    const anomalies = values
      .filter((v) => v.year === year && v.season !== undefined)
      .map((v) => v.value - median.get(v.season!)!);
    const row: YearRow = { year, nSurveys: anomalies.length };
    const n = anomalies.length;
    if (n >= 2) {
      const mean = anomalies.reduce((a, b) => a + b, 0) / n;
      const sd = Math.sqrt(anomalies.reduce((a, b) => a + (b - mean) ** 2, 0) / (n - 1));
      const h = jStat.studentt.inv(1 - 0.025 / comparisons, n - 1) * (sd / Math.sqrt(n));
      row.meanAnomaly = { value: mean, lower: mean - h, upper: mean + h, unit };
    }
    const prev = rows[rows.length - 1];
    if (prev?.meanAnomaly && row.meanAnomaly && prev.year === year - 1)
      row.differenceFromPrevious = differenceOfEstimates(prev.meanAnomaly, row.meanAnomaly);
    rows.push(row);
  }
  return rows;
}
