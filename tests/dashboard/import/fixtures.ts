/** Small invented import files for the dashboard import tests (not measurements). */
import { inspectFile } from "../../../dashboard/src/import/inspectFile.ts";
import { importFile, type ImportChoice } from "../../../dashboard/src/import/importFile.ts";
import type { ImportClient } from "../../../dashboard/src/import/importClient.ts";
import type { ImportSource } from "../../../dashboard/src/import/importTypes.ts";

/** Semicolons, decimal commas, a censored value, a bad cell, a salinity header no pattern knows, a row without id. */
export const QUIRKY_CSV = [
  "Cruise;Stn;Date;Lat;Lon;S_field;Fe (nmol/L);Mn (nmol/L)",
  "autumn-2025-11;N01;2025-11-04;45,04869;-35,30269;33,2;<0,05;3,1",
  "autumn-2025-11;N02;2025-11-04;45,05041;-35,30234;30,1;5,5;4,2",
  "autumn-2025-11;N03;2025-11-04;45,05351;-35,30693;25,4;abc;6,0",
  "autumn-2025-11;;2025-11-04;45,0600;-35,3100;12,5;30,2;9,5",
  "autumn-2025-11;N05;2025-11-04;45,0650;-35,3150;2,5;40,2;19,5",
].join("\n");

export function file(name: string, content: string | Uint8Array): ImportSource {
  return new File([content as BlobPart], name);
}

/** The import client without a worker: the same functions the worker runs, called directly. */
export function directClient(): ImportClient {
  return {
    inspect: (f: ImportSource) => inspectFile(f),
    read: (f: ImportSource, choice: ImportChoice, onProgress?: (fraction: number, stage: string) => void) =>
      importFile(f, choice, (x) => onProgress?.(x, `Reading ${f.name}`)),
    terminate: () => undefined,
  } as unknown as ImportClient;
}
