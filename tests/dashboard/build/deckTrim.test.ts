// The dashboard's deck.gl drops the WebGPU-only attribute packing (dashboard/deckTrim.ts). These
// checks read deck.gl as installed, so an upgrade that starts constructing AttributeBufferGroups on
// WebGL, or moves the import the plugin swaps, fails here instead of at run time in the browser.
import { readFileSync, readdirSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { deckTrim } from "../../../dashboard/deckTrim.ts";

const REPO = join(import.meta.dirname, "..", "..", "..");
const coreDir = join(REPO, "node_modules", "@deck.gl", "core");
const attributeDir = join(coreDir, "dist", "lib", "attribute");
const manager = readFileSync(join(attributeDir, "attribute-manager.js"), "utf8");

describe("deckTrim: deck.gl without its WebGPU attribute buffer groups", () => {
  it("attribute-manager.js constructs AttributeBufferGroups only for a WebGPU device (common practice: read the installed source)", () => {
    expect(manager).toMatch(
      /this\.attributeBufferGroups\s*=\s*device\.type === 'webgpu'\s*\?\s*new AttributeBufferGroups\([\s\S]*?\)\s*:\s*null;/,
    );
    // every other use goes through the field, never a new instance
    expect(manager.match(/new AttributeBufferGroups/g)).toHaveLength(1);
  });

  it("the plugin swaps exactly the import attribute-manager.js makes", () => {
    expect(manager).toContain('import AttributeBufferGroups from "./attribute-buffer-groups.js";');
    const resolveId = deckTrim.resolveId as (source: string, importer?: string) => string | null;
    const swapped = resolveId.call(null, "./attribute-buffer-groups.js", join(attributeDir, "attribute-manager.js"));
    expect(swapped).toMatch(/dashboard\/src\/vendor\/deckWebgpuBufferGroups\.js$/);
    expect(resolveId.call(null, "./attribute.js", join(attributeDir, "attribute-manager.js"))).toBeNull();
    expect(resolveId.call(null, "./attribute-buffer-groups.js", "/elsewhere/x.js")).toBeNull();
  });

  it("no other module of @deck.gl/core imports @luma.gl/gpgpu", () => {
    const dist = join(coreDir, "dist");
    const modules = (readdirSync(dist, { recursive: true }) as string[]).filter(
      (f) => f.endsWith(".js") && !f.startsWith("dist.") && !f.endsWith("attribute-buffer-groups.js"),
    );
    expect(modules.length).toBeGreaterThan(100);
    expect(modules.filter((f) => readFileSync(join(dist, f), "utf8").includes("@luma.gl/gpgpu"))).toEqual([]);
  });

  it("deck.gl's layer and resource code imports from loaders.gl only what the stand-in exports, and the plugin swaps it only for deck.gl's core", async () => {
    const dist = join(coreDir, "dist");
    const imported = new Set<string>();
    for (const f of ["lib/init.js", "lib/layer.js", "lib/resource/resource.js"]) {
      const code = readFileSync(join(dist, f), "utf8");
      for (const m of code.matchAll(/import \{([^}]*)\} from '@loaders\.gl\/(core|images)'/g)) {
        for (const name of m[1]!.split(",")) imported.add(name.trim());
      }
    }
    expect([...imported].sort()).toEqual(["ImageLoader", "load", "registerLoaders"]);
    const standIn = (await import("../../../dashboard/src/vendor/deckNoLoaders.js")) as Record<string, unknown>;
    for (const name of imported) expect(standIn[name], name).toBeDefined();
    await expect((standIn.load as (url: string) => Promise<unknown>)("cells.json")).rejects.toThrow(
      /not part of the dashboard build/,
    );
    const resolveId = deckTrim.resolveId as (source: string, importer?: string) => string | null;
    expect(resolveId.call(null, "@loaders.gl/core", join(dist, "lib", "layer.js"))).toMatch(/deckNoLoaders\.js$/);
    expect(resolveId.call(null, "@loaders.gl/core", join(REPO, "dashboard", "src", "x.ts"))).toBeNull();
  });
});
