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
