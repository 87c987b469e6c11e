import type { Endmember } from "./result.ts";
import type { EndmemberOverride } from "./options.ts";
import type { PreparedSample } from "./prepareSamples.ts";

/** Salinity window of the river group: stations within this of the lowest salinity. */
export const RIVER_GROUP_DS = 0.5;
/** Salinity window of the sea group: stations within this of the highest salinity. */
export const SEA_GROUP_DS = 1.0;

/**
 * End-member from the data: the group of stations at one salinity extreme.
 *
 * Group rule (documented choice): all stations within ΔS of the extreme
 * (ΔS = {@link RIVER_GROUP_DS} for the river, {@link SEA_GROUP_DS} for the sea), at least
 * 1 and at most max(1, ⌊n/4⌋) stations, nearest the extreme first. Concentration =
 * group mean; concSd = between-sample standard deviation when n ≥ 2, else the
 * analytical σ of the single value; salinity = group mean salinity.
 *
 * @param used samples sorted by salinity (non-empty)
 * @param which "river" (low-salinity end) or "sea" (high-salinity end)
 * @returns the data end-member
 * @throws RangeError when `used` is empty
 */
export function endmemberFromData(used: readonly PreparedSample[], which: "river" | "sea"): Endmember {
  if (used.length === 0) throw new RangeError("endmemberFromData: no samples");
  const n = used.length;
  const cap = Math.max(1, Math.floor(n / 4));
  const ordered = which === "river" ? used : [...used].reverse();
  const extreme = ordered[0]!.salinity;
  const ds = which === "river" ? RIVER_GROUP_DS : SEA_GROUP_DS;
  const group = ordered.filter((s) => Math.abs(s.salinity - extreme) <= ds).slice(0, cap);
  const m = group.length;
  const conc = group.reduce((a, s) => a + s.conc, 0) / m;
  const salinity = group.reduce((a, s) => a + s.salinity, 0) / m;
  const sd = m >= 2 ? Math.sqrt(group.reduce((a, s) => a + (s.conc - conc) ** 2, 0) / (m - 1)) : group[0]!.sigma;
  return { salinity, conc, concSd: sd, n: m, source: "data", stationIds: group.map((s) => s.stationId) };
}

/**
 * Applies a user override to a data end-member (value ± sd at a salinity).
 *
 * @param fn public function name for messages
 * @param which "river" or "sea"
 * @param data end-member from the data (undefined when there are no data)
 * @param o the override
 * @param sigmaOfConc analytical σ for a given concentration (default sd)
 * @returns the override end-member (source "override", n = 0)
 * @throws RangeError for non-finite or negative values
 */
export function applyOverride(
  fn: string,
  which: "river" | "sea",
  data: Endmember | undefined,
  o: EndmemberOverride,
  sigmaOfConc: (c: number) => number,
): Endmember {
  if (!Number.isFinite(o.conc)) throw new RangeError(`${fn}: options.${which}.conc must be finite, got ${o.conc}`);
  if (o.concSd !== undefined && !(o.concSd >= 0))
    throw new RangeError(`${fn}: options.${which}.concSd must be ≥ 0, got ${o.concSd}`);
  if (o.salinity !== undefined && !(o.salinity >= 0 && o.salinity < 50))
    throw new RangeError(`${fn}: options.${which}.salinity must be in [0, 50), got ${o.salinity}`);
  const salinity = o.salinity ?? data?.salinity ?? (which === "river" ? 0 : 35);
  return { salinity, conc: o.conc, concSd: o.concSd ?? sigmaOfConc(o.conc), n: 0, source: "override", stationIds: [] };
}
