/**
 * Drawing model of the mixing plot (concentration vs salinity): one scale pair
 * and the screen geometry of every layer, shared by the SVG and canvas
 * renderers. The layers are the output spec's mixing-plot model
 * (analysis/output), scaled to pixels here.
 */
import type { ScaleLinear } from "d3-scale";
import { mixingPlotModel, type DataSegment } from "../../../../analysis/index.ts";
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

/**
 * Builds the scales and geometry of the mixing plot for one constituent: the output spec's
 * mixing-plot model (analysis/output mixingPlotModel, the same the briefing draws) scaled to the
 * frame. Points are every observation, QC-rejected ones included, so they can be drawn as such.
 */
export function mixingModel(c: ConstituentAnalysisView | undefined, frame: Frame): MixingModel {
  const obs = observationsOf(c);
  const data = c ? mixingPlotModel(c) : undefined;
  const fit = data?.fit;
  const eff = data?.effective;
  const xDomain = extent([0, ...obs.map((o) => o.salinity), ...(data?.salinityDomain ?? [])]);
  const yDomain = extent([
    0,
    ...obs.map((o) => o.value),
    data?.dilution?.c0,
    data?.dilution?.c1,
    // The band is clipped to the frame rather than allowed to stretch the axis.
    ...(fit?.conc ?? []),
    // Axes follow the data (issue 14): the C*₀ interval is clipped to the frame with a marker, not allowed to squash the data.
    eff?.value,
  ]);
  const x = linear(xDomain, [frame.x0, frame.x1], { zero: true });
  const y = linear(yDomain, [frame.y1, frame.y0], { zero: true });
  const points = obs.map((o) => ({ ...o, px: round(x(o.salinity)), py: round(y(o.value)) }));

  const model: MixingModel = { x, y, points, fitPath: "", bandPath: "" };
  const segment = (d: DataSegment) => ({
    x1: round(x(d.s0)),
    y1: round(y(d.c0)),
    x2: round(x(d.s1)),
    y2: round(y(d.c1)),
  });
  if (data?.dilution) model.dilution = segment(data.dilution);
  if (fit) {
    const xs = fit.salinity.map(x);
    model.fitPath = linePath(xs, fit.conc.map(y));
    model.bandPath = bandPath(xs, fit.lower.map(y), fit.upper.map(y));
  }
  if (data?.tangent) model.tangent = segment(data.tangent);
  if (eff) {
    const [top, bottom] = [Math.min(frame.y0, frame.y1), Math.max(frame.y0, frame.y1)];
    const pyLower = round(y(eff.lower));
    const pyUpper = round(y(eff.upper));
    model.effective = {
      px: round(x(eff.salinity)),
      py: round(y(eff.value)),
      pyLower: Math.min(bottom, Math.max(top, pyLower)),
      pyUpper: Math.min(bottom, Math.max(top, pyUpper)),
      clippedLower: pyLower > bottom,
      clippedUpper: pyUpper < top,
    };
  }
  const z = data?.zone;
  if (z) {
    const a = x(z.salinity[0]);
    const b = x(z.salinity[1]);
    model.zone = { x: round(a), width: round(Math.max(1, b - a)), kind: z.kind as "removal" | "addition" };
  }
  const m = data?.maximum;
  if (m) model.maximum = { px: round(x(m.salinity)), pxLower: round(x(m.lower)), pxUpper: round(x(m.upper)) };
  return model;
}
