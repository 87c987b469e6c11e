/**
 * Underway log state: loads a dropped or selected log in its own analysis worker (so a long import
 * never blocks the survey analysis), with progress, and keeps the aggregated map points, bins,
 * summary and problems it sends back. Every number comes from analysis/underway in the worker.
 */
import type { ImportIssue, UnderwayBins, UnderwaySummary } from "../../../analysis/index.ts";
import { AnalysisClient } from "../worker/client.ts";
import type { WorkerResponse } from "../worker/protocol.ts";
import type { UnderwayPoints } from "../worker/underwayProtocol.ts";
import type { ChannelOverlay } from "../worker/overlay.ts";
import { MAX_UNDERWAY_POINTS } from "../map/underwayLayer.ts";

export type UnderwayStatus = "idle" | "reading" | "ready" | "error";

/** A centerline GeoJSON from the channel on the map (first branch = main stem, mouth at its first vertex). */
export function centerlineOf(channel: ChannelOverlay | undefined): unknown {
  if (!channel || channel.paths.length === 0) return undefined;
  return {
    type: "FeatureCollection",
    features: channel.paths.map((p, i) => ({
      type: "Feature",
      properties: { id: p.branchId, ...(i === 0 ? { role: "main" } : {}) },
      geometry: { type: "LineString", coordinates: p.path },
    })),
  };
}

export class UnderwayState {
  status = $state<UnderwayStatus>("idle");
  /** Share of the file read, 0…1. */
  progress = $state(0);
  stage = $state("");
  name = $state("");
  summary = $state.raw<UnderwaySummary | undefined>(undefined);
  issues = $state.raw<ImportIssue[]>([]);
  points = $state.raw<UnderwayPoints | undefined>(undefined);
  bins = $state.raw<UnderwayBins | undefined>(undefined);
  bounds = $state.raw<[number, number, number, number] | undefined>(undefined);
  error = $state<string | undefined>(undefined);
  #client: AnalysisClient | undefined;

  /**
   * Reads a log in the worker.
   *
   * @param file the dropped or selected File (or text with a name)
   * @param channel the channel on the map, for km bins (salinity classes without it)
   * @param bin bin kind and width [km or salinity]
   */
  load(
    file: File | { name: string; text: string },
    channel?: ChannelOverlay,
    bin: { by: "km" | "salinity"; width: number } = { by: "km", width: 1 },
  ): void {
    this.#client ??= new AnalysisClient((m) => this.receive(m));
    this.status = "reading";
    this.progress = 0;
    this.error = undefined;
    this.name = file.name;
    const centerline = centerlineOf(channel);
    this.#client.send({
      type: "underway",
      file: file instanceof Blob ? file : file.text,
      name: file.name,
      maxPoints: MAX_UNDERWAY_POINTS,
      ...(centerline !== undefined ? { centerline } : {}),
      bin,
    });
  }

  /** Folds one worker reply into the state (public for tests). */
  receive(message: WorkerResponse): void {
    switch (message.type) {
      case "underwayProgress":
        this.progress = message.fraction;
        this.stage = message.stage;
        break;
      case "underwayLoaded":
        this.summary = message.summary;
        this.issues = message.issues;
        this.points = message.points;
        this.bins = message.bins;
        this.bounds = message.bounds;
        this.status = "ready";
        this.progress = 1;
        break;
      case "error":
        this.error = message.message;
        this.status = "error";
        break;
    }
  }

  destroy(): void {
    this.#client?.terminate();
    this.#client = undefined;
  }
}
