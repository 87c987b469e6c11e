#!/usr/bin/env node
// Entry point of the `brackline` command: runs the plain-JavaScript build in cli/dist/ (made by
// `npm run build:cli`; rebuilt here when missing or older than the TypeScript sources).
import { existsSync } from "node:fs";

const dist = new URL("../dist/main.js", import.meta.url);
const { cliBuildIsStale, buildCli } = await import("../build.js");
if (cliBuildIsStale()) {
  try {
    await buildCli();
  } catch (error) {
    if (!existsSync(dist)) {
      process.stderr.write(`brackline: could not build the CLI (${error?.message ?? error}); run npm install\n`);
      process.exit(70);
    }
  }
}
const { main } = await import(dist.href);
process.exitCode = await main(process.argv.slice(2));
