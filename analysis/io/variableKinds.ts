/**
 * Which measured variables are dissolved mixing tracers (analysed against the theoretical dilution
 * line) and which are not: gases exchanged with the air, pigments and particles that grow, settle
 * and resuspend, optical measures. The latter are kept and shown along the channel, but no
 * effective end-member or % removal is computed for them unless the user asks.
 */

/** "tracer": a dissolved constituent for mixing analysis; "nonMixing": shown along the channel only. */
export type VariableKind = "tracer" | "nonMixing";

/** Symbols (before any qualifier) that are not dissolved mixing tracers, with the reason shown to the user. */
export const NON_MIXING_REASONS: Readonly<Record<string, string>> = {
  O2: "dissolved oxygen exchanges with the atmosphere and is set by respiration and photosynthesis, not by mixing of two end-members",
  Chla: "chlorophyll is living phytoplankton biomass (grows, is grazed and sinks)",
  POC: "particulate matter settles and resuspends; mixing diagrams describe dissolved constituents",
  PN: "particulate matter settles and resuspends; mixing diagrams describe dissolved constituents",
  SPM: "suspended matter settles and resuspends; mixing diagrams describe dissolved constituents",
  Turbidity: "turbidity is an optical measure of particles, not a dissolved concentration",
};

/**
 * Classifies a constituent symbol (as given by normaliseConstituentName) and its unit.
 *
 * @param symbol e.g. "Si", "O2 (discrete)", "Fe (particulate)", "Turbidity"
 * @param unit canonical unit, e.g. "µmol/L", "mg/L", "NTU"
 * @param isConcentration whether the unit is a concentration of the units table
 * @returns the kind and, for non-mixing variables, why (common practice: Officer 1979 and
 *   Boyle et al. 1974 apply mixing diagrams to dissolved, non-volatile constituents)
 * @see Officer, C.B. (1979) Estuar. Coast. Mar. Sci. 9:91–94; Boyle et al. (1974) GCA 38:1719–1728.
 */
export function variableKind(
  symbol: string,
  unit: string | undefined,
  isConcentration: boolean,
): { kind: VariableKind; reason?: string } {
  const base = symbol.replace(/\s*\(.*\)\s*$/, "").trim();
  const reason = NON_MIXING_REASONS[base];
  if (reason !== undefined) return { kind: "nonMixing", reason };
  if (/\(.*particulate.*\)/.test(symbol)) return { kind: "nonMixing", reason: NON_MIXING_REASONS.POC };
  if (unit !== undefined && !isConcentration)
    return { kind: "nonMixing", reason: `its unit ${unit} is not a concentration` };
  return { kind: "tracer" };
}
