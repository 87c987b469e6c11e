/** Writes the generator's file map to a directory (creating sub-directories). */
import { mkdirSync, writeFileSync } from "node:fs";
import { dirname, join } from "node:path";

/**
 * Writes each file of `files` below `outDir`.
 *
 * @returns the absolute-or-relative paths written, in map order
 */
export function writeFiles(outDir: string, files: Map<string, string>): string[] {
  const written: string[] = [];
  for (const [rel, text] of files) {
    const path = join(outDir, rel);
    mkdirSync(dirname(path), { recursive: true });
    writeFileSync(path, text, "utf8");
    written.push(path);
  }
  return written;
}
