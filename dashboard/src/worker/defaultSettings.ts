/**
 * The analysis settings a fresh dashboard starts with (the `Settings` state's initial value). The
 * analysis worker reads them too: at a first visit it starts the demo's job with them before the
 * page's main bundle has run (earlyJob.ts), and the page's own job attaches to it only when equal.
 */
import type { AnalysisSettings } from "./protocol.ts";

/** A new object each call (the state replaces it whole). */
export function defaultAnalysisSettings(): AnalysisSettings {
  return {
    endmemberOverrides: {},
    precisionPercent: {},
    riverDischargeM3s: undefined,
    constantSet: "default",
    saltIntrusionSalinity: 2,
  };
}
