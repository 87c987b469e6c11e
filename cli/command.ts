/** One `brackline` subcommand. */
export interface Command {
  name: string;
  /** One-line summary for `brackline --help`. */
  summary: string;
  /** Full help text for `brackline <name> --help`. */
  help: string;
  /** Runs the command; returns the exit code. Writes results to `out`, progress and problems to `err`. */
  run(args: string[], io: CommandIo): Promise<number>;
}

export interface CommandIo {
  out: (text: string) => void;
  err: (text: string) => void;
}
