/**
 * Worker side of the underway import: streams the log with analysis/underway, projects and bins
 * it, and aggregates it for the map. The typed arrays of the points are transferred, not copied.
 */
import {
  binUnderway,
  decimatePoints,
  projectUnderway,
  readUnderwayStream,
  readUnderwayText,
  type UnderwayImport,
} from "../../../analysis/index.ts";
import type { UnderwayPoints, UnderwayRequest, UnderwayResult, UnderwayView } from "./underwayProtocol.ts";
import type { ProgressCallback } from "./protocol.ts";
import { readChannel } from "./engine.ts";

async function read(request: UnderwayRequest, progress?: ProgressCallback): Promise<UnderwayImport> {
  const onProgress = (fraction: number) => progress?.(fraction, `Reading ${request.name}`);
  if (typeof request.file === "string") return readUnderwayText(request.file, { fileName: request.name, onProgress });
  return readUnderwayStream(request.file.stream(), {
    fileName: request.name,
    totalSize: request.file.size,
    onProgress,
  });
}

/** The positions and salinity of the last log read, kept in the worker for re-aggregation per view. */
let lastLog: { lonDeg: Float64Array; latDeg: Float64Array; salinity: Float64Array } | undefined;

/**
 * Re-aggregates the last log read for a map view: only records inside the view (padded by half
 * its size each way, so a short pan still has points), on a grid no finer than `minCellM`, so
 * detail appears as the user zooms in. Undefined when no log has been read.
 */
export function viewUnderway(view: UnderwayView): UnderwayPoints | undefined {
  if (!lastLog) return undefined;
  const [w, s, e, n] = view.bounds;
  const dx = (e - w) / 2;
  const dy = (n - s) / 2;
  const d = decimatePoints(lastLog.lonDeg, lastLog.latDeg, [lastLog.salinity], {
    maxPoints: view.maxPoints,
    minCellM: view.minCellM,
    bounds: [w - dx, s - dy, e + dx, n + dy],
  });
  return { lonDeg: d.lonDeg, latDeg: d.latDeg, salinity: d.values[0]!, count: d.count, cellM: d.cellM };
}

/** The typed arrays of a view's points, to transfer rather than copy. */
export function pointsTransfer(p: UnderwayPoints | undefined): Transferable[] {
  return p ? [p.lonDeg.buffer, p.latDeg.buffer, p.salinity.buffer, p.count.buffer] : [];
}

/** Reads, places and aggregates one underway log; errors propagate to the caller. */
export async function readUnderway(request: UnderwayRequest, progress?: ProgressCallback): Promise<UnderwayResult> {
  const imported = await read(request, progress);
  const { data } = imported;
  progress?.(1, "Placing records on the channel");
  // A centerline that cannot be read is reported by the analysis; the log is then binned by salinity.
  const network = readChannel(request.centerline).channel?.network;
  const projection = network ? projectUnderway(data, network) : undefined;
  const by = projection ? request.bin.by : "salinity";
  const bins = binUnderway(data, projection, { by, width: request.bin.width });
  const salinity = data.columns.find((c) => c.name === "salinity")?.values ?? new Float64Array(data.n).fill(Number.NaN);
  lastLog = { lonDeg: data.lonDeg, latDeg: data.latDeg, salinity };
  const d = decimatePoints(data.lonDeg, data.latDeg, [salinity], { maxPoints: request.maxPoints });
  let [w, s, e, n] = [Infinity, Infinity, -Infinity, -Infinity];
  for (let i = 0; i < d.lonDeg.length; i++) {
    w = Math.min(w, d.lonDeg[i]!);
    e = Math.max(e, d.lonDeg[i]!);
    s = Math.min(s, d.latDeg[i]!);
    n = Math.max(n, d.latDeg[i]!);
  }
  const points = { lonDeg: d.lonDeg, latDeg: d.latDeg, salinity: d.values[0]!, count: d.count, cellM: d.cellM };
  return {
    name: request.name,
    summary: imported.summary,
    issues: imported.issues,
    points,
    bins,
    bounds: d.lonDeg.length > 0 ? [w, s, e, n] : undefined,
  };
}

/** The typed arrays of a result, to transfer rather than copy. */
export function underwayTransfer(result: UnderwayResult): Transferable[] {
  const p = result.points;
  return [p.lonDeg.buffer, p.latDeg.buffer, p.salinity.buffer, p.count.buffer];
}
