/**
 * The invented meandering channel: main stem (mouth → head) and one tributary.
 *
 * The geometry is analytic (no randomness): an axis running north-west from the mouth
 * (azimuth 310°) with a lateral meander y(t) = amp(t)·[sin(2πt/λ) + 0.3·sin(2πt/(2.7λ) + 0.8)],
 * amplitude growing landward from 0.15 km near the mouth to ~2.2 km, wavelength λ = 9 km.
 * The tributary leaves the main stem from an outer bend between 40 and 50 km and runs ~9 km
 * to the north-east.
 */
import { cumulativeKm, roundLonLat, toLonLat } from "./localFrame.ts";

/** Unit vectors (east, north) of the channel axis (landward) and of its right-hand normal. */
const AZIMUTH = (310 * Math.PI) / 180;
export const AXIS: [number, number] = [Math.sin(AZIMUTH), Math.cos(AZIMUTH)];
export const NORMAL: [number, number] = [Math.cos(AZIMUTH), -Math.sin(AZIMUTH)];

/** A polyline in both frames. */
export interface ChannelLine {
  /** Vertices [lon, lat], rounded to 6 decimals. */
  lonLat: [number, number][];
  /** Same vertices in the local frame [east km, north km]. */
  localKm: [number, number][];
  /** Cumulative haversine distance from the first vertex [km]. */
  cumKm: number[];
}

const AXIAL_LENGTH_KM = 54;
const MAIN_VERTICES = 360;
const WAVELENGTH_KM = 9;

function smoothstep(u: number): number {
  const v = Math.min(1, Math.max(0, u));
  return v * v * (3 - 2 * v);
}

/** Lateral meander offset [km] at axial distance t [km]. */
function meanderKm(t: number): number {
  const amp = 0.15 + 2.0 * smoothstep((t - 6) / 28);
  const phase = (2 * Math.PI * t) / WAVELENGTH_KM;
  return amp * (Math.sin(phase) + 0.3 * Math.sin(phase / 2.7 + 0.8));
}

/** Local position [km] of the main stem at axial distance t. */
export function mainStemLocal(t: number): [number, number] {
  const y = meanderKm(t);
  return [t * AXIS[0] + y * NORMAL[0], t * AXIS[1] + y * NORMAL[1]];
}

function finish(localKm: [number, number][]): ChannelLine {
  const lonLat = localKm.map((p) => roundLonLat(toLonLat(p[0], p[1])));
  return { lonLat, localKm, cumKm: cumulativeKm(lonLat) };
}

/** The main stem, ordered from the mouth (first vertex) to the head (last vertex). */
export function buildMainStem(): ChannelLine {
  const pts: [number, number][] = [];
  for (let i = 0; i <= MAIN_VERTICES; i++) pts.push(mainStemLocal((AXIAL_LENGTH_KM * i) / MAIN_VERTICES));
  return finish(pts);
}

/** The tributary and the index of the main-stem vertex where it joins. */
export interface Tributary {
  line: ChannelLine;
  /** Index of the shared vertex in the main stem. */
  confluenceIndex: number;
  /** Along-channel distance of the confluence from the mouth [km]. */
  confluenceKm: number;
}

/**
 * The tributary, ordered from its confluence with the main stem (first vertex, shared exactly
 * with a main-stem vertex) to its upstream end.
 */
export function buildTributary(main: ChannelLine): Tributary {
  let best = -1;
  let bestY = -Infinity;
  for (let i = 0; i < main.localKm.length; i++) {
    if (main.cumKm[i] < 40 || main.cumKm[i] > 50) continue;
    const p = main.localKm[i];
    const y = p[0] * NORMAL[0] + p[1] * NORMAL[1];
    if (y > bestY) {
      bestY = y;
      best = i;
    }
  }
  const start = main.localKm[best];
  const pts: [number, number][] = [start];
  let [e, n] = start;
  const steps = 45;
  for (let k = 1; k <= steps; k++) {
    const s = k / steps;
    // heading: from the normal, turned 35° landward, wavering ±15°
    const ang = ((35 + 15 * Math.sin(2 * Math.PI * s * 1.5)) * Math.PI) / 180;
    const dir: [number, number] = [
      Math.cos(ang) * NORMAL[0] + Math.sin(ang) * AXIS[0],
      Math.cos(ang) * NORMAL[1] + Math.sin(ang) * AXIS[1],
    ];
    e += 0.2 * dir[0];
    n += 0.2 * dir[1];
    pts.push([e, n]);
  }
  const line = finish(pts);
  line.lonLat[0] = main.lonLat[best];
  return { line, confluenceIndex: best, confluenceKm: main.cumKm[best] };
}

/**
 * Position along a line at distance xKm from its first vertex and the local unit tangent
 * (east, north) of the segment there.
 */
export function pointAlong(line: ChannelLine, xKm: number): { local: [number, number]; tangent: [number, number] } {
  const { cumKm, localKm } = line;
  let i = 0;
  while (i < cumKm.length - 2 && cumKm[i + 1] < xKm) i++;
  const seg = cumKm[i + 1] - cumKm[i];
  const t = Math.min(1, Math.max(0, (xKm - cumKm[i]) / seg));
  const a = localKm[i];
  const b = localKm[i + 1];
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const len = Math.hypot(dx, dy);
  return { local: [a[0] + t * dx, a[1] + t * dy], tangent: [dx / len, dy / len] };
}
