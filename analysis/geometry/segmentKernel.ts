/**
 * Nearest point on a segment, in a local tangent plane centred on the query point.
 *
 * Each vertex is placed at x = Δλ·N(φm)cos φm, y = Δφ·M(φm), with φm the mean of the
 * vertex's and the point's latitude (mid-latitude formula, first-order expansion:
 * d(N cos φ)/dφ = −M sin φ). Distances from the query point are then correct to
 * second order in distance/radius, i.e. well below 1 m within a few km of the channel.
 *
 * @see Torge, W. & Müller, J. (2012) Geodesy, 4th ed., ch. 4 (radii of curvature; from memory).
 */
import { DEG_TO_RAD, WGS84_A_M, WGS84_E2 } from "./ellipsoid.ts";

/** The segment end arrays the kernel reads. */
export interface SegmentEnds {
  lon0: Float64Array;
  lat0: Float64Array;
  lon1: Float64Array;
  lat1: Float64Array;
}

/** Stateful nearest-segment tracker (no allocation per test; one instance per search loop). */
export class NearestSegmentTracker {
  private lonP = 0;
  private latP = 0;
  private cx = 0; // N cos φ at the point [m/rad]
  private dcx = 0; // half derivative of N cos φ [m/rad²]
  private cy = 0; // M at the point [m/rad]
  private dcy = 0; // half derivative of M [m/rad²]
  /** Squared distance to the best segment so far [m²]. */
  bestD2 = Number.POSITIVE_INFINITY;
  /** Index of the best segment so far (−1 when none). */
  bestSeg = -1;
  /** Position of the nearest point along the best segment, 0..1. */
  bestT = 0;
  /** Cross product sign term: > 0 when the point lies left of the segment direction. */
  bestCross = 0;
  /** Unclamped position parameter on the best segment (< 0 or > 1 beyond its ends). */
  bestTRaw = 0;
  /** Length of the best segment in the point's plane [m]. */
  bestLenM = 0;

  /** Segment ends interleaved [lon0, lat0, lon1, lat1] per segment (one cache line per test). */
  private readonly ends: Float64Array;

  constructor(seg: SegmentEnds) {
    const n = seg.lon0.length;
    this.ends = new Float64Array(4 * n);
    for (let i = 0; i < n; i++) {
      this.ends[4 * i] = seg.lon0[i]!;
      this.ends[4 * i + 1] = seg.lat0[i]!;
      this.ends[4 * i + 2] = seg.lon1[i]!;
      this.ends[4 * i + 3] = seg.lat1[i]!;
    }
  }

  /** Start a new query point (degrees; longitude already in the segments' unwrapped frame). */
  reset(lonDeg: number, latDeg: number): void {
    this.lonP = lonDeg;
    this.latP = latDeg;
    const phi = latDeg * DEG_TO_RAD;
    const s = Math.sin(phi);
    const c = Math.cos(phi);
    const w2 = 1 - WGS84_E2 * s * s;
    const w = Math.sqrt(w2);
    const n = WGS84_A_M / w; // prime-vertical radius N(φ)
    const m = (WGS84_A_M * (1 - WGS84_E2)) / (w2 * w); // meridional radius M(φ)
    this.cx = n * c;
    this.dcx = -0.5 * m * s;
    this.cy = m;
    this.dcy = (0.5 * 3 * WGS84_E2 * m * s * c) / w2;
    this.bestD2 = Number.POSITIVE_INFINITY;
    this.bestSeg = -1;
  }

  /** Test segment i; keeps it when nearer than the best so far. Returns its squared distance [m²]. */
  test(i: number): number {
    const latP = this.latP;
    const lonP = this.lonP;
    const cx = this.cx;
    const dcx = this.dcx;
    const cy = this.cy;
    const dcy = this.dcy;
    const e = this.ends;
    const o = 4 * i;
    const f0 = (e[o + 1]! - latP) * DEG_TO_RAD;
    const ax = (e[o]! - lonP) * DEG_TO_RAD * (cx + dcx * f0);
    const ay = f0 * (cy + dcy * f0);
    const f1 = (e[o + 3]! - latP) * DEG_TO_RAD;
    const bx = (e[o + 2]! - lonP) * DEG_TO_RAD * (cx + dcx * f1);
    const by = f1 * (cy + dcy * f1);
    const ux = bx - ax;
    const uy = by - ay;
    const len2 = ux * ux + uy * uy;
    const tRaw = len2 > 0 ? -(ax * ux + ay * uy) / len2 : 0;
    const t = tRaw < 0 ? 0 : tRaw > 1 ? 1 : tRaw;
    const qx = ax + t * ux;
    const qy = ay + t * uy;
    const d2 = qx * qx + qy * qy;
    if (d2 < this.bestD2) {
      this.bestD2 = d2;
      this.bestSeg = i;
      this.bestT = t;
      this.bestTRaw = tRaw;
      this.bestCross = uy * ax - ux * ay;
      this.bestLenM = Math.sqrt(len2);
    }
    return d2;
  }
}
