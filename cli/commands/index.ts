import type { Command } from "../command.ts";

/** A subcommand as `brackline --help` lists it; its code is loaded only when it runs (fast start). */
export interface CommandEntry {
  name: string;
  summary: string;
  load: () => Promise<Command>;
}

/** Every subcommand of `brackline`, in the order `--help` lists them. */
export const commands: CommandEntry[] = [
  {
    name: "analyze",
    summary: "analyse surveys: stations along the channel and mixing behaviour of every constituent",
    load: async () => (await import("./analyze.ts")).analyzeCommand,
  },
  {
    name: "demo",
    summary: "write the invented demo estuary (surveys, centerline, basemap, truth)",
    load: async () => (await import("./demo.ts")).demoCommand,
  },
  {
    name: "salinity",
    summary: "add PSS-78 practical salinity from conductivity, temperature and pressure columns of a CSV",
    load: async () => (await import("./salinity.ts")).salinityCommand,
  },
  {
    name: "compare",
    summary: "compare surveys: salt intrusion vs discharge, shifts of reaction zones, maxima and C*0",
    load: async () => (await import("./compare.ts")).compareCommand,
  },
  {
    name: "report",
    summary: "write a self-contained HTML stakeholder briefing (prints to A4 PDF)",
    load: async () => (await import("./report.ts")).reportCommand,
  },
  {
    name: "underway",
    summary: "bin an underway (flow-through) log along the channel or in salinity classes",
    load: async () => (await import("./underway.ts")).underwayCommand,
  },
  {
    name: "mapping",
    summary: "print the suggested column mapping of survey files (JSON, for editing and --mapping)",
    load: async () => (await import("./mapping.ts")).mappingCommand,
  },
];
