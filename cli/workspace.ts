/** The CLI's one way from files on disk to results: read the files, call readInputs, report, check. */
import { basename } from "node:path";
import type { CommandIo } from "./command.ts";
import type {
  ImportIssue,
  InputChoices,
  InputFile,
  InputFileKind,
  PreReadFiles,
  WorkspaceInputs,
} from "../analysis/index.ts";
import { EXPECTED_FILE, readInputs } from "../analysis/index.ts";
import { InputError } from "./exitCodes.ts";
import { readBytes } from "./files.ts";
import { inputChoices, type OptionValues } from "./options.ts";

/** "file: row 3, column "Fe", value "x": expected a number". */
export function issueText(i: ImportIssue): string {
  const where = [i.row > 0 ? `row ${i.row}` : "", i.column ? `column "${i.column}"` : ""].filter(Boolean).join(", ");
  return `${i.file}${where ? `: ${where}` : ""}${i.value ? `, value "${i.value}"` : ""}: expected ${i.expected}`;
}

/** One line per import problem class for stderr. */
export function describeImport(inputs: WorkspaceInputs): string {
  const s = inputs.summary;
  const reasons = Object.entries(s.rejectedByReason).map(([r, n]) => `${n} ${r}`);
  const lines = [
    `import: ${s.rowsRead} rows read, ${s.rowsAccepted} accepted, ${s.rowsRejected} rejected${reasons.length ? ` (${reasons.join("; ")})` : ""}`,
  ];
  for (const i of inputs.issues.slice(0, 50)) lines.push(`  ${i.severity}: ${issueText(i)}`);
  if (inputs.issues.length > 50)
    lines.push(`  ... and ${inputs.issues.length - 50} more problems (all listed in the JSON output)`);
  if (inputs.channel) lines.push(inputs.channel.mouth.statement);
  return lines.join("\n");
}

/** The files named on the command line (station table, surveys, centerline) and the readInputs choices. */
export function workspaceFiles(
  paths: readonly string[],
  values: OptionValues,
): { files: InputFile[]; choices: InputChoices } {
  const choices = inputChoices(values);
  if (paths.length === 0) throw new InputError("no survey file given");
  const kindByFile: Record<string, InputFileKind> = {};
  const named: ReadonlyArray<readonly [string, string, InputFileKind | undefined]> = [
    ...(values.stations !== undefined ? [[values.stations, "station table", "stationTable"] as const] : []),
    ...paths.map((p) => [p, "survey file", undefined] as const),
    ...(values.centerline !== undefined ? [[values.centerline, "centerline", "centerline"] as const] : []),
  ];
  const files: InputFile[] = named.map(([path, what, kind]) => {
    const name = basename(path);
    if (kind) kindByFile[name] = kind;
    return { name, content: readBytes(path, what) };
  });
  return { files, choices: { ...choices, kindByFile } };
}

/**
 * Reads the survey files given on the command line (any kind the dashboard reads), the station table
 * (`--stations`) and the centerline (`--centerline`) through readInputs.
 *
 * @param read the files and choices of {@link workspaceFiles} with the survey files already read on
 *   worker threads (cli/archive/parallelRead.ts); default: read everything here
 * @throws InputError (exit 2) for an unreadable or unrecognised file, an unusable centerline or no survey
 */
export function loadWorkspace(
  paths: readonly string[],
  values: OptionValues,
  io: CommandIo,
  read?: { files: InputFile[]; choices: InputChoices; preRead: PreReadFiles },
): WorkspaceInputs {
  const { files, choices } = read ?? workspaceFiles(paths, values);
  const inputs = readInputs(files, choices, read?.preRead);
  io.err(describeImport(inputs));
  const unknown = inputs.files.find((f) => f.kind === "unknown");
  if (unknown) {
    const why = inputs.issues.find((i) => i.file === unknown.file)?.value;
    throw new InputError(
      `${unknown.file}: not a file Brackline reads${why ? ` (${why})` : ""}; expected ${EXPECTED_FILE}`,
    );
  }
  if (values.centerline !== undefined && !inputs.channel) {
    const first = inputs.issues.find((i) => i.file === basename(values.centerline!) && i.severity === "error");
    throw new InputError(first ? issueText(first) : `${values.centerline}: no usable centerline`);
  }
  const unmatched = inputs.issues.find((i) => i.file === "(unit override)");
  if (unmatched) throw new InputError(`--unit: ${unmatched.value}: expected ${unmatched.expected}`);
  const tracers = inputs.surveys.flatMap((s) => s.constituents).filter((c) => c.kind !== "nonMixing");
  const missing = inputs.files.flatMap((f) => (f.missingUnits ?? []).map((m) => ({ ...m, file: f.file })));
  const missingTracers = missing.filter((m) => m.kind === "tracer");
  if (tracers.length === 0 && missingTracers.length > 0)
    throw new InputError(
      [
        `no dissolved constituent can be analysed: ${missingTracers.length} constituent column(s) have no unit in the header.`,
        ...missingTracers.map((m) => `  ${m.file}: column "${m.header}" (${m.name}) — add ${m.option}`),
        "Check each unit in the data's documentation; the units shown are examples, not guesses applied for you.",
      ].join("\n"),
    );
  for (const n of inputs.notices) io.err(`notice: ${n.message}`);
  const notUsed = inputs.files.flatMap((f) => (f.notUsed ?? []).map((u) => ({ ...u, file: f.file })));
  if (notUsed.length > 0)
    io.err(["columns not used:", ...notUsed.map((u) => `  ${u.file}: "${u.header}" — ${u.reason}`)].join("\n"));
  if (inputs.surveys.length === 0) {
    const first = inputs.issues.find((i) => i.severity === "error");
    throw new InputError(first ? issueText(first) : `${paths.join(", ")}: no survey could be read`);
  }
  return inputs;
}
