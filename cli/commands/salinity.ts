import { readBytes } from "../files.ts";
import { parseCommandLine } from "../options.ts";
import Papa from "papaparse";
import type { Command } from "../command.ts";
import { InputError, UsageError } from "../exitCodes.ts";
import { toCsv } from "../../analysis/output/csv.ts";
import { SCREENING_CAUTION } from "../../analysis/output/caution.ts";
import { practicalSalinityFromConductivity, pss78ValidityNote } from "../../analysis/seawater/practicalSalinity.ts";
import { planColumns, type ColumnPlan } from "./salinityColumns.ts";

const HELP = `brackline salinity: add practical salinity (PSS-78) computed from conductivity to a CSV file

Usage: brackline salinity <file.csv> [--cond <header>] [--temp <header>] [--pres <header>] [--pressure <dbar>]

Reads a CSV (comma, semicolon or tab separated; first row = headers) with in situ conductivity,
temperature and pressure, and prints the same rows as CSV with an added "salinity" column (practical
salinity, full precision; "salinity_pss78" if the file already has a "salinity" column).

Columns are recognised from their headers, e.g. "Conductivity (mS/cm)", "cond_mScm", "C [mS/cm]",
"Temperature (°C)", "temp", "Pressure (dbar)", "pres". Units in the header are converted: S/m, µS/cm,
mS/m and mmho/cm for conductivity; K or IPTS-68 ("t68") for temperature; bar, kPa, MPa for pressure.
A column without a unit is taken as mS/cm, °C (ITS-90) or dbar (a note says so). Specific conductance
(referenced to 25 °C) is refused: PSS-78 needs in situ conductivity. "EC" columns are not picked
automatically (often referenced to 25 °C); name one with --cond if it holds in situ conductivity.

Options:
  --cond <header>    use this column as conductivity
  --temp <header>    use this column as temperature
  --pres <header>    use this column as pressure
  --pressure <dbar>  pressure for every row when the file has no pressure column (default 0 dbar, with a note)

Method: the Practical Salinity Scale 1978, PSS-78 (UNESCO 1981, Tech. Pap. Mar. Sci. 36; algorithms
UNESCO 1983, Tech. Pap. Mar. Sci. 44), with ITS-90 input (t68 = 1.00024·t90 inside) and, below S = 2,
the Hill et al. (1986) extension made continuous at S = 2 as specified by TEOS-10 (IOC, SCOR & IAPSO
2010, The international thermodynamic equation of seawater – 2010, IOC Manuals and Guides 56).

Bad cells (not a number, missing, negative conductivity or pressure) are reported on stderr with file,
row, column and value; that row gets an empty salinity and the other rows are still written. Values
outside the PSS-78 range (S > 42, t outside −2…35 °C) are computed and noted on stderr.
Exit codes: 0 when at least one row got a salinity; 2 when the file or its columns are unusable or
no row could be converted; 64 for a wrong command line.
${SCREENING_CAUTION}`;

const MAX_MESSAGES = 50;

function readNumber(
  text: string | undefined,
  col: ColumnPlan,
  file: string,
  row: number,
  problems: string[],
): number | undefined {
  const t = (text ?? "").trim();
  const where = `${file}: row ${row}, column "${col.header}"`;
  if (t === "") {
    problems.push(`${where}: value "" is missing`);
    return undefined;
  }
  const x = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(t) ? Number(t) : Number.NaN;
  if (!Number.isFinite(x)) {
    problems.push(`${where}: value "${text}" is not a number`);
    return undefined;
  }
  return col.toWorking(x);
}

/** `brackline salinity`: practical salinity from conductivity, temperature and pressure columns of a CSV. */
export const salinityCommand: Command = {
  name: "salinity",
  summary: "add PSS-78 practical salinity from conductivity, temperature and pressure columns of a CSV",
  help: HELP,
  async run(args, io) {
    const { values, positionals } = parseCommandLine(args, ["cond", "temp", "pres", "pressure"]);
    if (positionals.length !== 1) throw new UsageError(`expected one CSV file, got ${positionals.length}`);
    const file = positionals[0];
    let fixedPressure = 0;
    if (values.pressure !== undefined) {
      fixedPressure = Number(values.pressure);
      if (values.pressure.trim() === "" || !Number.isFinite(fixedPressure) || fixedPressure < 0) {
        throw new UsageError(`--pressure must be a number ≥ 0 (dbar), got "${values.pressure}"`);
      }
    }
    const text = new TextDecoder().decode(readBytes(file, "CSV file"));
    const parsed = Papa.parse<string[]>(text.replace(/^\uFEFF/, ""), { header: false, skipEmptyLines: "greedy" });
    const rows = parsed.data;
    if (rows.length === 0) throw new InputError(`${file}: row 1: the file is empty (no header row)`);
    const headers = rows[0];
    const plan = planColumns(headers, file, {
      conductivity: values.cond,
      temperature: values.temp,
      pressure: values.pres,
    });
    const notes = [plan.cond.note, plan.temp.note, plan.pres?.note].filter((n): n is string => n !== undefined);
    if (!plan.pres) {
      const depth = headers.find((h) => /^depth\b/i.test(h.trim()));
      const hint = depth ? `; depth in m ≈ pressure in dbar, use --pres "${depth}" to take it` : "";
      notes.push(`no pressure column; using ${fixedPressure} dbar for every row (--pressure to change)${hint}`);
    }
    const outName = headers.some((h) => h.trim().toLowerCase() === "salinity") ? "salinity_pss78" : "salinity";
    const problems: string[] = [];
    const out: string[][] = [[...headers, outName]];
    let converted = 0;
    for (let r = 1; r < rows.length; r++) {
      const row = rows[r];
      const rowNumber = r + 1;
      const c = readNumber(row[plan.cond.index], plan.cond, file, rowNumber, problems);
      const t = readNumber(row[plan.temp.index], plan.temp, file, rowNumber, problems);
      const p = plan.pres ? readNumber(row[plan.pres.index], plan.pres, file, rowNumber, problems) : fixedPressure;
      let s = "";
      if (c !== undefined && t !== undefined && p !== undefined) {
        if (c < 0)
          problems.push(
            `${file}: row ${rowNumber}, column "${plan.cond.header}": value "${row[plan.cond.index]}" is a negative conductivity`,
          );
        else if (p < 0)
          problems.push(
            `${file}: row ${rowNumber}, column "${plan.pres?.header ?? "--pressure"}": value "${plan.pres ? row[plan.pres.index] : fixedPressure}" is a negative pressure`,
          );
        else {
          const sp = practicalSalinityFromConductivity(c, t, p);
          const note = pss78ValidityNote(sp, t, p);
          if (note) problems.push(`${file}: row ${rowNumber}: ${note} (value kept)`);
          s = String(sp);
          converted++;
        }
      }
      out.push([...headers.map((_, i) => row[i] ?? ""), s]);
    }
    for (const n of notes) io.err(`note: ${n}`);
    for (const m of problems.slice(0, MAX_MESSAGES)) io.err(m);
    if (problems.length > MAX_MESSAGES) io.err(`… and ${problems.length - MAX_MESSAGES} more messages`);
    if (rows.length === 1) throw new InputError(`${file}: row 2: no data rows after the header`);
    if (converted === 0)
      throw new InputError(`${file}: no row could be converted (${rows.length - 1} data rows; see the messages above)`);
    io.out(toCsv(out[0]!, out.slice(1)));
    return 0;
  },
};
