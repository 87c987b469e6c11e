/**
 * Fixed station design of the two-phase break search (positive-weight stations, ascending S):
 * scaled salinities t = (S − S_min)/R and prefix sums Pₘ,ₖ = Σ_{i<m} wᵢ·tᵢᵏ (k = 0…6). With the
 * landward term h = h_b − t (h_b = (S_b − S_min)/R) every normal-equation entry of a candidate break
 * is a binomial expansion of these sums over the m stations landward of S_b, so one break costs
 * O(1) instead of O(n). In the bootstrap the design is built once and reused by every replicate.
 */
export interface TwoPhaseDesign {
  /** Salinities and weights of the positive-weight stations, ascending. */
  xs: Float64Array;
  ws: Float64Array;
  /** Index of each of them in the caller's arrays. */
  idx: Int32Array;
  n: number;
  sMin: number;
  sMax: number;
  range: number;
  /** Prefix sums of w·tᵏ, row m = stations 0…m−1, 7 per row. */
  p: Float64Array;
  /** Prefix sums of w·(y − ȳ)·tᵏ of the current response, 4 per row ({@link loadResponse}). */
  q: Float64Array;
  /** Σw·(y − ȳ)² and ȳ of the current response. */
  ryy: number;
  ybar: number;
}

/**
 * Builds the design of {@link TwoPhaseDesign} from ascending salinities and weights.
 *
 * @param x ascending salinities; w weights 1/σ² (stations with w ≤ 0 are left out)
 * @returns the design, or undefined with fewer than 2 stations or no salinity range
 * @throws RangeError when the positive-weight salinities are not ascending
 */
export function twoPhaseDesign(x: ArrayLike<number>, w: ArrayLike<number>): TwoPhaseDesign | undefined {
  let n = 0;
  for (let i = 0; i < x.length; i++) if (w[i]! > 0) n++;
  if (n < 2) return undefined;
  const xs = new Float64Array(n);
  const ws = new Float64Array(n);
  const idx = new Int32Array(n);
  let j = 0;
  for (let i = 0; i < x.length; i++)
    if (w[i]! > 0) {
      if (j > 0 && !(x[i]! >= xs[j - 1]!))
        throw new RangeError(`fitTwoPhase: salinities must be ascending (index ${i}: ${x[i]})`);
      xs[j] = x[i]!;
      ws[j] = w[i]!;
      idx[j++] = i;
    }
  const sMin = xs[0]!;
  const sMax = xs[n - 1]!;
  const range = sMax - sMin;
  if (!(range > 0)) return undefined;
  const inv = 1 / range;
  const p = new Float64Array((n + 1) * 7);
  for (let i = 0; i < n; i++) {
    const t = (xs[i]! - sMin) * inv;
    let v = ws[i]!;
    for (let k = 0; k < 7; k++) {
      p[(i + 1) * 7 + k] = p[i * 7 + k]! + v;
      v *= t;
    }
  }
  return { xs, ws, idx, n, sMin, sMax, range, p, q: new Float64Array((n + 1) * 4), ryy: 0, ybar: 0 };
}

/**
 * Loads a response y (indexed like the caller's x) into the design: ȳ (weighted mean), the
 * prefix sums of w·(y − ȳ)·tᵏ and Σw·(y − ȳ)² (y centred so the normal-equation RSS loses little
 * to cancellation).
 */
export function loadResponse(d: TwoPhaseDesign, y: ArrayLike<number>): void {
  const { n, xs, ws, idx, q } = d;
  let sw = 0,
    swy = 0;
  for (let i = 0; i < n; i++) {
    sw += ws[i]!;
    swy += ws[i]! * y[idx[i]!]!;
  }
  const ybar = swy / sw;
  const inv = 1 / d.range;
  let ryy = 0;
  for (let i = 0; i < n; i++) {
    const t = (xs[i]! - d.sMin) * inv;
    const yi = y[idx[i]!]! - ybar;
    const wy = ws[i]! * yi;
    ryy += wy * yi;
    const o = i * 4;
    q[o + 4] = q[o]! + wy;
    q[o + 5] = q[o + 1]! + wy * t;
    q[o + 6] = q[o + 2]! + wy * t * t;
    q[o + 7] = q[o + 3]! + wy * t * t * t;
  }
  d.ryy = ryy;
  d.ybar = ybar;
}

const M = new Float64Array(20);

/** Solves the k×k augmented normal equations in `M` (row-major, k+1 columns) by Gauss–Jordan with partial pivoting. */
export function solveNormal(k: number, out: Float64Array): boolean {
  const w = k + 1;
  for (let col = 0; col < k; col++) {
    let piv = col;
    for (let r = col + 1; r < k; r++) if (Math.abs(M[r * w + col]!) > Math.abs(M[piv * w + col]!)) piv = r;
    const p = M[piv * w + col]!;
    if (!(Math.abs(p) > 1e-13 * (Math.abs(M[0]!) + 1e-300))) return false;
    if (piv !== col)
      for (let j = 0; j < w; j++) {
        const t = M[col * w + j]!;
        M[col * w + j] = M[piv * w + j]!;
        M[piv * w + j] = t;
      }
    for (let r = 0; r < k; r++) {
      if (r === col) continue;
      const f = M[r * w + col]! / p;
      if (f !== 0) for (let j = col; j < w; j++) M[r * w + j] = M[r * w + j]! - f * M[col * w + j]!;
    }
  }
  for (let i = 0; i < k; i++) {
    out[i] = M[i * w + k]! / M[i * w + i]!;
    if (!Number.isFinite(out[i]!)) return false;
  }
  return true;
}

/** Writes the symmetric k×k normal equations with right-hand side into `M`. */
export function putNormal(
  k: number,
  a00: number,
  a01: number,
  a11: number,
  a02: number,
  a12: number,
  a22: number,
  a03: number,
  a13: number,
  a23: number,
  a33: number,
  r0: number,
  r1: number,
  r2: number,
  r3: number,
): void {
  const c = k + 1;
  M[0] = a00;
  M[1] = a01;
  M[c] = a01;
  M[c + 1] = a11;
  M[k] = r0;
  M[c + k] = r1;
  if (k >= 3) {
    M[2] = a02;
    M[2 * c] = a02;
    M[c + 2] = a12;
    M[2 * c + 1] = a12;
    M[2 * c + 2] = a22;
    M[2 * c + k] = r2;
  }
  if (k >= 4) {
    M[3] = a03;
    M[3 * c] = a03;
    M[c + 3] = a13;
    M[3 * c + 1] = a13;
    M[2 * c + 3] = a23;
    M[3 * c + 2] = a23;
    M[3 * c + 3] = a33;
    M[3 * c + k] = r3;
  }
}

/**
 * Weighted RSS of the two-phase model with break b (k = 3: h²; k = 4: h² and h³) for the loaded
 * response, from the prefix sums and the normal equations (RSS = Σw·ỹ² − βᵀr): O(log n).
 *
 * @returns the RSS, or +∞ when the normal equations are singular
 */
export function breakRss(d: TwoPhaseDesign, b: number, k: number, coef: Float64Array): number {
  const xs = d.xs;
  let lo = 0,
    hi = d.n;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (xs[mid]! < b) lo = mid + 1;
    else hi = mid;
  }
  const P = d.p,
    Q = d.q;
  const o = lo * 7,
    oq = lo * 4,
    e = d.n * 7,
    eq = d.n * 4;
  const p0 = P[o]!,
    p1 = P[o + 1]!,
    p2 = P[o + 2]!,
    p3 = P[o + 3]!,
    p4 = P[o + 4]!,
    p5 = P[o + 5]!,
    p6 = P[o + 6]!;
  const q0 = Q[oq]!,
    q1 = Q[oq + 1]!,
    q2 = Q[oq + 2]!,
    q3 = Q[oq + 3]!;
  const h = (b - d.sMin) / d.range;
  // Σ w·tʲ·(h − t)ⁱ by the binomial theorem (0 ≤ t < h for the landward stations).
  const a02 = (h * p0 - 2 * p1) * h + p2;
  const a12 = (h * p1 - 2 * p2) * h + p3;
  const a22 = (((h * p0 - 4 * p1) * h + 6 * p2) * h - 4 * p3) * h + p4;
  const r2 = (h * q0 - 2 * q1) * h + q2;
  let a03 = 0,
    a13 = 0,
    a23 = 0,
    a33 = 0,
    r3 = 0;
  if (k >= 4) {
    a03 = ((h * p0 - 3 * p1) * h + 3 * p2) * h - p3;
    a13 = ((h * p1 - 3 * p2) * h + 3 * p3) * h - p4;
    a23 = ((((h * p0 - 5 * p1) * h + 10 * p2) * h - 10 * p3) * h + 5 * p4) * h - p5;
    a33 = (((((h * p0 - 6 * p1) * h + 15 * p2) * h - 20 * p3) * h + 15 * p4) * h - 6 * p5) * h + p6;
    r3 = ((h * q0 - 3 * q1) * h + 3 * q2) * h - q3;
  }
  const r0 = Q[eq]!,
    r1 = Q[eq + 1]!;
  putNormal(k, P[e]!, P[e + 1]!, P[e + 2]!, a02, a12, a22, a03, a13, a23, a33, r0, r1, r2, r3);
  coef[0] = coef[1] = coef[2] = coef[3] = 0;
  if (!solveNormal(k, coef)) return Number.POSITIVE_INFINITY;
  const rss = d.ryy - coef[0]! * r0 - coef[1]! * r1 - coef[2]! * r2 - coef[3]! * r3;
  return Number.isFinite(rss) ? Math.max(0, rss) : Number.POSITIVE_INFINITY;
}
