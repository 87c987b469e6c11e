/**
 * The discharge scatter of the archive view: one constituent's % change against river discharge
 * (log axis) with the fitted line and its 95 % band, all from analysis/archive's relation
 * (`vsDischarge.percentChange`); only placed here.
 */
import { scaleLog } from "d3-scale";
import { maxOf, minOf, type ConstituentSeries } from "../../../analysis/index.ts";
import { makeFrame, round, type Frame } from "../panels/lib/scales.ts";
import {
  estimateText,
  fmt,
  styleOf,
  valueAxis,
  type PanelPoint,
  type SeasonStyle,
  type ValueAxis,
} from "./archiveModel.ts";

/** Frame of the discharge scatter. */
export const SCATTER_FRAME = makeFrame(420, 230, { top: 10, right: 12, bottom: 34, left: 50 });

/** % change against river discharge with the fitted line and its 95 % band (analysis/archive's relation). */
export interface DischargeScatter {
  points: PanelPoint[];
  xTicks: Array<{ x: number; label: string }>;
  axis: ValueAxis;
  /** SVG paths of the fitted line and its band (absent without a fit). */
  line?: string;
  band?: string;
  /** The relation's plain statement (the analysis' words). */
  statement: string;
}

/**
 * The discharge scatter of one constituent's % change, or undefined when fewer than two surveys
 * have both a discharge and a % change.
 */
export function dischargeScatter(
  series: ConstituentSeries,
  styles: ReadonlyMap<string, SeasonStyle>,
  frame: Frame = SCATTER_FRAME,
): DischargeScatter | undefined {
  const rel = series.vsDischarge.percentChange;
  const pts = series.points.filter((p) => p.percentChange && p.dischargeM3s !== undefined && p.dischargeM3s > 0);
  if (pts.length < 2) return undefined;
  const qs = pts.map((p) => p.dischargeM3s!);
  const band = rel?.band ?? [];
  const qAll = [...qs, ...band.map((b) => b.dischargeM3s)];
  const xs = scaleLog()
    .domain([minOf(qAll), maxOf(qAll)])
    .range([frame.x0, frame.x1])
    .nice();
  const x = (q: number) => round(xs(q));
  const values = [
    ...pts.flatMap((p) => [p.percentChange!.lower, p.percentChange!.upper]),
    ...band.flatMap((b) => [b.lower, b.upper]),
  ];
  const { y, axis } = valueAxis(values.filter(Number.isFinite), frame, "% change", true);
  const tickFmt = xs.tickFormat(6, "~g");
  const points = pts.map((p): PanelPoint => {
    const st = styleOf(p, styles);
    const e = p.percentChange!;
    return {
      survey: p.survey,
      x: x(p.dischargeM3s!),
      y: y(e.value),
      ...(Number.isFinite(e.lower) && Number.isFinite(e.upper) ? { y0: y(e.lower), y1: y(e.upper) } : {}),
      colour: st.colour,
      mark: st.mark,
      title: `${p.survey}, ${p.date ?? "no date"}, ${fmt(p.dischargeM3s!)} m³/s: ${estimateText(e, "%")}`,
    };
  });
  const line =
    band.length >= 2 ? band.map((b, i) => `${i ? "L" : "M"}${x(b.dischargeM3s)},${y(b.value)}`).join("") : undefined;
  const bandPath =
    band.length >= 2
      ? band.map((b, i) => `${i ? "L" : "M"}${x(b.dischargeM3s)},${y(b.upper)}`).join("") +
        [...band]
          .reverse()
          .map((b) => `L${x(b.dischargeM3s)},${y(b.lower)}`)
          .join("") +
        "Z"
      : undefined;
  return {
    points,
    xTicks: xs
      .ticks(6)
      .filter((q) => tickFmt(q) !== "")
      .map((q) => ({ x: x(q), label: tickFmt(q) })),
    axis,
    ...(line ? { line } : {}),
    ...(bandPath ? { band: bandPath } : {}),
    statement: rel?.statement ?? "No fit: too few surveys with a known discharge.",
  };
}
