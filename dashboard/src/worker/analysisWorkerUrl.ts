/**
 * The URL the analysis worker is started from (a module worker). Under Vite this module is replaced
 * by the build (dashboard/sharedWorker.ts): the built worker entry, which shares its chunks with the
 * main thread, or the dev server's worker URL. Outside Vite (unit tests) it is the entry's source file.
 */
export const analysisWorkerUrl: string = new URL("./analysis.worker.ts", import.meta.url).href;
