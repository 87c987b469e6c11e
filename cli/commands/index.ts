import type { Command } from "../command.ts";

/** Every subcommand of `brackline`, in the order `--help` lists them. */
export const commands: Command[] = [];
