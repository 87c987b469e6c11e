/**
 * Eigen-decomposition of a real symmetric matrix by the cyclic Jacobi method.
 *
 * A = V·diag(values)·Vᵀ, columns of V orthonormal.
 *
 * @param a symmetric n×n matrix (row-major, not modified)
 * @returns eigenvalues and eigenvectors (vectors[k] is the k-th eigenvector)
 * @throws RangeError when the matrix is not square
 * @see Golub, G.H. & Van Loan, C.F. (2013) Matrix Computations, 4th ed., §8.5 (Jacobi methods).
 */
export function symmetricEigen(a: number[][]): { values: number[]; vectors: number[][] } {
  const n = a.length;
  for (const row of a) if (row.length !== n) throw new RangeError(`symmetricEigen: matrix must be square (${n}×${row.length})`);
  const m = a.map((r) => Float64Array.from(r));
  const v = Array.from({ length: n }, (_, i) => {
    const r = new Float64Array(n);
    r[i] = 1;
    return r;
  });
  for (let sweep = 0; sweep < 60; sweep++) {
    let off = 0;
    let diag = 0;
    for (let p = 0; p < n; p++) {
      diag += m[p]![p]! ** 2;
      for (let q = p + 1; q < n; q++) off += m[p]![q]! ** 2;
    }
    if (off <= 1e-30 * diag || off === 0) break;
    for (let p = 0; p < n - 1; p++) {
      for (let q = p + 1; q < n; q++) {
        const apq = m[p]![q]!;
        if (apq === 0) continue;
        const theta = (m[q]![q]! - m[p]![p]!) / (2 * apq);
        const t = Math.sign(theta || 1) / (Math.abs(theta) + Math.sqrt(theta * theta + 1));
        const c = 1 / Math.sqrt(t * t + 1);
        const s = t * c;
        for (let k = 0; k < n; k++) {
          const akp = m[k]![p]!;
          const akq = m[k]![q]!;
          m[k]![p] = c * akp - s * akq;
          m[k]![q] = s * akp + c * akq;
        }
        for (let k = 0; k < n; k++) {
          const apk = m[p]![k]!;
          const aqk = m[q]![k]!;
          m[p]![k] = c * apk - s * aqk;
          m[q]![k] = s * apk + c * aqk;
        }
        for (let k = 0; k < n; k++) {
          const vkp = v[k]![p]!;
          const vkq = v[k]![q]!;
          v[k]![p] = c * vkp - s * vkq;
          v[k]![q] = s * vkp + c * vkq;
        }
      }
    }
  }
  return {
    values: m.map((r, i) => r[i]!),
    vectors: Array.from({ length: n }, (_, k) => Array.from({ length: n }, (_, i) => v[i]![k]!)),
  };
}
