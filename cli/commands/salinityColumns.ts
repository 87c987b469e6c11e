import { InputError } from "../exitCodes.ts";
import { normaliseUnitText, quantityUnit, toWorkingUnit, WORKING_UNIT } from "../../analysis/seawater/quantityUnits.ts";

/** One input column of `brackline salinity`: where it is and how to bring its values to the working unit. */
export interface ColumnPlan {
  index: number;
  header: string;
  /** Converts a number in the column's unit to mS/cm, °C (ITS-90) or dbar. */
  toWorking: (x: number) => number;
  /** What was assumed or converted, for a note on stderr. */
  note?: string;
}

/** Splits "Conductivity (mS/cm)", "C [mS/cm]", "cond_mScm" or "temp degC" into a name and a unit text. */
export function splitHeader(header: string): { name: string; unit?: string } {
  const h = header.replace(/^\uFEFF/, "").trim();
  const bracket = /^(.*?)\s*[([{]\s*([^)\]}]*?)\s*[)\]}]\s*$/.exec(h);
  if (bracket) return { name: bracket[1].trim(), unit: bracket[2] };
  // "conductivity_mS_cm", "cond_S_m": the last two underscore parts as numerator/denominator.
  const perUnit = /^(.*?)[_\s]+([^_\s]+)_([^_\s]+)$/.exec(h);
  if (perUnit && unitKind(`${perUnit[2]}/${perUnit[3]}`) !== undefined)
    return { name: perUnit[1].trim(), unit: `${perUnit[2]}/${perUnit[3]}` };
  const under = /^(.*?)[_\s]+([^_\s]+)$/.exec(h);
  if (under && unitKind(under[2]) !== undefined) return { name: under[1].trim(), unit: under[2] };
  return { name: h };
}

type Role = "conductivity" | "temperature" | "pressure";

/** Unit text without an ITS-90 label or separators ("°C, ITS-90" → "°C"); the scale is ITS-90 unless it says 68. */
const bareUnit = (u: string): string => u.replace(/its-?90|[,;]/gi, " ").trim();

function unitKind(u: string): Role | undefined {
  return (["conductivity", "temperature", "pressure"] as const).find((k) => quantityUnit(k, bareUnit(u)) !== undefined);
}

const NAME: Record<Role, RegExp> = {
  conductivity:
    // "EC"/"electrical conductivity" is not picked automatically: in water-quality files it is often referenced to 25 °C.
    /^(c|c0|c1|cond|cndc|conductivity|in[ -]?situ conductivity|sea water conductivity)$/,
  temperature:
    /^(t|t0|t1|t90|t68|temp|temperature|water temp|water temperature|in[ -]?situ temperature|sea water temperature|tv290c)$/,
  pressure: /^(p|pres|press|pressure|prdm|prm|sea pressure|sea water pressure)$/,
};
const SPECIFIC_CONDUCTANCE = /spec|spcond|sp[ ._-]?cond|c25|@ ?25|25 ?°?c|sc25|^sc$/;

/** Finds the conductivity, temperature and pressure columns of a header row (or the ones named by the user). */
export function planColumns(
  headers: string[],
  file: string,
  chosen: Partial<Record<Role, string>>,
): { cond: ColumnPlan; temp: ColumnPlan; pres?: ColumnPlan } {
  const find = (role: Role): ColumnPlan | undefined => {
    let hits: number[];
    if (chosen[role] !== undefined) {
      hits = headers
        .map((h, i) => [h.replace(/^\uFEFF/, "").trim(), i] as const)
        .filter(([h]) => h === chosen[role])
        .map(([, i]) => i);
      if (hits.length === 0)
        throw new InputError(`${file}: row 1: no column "${chosen[role]}" (headers: ${headers.join(", ")})`);
    } else {
      hits = headers
        .map((h, i) => [splitHeader(h).name.toLowerCase().replace(/[_.]+/g, " ").trim(), i] as const)
        .filter(([n]) => NAME[role].test(n))
        .map(([, i]) => i);
    }
    if (hits.length > 1) {
      const names = hits.map((i) => `"${headers[i]}"`).join(", ");
      throw new InputError(
        `${file}: row 1: several columns look like ${role}: ${names}; choose one with --${role.slice(0, 4)} "<header>"`,
      );
    }
    if (hits.length === 0) return undefined;
    return plan(role, hits[0], headers[hits[0]], file);
  };
  const cond = find("conductivity");
  if (!cond) {
    const sc = headers.find((h) => SPECIFIC_CONDUCTANCE.test(h.toLowerCase()));
    const hint = sc
      ? ` ("${sc}" looks like specific conductance at 25 °C, which PSS-78 cannot use: it needs in situ conductivity)`
      : "";
    throw new InputError(
      `${file}: row 1: no conductivity column found${hint}; headers: ${headers.join(", ")}; name it with --cond "<header>"`,
    );
  }
  const temp = find("temperature");
  if (!temp)
    throw new InputError(
      `${file}: row 1: no temperature column found; headers: ${headers.join(", ")}; name it with --temp "<header>"`,
    );
  return { cond, temp, pres: find("pressure") };
}

function plan(role: Role, index: number, header: string, file: string): ColumnPlan {
  const { unit } = splitHeader(header);
  const where = `${file}: row 1, column "${header}"`;
  if (role === "conductivity" && SPECIFIC_CONDUCTANCE.test(header.toLowerCase())) {
    throw new InputError(
      `${where}: specific conductance (referenced to 25 °C) cannot give PSS-78 salinity; in situ conductivity is needed`,
    );
  }
  if (unit === undefined || unit.trim() === "") {
    const assumed = { conductivity: "mS/cm", temperature: "°C (ITS-90)", pressure: "dbar" }[role];
    return { index, header, toWorking: (x) => x, note: `column "${header}" has no unit; taken as ${assumed}` };
  }
  if (role === "pressure" && normaliseUnitText(unit) === "m") {
    return {
      index,
      header,
      toWorking: (x) => x,
      note: `column "${header}" is a depth in m, taken as dbar (about 1 % apart; common practice)`,
    };
  }
  const ipts68 = role === "temperature" && /68/.test(header);
  const u = ipts68 ? quantityUnit("temperature", "t68") : quantityUnit(role, bareUnit(unit));
  if (u) {
    const converted = u.factor !== 1 || u.offset !== 0;
    return {
      index,
      header,
      toWorking: (x) => toWorkingUnit(u, x),
      ...(converted
        ? {
            note: `column "${header}" converted from ${u.symbol} to ${WORKING_UNIT[role]}${u.note ? ` (${u.note})` : ` (×${u.factor}${u.offset ? ` ${u.offset > 0 ? "+" : "−"} ${Math.abs(u.offset)}` : ""})`}`,
          }
        : {}),
    };
  }
  throw new InputError(`${where}: unit "${unit}" not understood for ${role}`);
}
