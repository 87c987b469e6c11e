/**
 * Regenerates the committed demo data of the INVENTED Caldrevin estuary.
 *
 * Usage: npx tsx data-demo/generator/generate.ts [--out <dir>] [--seed <N>]
 * Defaults: --out data-demo (next to this folder), --seed 1974.
 * All outputs are invented (see data-demo/README.md); they are not measurements.
 */
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";
import { parseArgs } from "node:util";
import { DEFAULT_SEED, generateDemo } from "./generateDemo.ts";
import { writeFiles } from "./writeFiles.ts";

const { values } = parseArgs({ options: { out: { type: "string" }, seed: { type: "string" } } });
const outDir = values.out ?? join(dirname(fileURLToPath(import.meta.url)), "..");
const seed = values.seed === undefined ? DEFAULT_SEED : Number(values.seed);
for (const path of writeFiles(outDir, generateDemo(seed))) process.stdout.write(`wrote ${path}\n`);
