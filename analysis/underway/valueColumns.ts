/**
 * Reads the measured variables of an underway log into typed columns: salinity (or conductivity
 * and temperature converted with PSS-78), temperature, fluorescence and turbidity.
 */
import { pss78Salinity } from "../io/importPipeline.ts";
import type { UnderwayColumnRole } from "./headerRoles.ts";
import type { IssueLog } from "./issueLog.ts";
import { GrowableFloat64, GrowableUint8 } from "./growableColumns.ts";
import { readNumberCell } from "./cellText.ts";
import { CELL_DERIVED, CELL_INVALID, CELL_MEASURED, CELL_MISSING, type UnderwayColumn } from "./types.ts";

/** Conductivity unit → mS/cm factor (same table as the survey reader). */
const COND_TO_MS_CM: Record<string, number> = { "mS/cm": 1, "µS/cm": 0.001, "S/m": 10 };

interface Builder {
  name: string;
  role: UnderwayColumnRole;
  unit: string;
  values: GrowableFloat64;
  status: GrowableUint8;
}

/** Reads the value cells record by record. */
export class ValueColumns {
  readonly #builders: Builder[] = [];
  readonly #salinity: Builder | undefined;
  readonly #temperature: Builder | undefined;
  readonly #cond: UnderwayColumnRole | undefined;
  readonly #condFactor: number | undefined;
  readonly originalText: Record<string, Map<number, string>> = {};

  constructor(
    roles: readonly UnderwayColumnRole[],
    private readonly file: string,
    private readonly decimalComma: boolean,
    private readonly log: IssueLog,
  ) {
    const make = (role: UnderwayColumnRole, name: string, unit: string): Builder => {
      const b = { name, role, unit, values: new GrowableFloat64(), status: new GrowableUint8() };
      this.#builders.push(b);
      return b;
    };
    const by = (r: string) => roles.find((x) => x.role === r);
    const t = by("temperature");
    if (t !== undefined) {
      if (t.unitText === "" || t.unit === "°C") this.#temperature = make(t, "temperatureC", "°C");
      else
        log.add(
          "unknown temperature unit",
          file,
          1,
          t.header,
          t.unitText,
          "temperature in °C (ITS-90); column not imported",
        );
    }
    const s = by("salinity");
    const c = by("conductivity");
    if (s !== undefined) this.#salinity = make(s, "salinity", "PSU");
    else if (c !== undefined) {
      this.#condFactor = c.unit === undefined ? undefined : COND_TO_MS_CM[c.unit];
      if (this.#condFactor === undefined)
        log.add(
          "unknown conductivity unit",
          file,
          1,
          c.header,
          c.unitText,
          "a conductivity unit in the header (mS/cm, µS/cm or S/m)",
        );
      else if (this.#temperature === undefined)
        log.add(
          "no temperature for conductivity",
          file,
          1,
          c.header,
          "",
          "a temperature column (°C) to compute salinity from conductivity",
        );
      else {
        this.#cond = c;
        this.#salinity = make(c, "salinity", "PSU");
      }
    } else
      log.add("no salinity column", file, 1, "", "", "a salinity (or conductivity and temperature) column", "warning");
    for (const role of ["fluorescence", "turbidity"] as const) {
      const r = by(role);
      if (r !== undefined) make(r, role, r.unit ?? r.unitText);
    }
  }

  #bad(b: Builder, row: number, index: number, text: string, expected: string): void {
    (this.originalText[b.role.header] ??= new Map()).set(index, text);
    this.log.add(`unreadable ${b.name}`, this.file, row, b.role.header, text, expected);
    b.values.push(Number.NaN);
    b.status.push(CELL_INVALID);
  }

  /** Reads the value cells of one record (row = record number, index = row index in the columns). */
  read(fields: string[], row: number, index: number): void {
    for (const b of this.#builders) {
      if (b === this.#salinity && this.#cond !== undefined) continue;
      const text = fields[b.role.index] ?? "";
      const r = readNumberCell(text, this.decimalComma);
      if (r.status === CELL_INVALID) this.#bad(b, row, index, text, "a number");
      else if (b === this.#salinity && r.value < 0) this.#bad(b, row, index, text, "a practical salinity ≥ 0");
      else {
        b.values.push(r.value);
        b.status.push(r.status);
      }
    }
    if (this.#cond !== undefined) this.#derive(fields, row, index);
  }

  #derive(fields: string[], row: number, index: number): void {
    const b = this.#salinity!;
    const cond = this.#cond!;
    const text = fields[cond.index] ?? "";
    const c = readNumberCell(text, this.decimalComma);
    const t = this.#temperature!;
    const tC = t.values.data[index]!;
    if (c.status === CELL_INVALID || (c.status === CELL_MEASURED && c.value < 0))
      return this.#bad(b, row, index, text, "a conductivity ≥ 0");
    if (c.status === CELL_MISSING || t.status.data[index] !== CELL_MEASURED) {
      b.values.push(Number.NaN);
      b.status.push(CELL_MISSING);
      return;
    }
    // Pressure 0 dbar: flow-through intakes sit about a metre below the surface (common practice).
    const sp = pss78Salinity(c.value * this.#condFactor!, tC, 0);
    if (sp === undefined || !Number.isFinite(sp))
      return this.#bad(b, row, index, text, "a conductivity that converts to practical salinity (PSS-78)");
    b.values.push(sp);
    b.status.push(CELL_DERIVED);
  }

  /** The finished columns (exactly sized). */
  finish(): UnderwayColumn[] {
    const order = ["salinity", "temperatureC", "fluorescence", "turbidity"];
    const sorted = [...this.#builders].sort((a, b) => order.indexOf(a.name) - order.indexOf(b.name));
    return sorted.map((b) => ({
      name: b.name,
      header: b.role.header,
      unit: b.unit,
      values: b.values.trimmed(),
      status: b.status.trimmed(),
    }));
  }
}
