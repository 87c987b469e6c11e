/**
 * Steady salinity field of the 1-D model and the salt-intrusion length.
 *
 * Salt is conservative: the net seaward flux is the same at every section, and with a
 * river salinity S_r > 0 the balance is K·A·dS/dx = −Q·(S − S_r) (x landward; Eq. 2′ of
 * Boyle et al. 1974, with x landward). For constant A and K on a long channel the
 * solution is S = S_r + (S0 − S_r)·exp(−U·x/K), U = Q/A (steady 1-D advection–dispersion closed form, derived).
 */
import { solveSteadyTransport, type TransportGrid } from "./transport.ts";

/** Salinity on the solver grid. */
export interface SalinityField {
  grid: TransportGrid;
  dischargeM3s: number;
  /** Practical salinity at every node. */
  salinity: number[];
}

/**
 * Solves the steady salt balance with S(0) = seaSalinity and S(L) = riverSalinity.
 *
 * @param grid solver grid
 * @param dischargeM3s river discharge [m³/s]
 * @param seaSalinity salinity at the mouth (coastal sea end-member)
 * @param riverSalinity salinity of the river water at the head
 */
export function solveSalinity(
  grid: TransportGrid,
  dischargeM3s: number,
  seaSalinity: number,
  riverSalinity: number,
): SalinityField {
  const { conc } = solveSteadyTransport(grid, dischargeM3s, seaSalinity, riverSalinity);
  return { grid, dischargeM3s, salinity: conc };
}

/**
 * Distance from the mouth [km] of the first (most seaward) crossing of an isohaline,
 * found by linear interpolation between nodes; undefined when the salinity never falls
 * to the isohaline within the channel.
 *
 * @param field salinity field
 * @param isohaline salinity of the isohaline, e.g. 2
 */
export function isohalineKm(field: SalinityField, isohaline: number): number | undefined {
  const { salinity, grid } = field;
  for (let i = 0; i + 1 < salinity.length; i++) {
    const a = salinity[i];
    const b = salinity[i + 1];
    if (a >= isohaline && b < isohaline) {
      return grid.xKm[i] + ((a - isohaline) / (a - b)) * (grid.xKm[i + 1] - grid.xKm[i]);
    }
  }
  return undefined;
}

/** Linear interpolation of a nodal profile at xKm (clamped to the channel). */
export function profileAt(xKmNodes: number[], values: number[], xKm: number): number {
  const n = xKmNodes.length - 1;
  if (xKm <= xKmNodes[0]) return values[0];
  if (xKm >= xKmNodes[n]) return values[n];
  const h = xKmNodes[1] - xKmNodes[0];
  const i = Math.min(n - 1, Math.floor((xKm - xKmNodes[0]) / h));
  const t = (xKm - xKmNodes[i]) / h;
  return values[i] + t * (values[i + 1] - values[i]);
}
