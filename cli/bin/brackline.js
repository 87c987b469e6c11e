#!/usr/bin/env node
// Entry point of the `brackline` command: runs the plain-JavaScript build in cli/dist/ (made by
// `npm run build:cli`). Only a missing build is made here (a fresh clone, `npx brackline`): one stat,
// no walk over the sources. After changing the TypeScript, `npm run build:cli` rebuilds it; `npm start`,
// `npm test` (scripts/ensure.js) and `npm run bench` rebuild it themselves when it is older than the sources.
import { existsSync } from "node:fs";

const dist = new URL("../dist/main.js", import.meta.url);
if (!existsSync(dist)) {
  try {
    const { buildCli } = await import("../build.js");
    await buildCli();
  } catch (error) {
    process.stderr.write(`brackline: could not build the CLI (${error?.message ?? error}); run npm install\n`);
    process.exit(70);
  }
}
const { main } = await import(dist.href);
process.exitCode = await main(process.argv.slice(2));
