/**
 * Drawing model of the channel profile: a constituent and salinity against
 * along-channel distance from the mouth, with the river on the left and the
 * mouth on the right (as in the mixing plot, fresh to salt).
 */
import type { ScaleLinear } from "d3-scale";
import { extent, linear, linePath, round, type Frame } from "./scales.ts";
import { observationsOf, placementsById } from "./observations.ts";
import type { ConstituentAnalysisView, ObservationPoint, SurveyAnalysisView } from "./types.ts";

export interface ProfilePoint extends ObservationPoint {
  km: number;
  px: number;
  py: number;
}

export interface ProfileModel {
  x: ScaleLinear<number, number>;
  yConc: ScaleLinear<number, number>;
  ySal: ScaleLinear<number, number>;
  points: ProfilePoint[];
  /** Station salinity along the channel, sorted by distance. */
  salinity: Array<{ stationId: string; km: number; salinity: number; px: number; py: number }>;
  salinityPath: string;
  zones: Array<{ x: number; width: number }>;
  zoneKind?: "removal" | "addition";
  maxima: number[];
  /** Observations not drawn because their station has no channel position. */
  unplaced: number;
}

/** Builds scales and geometry of the channel profile for one constituent. */
export function profileModel(
  analysis: SurveyAnalysisView,
  c: ConstituentAnalysisView | undefined,
  frame: Frame,
): ProfileModel {
  const byId = placementsById(analysis);
  const obs = observationsOf(c);
  const placed = obs.flatMap((o) => {
    const km = byId.get(o.stationId)?.alongChannelKm;
    return km === undefined || !Number.isFinite(km) ? [] : [{ ...o, km }];
  });
  // Off-channel stations (a side basin) have no place on this channel's salinity profile unless kept in the fits.
  const keepOff = analysis.offChannel?.kept === true;
  const sal = analysis.stations
    .filter((s) => s.alongChannelKm !== undefined && s.salinity !== undefined && (keepOff || !s.offChannel))
    .map((s) => ({ stationId: s.id, km: s.alongChannelKm as number, salinity: s.salinity as number }))
    .sort((a, b) => a.km - b.km);
  const zoneKm = c?.reactionZone?.km ?? [];
  const maxKm = c?.maximum?.km ?? [];
  const kmDomain = extent([0, ...placed.map((p) => p.km), ...sal.map((s) => s.km), ...zoneKm.flat(), ...maxKm]);
  // Reversed: upstream (large km) on the left, mouth (0 km) on the right.
  const x = linear(kmDomain ? [kmDomain[1], kmDomain[0]] : undefined, [frame.x0, frame.x1]);
  const yConc = linear(extent([0, ...placed.map((p) => p.value)]), [frame.y1, frame.y0], { zero: true });
  const ySal = linear(extent([0, ...sal.map((s) => s.salinity)]), [frame.y1, frame.y0], { zero: true });
  const salinity = sal.map((s) => ({ ...s, px: round(x(s.km)), py: round(ySal(s.salinity)) }));
  return {
    x,
    yConc,
    ySal,
    points: placed.map((p) => ({ ...p, px: round(x(p.km)), py: round(yConc(p.value)) })),
    salinity,
    salinityPath: linePath(
      salinity.map((s) => s.px),
      salinity.map((s) => s.py),
    ),
    zones: zoneKm.map(([a, b]) => {
      const l = Math.min(x(a), x(b));
      return { x: round(l), width: round(Math.max(1, Math.abs(x(b) - x(a)))) };
    }),
    zoneKind: c?.reactionZone?.kind,
    maxima: maxKm.map((k) => round(x(k))),
    unplaced: obs.length - placed.length,
  };
}

/** Station ids whose screen x lies within [a, b] (a brushed stretch of channel). */
export function idsInScreenRange(
  points: ReadonlyArray<{ stationId: string; px: number }>,
  a: number,
  b: number,
): string[] {
  return [...new Set(points.filter((p) => p.px >= a && p.px <= b).map((p) => p.stationId))];
}
