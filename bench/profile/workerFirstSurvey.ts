// The analysis worker's cold-start job in Node (one fresh process, no result cache): the demo's files
// read, the channel built, the first survey analysed, with the time of each event since the job
// was posted. Usage: npx tsx bench/profile/workerFirstSurvey.ts [--cpu-prof via node flags]
import { readFileSync } from "node:fs";
import { performance } from "node:perf_hooks";
import { createWorkerApi } from "../../dashboard/src/worker/api.ts";
import type { AnalysisEvent, AnalysisJob } from "../../dashboard/src/worker/protocol.ts";

const demo = (p: string) => readFileSync(new URL(`../../data-demo/${p}`, import.meta.url), "utf8");
const job: AnalysisJob = {
  kind: "load",
  surveys: [{ name: "both-surveys.csv", text: demo("surveys/both-surveys.csv") }],
  centerline: { name: "centerline.geojson", text: demo("centerline.geojson") },
  // The dashboard's default analysis settings (dashboard/src/state/settings.svelte.ts).
  settings: {
    endmemberOverrides: {},
    precisionPercent: {},
    riverDischargeM3s: undefined,
    constantSet: "default",
    saltIntrusionSalinity: 2,
  },
  firstSurvey: 0,
  // The selection's default constituent: its map marks are posted first (an "overlay" event).
  firstConstituent: "Fe",
};
const api = createWorkerApi();
const t0 = performance.now();
let first = true;
await api.run(job, (e: AnalysisEvent) => {
  if (e.type === "progress") return;
  console.log(`${(performance.now() - t0).toFixed(0).padStart(6)} ms ${e.type}`);
  if (e.type === "analysis" && first) {
    first = false;
    setTimeout(() => api.resumeBackground(), 0);
  }
});
