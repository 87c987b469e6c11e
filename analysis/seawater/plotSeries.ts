/** One line of a ready-to-plot chart: values aligned with the x values of its {@link SeriesSet}. */
export interface PlotSeries {
  /** Stable key, e.g. "FeOH+2", "Cd+2", "pH_T". */
  key: string;
  /** Label for a legend, e.g. "Fe(OH)₂⁺". */
  label: string;
  /** Unit of the values, e.g. "%", "mmol/kg", "pH (total scale)". */
  unit: string;
  values: number[];
}

/** A set of series over one x axis, with the cautions the chart must show. */
export interface SeriesSet {
  x: number[];
  xLabel: string;
  xUnit: string;
  series: PlotSeries[];
  /** Cautions (validity limits, constants used outside their range); empty when none. */
  warnings: string[];
  /** Full citation of the constants or method used. */
  source: string;
}
