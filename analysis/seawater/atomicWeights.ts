/**
 * Atomic weights used by every mass ↔ amount conversion in Brackline (one table, cited).
 *
 * Values: CIAAW/IUPAC 2021 standard atomic weights; for elements with an interval the conventional
 * value (Prohaska et al. 2022). "sheet" entries are as tabulated in the project's chemistry reference
 * sheet (confirmed there against ciaaw.org); "fromMemory" entries were added for
 * convenience from the same CIAAW 2021 table without re-checking.
 *
 * @see bibliography key ciaaw2021; Prohaska, T. et al., 2022. Pure Appl. Chem. 94, 573–600 (from memory).
 */
export interface AtomicWeight {
  /** Element symbol. */
  symbol: string;
  /** Standard (or conventional, for interval elements) atomic weight [g/mol]. */
  gPerMol: number;
  /** "sheet" = checked against CIAAW 2021; "fromMemory" = not re-checked. */
  status: "sheet" | "fromMemory";
}

const table: ReadonlyArray<[string, number, AtomicWeight["status"]]> = [
  ["Fe", 55.845, "sheet"],
  ["Mn", 54.938043, "sheet"],
  ["Cu", 63.546, "sheet"],
  ["Ni", 58.6934, "sheet"],
  ["Cd", 112.414, "sheet"],
  ["Ba", 137.327, "sheet"],
  ["Si", 28.085, "sheet"],
  ["Ca", 40.078, "sheet"],
  ["Mg", 24.305, "sheet"],
  ["Na", 22.98976928, "sheet"],
  ["Cl", 35.45, "sheet"],
  ["C", 12.011, "sheet"],
  ["N", 14.007, "sheet"],
  ["P", 30.973761998, "sheet"],
  ["H", 1.008, "fromMemory"],
  ["O", 15.999, "fromMemory"],
  ["S", 32.06, "fromMemory"],
  ["K", 39.0983, "fromMemory"],
  ["Sr", 87.62, "fromMemory"],
  ["B", 10.81, "fromMemory"],
  ["Br", 79.904, "fromMemory"],
  ["F", 18.998403162, "fromMemory"],
  ["Li", 6.94, "fromMemory"],
  ["Al", 26.9815384, "fromMemory"],
  ["Co", 58.933194, "fromMemory"],
  ["Zn", 65.38, "fromMemory"],
  ["As", 74.921595, "fromMemory"],
  ["Mo", 95.95, "fromMemory"],
  ["Hg", 200.592, "fromMemory"],
  ["Pb", 207.2, "fromMemory"],
  ["U", 238.02891, "fromMemory"],
];

/** Atomic weights keyed by element symbol (case-sensitive, e.g. "Cd", "Si"). */
export const ATOMIC_WEIGHTS: Readonly<Record<string, AtomicWeight>> = Object.freeze(
  Object.fromEntries(table.map(([symbol, gPerMol, status]) => [symbol, Object.freeze({ symbol, gPerMol, status })])),
);

/**
 * Atomic weight of an element.
 * @param element element symbol, e.g. "Fe" (case-sensitive: "Co" is cobalt, "CO" is not an element)
 * @returns atomic weight [g/mol]
 * @throws {RangeError} naming the symbol when the element is not in the table
 * @see CIAAW, 2021. Standard atomic weights; Prohaska, T. et al., 2022. Pure Appl. Chem. 94, 573–600.
 */
export function atomicWeight(element: string): number {
  const entry = Object.hasOwn(ATOMIC_WEIGHTS, element) ? ATOMIC_WEIGHTS[element] : undefined;
  if (!entry) {
    throw new RangeError(
      `atomicWeight: unknown element "${element}" (known: ${Object.keys(ATOMIC_WEIGHTS).join(", ")})`,
    );
  }
  return entry.gPerMol;
}
