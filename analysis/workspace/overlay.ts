/**
 * Map-ready geometry derived (through analysis/geometry) from the channel and from each survey's
 * analysis, so a map only draws: channel paths and km ticks, isohaline crossings, reaction-zone
 * stretches and maxima.
 */
import { pointAtKm } from "../geometry/alongChannel.ts";
import { channelStretch } from "../geometry/channelStretch.ts";
import { kmTicks } from "../geometry/kmTicks.ts";
import type { ChannelNetwork } from "../geometry/types.ts";
import type { SurveyAnalysis } from "../pipeline/surveyAnalysis.ts";
import { minOf, maxOf } from "../survey/arrayExtent.ts";

export type LonLat = [number, number];

/** Tick spacing on the map [km]; every `MAJOR_TICK_EVERY`-th tick is labelled. */
export const TICK_SPACING_KM = 1;
export const MAJOR_TICK_EVERY = 5;

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

/** The channel's paths and km ticks. */
export function channelOverlay(network: ChannelNetwork): ChannelOverlay {
  const ticks = kmTicks(network, TICK_SPACING_KM).features.map((f) => ({
    km: f.properties.km,
    lonLat: f.geometry.coordinates as LonLat,
    major: Math.round(f.properties.km / TICK_SPACING_KM) % MAJOR_TICK_EVERY === 0,
    label: f.properties.label,
    branchId: f.properties.branchId,
    bearingDeg: f.properties.bearingDeg,
  }));
  return { paths: network.branches.map((b) => ({ branchId: b.id, path: b.coordinates as LonLat[] })), ticks };
}

/** Points of the main stem at each km, skipping any km outside it. */
function pointsAtKm(network: ChannelNetwork, kms: readonly number[]): LonLat[] {
  const head = network.branches.find((b) => b.id === network.mainBranchId)?.kmEnd ?? 0;
  return kms.filter((km) => km >= 0 && km <= head).map((km) => pointAtKm(network, km));
}

/**
 * The reaction zones, maxima and isohalines of one analysis, placed on the channel.
 *
 * @param analysis one survey's analysis
 * @param network the channel (undefined → empty overlay)
 * @param ticks the channel's ticks (for label bearings)
 */
export function surveyOverlay(
  analysis: SurveyAnalysis,
  network: ChannelNetwork | undefined,
  ticks: ChannelOverlay["ticks"],
): SurveyOverlay {
  if (!network) return { isohalines: [], constituents: {} };
  const mainTicks = ticks.filter((t) => t.branchId === network.mainBranchId);
  const bearingNear = (km: number): number =>
    mainTicks.reduce((best, t) => (Math.abs(t.km - km) < Math.abs(best.km - km) ? t : best), mainTicks[0]!)
      ?.bearingDeg ?? 0;
  const isohalines = analysis.survey.isohalines.flatMap((iso) =>
    iso.km.flatMap((km) =>
      pointsAtKm(network, [km]).map((lonLat) => ({ salinity: iso.salinity, km, lonLat, bearingDeg: bearingNear(km) })),
    ),
  );
  const constituents: Record<string, ConstituentOverlay> = {};
  for (const c of analysis.constituents) {
    const zonePaths: LonLat[][] = [];
    for (const range of c.reactionZone?.km ?? []) {
      const g = channelStretch(network, [minOf(range), maxOf(range)], network.mainBranchId);
      if (g?.type === "LineString") zonePaths.push(g.coordinates as LonLat[]);
      else if (g?.type === "MultiLineString") zonePaths.push(...(g.coordinates as LonLat[][]));
    }
    constituents[c.name] = {
      zonePaths,
      zoneKind: c.reactionZone?.kind,
      maximumPoints: pointsAtKm(network, c.maximum?.km ?? []),
    };
  }
  return { isohalines, constituents };
}
