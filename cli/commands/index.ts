import type { Command } from "../command.ts";
import { analyzeCommand } from "./analyze.ts";
import { compareCommand } from "./compare.ts";
import { reportCommand } from "./report.ts";
import { demoCommand } from "./demo.ts";
import { salinityCommand } from "./salinity.ts";
import { underwayCommand } from "./underway.ts";
import { mappingCommand } from "./mapping.ts";

/** Every subcommand of `brackline`, in the order `--help` lists them. */
export const commands: Command[] = [
  analyzeCommand,
  demoCommand,
  salinityCommand,
  compareCommand,
  reportCommand,
  underwayCommand,
  mappingCommand,
];
