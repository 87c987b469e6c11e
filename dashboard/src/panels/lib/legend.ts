/** Legend entries and their layout (estimated text widths; no DOM measuring, so output is stable). */

export type LegendSymbol = "dot" | "ring" | "triangle" | "cross" | "line" | "dashed" | "band" | "zone" | "diamond";

export interface LegendItem {
  label: string;
  colour: string;
  symbol: LegendSymbol;
}

/** A continuous colour ramp with its unit, e.g. salinity (PSS-78). */
export interface LegendRamp {
  title: string;
  /** Stops [value, colour], ascending. */
  stops: Array<[number, string]>;
  /** Tick labels to print under the ramp. */
  ticks: number[];
}

export interface PlacedItem extends LegendItem {
  x: number;
  y: number;
}

const CHAR_PX = 6.2;
const SWATCH_PX = 22;
const GAP_PX = 14;
export const LEGEND_ROW_PX = 16;

/** Places items left to right, wrapping at `width`; returns positions and total height. */
export function layoutLegend(items: readonly LegendItem[], width: number): { placed: PlacedItem[]; height: number } {
  const placed: PlacedItem[] = [];
  let x = 0;
  let y = 0;
  for (const item of items) {
    const w = SWATCH_PX + item.label.length * CHAR_PX;
    if (x > 0 && x + w > width) {
      x = 0;
      y += LEGEND_ROW_PX;
    }
    placed.push({ ...item, x, y });
    x += w + GAP_PX;
  }
  return { placed, height: items.length ? y + LEGEND_ROW_PX : 0 };
}

/** Places a label starting at `x` + 4, or right-aligned at `right` − 4 when it would run past `right`. */
export function fitLabel(x: number, text: string, right: number): { x: number; anchor: "start" | "end" } {
  return x + 4 + text.length * CHAR_PX > right ? { x: right - 4, anchor: "end" } : { x: x + 4, anchor: "start" };
}
