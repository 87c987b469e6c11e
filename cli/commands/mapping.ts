import { readFileSync } from "node:fs";
import { basename } from "node:path";
import { parseArgs } from "node:util";
import type { Command } from "../command.ts";
import { applyUnitOverrides, parseUnitOverride, suggestMappingForText } from "../../analysis/index.ts";
import { InputError, UsageError } from "../exitCodes.ts";

const help = `brackline mapping <survey files...> [--unit "<column>=<unit>" ...]

Prints the suggested column mapping of each file as JSON, for editing and passing back with
--mapping: every column's role (station, date, depth, salinity, constituent, ...), constituent
name, unit and kind ("tracer" = dissolved constituent analysed against the dilution line,
"nonMixing" = shown along the channel only), and why each was suggested. Fields are described in
the README ("Column mapping file"). A partial mapping is enough: columns it leaves out keep the
suggestion. With several files, one mapping per file is printed as a JSON array.`;

export const mappingCommand: Command = {
  name: "mapping",
  summary: "print the suggested column mapping of survey files (JSON, for editing and --mapping)",
  help,
  async run(args, io) {
    const { values, positionals } = parseArgs({
      args,
      allowPositionals: true,
      options: { unit: { type: "string", multiple: true } },
    });
    if (positionals.length === 0) throw new UsageError("give at least one survey file");
    const units = (values.unit ?? []).map((t) => {
      const o = parseUnitOverride(t);
      if ("error" in o) throw new UsageError(o.error);
      return o;
    });
    const out = positionals.map((p) => {
      let text: string;
      try {
        text = readFileSync(p, "utf8");
      } catch (error) {
        throw new InputError(`${p}: cannot read survey file (${(error as NodeJS.ErrnoException).code ?? ""})`);
      }
      const { mapping } = applyUnitOverrides(suggestMappingForText(text), units);
      return { file: basename(p), ...mapping };
    });
    io.out(`${JSON.stringify(out.length === 1 ? out[0] : out, null, 2)}\n`);
    return 0;
  },
};
