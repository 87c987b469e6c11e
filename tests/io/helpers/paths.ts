import { existsSync, readFileSync } from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";

/** Repository root (two levels above tests/io/helpers). */
export const repoRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../../..");
/** Folder of the shared real data sets (outside the repository). */
export const sharedData = path.resolve(repoRoot, "../shared/data");

/** Reads a text file, or undefined when absent. */
export function readIfExists(file: string): string | undefined {
  return existsSync(file) ? readFileSync(file, "utf8") : undefined;
}
