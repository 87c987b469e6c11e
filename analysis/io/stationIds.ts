/** A station id reduced to its comparable form. */
export interface NormalisedStationId {
  /** Comparable id: trimmed, upper-case, leading zeros and a trailing ".0" removed from numbers. */
  id: string;
  /** What the normalisation changed, for reporting ("leading zeros", "case", ...). */
  changes: string[];
}

/**
 * Normalises a station id for joining a measurement file to a station table: trims white space,
 * compares case-insensitively, reads numeric ids as numbers ("007" → "7", "2.0" → "2", "12.50" → "12.5").
 *
 * @param raw the id as written
 * @returns the comparable id and the list of changes made
 */
export function normaliseStationId(raw: string): NormalisedStationId {
  // Readers ask for the same few ids once per row and step: answers are kept (a copy is returned).
  const known = NORMALISED.get(raw);
  if (known !== undefined) return { id: known.id, changes: [...known.changes] };
  const out = normalise(raw);
  if (NORMALISED.size >= 4096) NORMALISED.clear();
  NORMALISED.set(raw, { id: out.id, changes: [...out.changes] });
  return out;
}

const NORMALISED = new Map<string, NormalisedStationId>();

function normalise(raw: string): NormalisedStationId {
  const changes: string[] = [];
  let id = raw.trim().replace(/\s+/g, " ");
  if (id !== raw) changes.push("white space");
  if (/^[+-]?\d+(\.\d+)?$/.test(id)) {
    const n = String(Number(id));
    if (/^[+-]?0\d/.test(id)) changes.push("leading zeros");
    if (/\.\d*$/.test(id) && n !== id && !id.startsWith("0")) changes.push("decimal form");
    id = n;
  } else {
    const up = id.toUpperCase();
    if (up !== id) changes.push("case");
    id = up;
  }
  return { id, changes };
}

/**
 * A station id written as a whole number with a trailing ".0" (a numeric id column that went
 * through a floating-point export: "36.0", "7.00") reduced to the whole number ("36", "7"). Other
 * ids are returned unchanged ("21.5", "A.0", "036", "S36").
 *
 * @param raw the id as written (trimmed by the caller)
 * @returns the id to use and whether it was changed
 * @see common practice (spreadsheet and data-frame exports write integer ids of float columns as "36.0")
 */
export function integralStationId(raw: string): { id: string; changed: boolean } {
  const m = /^([+-]?\d+)\.0+$/.exec(raw);
  return m ? { id: m[1]!, changed: true } : { id: raw, changed: false };
}
