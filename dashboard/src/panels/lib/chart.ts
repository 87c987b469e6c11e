/** Inputs of the small series chart (SeriesChart.svelte). */

/** One line, drawn against the left or right axis. */
export interface ChartSeries {
  key: string;
  label: string;
  x: readonly number[];
  y: readonly number[];
  colour: string;
  axis?: "left" | "right";
  width?: number;
  dash?: string;
}
/** A station point (left axis); clicking it calls `onpick`. */
export interface ChartPoint {
  id: string;
  x: number;
  y: number;
  label: string;
  selected: boolean;
}
/** A vertical marker line with a label. */
export interface ChartMarker {
  x: number;
  label: string;
  colour?: string;
}
