/**
 * The dashboard's worker: exposes the worker API (api.ts) through Comlink. The main thread starts
 * one instance for the analysis and others for long reads (import, underway log), so reading a
 * large file never holds up the analysis on screen.
 */
import { expose, transfer } from "comlink";
import { createWorkerApi } from "./api.ts";
import { pointsTransfer, underwayTransfer } from "./underwayEngine.ts";
import { browserResultCache } from "./resultCache.ts";

const api = createWorkerApi(browserResultCache());

expose({
  ...api,
  /** The underway result with its typed arrays transferred, not copied. */
  async underway(...args: Parameters<typeof api.underway>) {
    const result = await api.underway(...args);
    return transfer(result, underwayTransfer(result));
  },
  /** A view's points with their typed arrays transferred. */
  underwayView(...args: Parameters<typeof api.underwayView>) {
    const points = api.underwayView(...args);
    return transfer(points, pointsTransfer(points));
  },
} satisfies typeof api);
