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
  /** Σw of the stations (summed in station order). */
  sw: number;
  /** Σw·y and Σw·y² of the response last given to {@link fitLine}. */
  swy: number;
  syy: number;
  /** Σw·(y − ȳ)² and ȳ of the current response. */
  ryy: number;
  ybar: number;
  /** Straight-line fit of the current response (centred, in t) and its RSS from the normal equations. */
  line0: number;
  line1: number;
  rssLine: number;
  /** Determinant of the straight line's normal matrix [[Σw, Σwt], [Σwt, Σwt²]]. */
  det11: number;
  /** Scaled salinities t of the stations (as xs). */
  ts: Float64Array;
  /** The straight line's normal-matrix entries Σw, Σw·t, Σ(w·t)·t summed station by station ({@link fitLine}). */
  lineA00: number;
  lineA01: number;
  lineA11: number;
  /**
   * Cached design terms of the grid of candidate breaks starting at gridLo ({@link gridTerms}); empty
   * and NaN until the first search (present from the start, so every design has one object layout).
   */
  grid: Float64Array;
  gridLo: number;
}

/** The empty grid of a design before its first break search. */
const NO_GRID = new Float64Array(0);

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
  const e = n * 7;
  const det11 = p[e]! * p[e + 2]! - p[e + 1]! * p[e + 1]!;
  const q = new Float64Array((n + 1) * 4);
  const ts = new Float64Array(n);
  let lineA00 = 0,
    lineA01 = 0,
    lineA11 = 0,
    sw = 0;
  for (let i = 0; i < n; i++) sw += ws[i]!;
  for (let i = 0; i < n; i++) {
    const t = (xs[i]! - sMin) * inv;
    const wt = ws[i]! * t;
    ts[i] = t;
    lineA00 += ws[i]!;
    lineA01 += wt;
    lineA11 += wt * t;
  }
  return {
    xs,
    ws,
    idx,
    n,
    sMin,
    sMax,
    range,
    p,
    q,
    sw,
    swy: Number.NaN,
    syy: Number.NaN,
    ryy: Number.NaN,
    ybar: Number.NaN,
    line0: Number.NaN,
    line1: Number.NaN,
    rssLine: Number.NaN,
    det11,
    ts,
    lineA00,
    lineA01,
    lineA11,
    grid: NO_GRID,
    gridLo: Number.NaN,
  };
}

// Settles the designs' object layout before any fitting code runs hot: in a design built from
// fractions every number property holds a double from the start. (Were the first design's sums whole
// numbers, V8 would lay them out as small integers and change the layout at the first fraction,
// discarding the code compiled for it.)
twoPhaseDesign([0.5, 1.25, 2.75], [0.3, 0.7, 1.1]);

/**
 * Weighted straight-line fit C = α₀ + α₁·t of a response y (indexed like the caller's x) on the
 * design: the normal equations with the design's response-free sums, solved by {@link solveNormal},
 * and the RSS from the residuals (the same sums in the same order as a direct fit). Also leaves
 * Σw·y and Σw·y² of y in d.swy and d.syy (for {@link loadResponse} and the rounding-level test).
 *
 * @returns the weighted RSS with α₀, α₁ in coef[0], coef[1], or NaN when the equations are singular
 */
export function fitLine(d: TwoPhaseDesign, y: ArrayLike<number>, coef: Float64Array): number {
  const { n, ws, ts, idx, xs, sMin } = d;
  let r0 = 0,
    r1 = 0,
    syy = 0;
  for (let i = 0; i < n; i++) {
    const wi = ws[i]!;
    const yi = y[idx[i]!]!;
    r0 += wi * yi;
    r1 += wi * ts[i]! * yi;
    syy += wi * yi * yi;
  }
  d.swy = r0;
  d.syy = syy;
  coef[0] = coef[1] = coef[2] = coef[3] = 0;
  if (!solveNormal2(d.lineA00, d.lineA01, d.lineA11, r0, r1, coef)) return Number.NaN;
  const c0 = coef[0]!,
    c1 = coef[1]! * (1 / d.range);
  let rss = 0;
  for (let i = 0; i < n; i++) {
    const e = y[idx[i]!]! - c0 - c1 * (xs[i]! - sMin);
    rss += ws[i]! * e * e;
  }
  return rss;
}

/**
 * Loads a response y (indexed like the caller's x) into the design: ȳ (weighted mean), the
 * prefix sums of w·(y − ȳ)·tᵏ and Σw·(y − ȳ)² (y centred so the normal-equation RSS loses little
 * to cancellation).
 *
 * @param swy Σw·y of this y in station order when already known (d.swy after {@link fitLine} of it)
 */
export function loadResponse(d: TwoPhaseDesign, y: ArrayLike<number>, swy?: number): void {
  const { n, xs, ws, idx, q } = d;
  if (swy === undefined) {
    swy = 0;
    for (let i = 0; i < n; i++) swy += ws[i]! * y[idx[i]!]!;
  }
  const ybar = swy / d.sw;
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
  const e = n * 7,
    r0 = q[n * 4]!,
    r1 = q[n * 4 + 1]!;
  d.line0 = (d.p[e + 2]! * r0 - d.p[e + 1]! * r1) / d.det11;
  d.line1 = (d.p[e]! * r1 - d.p[e + 1]! * r0) / d.det11;
  d.rssLine = ryy - d.line0 * r0 - d.line1 * r1;
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
    const co = col * w;
    for (let r = 0, ro = 0; r < k; r++, ro += w) {
      if (r === col) continue;
      const f = M[ro + col]! / p;
      // Column col itself (≈ 0 after elimination) is never read again: the update starts right of it.
      if (f !== 0) for (let j = col + 1; j < w; j++) M[ro + j] = M[ro + j]! - f * M[co + j]!;
    }
  }
  for (let i = 0; i < k; i++) {
    const v = M[i * w + k]! / M[i * w + i]!;
    out[i] = v;
    if (!Number.isFinite(v)) return false;
  }
  return true;
}

/**
 * {@link solveNormal} for k = 2 ([[a00, a01], [a01, a11]]·β = [r0, r1]) written out in locals: the
 * same pivot choice, singularity test and operations in the same order.
 */
export function solveNormal2(
  a00: number,
  a01: number,
  a11: number,
  r0: number,
  r1: number,
  out: Float64Array,
): boolean {
  // Rows [m00 m01 m02] and [m10 m11 m12] of the augmented matrix.
  let m00 = a00,
    m01 = a01,
    m02 = r0,
    m10 = a01,
    m11 = a11,
    m12 = r1;
  // Column 0: partial pivoting (a strictly larger |entry| swaps), tested against the current M[0].
  const swap = Math.abs(m10) > Math.abs(m00);
  const p0 = swap ? m10 : m00;
  if (!(Math.abs(p0) > 1e-13 * (Math.abs(m00) + 1e-300))) return false;
  if (swap) {
    m10 = m00;
    m00 = p0;
    let t = m01;
    m01 = m11;
    m11 = t;
    t = m02;
    m02 = m12;
    m12 = t;
  }
  const f1 = m10 / p0;
  // (The eliminated entries themselves are not needed again.)
  if (f1 !== 0) {
    m11 = m11 - f1 * m01;
    m12 = m12 - f1 * m02;
  }
  // Column 1.
  const p1 = m11;
  if (!(Math.abs(p1) > 1e-13 * (Math.abs(m00) + 1e-300))) return false;
  const f0 = m01 / p1;
  if (f0 !== 0) m02 = m02 - f0 * m12;
  out[0] = m02 / m00;
  if (!Number.isFinite(out[0]!)) return false;
  out[1] = m12 / m11;
  return Number.isFinite(out[1]!);
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

/** Slots of one break's design terms (see {@link breakTerms}). */
export const TERMS = 14;
const T_M = 0,
  T_H = 1,
  T_K = 2,
  T_FAST = 3,
  T_A02 = 4,
  T_A12 = 5,
  T_A22 = 6,
  T_A03 = 7,
  T_A13 = 8,
  T_A23 = 9,
  T_A33 = 10,
  T_C22 = 11,
  T_C23 = 12,
  T_C33 = 13;

/**
 * The response-free part of a candidate break b (k = 3: h²; k = 4: h² and h³), written to
 * out[at … at + TERMS): landward count m, h_b, the normal-matrix entries from the prefix sums
 * (Σ w·tʲ·(h_b − t)ⁱ by the binomial theorem; 0 ≤ t < h_b for the landward stations) and, when
 * safe, the inverse of the Schur complement S of the straight line (1, t) for the closed form
 * RSS = RSS_line − r̃ᵀ S⁻¹ r̃. The closed form is marked safe only when Gaussian elimination with
 * partial pivoting would keep the first two pivots (Σw, then t's) and every later pivot stays far
 * above the singularity threshold of {@link solveNormal} (1e-13·Σw); otherwise the general solve
 * decides, as it always did (on the cached grid that decision is made once: 2 = singular).
 */
export function breakTerms(d: TwoPhaseDesign, b: number, k: number, out: Float64Array, at = 0): void {
  BREAK_IN[0] = b;
  breakTermsIn(d, k, out, at);
}

/**
 * The candidate break of {@link breakTermsIn} and {@link breakRssIn}: a slot rather than an argument,
 * because a double passed to a call that is not inlined is boxed on the heap, and the break search of
 * every bootstrap replicate makes ~15 such calls (as {@link RSS_OUT} for the results).
 */
export const BREAK_IN = new Float64Array(1);

/** {@link breakTerms} of the break in {@link BREAK_IN}[0]. */
function breakTermsIn(d: TwoPhaseDesign, k: number, out: Float64Array, at: number): void {
  const b = BREAK_IN[0]!;
  const xs = d.xs;
  let lo = 0,
    hi = d.n;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (xs[mid]! < b) lo = mid + 1;
    else hi = mid;
  }
  const P = d.p;
  const o = lo * 7,
    e = d.n * 7;
  const p0 = P[o]!,
    p1 = P[o + 1]!,
    p2 = P[o + 2]!,
    p3 = P[o + 3]!,
    p4 = P[o + 4]!,
    p5 = P[o + 5]!,
    p6 = P[o + 6]!;
  const h = (b - d.sMin) / d.range;
  const a02 = (h * p0 - 2 * p1) * h + p2;
  const a12 = (h * p1 - 2 * p2) * h + p3;
  const a22 = (((h * p0 - 4 * p1) * h + 6 * p2) * h - 4 * p3) * h + p4;
  let a03 = 0,
    a13 = 0,
    a23 = 0,
    a33 = 0;
  if (k >= 4) {
    a03 = ((h * p0 - 3 * p1) * h + 3 * p2) * h - p3;
    a13 = ((h * p1 - 3 * p2) * h + 3 * p3) * h - p4;
    a23 = ((((h * p0 - 5 * p1) * h + 10 * p2) * h - 10 * p3) * h + 5 * p4) * h - p5;
    a33 = (((((h * p0 - 6 * p1) * h + 15 * p2) * h - 20 * p3) * h + 15 * p4) * h - 6 * p5) * h + p6;
  }
  out[at + T_M] = lo;
  out[at + T_H] = h;
  out[at + T_K] = k;
  out[at + T_A02] = a02;
  out[at + T_A12] = a12;
  out[at + T_A22] = a22;
  out[at + T_A03] = a03;
  out[at + T_A13] = a13;
  out[at + T_A23] = a23;
  out[at + T_A33] = a33;
  out[at + T_FAST] = 0;
  out[at + T_C22] = out[at + T_C23] = out[at + T_C33] = Number.NaN;
  const a00 = P[e]!,
    a01 = P[e + 1]!,
    a11 = P[e + 2]!;
  const det = d.det11;
  const p11 = det / a00;
  const g02 = (a11 * a02 - a01 * a12) / det,
    g12 = (a00 * a12 - a01 * a02) / det;
  const s22 = a22 - a02 * g02 - a12 * g12;
  const tiny = 1e-10 * a00;
  let safe = p11 > tiny && p11 >= Math.abs(a12 - (a02 * a01) / a00) && s22 > tiny;
  if (k < 4) {
    if (s22 > 0) out[at + T_C22] = 1 / s22;
    if (safe) out[at + T_FAST] = 1;
    return;
  }
  const g03 = (a11 * a03 - a01 * a13) / det,
    g13 = (a00 * a13 - a01 * a03) / det;
  const s23 = a23 - a02 * g03 - a12 * g13;
  const s33 = a33 - a03 * g03 - a13 * g13;
  const detS = s22 * s33 - s23 * s23;
  safe = safe && p11 >= Math.abs(a13 - (a03 * a01) / a00) && s33 > tiny && detS > tiny * Math.max(s22, s33);
  if (s22 > 0 && s33 > 0 && detS > 0) {
    out[at + T_C22] = s33 / detS;
    out[at + T_C23] = -s23 / detS;
    out[at + T_C33] = s22 / detS;
  }
  if (safe) out[at + T_FAST] = 1;
}

/**
 * Result slot of {@link termsRssInto} and {@link breakRssInto}: a double returned from a call that is
 * not inlined is boxed on the heap, and the break search of every bootstrap replicate makes ~40 of them.
 */
export const RSS_OUT = new Float64Array(1);

/**
 * Weighted RSS of the two-phase model at a break whose design terms are in tm[at …] for the
 * response loaded by {@link loadResponse}: the closed form when safe, else the normal equations
 * solved by {@link solveNormal} (RSS = Σw·ỹ² − βᵀr).
 *
 * @returns the RSS, or +∞ when the normal equations are singular
 */
export function termsRss(d: TwoPhaseDesign, tm: Float64Array, at: number, coef: Float64Array): number {
  termsRssInto(d, tm, at, coef);
  return RSS_OUT[0]!;
}

/** {@link termsRss} with the RSS written to {@link RSS_OUT}[0] instead of returned (no boxing). */
export function termsRssInto(d: TwoPhaseDesign, tm: Float64Array, at: number, coef: Float64Array): void {
  const Q = d.q;
  const oq = tm[at + T_M]! * 4;
  const h = tm[at + T_H]!;
  const k = tm[at + T_K]!;
  const q0 = Q[oq]!,
    q1 = Q[oq + 1]!,
    q2 = Q[oq + 2]!,
    q3 = Q[oq + 3]!;
  const a02 = tm[at + T_A02]!,
    a12 = tm[at + T_A12]!,
    a03 = tm[at + T_A03]!,
    a13 = tm[at + T_A13]!;
  const r2 = (h * q0 - 2 * q1) * h + q2;
  const r3 = k >= 4 ? ((h * q0 - 3 * q1) * h + 3 * q2) * h - q3 : 0;
  const fast = tm[at + T_FAST]!;
  if (fast === 2) {
    RSS_OUT[0] = Number.POSITIVE_INFINITY;
    return;
  }
  if (fast === 1) {
    const rt2 = r2 - a02 * d.line0 - a12 * d.line1;
    if (k < 4) {
      RSS_OUT[0] = Math.max(0, d.rssLine - rt2 * rt2 * tm[at + T_C22]!);
      return;
    }
    const rt3 = r3 - a03 * d.line0 - a13 * d.line1;
    const gain = tm[at + T_C22]! * rt2 * rt2 + 2 * tm[at + T_C23]! * rt2 * rt3 + tm[at + T_C33]! * rt3 * rt3;
    RSS_OUT[0] = Math.max(0, d.rssLine - gain);
    return;
  }
  const P = d.p,
    e = d.n * 7,
    eq = d.n * 4;
  const r0 = Q[eq]!,
    r1 = Q[eq + 1]!;
  // The normal equations written into M here rather than through putNormal (the same entries): a
  // call with 15 numbers that is not inlined boxes each of them.
  const a00 = P[e]!,
    a01 = P[e + 1]!,
    c = k + 1;
  M[0] = a00;
  M[1] = a01;
  M[c] = a01;
  M[c + 1] = P[e + 2]!;
  M[k] = r0;
  M[c + k] = r1;
  if (k >= 3) {
    M[2] = a02;
    M[2 * c] = a02;
    M[c + 2] = a12;
    M[2 * c + 1] = a12;
    M[2 * c + 2] = tm[at + T_A22]!;
    M[2 * c + k] = r2;
  }
  if (k >= 4) {
    const a23 = tm[at + T_A23]!;
    M[3] = a03;
    M[3 * c] = a03;
    M[c + 3] = a13;
    M[3 * c + 1] = a13;
    M[2 * c + 3] = a23;
    M[3 * c + 2] = a23;
    M[3 * c + 3] = tm[at + T_A33]!;
    M[3 * c + k] = r3;
  }
  coef[0] = coef[1] = coef[2] = coef[3] = 0;
  if (!solveNormal(k, coef)) {
    RSS_OUT[0] = Number.POSITIVE_INFINITY;
    return;
  }
  const rss = d.ryy - coef[0]! * r0 - coef[1]! * r1 - coef[2]! * r2 - coef[3]! * r3;
  RSS_OUT[0] = Number.isFinite(rss) ? Math.max(0, rss) : Number.POSITIVE_INFINITY;
}

const ONE = new Float64Array(TERMS);
const SINK = new Float64Array(4);

/** Weighted RSS at break b for the loaded response ({@link breakTerms} then {@link termsRss}). */
export function breakRss(d: TwoPhaseDesign, b: number, k: number, coef: Float64Array): number {
  breakRssInto(d, b, k, coef);
  return RSS_OUT[0]!;
}

/** {@link breakRss} with the RSS written to {@link RSS_OUT}[0] instead of returned (no boxing). */
export function breakRssInto(d: TwoPhaseDesign, b: number, k: number, coef: Float64Array): void {
  BREAK_IN[0] = b;
  breakRssIn(d, k, coef);
}

/** {@link breakRssInto} of the break in {@link BREAK_IN}[0] (no boxing of the break). */
export function breakRssIn(d: TwoPhaseDesign, k: number, coef: Float64Array): void {
  breakTermsIn(d, k, ONE, 0);
  termsRssInto(d, ONE, 0, coef);
}

/**
 * Design terms of the grid of candidate breaks lo + (S_max − lo)·g/G, g = 0…G (cached on the
 * design: the bootstrap's replicates share the grid).
 *
 * @param fourth salinity of the 4th distinct station (the cubic term needs it landward of the break)
 */
export function gridTerms(d: TwoPhaseDesign, lo: number, G: number, fourth: number): Float64Array {
  if (d.gridLo === lo && d.grid.length === (G + 1) * TERMS) return d.grid;
  const grid = new Float64Array((G + 1) * TERMS);
  for (let g = 0; g <= G; g++) {
    const b = lo + ((d.sMax - lo) * g) / G;
    const k = fourth < b ? 4 : 3;
    const at = g * TERMS;
    breakTerms(d, b, k, grid, at);
    if (grid[at + T_FAST] === 1) continue;
    // Not provably safe: decide once, as the general solve would (its pivots ignore y).
    const P = d.p,
      e = d.n * 7;
    putNormal(
      k,
      P[e]!,
      P[e + 1]!,
      P[e + 2]!,
      grid[at + T_A02]!,
      grid[at + T_A12]!,
      grid[at + T_A22]!,
      grid[at + T_A03]!,
      grid[at + T_A13]!,
      grid[at + T_A23]!,
      grid[at + T_A33]!,
      0,
      0,
      0,
      0,
    );
    if (!solveNormal(k, SINK)) grid[at + T_FAST] = 2;
    else if (Number.isFinite(grid[at + T_C22]!) && (k < 4 || Number.isFinite(grid[at + T_C33]!))) grid[at + T_FAST] = 1;
  }
  d.grid = grid;
  d.gridLo = lo;
  return grid;
}
