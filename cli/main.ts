import type { Command, CommandIo } from "./command.ts";
import { prestartSurveyWorkers, stopPrestarted } from "./archive/earlyStart.ts";
import { PHASES_ON, phaseMark } from "./archive/phaseLog.ts";
import { commands } from "./commands/index.ts";
import { EXIT_BAD_INPUT, EXIT_INTERNAL, EXIT_USAGE, InputError, UsageError } from "./exitCodes.ts";
import { stripControl } from "../analysis/output/terminalText.ts";
import { SCREENING_CAUTION } from "../analysis/output/caution.ts";

function usage(): string {
  const lines = commands.map((c) => `  ${c.name.padEnd(10)} ${c.summary}`);
  return [
    "brackline: estuarine mixing analysis from survey files",
    "",
    "Usage: brackline <command> [options]",
    "",
    "Commands:",
    ...lines,
    "",
    "Run `brackline <command> --help` for a command's options.",
    SCREENING_CAUTION,
  ].join("\n");
}

const isParseArgsError = (error: unknown): boolean =>
  error instanceof TypeError &&
  "code" in error &&
  String((error as { code: unknown }).code).startsWith("ERR_PARSE_ARGS");

/**
 * Runs the CLI with the given arguments and returns the process exit code. Everything written to the
 * terminal (results and messages) has control characters and escape sequences removed.
 */
export async function main(argv: string[], io?: CommandIo): Promise<number> {
  const raw: CommandIo = io ?? {
    out: (t) => process.stdout.write(t.endsWith("\n") ? t : `${t}\n`),
    err: (t) => process.stderr.write(t.endsWith("\n") ? t : `${t}\n`),
  };
  const sink: CommandIo = { out: (t) => raw.out(stripControl(t)), err: (t) => raw.err(stripControl(t)) };
  const [name, ...rest] = argv;
  if (PHASES_ON && !io) {
    process.stderr.write(`phase ${performance.timeOrigin.toFixed(1)} 0 process start\n`);
    phaseMark("CLI entry loaded");
  }
  if (name === undefined || name === "--help" || name === "-h" || name === "help") {
    sink.out(usage());
    return name === undefined ? EXIT_USAGE : 0;
  }
  const entry = commands.find((c) => c.name === name);
  if (!entry) {
    sink.err(`brackline: unknown command "${name}"\n\n${usage()}`);
    return EXIT_USAGE;
  }
  // Survey workers start loading now, while this thread loads the command's code.
  prestartSurveyWorkers(name, rest);
  phaseMark("workers started");
  try {
    const command = await entry.load();
    phaseMark("command loaded");
    if (rest.includes("--help") || rest.includes("-h")) {
      sink.out(command.help);
      return 0;
    }
    return await runCommand(command, name, rest, sink);
  } finally {
    await stopPrestarted();
  }
}

async function runCommand(command: Command, name: string, rest: string[], sink: CommandIo): Promise<number> {
  try {
    return await command.run(rest, sink);
  } catch (error) {
    if (error instanceof InputError) {
      sink.err(`brackline ${name}: ${error.message}`);
      return EXIT_BAD_INPUT;
    }
    if (error instanceof UsageError || isParseArgsError(error)) {
      sink.err(`brackline ${name}: ${(error as Error).message}\n\n${command.help}`);
      return EXIT_USAGE;
    }
    sink.err(
      `brackline ${name}: internal error: ${error instanceof Error ? (error.stack ?? error.message) : String(error)}`,
    );
    return EXIT_INTERNAL;
  }
}
