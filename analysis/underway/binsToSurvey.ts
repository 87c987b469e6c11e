/**
 * Turns underway bins into a {@link Survey} (one station per bin) so the mixing analysis
 * (analyzeSurvey) can run on, e.g., fluorescence against salinity.
 */
import type { Constituent, Station, Survey, ValueCell } from "../survey/survey.ts";
import type { UnderwayBins } from "./binUnderway.ts";
import type { BinStats } from "./runningStats.ts";
import { minOf, maxOf } from "../survey/arrayExtent.ts";

/** Options of {@link binsToSurvey}. */
export interface BinsToSurveyOptions {
  /** Survey name (default: "underway <file>"). */
  name?: string;
  /** File name recorded on every station. */
  fileName: string;
  /** River discharge during the log [m³/s], when known. */
  riverDischargeM3s?: number;
}

const CORE = new Set(["salinity", "temperatureC"]);

function cell(stats: BinStats | undefined, binN: number): ValueCell {
  if (stats === undefined)
    return { value: undefined, original: `no value among ${binN} records`, status: "missing", accepted: true };
  const sd = stats.sd === undefined ? "" : `, sd ${stats.sd.toPrecision(4)}`;
  return {
    value: stats.mean,
    original: `mean of ${stats.n} records${sd} (min ${stats.min}, max ${stats.max})`,
    status: "measured",
    accepted: true,
  };
}

function isoOf(ms: number | undefined): string | undefined {
  return ms === undefined ? undefined : new Date(ms).toISOString();
}

/**
 * One station per bin: id "km 12–12.5" or "S 10–11", position the bins' mean position, time the
 * mean of the first and last record, salinity, temperature and every other variable as the bin mean
 * with the text "mean of 1234 records, sd …" as the cell's original. Variables other than salinity
 * and temperature become constituents with the unit of their column.
 *
 * @param bins from binUnderway
 * @param options name, file name, discharge [m³/s]
 * @returns a Survey for analyzeSurvey
 * @throws TypeError when options.fileName is not a string
 */
export function binsToSurvey(bins: UnderwayBins, options: BinsToSurveyOptions): Survey {
  if (typeof options?.fileName !== "string")
    throw new TypeError(`binsToSurvey(): options.fileName must be a string, got ${typeof options?.fileName}`);
  const names = Object.keys(bins.units).filter((n) => !CORE.has(n));
  const constituents: Constituent[] = names.map((name) => ({ name, unit: bins.units[name] ?? "", header: name }));
  const label = bins.by === "km" ? "km" : "S";
  const stations: Station[] = bins.bins.map((b) => {
    const mid = b.startMs !== undefined && b.endMs !== undefined ? (b.startMs + b.endMs) / 2 : undefined;
    const time = isoOf(mid);
    const values: Record<string, ValueCell> = {};
    for (const name of names) values[name] = cell(b.stats[name], b.n);
    return {
      id: `${label} ${b.lower}–${b.upper}`,
      ...(time !== undefined ? { time } : {}),
      lonLat: [b.meanLonLat[0], b.meanLonLat[1]] as [number, number],
      salinity: cell(b.stats.salinity, b.n),
      ...(bins.units.temperatureC !== undefined ? { temperatureC: cell(b.stats.temperatureC, b.n) } : {}),
      values,
      sourceRow: b.firstRow,
      sourceFile: options.fileName,
    };
  });
  const starts = bins.bins.flatMap((b) => (b.startMs !== undefined ? [b.startMs] : []));
  const ends = bins.bins.flatMap((b) => (b.endMs !== undefined ? [b.endMs] : []));
  const startDate = starts.length > 0 ? isoOf(minOf(starts)) : undefined;
  const endDate = ends.length > 0 ? isoOf(maxOf(ends)) : undefined;
  return {
    name: options.name ?? `underway ${options.fileName}`,
    ...(startDate !== undefined ? { startDate } : {}),
    ...(endDate !== undefined ? { endDate } : {}),
    ...(options.riverDischargeM3s !== undefined ? { riverDischargeM3s: options.riverDischargeM3s } : {}),
    stations,
    constituents,
  };
}
