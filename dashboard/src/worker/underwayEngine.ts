/**
 * Worker side of the underway import: streams the log with analysis/underway, projects and bins
 * it, and aggregates it for the map. The typed arrays of the points are transferred, not copied.
 */
import {
  binUnderway,
  buildChannelNetwork,
  decimatePoints,
  projectUnderway,
  readUnderwayStream,
  readUnderwayText,
  type CenterlineGeoJson,
  type UnderwayImport,
} from "../../../analysis/index.ts";
import type { UnderwayRequest, UnderwayResponse } from "./underwayProtocol.ts";

type Post = (message: UnderwayResponse, transfer?: Transferable[]) => void;

async function read(request: UnderwayRequest, post: Post): Promise<UnderwayImport> {
  const onProgress = (fraction: number) =>
    post({ type: "underwayProgress", id: request.id, fraction, stage: `Reading ${request.name}` });
  if (typeof request.file === "string") return readUnderwayText(request.file, { fileName: request.name, onProgress });
  return readUnderwayStream(request.file.stream(), {
    fileName: request.name,
    totalSize: request.file.size,
    onProgress,
  });
}

/** Handles one underway request; errors propagate to the worker's error reply. */
export async function handleUnderway(request: UnderwayRequest, post: Post): Promise<void> {
  const imported = await read(request, post);
  const { data } = imported;
  post({ type: "underwayProgress", id: request.id, fraction: 1, stage: "Placing records on the channel" });
  const network =
    request.centerline === undefined
      ? undefined
      : buildChannelNetwork(request.centerline as CenterlineGeoJson, { mouth: "start" });
  const projection = network ? projectUnderway(data, network) : undefined;
  const by = projection ? request.bin.by : "salinity";
  const bins = binUnderway(data, projection, { by, width: request.bin.width });
  const salinity = data.columns.find((c) => c.name === "salinity")?.values ?? new Float64Array(data.n).fill(Number.NaN);
  const d = decimatePoints(data.lonDeg, data.latDeg, [salinity], { maxPoints: request.maxPoints });
  let [w, s, e, n] = [Infinity, Infinity, -Infinity, -Infinity];
  for (let i = 0; i < d.lonDeg.length; i++) {
    w = Math.min(w, d.lonDeg[i]!);
    e = Math.max(e, d.lonDeg[i]!);
    s = Math.min(s, d.latDeg[i]!);
    n = Math.max(n, d.latDeg[i]!);
  }
  const points = { lonDeg: d.lonDeg, latDeg: d.latDeg, salinity: d.values[0]!, count: d.count, cellM: d.cellM };
  post(
    {
      type: "underwayLoaded",
      id: request.id,
      name: request.name,
      summary: imported.summary,
      issues: imported.issues,
      points,
      bins,
      bounds: d.lonDeg.length > 0 ? [w, s, e, n] : undefined,
    },
    [points.lonDeg.buffer, points.latDeg.buffer, points.salinity.buffer, points.count.buffer],
  );
}
