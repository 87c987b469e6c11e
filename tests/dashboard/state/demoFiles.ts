/** The invented demo files read from data-demo/ for state tests (no Vite glob in Node). */
import { readFileSync } from "node:fs";
import { join, resolve } from "node:path";
import { fileURLToPath } from "node:url";
import type { TextFile } from "../../../dashboard/src/lib/demoData.ts";

const DEMO = resolve(fileURLToPath(new URL("../../../data-demo", import.meta.url)));

export function demoFile(relPath: string): TextFile {
  return { name: relPath.split("/").pop() ?? relPath, text: readFileSync(join(DEMO, relPath), "utf8") };
}
