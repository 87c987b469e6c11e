import { join } from "node:path";
import { fileURLToPath } from "node:url";
import type { Plugin } from "vite";

const vendor = fileURLToPath(new URL("./src/vendor/", import.meta.url));

/** Imports to swap: inside files whose path contains `importer`, each import specifier → a file in src/vendor/. */
export interface VendorSwapRule {
  importer: string;
  swaps: Record<string, string>;
}

/**
 * A Vite plugin (resolved before the default resolver) that swaps the named imports of a library's
 * own files for our files in dashboard/src/vendor/: the one mechanism behind the dashboard's trimmed
 * builds of third-party packages (proj4Trim.ts, deckTrim.ts). The first rule whose `importer` the
 * importing file's path contains and that names the specifier wins; anything else resolves as usual.
 */
export function vendorSwap(name: string, rules: readonly VendorSwapRule[]): Plugin {
  return {
    name,
    enforce: "pre",
    resolveId(source, importer) {
      if (!importer) return null;
      for (const rule of rules) {
        const file =
          importer.includes(rule.importer) && Object.hasOwn(rule.swaps, source) ? rule.swaps[source] : undefined;
        if (file !== undefined) return join(vendor, file);
      }
      return null;
    },
  };
}
