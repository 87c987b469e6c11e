/** Knots with merged ties: weighted means of y, summed weights. */
export interface KnotData {
  x: ArrayLike<number>;
  y: ArrayLike<number>;
  w: ArrayLike<number>;
  /** Number of knots in use (arrays may be longer workspaces). */
  n?: number;
}

/**
 * Merges (near-)tied abscissae into one knot (weighted mean of y, summed weight)
 * and drops zero-weight points, which leaves the penalised least-squares
 * solution unchanged. Input must be sorted by x.
 *
 * @param x ascending abscissae
 * @param y ordinates
 * @param w non-negative weights
 * @param tieTol abscissae closer than this are merged (same unit as x)
 * @param out optional workspace arrays of length ≥ x.length (reused in loops)
 * @param knotOf optional array of length ≥ x.length that receives each point's knot index (−1 when
 *   dropped), for {@link mergeKnotResponses}
 * @returns merged knot data (n = number of knots)
 */
export function mergeKnots(
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  w: ArrayLike<number>,
  tieTol: number,
  out?: { x: Float64Array; y: Float64Array; w: Float64Array },
  knotOf?: Int32Array,
): KnotData & { x: Float64Array; y: Float64Array; w: Float64Array; n: number } {
  const o = out ?? { x: new Float64Array(x.length), y: new Float64Array(x.length), w: new Float64Array(x.length) };
  let n = 0;
  let sx = 0,
    sy = 0,
    sw = 0,
    anchor = Number.NaN;
  for (let i = 0; i <= x.length; i++) {
    const wi = i < x.length ? w[i]! : 0;
    if (i < x.length && !(wi > 0)) {
      if (knotOf) knotOf[i] = -1;
      continue;
    }
    if (i === x.length || !(Math.abs(x[i]! - anchor) <= tieTol)) {
      if (sw > 0) {
        o.x[n] = sx / sw;
        o.y[n] = sy / sw;
        o.w[n] = sw;
        n++;
      }
      sx = sy = sw = 0;
      if (i === x.length) break;
      anchor = x[i]!;
    }
    if (knotOf) knotOf[i] = n;
    sx += wi * x[i]!;
    sy += wi * y[i]!;
    sw += wi;
  }
  return { x: o.x, y: o.y, w: o.w, n };
}

/**
 * The merged y of {@link mergeKnots} for a new response on the same abscissae and weights: each
 * knot's weighted mean Σwᵢyᵢ / Σwᵢ, summed in the same order (so the same numbers), without
 * re-grouping the abscissae.
 *
 * @param knotOf each point's knot index from mergeKnots (−1 = dropped)
 * @param w the weights given to mergeKnots; y the new response
 * @param knotW the merged weights Σwᵢ of mergeKnots; n the number of knots
 * @param out receives the n merged responses
 */
export function mergeKnotResponses(
  knotOf: Int32Array,
  w: ArrayLike<number>,
  y: ArrayLike<number>,
  knotW: ArrayLike<number>,
  n: number,
  out: Float64Array,
): void {
  out.fill(0, 0, n);
  for (let i = 0; i < y.length; i++) {
    const k = knotOf[i]!;
    if (k >= 0) out[k] = out[k]! + w[i]! * y[i]!;
  }
  for (let k = 0; k < n; k++) out[k] = out[k]! / knotW[k]!;
}
