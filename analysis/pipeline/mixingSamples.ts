import type { MixingSample } from "../mixing/options.ts";
import type { Station, ValueCell } from "../survey/survey.ts";

/** Samples of one constituent ready for the mixing analysis, and what was left out and why. */
export interface ConstituentSamples {
  samples: MixingSample[];
  /** Stations left out, by reason (e.g. "no accepted salinity": 2). */
  leftOut: Record<string, number>;
}

/** The value of a cell when it was measured and accepted by QC; otherwise undefined. */
export function acceptedValue(cell: ValueCell | undefined): number | undefined {
  return cell && cell.status === "measured" && cell.accepted && cell.value !== undefined ? cell.value : undefined;
}

/**
 * Turns survey stations into mixing samples for one constituent.
 *
 * A station takes part when its salinity is measured and accepted (the salinity of the value's own
 * sample when layer selection recorded one, else the station's). Measured values pass as they are
 * (QC-rejected ones are kept with `accepted: false`, so the analysis can show but not use them);
 * below-detection values pass as censored with their limit; a below-detection value without a stated
 * limit ("ND") cannot be placed on the concentration axis and is left out and counted — never
 * replaced by zero. Missing and unreadable cells are left out and counted.
 *
 * @param stations survey stations
 * @param constituent constituent name (key of `Station.values`)
 * @returns samples and the counts of stations left out by reason
 */
export function constituentSamples(stations: readonly Station[], constituent: string): ConstituentSamples {
  const samples: MixingSample[] = [];
  const leftOut: Record<string, number> = {};
  const skip = (reason: string): void => {
    leftOut[reason] = (leftOut[reason] ?? 0) + 1;
  };
  for (const st of stations) {
    const cell = st.values[constituent];
    // A value chosen by layer selection carries the salinity of its own sample (same depth).
    const salinity = cell?.sampleSalinity ?? acceptedValue(st.salinity);
    if (salinity === undefined) {
      skip("no accepted salinity");
      continue;
    }
    if (!cell || cell.status === "missing") {
      skip("value missing");
      continue;
    }
    if (cell.status === "invalid") {
      skip("value unreadable");
      continue;
    }
    if (cell.status === "belowDetection") {
      if (cell.detectionLimit === undefined) {
        skip("below detection without a stated limit");
        continue;
      }
      samples.push({
        stationId: st.id,
        salinity,
        conc: cell.detectionLimit,
        censored: true,
        detectionLimit: cell.detectionLimit,
        accepted: cell.accepted,
      });
      continue;
    }
    samples.push({ stationId: st.id, salinity, conc: cell.value!, censored: false, accepted: cell.accepted });
  }
  return { samples, leftOut };
}
