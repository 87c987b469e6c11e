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
 * suffix that is not a unit (`DO_Sat`, `a254_DOM`) stays part of the name. The unit may also be
 * written as the last one or two tokens after an underscore or a space (`Fe_umol_L` → µmol/L,
 * `Fe umol/L`, `dFe_nM` → nmol/L, `Fe_ug_L` → µg/L, `Chla mg m-3`).
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
  const tail = unitSuffix(h, parseUnit);
  if (tail !== undefined) return tail;
  return { name: h };
}

function withUnit(name: string, unitText: string, parseUnit: UnitParser): HeaderParts {
  const unit = parseUnit(unitText);
  return unit === undefined ? { name, unitText } : { name, unitText, unit };
}

/** Separators between a name and a unit written without brackets. */
const TOKEN_SPLIT = /[_\s]+/;

/**
 * A unit written as the last one or two tokens of a header (`Silicate_uM`, `Fe_umol_L`,
 * `Fe umol/L`, `Cd_ngL`, `Fe_ug_L`, `NO3 umol kg-1`). Two tokens are tried first, joined with a
 * slash when the second is a bare denominator (L, kg) and with a space otherwise ("kg-1").
 */
function unitSuffix(h: string, parseUnit: UnitParser): HeaderParts | undefined {
  const tokens = h.split(TOKEN_SPLIT).filter((t) => t.length > 0);
  const seps = h.match(/[_\s]+/g) ?? [];
  if (tokens.length < 2) return undefined;
  for (const k of [2, 1]) {
    if (tokens.length <= k) continue;
    const last = tokens.slice(tokens.length - k);
    const joined =
      k === 2 ? (/^(l|kg|m3)$/i.test(last[1]) ? `${last[0]}/${last[1]}` : `${last[0]} ${last[1]}`) : last[0];
    const unit = parseUnit(joined);
    if (unit === undefined) continue;
    const cut = seps.slice(0, tokens.length - k - 1);
    const name = tokens
      .slice(0, tokens.length - k)
      .map((t, i) => (i === 0 ? t : `${cut[i - 1] ?? " "}${t}`))
      .join("")
      .trim();
    const unitText = h.slice(indexOfToken(h, tokens.length - k)).trim();
    return { name, unitText, unit };
  }
  return undefined;
}

/** Character index where the n-th token (0-based) of a header starts. */
function indexOfToken(h: string, n: number): number {
  const re = /[^_\s]+/g;
  let m: RegExpExecArray | null;
  let i = 0;
  while ((m = re.exec(h)) !== null) {
    if (i === n) return m.index;
    i += 1;
  }
  return h.length;
}
