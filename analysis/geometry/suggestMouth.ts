/**
 * Suggest which end of the main stem is the mouth, from the salinity of projected stations.
 */
import type { ChannelNetwork } from "./types.ts";
import { projectLonLatArrays } from "./projectBulk.ts";
import { MAX_ABS_LAT_DEG, normalizeLon } from "./lonLat.ts";

/** A station as evidence: position and salinity (either may be missing). */
export interface MouthEvidence {
  /** [lon, lat] [deg]. */
  lonLat?: [number, number] | undefined;
  /** Practical salinity (PSS-78). */
  salinity?: number | undefined;
}

/** The suggestion, stated as such. */
export interface MouthSuggestion {
  /** The suggested mouth in the input's terms: first ("start") or last ("end") vertex of the main stem as given. */
  mouth: "start" | "end";
  /** That vertex [lon, lat]. */
  mouthLonLat: [number, number];
  /** Spearman rank correlation of salinity with chainage from the network's current km 0. */
  spearmanRho: number;
  /** Stations used. */
  nStations: number;
  /** Plain-language notice to show the user (a suggestion, not a fact). */
  notice: string;
}

function ranks(v: readonly number[]): number[] {
  const order = v.map((_, i) => i).sort((a, b) => v[a]! - v[b]!);
  const r = new Array<number>(v.length);
  for (let i = 0; i < order.length;) {
    let j = i;
    while (j + 1 < order.length && v[order[j + 1]!] === v[order[i]!]) j++;
    for (let k = i; k <= j; k++) r[order[k]!] = (i + j) / 2 + 1;
    i = j + 1;
  }
  return r;
}

/** Spearman rank correlation (Pearson correlation of mid-ranks); NaN when a variable is constant. */
export function spearmanRho(x: readonly number[], y: readonly number[]): number {
  const [rx, ry] = [ranks(x), ranks(y)];
  const n = x.length;
  const mean = (n + 1) / 2;
  let [sxy, sxx, syy] = [0, 0, 0];
  for (let i = 0; i < n; i++) {
    const [a, b] = [rx[i]! - mean, ry[i]! - mean];
    [sxy, sxx, syy] = [sxy + a * b, sxx + a * a, syy + b * b];
  }
  return sxy / Math.sqrt(sxx * syy);
}

/**
 * Suggest the mouth: salinity is higher seaward, so the main-stem end towards which
 * salinity rises is suggested. The evidence is the Spearman rank correlation between
 * station chainage (from the network's current km 0) and salinity.
 *
 * @param network from buildChannelNetwork (any mouth choice)
 * @param stations positions [deg] and salinities (PSS-78)
 * @returns the suggestion with a notice, or undefined when fewer than 3 stations have both a
 *   position and a salinity, or when salinity or chainage does not vary
 * @see Spearman, C. (1904) The proof and measurement of association between two things,
 *   Am. J. Psychol. 15:72–101 (rank correlation).
 */
export function suggestMouth(network: ChannelNetwork, stations: readonly MouthEvidence[]): MouthSuggestion | undefined {
  const usable = stations.filter(
    (s): s is { lonLat: [number, number]; salinity: number } =>
      s.lonLat !== undefined &&
      Number.isFinite(s.lonLat[0]) &&
      Math.abs(s.lonLat[1]) <= MAX_ABS_LAT_DEG &&
      s.salinity !== undefined &&
      Number.isFinite(s.salinity),
  );
  if (usable.length < 3) return undefined;
  const proj = projectLonLatArrays(
    network,
    Float64Array.from(usable, (s) => s.lonLat[0]),
    Float64Array.from(usable, (s) => s.lonLat[1]),
  );
  const km = Array.from(proj.alongChannelKm);
  const rho = spearmanRho(
    km,
    usable.map((s) => s.salinity),
  );
  if (!Number.isFinite(rho)) return undefined;
  const main = network.branches[0]!;
  const keep = rho < 0; // salinity falls with km: the current km 0 is seaward
  const atFirstGiven = keep !== main.reversed;
  const vertex = keep ? main.coordinates[0]! : main.coordinates[main.coordinates.length - 1]!;
  const mouthLonLat: [number, number] = [normalizeLon(vertex[0]), vertex[1]];
  const strength = Math.abs(rho) >= 0.8 ? "strong" : Math.abs(rho) >= 0.5 ? "moderate" : "weak";
  const notice =
    `Suggested mouth: the ${atFirstGiven ? "first" : "last"} vertex of main stem '${main.id}' ` +
    `[${mouthLonLat[0].toFixed(5)}, ${mouthLonLat[1].toFixed(5)}], because salinity rises towards it ` +
    `(Spearman ρ = ${(keep ? rho : -rho).toFixed(2)} between salinity and distance from it, n = ${usable.length}; ${strength} evidence). ` +
    `This is a suggestion from the survey data; confirm it by setting the mouth explicitly.`;
  return { mouth: atFirstGiven ? "start" : "end", mouthLonLat, spearmanRho: rho, nStations: usable.length, notice };
}
