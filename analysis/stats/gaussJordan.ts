/**
 * Solves a small dense linear system A·β = r given as its augmented matrix [A | r] (row-major, k rows of
 * k + 1 columns, overwritten) by Gauss–Jordan elimination with partial pivoting (Press et al. 2007,
 * §2.1, from memory). A pivot of magnitude ≤ relTol·|A₀₀| counts as singular: for weighted normal
 * equations A₀₀ = Σw, so the test is relative to the data's total weight. Dimensionless.
 *
 * @param a augmented matrix, k·(k + 1) values from index 0 (overwritten)
 * @param k number of unknowns
 * @param out receives β₀ … β_{k−1}
 * @param relTol singularity threshold relative to |A₀₀|
 * @returns false when the system is singular or a coefficient is not finite
 * @see Press, W.H., Teukolsky, S.A., Vetterling, W.T. & Flannery, B.P. (2007) Numerical Recipes, 3rd ed.,
 *   Cambridge University Press, §2.1 (from memory).
 */
export function solveAugmented(a: Float64Array, k: number, out: Float64Array, relTol = 1e-14): boolean {
  const w = k + 1;
  const scale = Math.abs(a[0]!) + 1e-300;
  for (let col = 0; col < k; col++) {
    let piv = col;
    for (let r = col + 1; r < k; r++) if (Math.abs(a[r * w + col]!) > Math.abs(a[piv * w + col]!)) piv = r;
    const p = a[piv * w + col]!;
    if (!(Math.abs(p) > relTol * scale)) return false;
    if (piv !== col)
      for (let j = 0; j < w; j++) {
        const t = a[col * w + j]!;
        a[col * w + j] = a[piv * w + j]!;
        a[piv * w + j] = t;
      }
    const co = col * w;
    for (let r = 0, ro = 0; r < k; r++, ro += w) {
      if (r === col) continue;
      const f = a[ro + col]! / p;
      // Column col itself (≈ 0 after elimination) is never read again: the update starts right of it.
      if (f !== 0) for (let j = col + 1; j < w; j++) a[ro + j] = a[ro + j]! - f * a[co + j]!;
    }
  }
  for (let i = 0; i < k; i++) {
    const v = a[i * w + k]! / a[i * w + i]!;
    if (!Number.isFinite(v)) return false;
    out[i] = v;
  }
  return true;
}
