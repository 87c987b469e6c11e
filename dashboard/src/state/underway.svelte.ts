/**
 * Underway log state: loads a dropped or selected log in the reading worker (so a long import
 * never blocks the survey analysis), with progress, and keeps the aggregated map points, bins,
 * summary and problems it returns. The worker places the log on the channel built from the
 * workspace's centerline file by the one centerline reader. Every number comes from
 * analysis/underway in the worker.
 */
import type { ImportIssue, UnderwayBins, UnderwaySummary } from "../../../analysis/index.ts";
import { proxyCallback, type RemoteApi } from "../worker/client.ts";
import type { TextFile } from "../worker/protocol.ts";
import type { UnderwayPoints, UnderwayResult, UnderwayView } from "../worker/underwayProtocol.ts";
import { MAX_UNDERWAY_POINTS } from "../map/underwayPoints.ts";

export type UnderwayStatus = "idle" | "reading" | "ready" | "error";

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
  #ask = 0;
  #viewAsk = 0;
  #viewTimer: ReturnType<typeof setTimeout> | undefined;
  #lastView: UnderwayView | undefined;
  /** Ms of camera rest before the view's points are asked for (a pan or zoom fires many moves). */
  static readonly VIEW_DELAY_MS = 150;

  /**
   * @param reader the reading worker's API
   * @param centerline the workspace's centerline file now (for km bins; salinity classes without it)
   */
  constructor(
    readonly reader: () => Pick<RemoteApi, "underway" | "underwayView">,
    readonly centerline: () => TextFile | undefined,
  ) {}

  /**
   * Reads a log in the worker.
   *
   * @param file the dropped or selected File (or text with a name)
   * @param bin bin kind and width [km or salinity]
   */
  async load(
    file: File | { name: string; text: string },
    bin: { by: "km" | "salinity"; width: number } = { by: "km", width: 1 },
  ): Promise<void> {
    const ask = ++this.#ask;
    this.status = "reading";
    this.progress = 0;
    this.error = undefined;
    this.name = file.name;
    const centerline = this.centerline();
    const onProgress = proxyCallback((fraction: number, stage: string) => {
      if (ask !== this.#ask) return;
      this.progress = fraction;
      this.stage = stage;
    });
    try {
      const result = await this.reader().underway(
        {
          file: file instanceof Blob ? file : file.text,
          name: file.name,
          maxPoints: MAX_UNDERWAY_POINTS,
          ...(centerline ? { centerline: $state.snapshot(centerline) } : {}),
          bin,
        },
        onProgress,
      );
      if (ask === this.#ask) this.receive(result);
    } catch (error) {
      if (ask !== this.#ask) return;
      this.error = error instanceof Error ? error.message : String(error);
      this.status = "error";
    }
  }

  /**
   * The map's view changed: once the camera has rested, the worker re-aggregates the log for it
   * (finer cells when zoomed in). Answers to older views are dropped; the map keeps drawing the
   * points it has until the new ones arrive, so nothing blocks.
   *
   * @param view visible bounds [deg] and the map's metres per pixel (Web Mercator)
   */
  setView(view: { bounds: [number, number, number, number]; metresPerPixel: number }): void {
    this.#lastView = { bounds: view.bounds, minCellM: 4 * view.metresPerPixel, maxPoints: MAX_UNDERWAY_POINTS };
    if (this.status !== "ready") return;
    clearTimeout(this.#viewTimer);
    this.#viewTimer = setTimeout(() => void this.#askView(), UnderwayState.VIEW_DELAY_MS);
  }

  async #askView(): Promise<void> {
    const view = this.#lastView;
    if (!view || this.status !== "ready") return;
    const ask = ++this.#viewAsk;
    const importAsk = this.#ask;
    try {
      const points = await this.reader().underwayView(view);
      if (ask === this.#viewAsk && importAsk === this.#ask && points) this.points = points;
    } catch {
      // A failed re-aggregation keeps the points already drawn.
    }
  }

  /** Keeps a result the worker returned (public for tests). */
  receive(result: UnderwayResult): void {
    this.summary = result.summary;
    this.issues = result.issues;
    this.points = result.points;
    this.bins = result.bins;
    this.bounds = result.bounds;
    this.status = "ready";
    this.progress = 1;
    // Detail for the view the user is looking at, once the whole-log overview is drawn.
    if (this.#lastView) this.#viewTimer = setTimeout(() => void this.#askView(), 0);
  }
}
