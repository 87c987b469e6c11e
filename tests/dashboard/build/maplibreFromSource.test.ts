// The dashboard builds MapLibre from the TypeScript sources its package ships (dashboard/maplibreFromSource.ts).
// MapLibre's classes rely on TypeScript's `useDefineForClassFields: false`: a struct array declares
// `int16: Int16Array` and its base constructor fills it, so a declared-only field must not be emitted
// (an emitted `int16;` resets it to undefined after the base constructor and the map throws on start).
// These checks run the plugin's hooks on MapLibre's own files as installed.
import { readFileSync } from "node:fs";
import { join } from "node:path";
import type { Plugin } from "vite";
import { describe, expect, it } from "vitest";
import { maplibreFromSource } from "../../../dashboard/maplibreFromSource.ts";

const REPO = join(import.meta.dirname, "..", "..", "..");
const src = join(REPO, "node_modules", "maplibre-gl", "src");

type Hook = (this: unknown, ...args: unknown[]) => unknown;
/** The plugin as `vite build` runs it: configResolved says it is a build. */
function buildingPlugin(): Plugin {
  const plugin = maplibreFromSource();
  (plugin.configResolved as Hook).call(null, { command: "build" });
  return plugin;
}

describe("maplibreFromSource: MapLibre from its TypeScript sources", () => {
  it("compiles a struct array without its declared-only fields, as useDefineForClassFields: false does (common practice: TypeScript class-field semantics)", async () => {
    const id = join(src, "data", "array_types.g.ts");
    const out = (await (buildingPlugin().transform as Hook).call(null, readFileSync(id, "utf8"), id)) as {
      code: string;
    };
    const layout = /class StructArrayLayout2i4 extends StructArray \{([\s\S]*?)\n\}/.exec(out.code)?.[1] ?? "";
    expect(layout).toContain("this.int16 = new Int16Array(this.arrayBuffer)");
    expect(layout).not.toMatch(/^\s*(uint8|int16)\s*;/m);
  });

  it("leaves files outside MapLibre's sources to Vite", async () => {
    const id = join(REPO, "dashboard", "src", "map", "layers.ts");
    expect(await (buildingPlugin().transform as Hook).call(null, "export const a = 1;", id)).toBeNull();
  });

  it("resolves maplibre-gl to its sources only in a build, and the MLT decoder to the stand-in only for MapLibre", () => {
    const resolve = (p: Plugin, source: string, importer?: string) =>
      (p.resolveId as Hook).call(null, source, importer);
    const building = buildingPlugin();
    expect(resolve(building, "maplibre-gl")).toBe(join(src, "index.ts"));
    expect(resolve(building, "@maplibre/mlt", join(src, "source", "vector_tile_mlt.ts"))).toMatch(
      /dashboard\/src\/vendor\/maplibreNoMlt\.js$/,
    );
    expect(resolve(building, "@maplibre/mlt", join(REPO, "elsewhere.ts"))).toBeNull();
    const serving = maplibreFromSource();
    (serving.configResolved as Hook).call(null, { command: "serve" });
    expect(resolve(serving, "maplibre-gl")).toBeNull();
  });

  it("the MLT stand-in keeps @maplibre/mlt's GEOMETRY_TYPE values, the only non-throwing thing MapLibre imports from it", async () => {
    const mlt = readFileSync(
      join(REPO, "node_modules", "@maplibre", "mlt", "dist", "vector", "geometry", "geometryType.js"),
      "utf8",
    );
    const { GEOMETRY_TYPE, decodeTile } = await import("../../../dashboard/src/vendor/maplibreNoMlt.js");
    for (const [name, value] of Object.entries(GEOMETRY_TYPE).filter(([k]) => Number.isNaN(Number(k)))) {
      expect(mlt).toContain(`GEOMETRY_TYPE["${name}"] = ${String(value)}]`);
    }
    expect(() => decodeTile()).toThrow(/not part of the dashboard build/);
    const usesFromMlt = readFileSync(join(src, "source", "vector_tile_mlt.ts"), "utf8").match(
      /import \{([^}]*)\} from '@maplibre\/mlt'/,
    )?.[1];
    expect(
      usesFromMlt
        ?.split(",")
        .map((s) => s.trim())
        .filter((s) => !s.startsWith("type ")),
    ).toEqual(["decodeTile", "GEOMETRY_TYPE"]);
  });
});
