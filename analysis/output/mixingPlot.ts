/**
 * The one mixing-plot model: what a plot of concentration against salinity shows for one constituent,
 * in data units (salinity, concentration). The dashboard scales it to pixels, the briefing to SVG; both
 * draw the same layers by the same rules.
 */
import type { ConstituentAnalysis } from "../mixing/result.ts";
import { minOf, maxOf } from "../survey/arrayExtent.ts";

/** A straight segment in data units: salinity (PSS-78) → concentration (the constituent's unit). */
export interface DataSegment {
  s0: number;
  c0: number;
  s1: number;
  c1: number;
}

/** Everything a mixing plot draws, in data units. */
export interface MixingPlotModel {
  /** Axis ranges, starting at zero. */
  salinityDomain: [number, number];
  concDomain: [number, number];
  points: Array<{ stationId: string; salinity: number; conc: number; belowDetection: boolean; significant: boolean }>;
  /** Theoretical dilution line between the end-members. */
  dilution?: DataSegment;
  /** Fitted curve and its 95 % band. */
  fit?: { salinity: number[]; conc: number[]; lower: number[]; upper: number[] };
  /**
   * Seaward tangent, from the river salinity to the seaward end of the segment it was fitted to.
   * Drawn only when the constituent is not conservative and not short of data: for a conservative
   * constituent the tangent coincides with the dilution line and C*₀ with the river end-member.
   */
  tangent?: DataSegment;
  /** C*₀ with its 95 % interval at the river salinity (shown with the tangent). */
  effective?: { salinity: number; value: number; lower: number; upper: number };
  zone?: { salinity: [number, number]; kind: string };
  maximum?: { salinity: number; lower: number; upper: number };
}

function upperOf(values: readonly number[], fallback: number): number {
  const finite = values.filter(Number.isFinite);
  const hi = finite.length ? maxOf(finite) : fallback;
  return hi > 0 ? hi : fallback;
}

/**
 * Builds the mixing-plot model of one constituent from its analysis.
 *
 * @param c the constituent's analysis (analyzeSurvey)
 * @returns the layers to draw, in data units
 */
export function mixingPlotModel(c: ConstituentAnalysis): MixingPlotModel {
  const line = c.dilutionLine;
  const riverS = line?.river.salinity ?? c.endmembers?.river.salinity ?? 0;
  const showTangent = c.class !== "conservative" && c.class !== "insufficient-data";
  const model: MixingPlotModel = {
    salinityDomain: [0, upperOf([...c.deviations.map((d) => d.salinity), line?.sea.salinity ?? 0], 35)],
    concDomain: [
      0,
      upperOf(
        [
          ...c.deviations.map((d) => d.observed),
          line?.river.conc ?? 0,
          line?.sea.conc ?? 0,
          ...(c.fit?.conc ?? []),
          ...(showTangent && c.effectiveEndmember ? [c.effectiveEndmember.upper] : []),
        ],
        1,
      ),
    ],
    points: c.deviations.map((d) => ({
      stationId: d.stationId,
      salinity: d.salinity,
      conc: d.observed,
      belowDetection: d.censored,
      significant: d.significant,
    })),
  };
  if (line) model.dilution = { s0: line.river.salinity, c0: line.river.conc, s1: line.sea.salinity, c1: line.sea.conc };
  if (c.fit && c.fit.salinity.length > 1)
    model.fit = { salinity: c.fit.salinity, conc: c.fit.conc, lower: c.fit.lower, upper: c.fit.upper };
  const t = c.tangent;
  if (t && showTangent) {
    const sEnd = t.salinityRange[1];
    model.tangent = { s0: riverS, c0: t.intercept + t.slope * riverS, s1: sEnd, c1: t.intercept + t.slope * sEnd };
    const e = c.effectiveEndmember;
    if (e) model.effective = { salinity: riverS, value: e.value, lower: e.lower, upper: e.upper };
  }
  if (c.reactionZone)
    model.zone = {
      salinity: [minOf(c.reactionZone.salinity), maxOf(c.reactionZone.salinity)],
      kind: c.reactionZone.kind,
    };
  if (c.maximum)
    model.maximum = {
      salinity: c.maximum.salinity.value,
      lower: c.maximum.salinity.lower,
      upper: c.maximum.salinity.upper,
    };
  return model;
}
