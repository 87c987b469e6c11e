/**
 * The one units table of Brackline keyed by quantity kind: concentration (through the concentration
 * table in units.ts), conductivity, temperature, pressure, discharge and length. Each unit converts to
 * the working unit of its kind (mS/cm, °C ITS-90, dbar, m³/s, m). Used by the import, the mapping
 * compiler, the mixing precision table and the CLI's salinity command.
 *
 * @see BIPM (2019) The International System of Units (SI), 9th ed., Tables 4 and 8 (factors);
 *   Saunders, P. (1990) The International Temperature Scale of 1990, ITS-90. WOCE Newsletter 10 (t90 = t68/1.00024).
 */
import { parseUnit } from "./units.ts";

/** Kinds of quantity with units. */
export type QuantityKind = "concentration" | "conductivity" | "temperature" | "pressure" | "discharge" | "length";

/** Working unit of each kind: what every value is converted to before analysis. */
export const WORKING_UNIT: Readonly<Record<QuantityKind, string>> = {
  concentration: "as given (nmol/L, µg/kg, ...)",
  conductivity: "mS/cm",
  temperature: "°C (ITS-90)",
  pressure: "dbar",
  discharge: "m³/s",
  length: "m",
};

/** A recognised unit: its canonical symbol and the conversion to the working unit of its kind. */
export interface QuantityUnit {
  kind: QuantityKind;
  symbol: string;
  /** Value in the working unit = value · factor + offset. */
  factor: number;
  offset: number;
  /** What the conversion assumes, when it is more than a factor (IPTS-68, depth as pressure). */
  note?: string;
}

type Row = [symbol: string, factor: number, spellings: string[], offset?: number, note?: string];

const ROWS: Record<Exclude<QuantityKind, "concentration">, Row[]> = {
  conductivity: [
    ["mS/cm", 1, ["ms/cm", "mscm", "ms cm-1", "mmho/cm", "mmhocm"]],
    ["S/m", 10, ["s/m", "sm", "s m-1"]],
    ["µS/cm", 1e-3, ["µs/cm", "us/cm", "uscm", "µscm", "µs cm-1", "us cm-1", "µmho/cm", "umho/cm"]],
    ["mS/m", 0.01, ["ms/m", "msm"]],
  ],
  temperature: [
    [
      "°C",
      1,
      [
        "°c",
        "degc",
        "deg c",
        "c",
        "º c",
        "ºc",
        "degrees celsius",
        "degree celsius",
        "celsius",
        "its90",
        "its-90",
        "t90",
      ],
    ],
    ["K", 1, ["k", "kelvin"], -273.15],
    [
      "°C (IPTS-68)",
      1 / 1.00024,
      ["ipts68", "ipts-68", "t68", "°c ipts-68", "degc ipts-68"],
      0,
      "IPTS-68 converted to ITS-90 (t90 = t68/1.00024)",
    ],
  ],
  pressure: [
    ["dbar", 1, ["dbar", "db", "decibar", "decibars"]],
    ["bar", 10, ["bar"]],
    ["kPa", 0.1, ["kpa"]],
    ["MPa", 100, ["mpa"]],
  ],
  discharge: [
    ["m³/s", 1, ["m3/s", "m³/s", "m3s", "cms", "m3s-1", "m³s-1", "m3 s-1"]],
    ["L/s", 1e-3, ["l/s", "ls-1", "l s-1"]],
    ["ft³/s", 0.3048 ** 3, ["ft3/s", "cfs", "ft³/s", "ft3s"]],
  ],
  length: [
    ["m", 1, ["m", "meter", "meters", "metre", "metres"]],
    ["km", 1000, ["km"]],
    ["cm", 0.01, ["cm"]],
    ["ft", 0.3048, ["ft", "feet"]],
  ],
};

const INDEX: ReadonlyMap<string, QuantityUnit> = new Map(
  (Object.entries(ROWS) as Array<[QuantityKind, Row[]]>).flatMap(([kind, rows]) =>
    rows.flatMap(([symbol, factor, spellings, offset = 0, note]) =>
      spellings.map((s) => [`${kind}:${s}`, { kind, symbol, factor, offset, ...(note ? { note } : {}) }] as const),
    ),
  ),
);

/** Unit text in a comparable form: NFKC, µ for mu, ASCII minus, superscript 1, single spaces, lower case. */
export function normaliseUnitText(text: string): string {
  return text
    .normalize("NFKC")
    .replace(/\u03bc/g, "µ")
    .replace(/[⁻−]/g, "-")
    .replace(/¹/g, "1")
    .replace(/\s+/g, " ")
    .trim()
    .toLowerCase();
}

/**
 * Looks up a unit of a given kind.
 *
 * @param kind the quantity kind
 * @param text unit text as written ("mS/cm", "S m-1", "degC", "dbar", "cfs", "km", "nmol/L")
 * @returns the unit with its conversion to the working unit, or undefined when not a unit of that kind
 */
export function quantityUnit(kind: QuantityKind, text: string): QuantityUnit | undefined {
  if (kind === "concentration") {
    const c = parseUnit(text);
    return c ? { kind, symbol: c.symbol, factor: 1, offset: 0 } : undefined;
  }
  const n = normaliseUnitText(text);
  return INDEX.get(`${kind}:${n}`) ?? INDEX.get(`${kind}:${n.replace(/[\s_]+/g, "")}`);
}

/** The kinds a unit text can belong to, in table order (e.g. "m" → length). */
export function quantityKindsOf(text: string): QuantityKind[] {
  const kinds: QuantityKind[] = ["conductivity", "temperature", "pressure", "discharge", "length", "concentration"];
  return kinds.filter((k) => quantityUnit(k, text) !== undefined);
}

/** Converts a value to the working unit of its kind. */
export function toWorkingUnit(unit: QuantityUnit, value: number): number {
  return value * unit.factor + unit.offset;
}
