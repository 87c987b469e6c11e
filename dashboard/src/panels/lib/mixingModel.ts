/**
 * Drawing model of the mixing plot (concentration vs salinity): one scale pair
 * and the screen geometry of every layer, shared by the SVG and canvas
 * renderers. Lines are drawn between values the analysis returned.
 */
import type { ScaleLinear } from "d3-scale";
import { bandPath, extent, linear, linePath, round, type Frame } from "./scales.ts";
import { observationsOf } from "./observations.ts";
import type { ConstituentAnalysisView, ObservationPoint } from "./types.ts";

export interface ScreenPoint extends ObservationPoint {
  px: number;
  py: number;
}

export interface MixingModel {
  x: ScaleLinear<number, number>;
  y: ScaleLinear<number, number>;
  points: ScreenPoint[];
  /** Theoretical dilution line between the end-members. */
  dilution?: { x1: number; y1: number; x2: number; y2: number };
  fitPath: string;
  bandPath: string;
  /** Tangent from the seaward segment back to the river end-member salinity. */
  tangent?: { x1: number; y1: number; x2: number; y2: number };
  /** Effective river end-member C*₀ with its 95 % interval, at the river salinity. */
  effective?: {
    px: number;
    py: number;
    pyLower: number;
    pyUpper: number;
    clippedLower?: boolean;
    clippedUpper?: boolean;
  };
  zone?: { x: number; width: number; kind: "removal" | "addition" };
  maximum?: { px: number; pxLower: number; pxUpper: number };
}

/** Builds the scales and geometry of the mixing plot for one constituent. */
export function mixingModel(c: ConstituentAnalysisView | undefined, frame: Frame): MixingModel {
  const obs = observationsOf(c);
  const line = c?.dilutionLine;
  const fit = c?.fit;
  const eff = c?.effectiveEndmember;
  const riverS = line?.river.salinity ?? c?.endmembers?.river.salinity ?? 0;
  const xDomain = extent([0, ...obs.map((o) => o.salinity), line?.sea.salinity, ...(fit?.salinity ?? [])]);
  const yDomain = extent([
    0,
    ...obs.map((o) => o.value),
    line?.river.conc,
    line?.sea.conc,
    // The band is clipped to the frame rather than allowed to stretch the axis.
    ...(fit?.conc ?? []),
    // Axes follow the data (issue 14): the C*₀ interval is clipped to the frame with a marker, not allowed to squash the data.
    eff?.value,
  ]);
  const x = linear(xDomain, [frame.x0, frame.x1], { zero: true });
  const y = linear(yDomain, [frame.y1, frame.y0], { zero: true });
  const points = obs.map((o) => ({ ...o, px: round(x(o.salinity)), py: round(y(o.value)) }));

  const model: MixingModel = { x, y, points, fitPath: "", bandPath: "" };
  if (line) {
    model.dilution = {
      x1: round(x(line.river.salinity)),
      y1: round(y(line.river.conc)),
      x2: round(x(line.sea.salinity)),
      y2: round(y(line.sea.conc)),
    };
  }
  if (fit && fit.salinity.length > 1) {
    const xs = fit.salinity.map(x);
    model.fitPath = linePath(xs, fit.conc.map(y));
    model.bandPath = bandPath(xs, fit.lower.map(y), fit.upper.map(y));
  }
  const t = c?.tangent;
  if (t) {
    const sEnd = t.salinityRange[1];
    model.tangent = {
      x1: round(x(riverS)),
      y1: round(y(t.intercept + t.slope * riverS)),
      x2: round(x(sEnd)),
      y2: round(y(t.intercept + t.slope * sEnd)),
    };
  }
  if (eff) {
    const [top, bottom] = [Math.min(frame.y0, frame.y1), Math.max(frame.y0, frame.y1)];
    const pyLower = round(y(eff.lower));
    const pyUpper = round(y(eff.upper));
    model.effective = {
      px: round(x(riverS)),
      py: round(y(eff.value)),
      pyLower: Math.min(bottom, Math.max(top, pyLower)),
      pyUpper: Math.min(bottom, Math.max(top, pyUpper)),
      clippedLower: pyLower > bottom,
      clippedUpper: pyUpper < top,
    };
  }
  const z = c?.reactionZone;
  if (z) {
    const a = x(Math.min(...z.salinity));
    const b = x(Math.max(...z.salinity));
    model.zone = { x: round(a), width: round(Math.max(1, b - a)), kind: z.kind };
  }
  const m = c?.maximum;
  if (m) {
    model.maximum = {
      px: round(x(m.salinity.value)),
      pxLower: round(x(m.salinity.lower)),
      pxUpper: round(x(m.salinity.upper)),
    };
  }
  return model;
}
