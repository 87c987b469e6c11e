// Reads an invented demo survey CSV (data-demo/surveys, see its README) into mixing samples.
import { readFileSync } from "node:fs";
import Papa from "papaparse";
import type { MixingSample } from "../../../analysis/mixing/options.ts";

/** Samples of one constituent column, e.g. "Fe (nmol/L)"; "<x" = below detection limit x; `<name>_flag` 4 = rejected. */
export function demoSamples(file: string, name: string): { samples: MixingSample[]; unit: string } {
  const parsed = Papa.parse<Record<string, string>>(readFileSync(file, "utf8"), { header: true, skipEmptyLines: true });
  const col = parsed.meta.fields!.find((f) => f.startsWith(`${name} (`));
  if (!col) throw new Error(`demoSamples: no column for ${name} in ${file}`);
  const unit = /\((.*)\)/.exec(col)![1]!;
  const samples = parsed.data.map((row, i) => {
    const text = row[col]!.trim();
    const censored = text.startsWith("<");
    const value = Number(censored ? text.slice(1) : text);
    if (!Number.isFinite(value) || !Number.isFinite(Number(row.salinity)))
      throw new Error(`demoSamples: ${file} row ${i + 2} column ${col}: "${text}"`);
    const flag = row[`${name}_flag`];
    return {
      stationId: row.station!,
      salinity: Number(row.salinity),
      conc: censored ? value / 2 : value,
      censored,
      detectionLimit: censored ? value : undefined,
      accepted: flag === undefined || flag.trim() !== "4",
    };
  });
  return { samples, unit };
}
