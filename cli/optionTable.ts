/**
 * Every option of every command as node:util parseArgs declares it: plain data with no analysis
 * import, so the CLI's entry can read the command line before loading a command's code
 * (cli/archive/earlyStart.ts). Re-exported by cli/options.ts.
 */
export const OPTIONS = {
  centerline: { type: "string" },
  mouth: { type: "string" },
  stations: { type: "string" },
  mapping: { type: "string" },
  layer: { type: "string" },
  discharge: { type: "string" },
  draws: { type: "string" },
  seed: { type: "string" },
  format: { type: "string" },
  out: { type: "string" },
  basemap: { type: "string" },
  title: { type: "string" },
  date: { type: "string" },
  bin: { type: "string" },
  width: { type: "string" },
  "max-offset": { type: "string" },
  mixing: { type: "boolean" },
  cond: { type: "string" },
  temp: { type: "string" },
  pres: { type: "string" },
  pressure: { type: "string" },
  threads: { type: "string" },
  "cache-dir": { type: "string" },
  "no-cache": { type: "boolean" },
  seasons: { type: "string" },
  "discharge-table": { type: "string" },
  unit: { type: "string", multiple: true },
  "off-channel-km": { type: "string" },
  "keep-off-channel": { type: "boolean" },
  "as-tracer": { type: "string", multiple: true },
  "centerline-out": { type: "string" },
} as const;
