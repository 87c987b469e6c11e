/**
 * The project's bibliography: one entry per publication that code, tests or the briefing cite.
 * Doc comments point here with "@see bibliography key <key>"; the briefing renders the entries it
 * cites from here ({@link formatReference}).
 *
 * `checked` says how far the bibliographic details (authors, year, title, journal, volume, pages, DOI)
 * were confirmed against the publication itself, its abstract page, its DOI record or a publisher's
 * reference list:
 * - "confirmed": confirmed that way, either by the compiler of the project's reference sheets (their
 *   "confirmed" tag) or during this bibliography's compilation; `checkedAgainst` says which.
 * - "fromMemory": recalled, not confirmed; never printed in a briefing's reference list, and cited in
 *   briefing text only as "method after …".
 */
import { CHEMISTRY_BIBLIOGRAPHY } from "./referencesChemistry.ts";
import { MIXING_BIBLIOGRAPHY } from "./referencesMixing.ts";
import { ARCHIVE_BIBLIOGRAPHY } from "../archive/archiveReferences.ts";

/** One publication. */
export interface BibEntry {
  /** Stable key, e.g. "boyle1974". */
  key: string;
  /** Authors as printed, "Surname, I., Surname, I.". */
  authors: string;
  year: number;
  title: string;
  /** Journal volume, pages; or book publisher and place; or report series. */
  container: string;
  doi?: string;
  checked: "confirmed" | "fromMemory";
  /** What the details were confirmed against (for "confirmed"), or what is uncertain (for "fromMemory"). */
  checkedAgainst: string;
}

/** All entries, keyed. */
export const BIBLIOGRAPHY: Readonly<Record<string, BibEntry>> = Object.freeze(
  Object.fromEntries(
    [...MIXING_BIBLIOGRAPHY, ...CHEMISTRY_BIBLIOGRAPHY, ...ARCHIVE_BIBLIOGRAPHY].map((e) => [e.key, e]),
  ),
);

/**
 * Looks up a bibliography entry.
 * @param key entry key
 * @returns the entry
 * @throws {RangeError} naming the key when it is not in the bibliography
 */
export function bibEntry(key: string): BibEntry {
  const e = Object.hasOwn(BIBLIOGRAPHY, key) ? BIBLIOGRAPHY[key] : undefined;
  if (!e) throw new RangeError(`bibEntry: unknown bibliography key "${key}"`);
  return e;
}

/**
 * A reference-list line: "Authors (year) Title. Container. doi:…".
 * @param entry bibliography entry
 * @returns the formatted reference
 */
export function formatReference(entry: BibEntry): string {
  const title = /[.?!]$/.test(entry.title) ? entry.title : `${entry.title}.`;
  const doi = entry.doi ? ` doi:${entry.doi}` : "";
  return `${entry.authors} (${entry.year}) ${title} ${entry.container}.${doi}`;
}

/**
 * The reference list for a set of cited keys: confirmed entries only, alphabetical by first author.
 * Entries recalled from memory are left out (their text citations read "method after …").
 * @param keys cited keys
 * @returns formatted references
 * @throws {RangeError} for an unknown key
 */
export function referenceList(keys: Iterable<string>): string[] {
  const entries = [...new Set(keys)].map(bibEntry).filter((e) => e.checked === "confirmed");
  entries.sort((a, b) => a.authors.localeCompare(b.authors) || a.year - b.year);
  return entries.map(formatReference);
}
