import type { AnalyzeOptions } from "./options.ts";

/**
 * Checks the caller's options of analyzeConstituent and throws on mistakes.
 *
 * @param o options
 * @throws TypeError for a missing name/unit; RangeError for out-of-range numbers
 */
export function validateOptions(o: AnalyzeOptions): void {
  const fn = "analyzeConstituent";
  if (typeof o !== "object" || o === null) throw new TypeError(`${fn}: options must be an object, got ${String(o)}`);
  if (typeof o.name !== "string" || o.name === "")
    throw new TypeError(`${fn}: options.name must be a non-empty string, got ${String(o.name)}`);
  if (typeof o.unit !== "string") throw new TypeError(`${fn}: options.unit must be a string, got ${String(o.unit)}`);
  const pos = (k: string, v: number | undefined): void => {
    if (v !== undefined && !(Number.isFinite(v) && v > 0))
      throw new RangeError(`${fn}: options.${k} must be a positive number, got ${v}`);
  };
  pos("k", o.k);
  pos("riverDischargeM3s", o.riverDischargeM3s);
  pos("flushingTimeDays", o.flushingTimeDays);
  if (typeof o.crossSectionM2 === "number") pos("crossSectionM2", o.crossSectionM2);
  if (typeof o.dispersionM2s === "number") pos("dispersionM2s", o.dispersionM2s);
  if (
    o.bootstrapDraws !== undefined &&
    !(Number.isInteger(o.bootstrapDraws) && o.bootstrapDraws >= 0 && o.bootstrapDraws <= 100000)
  )
    throw new RangeError(`${fn}: options.bootstrapDraws must be an integer in [0, 100000], got ${o.bootstrapDraws}`);
  if (o.seed !== undefined && !Number.isFinite(o.seed))
    throw new RangeError(`${fn}: options.seed must be finite, got ${o.seed}`);
  if (o.gridPoints !== undefined && !(Number.isInteger(o.gridPoints) && o.gridPoints >= 11 && o.gridPoints <= 2001))
    throw new RangeError(`${fn}: options.gridPoints must be an integer in [11, 2001], got ${o.gridPoints}`);
  if (
    o.precision !== undefined &&
    !(o.precision.relative >= 0 && o.precision.absolute >= 0 && o.precision.relative + o.precision.absolute > 0)
  )
    throw new RangeError(
      `${fn}: options.precision needs relative ≥ 0 and absolute ≥ 0, not both 0; got ${JSON.stringify(o.precision)}`,
    );
  for (const h of o.riverHistory ?? [])
    if (!Number.isFinite(h.conc) || !Number.isFinite(h.daysBeforeSurvey))
      throw new RangeError(
        `${fn}: options.riverHistory entries need finite conc and daysBeforeSurvey, got ${JSON.stringify(h)}`,
      );
}
