import { fileURLToPath } from "node:url";
import type { Plugin } from "vite";

const workerDir = fileURLToPath(new URL("./src/worker/", import.meta.url));
/** The analysis worker's entry module. */
const workerEntry = `${workerDir}analysis.worker.ts`;
/** The module that gives the main thread the URL to start the worker from (src/worker/analysisWorkerUrl.ts). */
const urlModule = `${workerDir}analysisWorkerUrl.ts`;

/**
 * Vite plugin: the analysis worker is built as a second entry of the main build instead of Vite's
 * separate worker build, so every module the main thread and the worker both import (the analysis
 * helpers the panels format with, d3, Comlink, idb) ships once, in chunks both load. A module
 * worker may import same-origin chunks, so the worker is started with `{ type: "module" }` from
 * the emitted entry's URL, which `analysisWorkerUrl.ts` exports. In the dev server the worker is
 * Vite's own dev worker (the `?worker&url` import), so `npm run dev` serves it as before.
 */
export function sharedAnalysisWorker(): Plugin {
  let building = false;
  let entryRef = "";
  return {
    name: "brackline-shared-analysis-worker",
    enforce: "pre",
    configResolved(config) {
      building = config.command === "build";
    },
    buildStart() {
      if (building) entryRef = this.emitFile({ type: "chunk", id: workerEntry, name: "analysis.worker" });
    },
    // The built page starts the analysis worker from a one-line script at the top of its head, before
    // the main bundle (~1.3 MB) is fetched, parsed and run: the worker's own ~0.5 MB load, parse and
    // evaluate in parallel instead of after it; startWorker (src/worker/client.ts) adopts that worker.
    transformIndexHtml: {
      order: "post",
      handler(_html, ctx) {
        const entry = Object.values(ctx.bundle ?? {}).find(
          (f) => f.type === "chunk" && f.isEntry && f.facadeModuleId === workerEntry,
        );
        if (!entry) return [];
        const url = JSON.stringify(`./${entry.fileName}`);
        return [
          {
            tag: "script",
            children:
              `(()=>{try{const w=new Worker(${url},{type:"module",name:"brackline-analysis"});const errors=[];` +
              `w.addEventListener("error",(e)=>errors.push(e));` +
              `window.__bracklineEarlyWorker={worker:w,url:new URL(${url},document.baseURI).href,errors}}catch{}})();`,
            injectTo: "head" as const,
          },
        ];
      },
    },
    load(id) {
      if (id !== urlModule) return null;
      if (building) return `export const analysisWorkerUrl = import.meta.ROLLDOWN_FILE_URL_${entryRef};\n`;
      const devUrl = JSON.stringify(`${workerEntry}?worker&url`);
      return `import url from ${devUrl};\nexport const analysisWorkerUrl = url;\n`;
    },
  };
}
