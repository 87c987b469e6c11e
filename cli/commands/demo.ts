import { parseArgs } from "node:util";
import type { Command } from "../command.ts";
import { UsageError } from "../exitCodes.ts";
import { DEFAULT_SEED, generateDemo } from "../../data-demo/generator/generateDemo.ts";
import { writeFiles } from "../../data-demo/generator/writeFiles.ts";

const HELP = `brackline demo: write the INVENTED demo data set (the fictitious Caldrevin estuary)

Usage: brackline demo --out <dir> [--seed N]

Options:
  --out <dir>   directory to write into (created if missing; existing demo files are overwritten)
  --seed N      integer seed of the random generator, 0 ≤ N < 2^31 (default ${DEFAULT_SEED}, the committed files)

Writes centerline.geojson, basemap.geojson, surveys/*.csv, surveys/README.md and truth.json.
Everything written is invented by a seeded model; it is not a measurement. See data-demo/README.md.`;

/** `brackline demo`: regenerates the invented demo estuary into a directory. */
export const demoCommand: Command = {
  name: "demo",
  summary: "write the invented demo estuary (surveys, centerline, basemap, truth)",
  help: HELP,
  async run(args, io) {
    const { values } = parseArgs({
      args,
      options: { out: { type: "string" }, seed: { type: "string" } },
      strict: true,
    });
    if (values.out === undefined || values.out === "") throw new UsageError("missing --out <dir>");
    let seed = DEFAULT_SEED;
    if (values.seed !== undefined) {
      seed = Number(values.seed);
      if (!/^\d+$/.test(values.seed) || !Number.isInteger(seed) || seed >= 2 ** 31) {
        throw new UsageError(`--seed must be an integer in [0, 2^31), got "${values.seed}"`);
      }
    }
    const written = writeFiles(values.out, generateDemo(seed));
    io.out(written.map((p) => `wrote ${p}`).join("\n"));
    io.err("Note: invented demo data (seed " + String(seed) + "), not measurements.");
    return 0;
  },
};
