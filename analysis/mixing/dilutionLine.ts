import type { DilutionLine, Endmember, StationDeviation } from "./result.ts";
import type { PreparedSample } from "./prepareSamples.ts";

/**
 * Theoretical dilution line between two end-members (two-end-member conservative mixing):
 * C_TDL(S) = C_r + (C_s − C_r)·(S − S_r)/(S_s − S_r), written as intercept + slope·S.
 *
 * @param river river end-member (salinity S_r, conc C_r)
 * @param sea sea end-member (salinity S_s > S_r)
 * @param unit concentration unit
 * @returns the line
 * @throws RangeError when S_s ≤ S_r
 * @see bibliography key liss1976.
 */
export function dilutionLine(river: Endmember, sea: Endmember, unit: string): DilutionLine {
  if (!(sea.salinity > river.salinity))
    throw new RangeError(`dilutionLine: sea salinity (${sea.salinity}) must exceed river salinity (${river.salinity})`);
  const slope = (sea.conc - river.conc) / (sea.salinity - river.salinity);
  return { slope, intercept: river.conc - slope * river.salinity, river, sea, unit };
}

/** Concentration on the dilution line at salinity S [unit]. */
export function dilutionAt(line: DilutionLine, salinity: number): number {
  return line.intercept + line.slope * salinity;
}

/**
 * Deviation of each station from the dilution line: ΔC = C_obs − C_TDL and
 * 100·ΔC/C_TDL; significant when |ΔC| > k·σ (σ = analytical precision).
 * When C_TDL ≤ 0 the percentage is reported as 0 (undefined ratio).
 *
 * @param line the dilution line
 * @param used prepared samples
 * @param k significance factor (default 2)
 * @returns one deviation per sample, in salinity order
 * @see common practice (k = 2 or 3).
 */
export function deviations(line: DilutionLine, used: readonly PreparedSample[], k: number): StationDeviation[] {
  return used.map((s) => {
    const expected = dilutionAt(line, s.salinity);
    const deviation = s.conc - expected;
    return {
      stationId: s.stationId,
      salinity: s.salinity,
      observed: s.conc,
      expected,
      deviation,
      // 0 when the ratio is undefined (expected ≤ 0) or overflows: never NaN or ±Infinity.
      deviationPercent:
        expected > 0 && Number.isFinite((100 * deviation) / expected) ? (100 * deviation) / expected : 0,
      significant: Math.abs(deviation) > k * s.sigma,
      censored: s.censored,
    };
  });
}
