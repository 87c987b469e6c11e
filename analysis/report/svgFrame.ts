/**
 * Plot frame for the briefing's inline SVG charts: linear scales (d3-scale), nice ticks,
 * axes with labels and units. All coordinates are rounded to 0.1 for compact, deterministic output.
 */
import { scaleLinear, type ScaleLinear } from "d3-scale";
import { formatSignificant } from "../output/formatNumber.ts";
import { html, joinHtml, type SafeHtml } from "./html.ts";
import { minOf, maxOf } from "../survey/arrayExtent.ts";

/** Colours of the briefing (own choice; colour-blind-distinguishable pairs). */
export const PALETTE = [
  "#b2182b",
  "#2166ac",
  "#1b7837",
  "#762a83",
  "#b35806",
  "#35978f",
  "#8c510a",
  "#4d4d4d",
] as const;

/** A chart area with its scales. */
export interface PlotFrame {
  width: number;
  height: number;
  left: number;
  right: number;
  top: number;
  bottom: number;
  x: ScaleLinear<number, number>;
  y: ScaleLinear<number, number>;
}

/** Coordinate text rounded to 0.1. */
export function c1(v: number): string {
  const r = Math.round(v * 10) / 10;
  return Object.is(r, -0) ? "0" : String(r);
}

/** Finite-value extent with a fallback, padded when empty or flat. */
export function extentOf(values: readonly number[], fallback: [number, number]): [number, number] {
  const f = values.filter((v) => Number.isFinite(v));
  if (!f.length) return fallback;
  let lo = minOf(f);
  let hi = maxOf(f);
  if (hi - lo < 1e-12) {
    const pad = Math.abs(hi) * 0.1 || 1;
    lo -= pad;
    hi += pad;
  }
  return [lo, hi];
}

/**
 * A frame of the given size with nice linear scales over the domains.
 *
 * @param xDomain data range on x
 * @param yDomain data range on y
 * @param size width/height of the whole SVG (viewBox units) and margins
 */
export function makeFrame(
  xDomain: [number, number],
  yDomain: [number, number],
  size: {
    width: number;
    height: number;
    left?: number;
    right?: number;
    top?: number;
    bottom?: number;
    /** Round the x domain to nice numbers (default true; false for a date axis with its own ticks). */
    niceX?: boolean;
  },
): PlotFrame {
  const left = size.left ?? 48;
  const right = size.right ?? 12;
  const top = size.top ?? 22;
  const bottom = size.bottom ?? 34;
  const x = scaleLinear()
    .domain(xDomain)
    .range([left, size.width - right]);
  if (size.niceX !== false) x.nice(6);
  const y = scaleLinear()
    .domain(yDomain)
    .range([size.height - bottom, top])
    .nice(5);
  return { width: size.width, height: size.height, left, right, top, bottom, x, y };
}

/** Line path "M x y L x y ..." through the points (skipping non-finite ones, starting a new piece after a gap). */
export function linePath(frame: PlotFrame, xs: readonly number[], ys: readonly number[]): string {
  let d = "";
  let pen = false;
  for (let i = 0; i < xs.length; i++) {
    const xv = xs[i]!;
    const yv = ys[i]!;
    if (!Number.isFinite(xv) || !Number.isFinite(yv)) {
      pen = false;
      continue;
    }
    d += `${pen ? "L" : "M"}${c1(frame.x(xv))} ${c1(frame.y(yv))}`;
    pen = true;
  }
  return d;
}

/**
 * Axes with ticks, grid lines and labels (units in the labels).
 *
 * @param frame the frame
 * @param xLabel x-axis label with unit
 * @param yLabel y-axis label with unit
 * @param xTicks ticks of the x axis with their labels (e.g. a date axis); default: nice numbers
 */
export function axesSvg(
  frame: PlotFrame,
  xLabel: string,
  yLabel: string,
  xTicks?: ReadonlyArray<{ value: number; label: string }>,
): SafeHtml {
  const { x, y, left, top, width, height, right, bottom } = frame;
  const x0 = left;
  const x1 = width - right;
  const y0 = height - bottom;
  const ticks = xTicks ?? x.ticks(6).map((t) => ({ value: t, label: formatSignificant(t, 4) }));
  const xt = ticks.map(
    (t) =>
      html`<line class="grid" x1="${c1(x(t.value))}" x2="${c1(x(t.value))}" y1="${c1(top)}" y2="${c1(y0)}" /><text
          class="tick"
          x="${c1(x(t.value))}"
          y="${c1(y0 + 11)}"
          text-anchor="middle"
          >${t.label}</text
        >`,
  );
  const yt = y
    .ticks(5)
    .map(
      (t) =>
        html`<line class="grid" x1="${c1(x0)}" x2="${c1(x1)}" y1="${c1(y(t))}" y2="${c1(y(t))}" /><text
            class="tick"
            x="${c1(x0 - 4)}"
            y="${c1(y(t) + 3)}"
            text-anchor="end"
            >${formatSignificant(t, 4)}</text
          >`,
    );
  return html`<g class="axes"
    >${joinHtml(xt)}${joinHtml(yt)}<rect
      class="frame"
      x="${c1(x0)}"
      y="${c1(top)}"
      width="${c1(x1 - x0)}"
      height="${c1(y0 - top)}"
    /><text class="label" x="${c1((x0 + x1) / 2)}" y="${c1(height - 4)}" text-anchor="middle">${xLabel}</text
    ><text class="label" transform="translate(11 ${c1((top + y0) / 2)}) rotate(-90)" text-anchor="middle"
      >${yLabel}</text
    ></g
  >`;
}

/**
 * Legend entries in one row above the plot area.
 *
 * @param frame the frame
 * @param items label, colour and mark ("line", "dash", "dot", "band")
 */
export function legendSvg(
  frame: PlotFrame,
  items: ReadonlyArray<{ label: string; color: string; mark: "line" | "dash" | "dot" | "band" | "open" }>,
): SafeHtml {
  let xPos = frame.left;
  const parts = items.map((it) => {
    const yy = frame.top - 9;
    const mark =
      it.mark === "dot"
        ? html`<circle cx="${c1(xPos + 5)}" cy="${c1(yy)}" r="2.6" fill="${it.color}" />`
        : it.mark === "open"
          ? html`<circle cx="${c1(xPos + 5)}" cy="${c1(yy)}" r="2.6" fill="#fff" stroke="${it.color}" />`
          : it.mark === "band"
            ? html`<rect x="${c1(xPos)}" y="${c1(yy - 3)}" width="10" height="6" fill="${it.color}" />`
            : html`<line
                x1="${c1(xPos)}"
                x2="${c1(xPos + 10)}"
                y1="${c1(yy)}"
                y2="${c1(yy)}"
                stroke="${it.color}"
                stroke-width="1.6"
                ${it.mark === "dash" ? html` stroke-dasharray="3 2"` : ""}
              />`;
    const g = html`${mark}<text class="legend" x="${c1(xPos + 13)}" y="${c1(yy + 3)}">${it.label}</text>`;
    xPos += 18 + it.label.length * 4.3;
    return g;
  });
  return html`<g class="legend">${joinHtml(parts)}</g>`;
}
