import type { UnitParser } from "./unitText.ts";
import { canonicalUnitText } from "./unitText.ts";

/** A header split into its name part and unit part. */
export interface HeaderParts {
  /** The header without its unit, trimmed ("Fe", "Silicate", "Distance from Sta. 36"). */
  name: string;
  /** The unit text exactly as written in the header, when there is one ("nmol/L", "uM"). */
  unitText?: string;
  /** Canonical unit when the unit text was recognised. */
  unit?: string;
}

const BRACKETED = /^(.*?)[\s_]*[([{]([^()[\]{}]*)[)\]}]\s*$/;

/**
 * Splits a column header into a name and a unit.
 *
 * Recognised forms: `Fe (nmol/L)`, `NO3 [µmol/l]`, `Si {uM}`, `Ba, nmol kg-1`, and an underscore
 * suffix that reads as a unit (`Silicate_uM`, `Cd_ngL`, `temperature_C`, `depth_m`). An underscore
 * suffix that is not a unit (`DO_Sat`, `a254_DOM`) stays part of the name.
 *
 * @param header the header text
 * @param parseUnit unit reader (defaults to the built-in {@link canonicalUnitText})
 * @returns name, the raw unit text when present, and the canonical unit when recognised
 */
export function splitHeaderUnit(header: string, parseUnit: UnitParser = canonicalUnitText): HeaderParts {
  const h = header.trim();
  const b = BRACKETED.exec(h);
  if (b !== null && b[1].trim().length > 0) {
    const unitText = b[2].trim();
    return withUnit(b[1].trim(), unitText, parseUnit);
  }
  const comma = h.lastIndexOf(",");
  if (comma > 0) {
    const unitText = h.slice(comma + 1).trim();
    if (unitText.length > 0) return withUnit(h.slice(0, comma).trim(), unitText, parseUnit);
  }
  const us = h.lastIndexOf("_");
  if (us > 0) {
    const unitText = h.slice(us + 1);
    const unit = parseUnit(unitText);
    if (unit !== undefined) return { name: h.slice(0, us).trim(), unitText, unit };
  }
  return { name: h };
}

function withUnit(name: string, unitText: string, parseUnit: UnitParser): HeaderParts {
  const unit = parseUnit(unitText);
  return unit === undefined ? { name, unitText } : { name, unitText, unit };
}
