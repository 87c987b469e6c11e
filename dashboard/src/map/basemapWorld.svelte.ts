/**
 * The offline world land for imported data: Natural Earth land polygons (public domain) shipped by the
 * `world-atlas` npm package as JSON assets that Vite emits beside the bundle. Nothing is fetched with the
 * first page: the map asks for land (`want`) only when it shows data without our own basemap, and the
 * land arrives through a worker as a blob URL of GeoJSON, which MapLibre parses in its own worker.
 * The 1:50m land serves a zoomed-out view; from FINE_MIN_ZOOM on the 1:10m land replaces it.
 */
import land50mUrl from "world-atlas/land-50m.json?url";
import land10mUrl from "world-atlas/land-10m.json?url";
import { resolutionForZoom, type LandResolution, type WorldLandSource } from "./basemapStyle.ts";

/** The asset of each resolution (URLs of files Vite emits; not JavaScript, not in the first page load). */
export const LAND_ASSETS: Record<LandResolution, string> = { "50m": land50mUrl, "10m": land10mUrl };

/** Message to the basemap worker. */
export interface WorldLandRequest {
  /** Absolute URL of the land topology. */
  url: string;
}

/** The basemap worker's answer: GeoJSON text as UTF-8 bytes, or what went wrong. */
export type WorldLandReply =
  { ok: true; geojson: ArrayBuffer; polygons: number; vertices: number } | { ok: false; message: string };

/** Fetches and decodes one resolution in a worker; resolves to a blob URL of the GeoJSON. */
export function loadLandInWorker(resolution: LandResolution): Promise<string> {
  const worker = new Worker(new URL("./basemapWorld.worker.ts", import.meta.url), {
    type: "module",
    name: `world-land-${resolution}`,
  });
  const request: WorldLandRequest = { url: new URL(LAND_ASSETS[resolution], document.baseURI).href };
  return new Promise<string>((resolve, reject) => {
    worker.onmessage = (event: MessageEvent<WorldLandReply>) => {
      const reply = event.data;
      if (reply.ok) resolve(URL.createObjectURL(new Blob([reply.geojson], { type: "application/geo+json" })));
      else reject(new Error(reply.message));
    };
    worker.onerror = (event) => reject(new Error(event.message || "the basemap worker failed"));
    worker.postMessage(request);
  }).finally(() => worker.terminate());
}

/** State of the world land: what is drawn, what is on its way, what failed. */
export class WorldBasemap {
  /** The land drawn: the finest resolution loaded so far, or undefined. */
  source = $state.raw<WorldLandSource | undefined>(undefined);
  /** The resolution being fetched, if any. */
  loading = $state<LandResolution | undefined>(undefined);
  /** Why the last fetch failed (the map then keeps what it has). */
  error = $state<string | undefined>(undefined);
  readonly #requested = new Set<LandResolution>();

  constructor(private readonly load: (resolution: LandResolution) => Promise<string> = loadLandInWorker) {}

  /** Fetches the land a view at `zoom` needs, unless it is loaded or on its way. */
  want(zoom: number): void {
    const resolution = resolutionForZoom(zoom, this.#requested);
    if (!resolution) return;
    this.#requested.add(resolution);
    this.loading = resolution;
    this.load(resolution).then(
      (url) => {
        // A coarse answer arriving after the fine one is not drawn.
        if (this.source?.resolution !== "10m") this.source = { url, resolution };
        if (this.loading === resolution) this.loading = undefined;
      },
      (error: unknown) => {
        this.#requested.delete(resolution);
        this.error = `World land (Natural Earth 1:${resolution}) could not be loaded: ${error instanceof Error ? error.message : String(error)}`;
        if (this.loading === resolution) this.loading = undefined;
        console.warn(this.error);
      },
    );
  }

  /** For the map element's data attribute: off, loading, the resolution drawn, or error. */
  status(enabled: boolean): string {
    if (!enabled) return "off";
    if (this.source) return this.source.resolution;
    if (this.loading) return "loading";
    return this.error ? "error" : "waiting";
  }
}
