/**
 * Steady one-dimensional advection–dispersion–reaction solver for a tidally averaged estuary.
 *
 * Coordinate x is measured LANDWARD from the mouth (x = 0) to the head (x = L), as in
 * the steady 1-D advection–dispersion balance (common practice). The net seaward flux through a section is
 *   F(x) = Q·C + K(x)·A(x)·dC/dx,
 * and the steady balance of a slab is dF/dx = −A·R, with R the volumetric reaction rate
 * (positive = production). Salt is the special case R = 0, for which F is constant (Eq. 2′
 * of the sheet with S_r the river salinity).
 *
 * Discretisation: finite volumes on N equal cells, central advection, face-centred
 * dispersion, Dirichlet values at mouth and head, solved with the Thomas algorithm.
 * The reaction enters as a per-node net production `productionPerNode` [concentration·m³/s],
 * i.e. the integral of A·R over the node's control volume, so that the discrete mass balance
 * telescopes exactly: F_{1/2} = F_{N−1/2} + Σ production.
 *
 * @see Boyle, E. et al. (1974) Geochim. Cosmochim. Acta 38, 1719–1728 (1-D steady mass balance)
 * @see Boyle et al. (1974), Geochim. Cosmochim. Acta 38, 1719–1728 (flux F = Q·C*0; curvature–rate relation, with Officer 1979, from memory)
 */

/** Channel description on the solver grid. */
export interface TransportGrid {
  /** Node positions, km landward from the mouth, equally spaced, first 0. */
  xKm: number[];
  /** Cross-sectional area at the faces between nodes i and i+1 [m²] (length N). */
  faceAreaM2: number[];
  /** Dispersion coefficient at the faces [m²/s] (length N). */
  faceDispersionM2s: number[];
}

/** Result of one steady solve. */
export interface SteadyProfile {
  /** Concentration at each node. */
  conc: number[];
  /** Net seaward flux through each face [concentration·m³/s] (length N). */
  faceFlux: number[];
}

/**
 * Solves 0 = d/dx(Q·C + K·A·dC/dx) + A·R on the grid with C(0) = mouthConc, C(L) = headConc.
 *
 * @param grid solver grid (km, m², m²/s)
 * @param dischargeM3s river discharge Q [m³/s], > 0
 * @param mouthConc concentration imposed at the mouth node
 * @param headConc concentration imposed at the head node
 * @param productionPerNode ∫A·R dx over each node's control volume (length N+1; ends ignored); omit for a conservative tracer
 * @throws RangeError on a bad discharge or mismatched array lengths
 */
export function solveSteadyTransport(
  grid: TransportGrid,
  dischargeM3s: number,
  mouthConc: number,
  headConc: number,
  productionPerNode?: number[],
): SteadyProfile {
  const n = grid.xKm.length - 1;
  if (!(dischargeM3s > 0))
    throw new RangeError(`solveSteadyTransport(): dischargeM3s must be > 0, got ${dischargeM3s}`);
  if (n < 2 || grid.faceAreaM2.length !== n || grid.faceDispersionM2s.length !== n) {
    throw new RangeError(`solveSteadyTransport(): grid needs N+1 nodes and N faces, got ${n + 1} nodes`);
  }
  if (productionPerNode && productionPerNode.length !== n + 1) {
    throw new RangeError(
      `solveSteadyTransport(): productionPerNode must have ${n + 1} entries, got ${productionPerNode.length}`,
    );
  }
  const q = dischargeM3s;
  const hM = (grid.xKm[n] * 1000) / n;
  const d = grid.faceAreaM2.map((a, i) => (grid.faceDispersionM2s[i] * a) / hM);
  // Interior node i: F_{i+1/2} − F_{i−1/2} = −P_i, with F_{i+1/2} = Q(C_i+C_{i+1})/2 + D_{i+1/2}(C_{i+1}−C_i).
  const lower = new Float64Array(n + 1);
  const diag = new Float64Array(n + 1);
  const upper = new Float64Array(n + 1);
  const rhs = new Float64Array(n + 1);
  diag[0] = 1;
  rhs[0] = mouthConc;
  diag[n] = 1;
  rhs[n] = headConc;
  for (let i = 1; i < n; i++) {
    lower[i] = d[i - 1] - q / 2;
    diag[i] = -(d[i] + d[i - 1]);
    upper[i] = q / 2 + d[i];
    rhs[i] = productionPerNode ? -productionPerNode[i] : 0;
  }
  const conc = thomas(lower, diag, upper, rhs);
  const faceFlux: number[] = [];
  for (let i = 0; i < n; i++) faceFlux.push((q * (conc[i] + conc[i + 1])) / 2 + d[i] * (conc[i + 1] - conc[i]));
  return { conc, faceFlux };
}

/** Thomas algorithm for a tridiagonal system (diagonally dominant here, no pivoting needed). */
function thomas(a: Float64Array, b: Float64Array, c: Float64Array, r: Float64Array): number[] {
  const n = b.length;
  const cp = new Float64Array(n);
  const rp = new Float64Array(n);
  cp[0] = c[0] / b[0];
  rp[0] = r[0] / b[0];
  for (let i = 1; i < n; i++) {
    const m = b[i] - a[i] * cp[i - 1];
    cp[i] = c[i] / m;
    rp[i] = (r[i] - a[i] * rp[i - 1]) / m;
  }
  const x = new Array<number>(n);
  x[n - 1] = rp[n - 1];
  for (let i = n - 2; i >= 0; i--) x[i] = rp[i] - cp[i] * x[i + 1];
  return x;
}
