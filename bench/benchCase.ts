/** One row of the `npm run bench` table. */
export interface BenchRow {
  /** What was measured, e.g. "project 1e6 points onto a 5,000-vertex centerline". */
  name: string;
  /** The measured figure. */
  value: number;
  unit: string;
  /** The baseline measured in the same run (undefined when the row has no baseline). */
  baseline?: { name: string; value: number };
  /** Ratio baseline/value for times (speed-up) or value/baseline for sizes; stated in `ratioLabel`. */
  ratio?: number;
  ratioLabel?: string;
  /** The goal from the issues, as text, e.g. "≤ 1 s and ≥ 30×". */
  goal?: string;
  /** Extra facts worth printing (max difference vs baseline, peak memory...). */
  note?: string;
}

/** A benchmark: runs and returns one or more rows. */
export interface BenchCase {
  name: string;
  run(): Promise<BenchRow[]>;
}
