/**
 * Map-ready geometry the worker derives (through analysis/geometry) from the
 * channel and from each survey's analysis, so the map only draws.
 */

export type LonLat = [number, number];

/** The channel network as drawn: one path per branch, and km ticks from the mouth. */
export interface ChannelOverlay {
  paths: Array<{ branchId: string; path: LonLat[] }>;
  ticks: Array<{
    km: number;
    lonLat: LonLat;
    major: boolean;
    label: string;
    branchId: string;
    /** Channel direction looking upstream, clockwise from north [deg]; used to set labels beside the channel. */
    bearingDeg: number;
  }>;
}

/** Where one constituent's reaction zone and maximum lie on the channel. */
export interface ConstituentOverlay {
  /** Channel stretches of the reaction zone, one path per km interval. */
  zonePaths: LonLat[][];
  zoneKind: "removal" | "addition" | undefined;
  /** Positions of the mid-estuarine maximum (several when S(x) is not monotonic). */
  maximumPoints: LonLat[];
}

/** One survey's overlay: isohaline crossings and per-constituent zones. */
export interface SurveyOverlay {
  isohalines: Array<{ salinity: number; km: number; lonLat: LonLat; bearingDeg: number }>;
  constituents: Record<string, ConstituentOverlay>;
}

export function emptySurveyOverlay(): SurveyOverlay {
  return { isohalines: [], constituents: {} };
}
