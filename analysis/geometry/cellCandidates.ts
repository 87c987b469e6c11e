/**
 * Per-grid-cell candidate segment lists for bulk projection, computed on first use
 * from the flatbush index and reused by every later point in the same cell.
 *
 * For a cell B with centre c: any point p in B has nearest-segment distance
 * d(p) ≤ d(c) + |p − c| ≤ U := d(c) + half-diagonal (triangle inequality), so its
 * nearest segment's box lies within U of B. The list holds those segments sorted by a
 * lower bound of their distance to B, so a point can stop once the bound exceeds its
 * best distance so far.
 */
import type Flatbush from "flatbush";
import type { NearestSegmentTracker } from "./segmentKernel.ts";
import { M_MAX_DEG, anisotropy, indexDegPerM } from "./indexMetric.ts";

/** Candidate list of one cell: segment ids and lower bounds of their distance to the cell [m]. */
export interface CellList {
  seg: Int32Array;
  lowerM: Float64Array;
}

/** Where a cell's list sits in the shared pool: pairs [lowerM, segment id] from `start`, `length` pairs. */
interface PoolRef {
  start: number;
  length: number;
}

/** Grid extent in index degrees: [minX, minY, maxX, maxY]. */
export type IndexBox = [number, number, number, number];

/** Lazily filled cache of cell candidate lists for one network and one bulk call. */
export class CellCandidateCache {
  /** All built lists, interleaved [lowerM, segment id] pairs, in build order. */
  pool = new Float64Array(1024);
  private used = 0;
  /** Dense grid over the network box (+ margin): pool start of each cell's list (−1 until built) and its length. */
  private readonly slotStart: Int32Array;
  private readonly slotLen: Int32Array;
  private readonly outside = new Map<string, PoolRef>();
  private readonly nx: number;
  private readonly ny: number;
  private readonly gx0: number;
  private readonly gy0: number;
  /** Cell size in index degrees. */
  readonly cellDeg: number;
  /** Length (pairs) of the list returned by the last {@link get}. */
  lastLength = 0;

  constructor(
    private readonly index: Flatbush,
    private readonly lonScale: number,
    private readonly netMaxAbsLat: number,
    box: IndexBox,
    cellM: number,
    /** Finds the exact nearest distance [m] from a point (unwrapped lon, lat) to the network. */
    private readonly nearestDistM: (lonDeg: number, latDeg: number) => number,
    maxCells = 1 << 22,
  ) {
    const w = box[2] - box[0];
    const h = box[3] - box[1];
    const margin = Math.max(0.1 * Math.max(w, h), 2000 * indexDegPerM(lonScale, 0));
    this.gx0 = box[0] - margin;
    this.gy0 = box[1] - margin;
    let cell = cellM * indexDegPerM(lonScale, 0);
    const cellsAt = (c: number): number => Math.ceil((w + 2 * margin) / c) * Math.ceil((h + 2 * margin) / c);
    while (cellsAt(cell) > maxCells) cell *= 1.5;
    this.cellDeg = cell;
    this.nx = Math.ceil((w + 2 * margin) / cell);
    this.ny = Math.ceil((h + 2 * margin) / cell);
    this.slotStart = new Int32Array(this.nx * this.ny).fill(-1);
    this.slotLen = new Int32Array(this.nx * this.ny);
  }

  /** Pool start (in doubles) of the list of the cell holding index point (x, y); its length is left in lastLength. */
  get(x: number, y: number): number {
    const ix = Math.floor((x - this.gx0) / this.cellDeg);
    const iy = Math.floor((y - this.gy0) / this.cellDeg);
    if (ix >= 0 && iy >= 0 && ix < this.nx && iy < this.ny) {
      const k = iy * this.nx + ix;
      const at = this.slotStart[k]!;
      if (at >= 0) {
        this.lastLength = this.slotLen[k]!;
        return at;
      }
      const ref = this.store(this.build(ix, iy));
      this.slotStart[k] = ref.start;
      this.slotLen[k] = this.lastLength = ref.length;
      return ref.start;
    }
    const key = `${ix},${iy}`;
    let ref = this.outside.get(key);
    if (!ref) {
      ref = this.store(this.build(ix, iy));
      this.outside.set(key, ref);
    }
    this.lastLength = ref.length;
    return ref.start;
  }

  private store(list: CellList): PoolRef {
    const n = list.seg.length;
    if (this.used + 2 * n > this.pool.length) {
      const grown = new Float64Array(Math.max(2 * this.pool.length, this.used + 2 * n));
      grown.set(this.pool.subarray(0, this.used));
      this.pool = grown;
    }
    const start = this.used;
    for (let j = 0; j < n; j++) {
      this.pool[start + 2 * j] = list.lowerM[j]!;
      this.pool[start + 2 * j + 1] = list.seg[j]!;
    }
    this.used += 2 * n;
    return { start, length: n };
  }

  private build(ix: number, iy: number): CellList {
    const c = this.cellDeg;
    const [x0, y0] = [this.gx0 + ix * c, this.gy0 + iy * c];
    const [x1, y1] = [x0 + c, y0 + c];
    const absLatMax = Math.max(Math.abs(y0), Math.abs(y1), this.netMaxAbsLat);
    const absLatMin = y0 <= 0 && y1 >= 0 ? 0 : Math.min(Math.abs(y0), Math.abs(y1));
    const perM = indexDegPerM(this.lonScale, absLatMax);
    // metres per index degree, upper bound within the cell
    const mPerDeg = M_MAX_DEG * Math.max(1, anisotropy(absLatMin) / this.lonScale) * 1.01;
    const halfDiagM = 0.5 * Math.SQRT2 * c * mPerDeg;
    const u = this.nearestDistM((0.5 * (x0 + x1)) / this.lonScale, 0.5 * (y0 + y1)) + halfDiagM;
    const r = u * perM + 1e-12;
    const ids: number[] = [];
    const lows: number[] = [];
    this.index.search(x0 - r, y0 - r, x1 + r, y1 + r, (i, bx0, by0, bx1, by1) => {
      const dx = Math.max(bx0 - x1, x0 - bx1, 0);
      const dy = Math.max(by0 - y1, y0 - by1, 0);
      ids.push(i);
      lows.push(Math.sqrt(dx * dx + dy * dy) / perM);
      return false;
    });
    const order = ids.map((_, k) => k).sort((a, b) => lows[a]! - lows[b]!);
    return { seg: Int32Array.from(order, (k) => ids[k]!), lowerM: Float64Array.from(order, (k) => lows[k]!) };
  }
}

/** Run the tracker over a pooled cell list, stopping once the lower bound exceeds the best distance. */
export function testCellList(pool: Float64Array, start: number, length: number, tracker: NearestSegmentTracker): void {
  const end = start + 2 * length;
  for (let j = start; j < end; j += 2) {
    const lo = pool[j]!;
    if (lo * lo > tracker.bestD2) break;
    tracker.test(pool[j + 1]!);
  }
}
