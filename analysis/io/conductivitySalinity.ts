import type { ValueCell } from "../survey/survey.ts";
import type { CellContext } from "./cellReaders.ts";
import type { CompiledMapping } from "./compileMapping.ts";
import { makeIssue } from "./importSummary.ts";

/** Practical salinity from conductivity [mS/cm], temperature [°C] and pressure [dbar]. */
export type SalinityFromConductivity = (
  conductivityMScm: number,
  temperatureC: number,
  pressureDbar: number,
) => number | undefined;

/**
 * The salinity cell of a row that has conductivity but no salinity column: conductivity (in the
 * column's unit, converted to mS/cm) and temperature go through `convert` (PSS-78 by default),
 * with pressure taken as depth in metres (1 m ≈ 1 dbar; common practice for shallow estuarine samples).
 * The cell keeps the conductivity text as its original.
 *
 * @returns a measured cell, a missing cell when an input is missing, or an invalid cell with an issue
 */
export function salinityFromConductivityCell(
  ctx: CellContext,
  cells: Partial<Record<string, ValueCell>>,
  compiled: CompiledMapping,
  convert: SalinityFromConductivity | undefined,
  depthM: number | undefined,
): ValueCell {
  const cond = cells.conductivity;
  const missing: ValueCell = { value: undefined, original: cond?.original ?? "", status: "missing", accepted: true };
  if (cond?.status === "invalid")
    return { value: undefined, original: cond.original, status: "invalid", accepted: false };
  if (cond === undefined || cond.status !== "measured" || cond.value === undefined) return missing;
  const t = cells.temperature?.value;
  const f = compiled.conductivityToMScm;
  if (convert === undefined || t === undefined || f === undefined) return missing;
  // Pressure from depth: 1 m ≈ 1 dbar (common practice for shallow estuarine samples).
  const sp = convert(cond.value * f, t, depthM ?? 0);
  if (sp === undefined || !Number.isFinite(sp)) {
    ctx.issues.push(
      makeIssue(
        ctx.file,
        ctx.row,
        compiled.headers[compiled.single.conductivity ?? 0] ?? "",
        cond.original,
        "a conductivity that converts to practical salinity",
      ),
    );
    return { value: undefined, original: cond.original, status: "invalid", accepted: false };
  }
  return { value: sp, original: cond.original, status: "measured", accepted: cond.accepted };
}
