/**
 * The basemap worker: fetches one Natural Earth land topology (a JSON asset emitted by Vite from the
 * `world-atlas` package), decodes it into GeoJSON land polygons and hands the GeoJSON text back as a
 * transferred buffer, so neither the decoding nor the JSON parse of the topology runs on the main thread.
 * One request per worker; the main thread terminates it after the answer.
 */
import { landFeatures } from "./basemapLand.ts";
import type { WorldLandReply, WorldLandRequest } from "./basemapWorld.svelte.ts";

self.onmessage = async (event: MessageEvent<WorldLandRequest>) => {
  const { url } = event.data;
  let reply: WorldLandReply;
  const transfer: Transferable[] = [];
  try {
    const response = await fetch(url);
    if (!response.ok) throw new Error(`HTTP ${response.status} for ${url}`);
    const land = landFeatures(await response.json());
    const bytes = new TextEncoder().encode(JSON.stringify(land)).buffer;
    transfer.push(bytes);
    reply = { ok: true, geojson: bytes, polygons: land.features.length, vertices: land.vertexCount };
  } catch (error) {
    reply = { ok: false, message: error instanceof Error ? error.message : String(error) };
  }
  (self as unknown as Worker).postMessage(reply, transfer);
};
