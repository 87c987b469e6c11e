/**
 * Hydraulic geometry of the invented channel: exponentially convergent cross-section,
 * depth, width and a discharge-dependent dispersion coefficient.
 *
 * A(x) = A0·exp(−x/a) (x landward from the mouth) is the usual alluvial-estuary shape
 * (Savenije 1993, J. Hydrol. 148, 203–218). The dispersion
 * coefficient is constant along the channel within one survey and grows weakly with discharge,
 * K = K_ref·(Q/Q_ref)^0.3, an invented rule standing in for stronger gravitational
 * circulation at high flow (cf. the Q^(−1/3) scaling of Hansen & Rattray 1965 / Chatwin 1976, from memory).
 */
import type { TransportGrid } from "./transport.ts";

/** Cross-section parameters of the channel. */
export interface ChannelShape {
  /** Cross-sectional area at the mouth [m²]. */
  mouthAreaM2: number;
  /** Convergence length a of the area [km]. */
  convergenceLengthKm: number;
  /** Smallest cross-section, reached upstream [m²] (the river channel does not vanish). */
  minAreaM2: number;
}

/** The demo channel (invented values). */
export const DEMO_CHANNEL: ChannelShape = { mouthAreaM2: 25_000, convergenceLengthKm: 25, minAreaM2: 1_200 };

/** Reference values of the invented dispersion rule K = K_ref·(Q/Q_ref)^0.3. */
export const DISPERSION_RULE = { refDispersionM2s: 120, refDischargeM3s: 100, exponent: 0.3 } as const;

/** Cross-sectional area [m²] at xKm km landward of the mouth. */
export function areaM2(shape: ChannelShape, xKm: number): number {
  return Math.max(shape.minAreaM2, shape.mouthAreaM2 * Math.exp(-xKm / shape.convergenceLengthKm));
}

/** Mean depth [m] (invented: 9 m at the mouth shoaling to ~4 m upstream). */
export function depthM(xKm: number): number {
  return 4 + 5 * Math.exp(-xKm / 30);
}

/** Surface width [m] = A/h. */
export function widthM(shape: ChannelShape, xKm: number): number {
  return areaM2(shape, xKm) / depthM(xKm);
}

/** Survey dispersion coefficient [m²/s] from the invented rule K = K_ref·(Q/Q_ref)^0.3. */
export function dispersionM2s(dischargeM3s: number): number {
  const r = DISPERSION_RULE;
  return r.refDispersionM2s * (dischargeM3s / r.refDischargeM3s) ** r.exponent;
}

/**
 * Builds an equally spaced solver grid from area and dispersion functions.
 *
 * @param lengthKm channel length from mouth to head [km]
 * @param cells number of cells N
 * @param area A(x) [m²] as a function of km from the mouth
 * @param dispersion K(x) [m²/s] as a function of km from the mouth
 */
export function buildGrid(
  lengthKm: number,
  cells: number,
  area: (xKm: number) => number,
  dispersion: (xKm: number) => number,
): TransportGrid {
  const xKm: number[] = [];
  for (let i = 0; i <= cells; i++) xKm.push((lengthKm * i) / cells);
  const faceAreaM2: number[] = [];
  const faceDispersionM2s: number[] = [];
  for (let i = 0; i < cells; i++) {
    const xf = (xKm[i] + xKm[i + 1]) / 2;
    faceAreaM2.push(area(xf));
    faceDispersionM2s.push(dispersion(xf));
  }
  return { xKm, faceAreaM2, faceDispersionM2s };
}
