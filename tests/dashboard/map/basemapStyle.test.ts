import { describe, expect, it } from "vitest";
import {
  FINE_MIN_ZOOM,
  resolutionForZoom,
  WORLD_LAND_LAYERS,
  WORLD_LAND_SOURCE,
  worldLandAttribution,
  type LandResolution,
} from "../../../dashboard/src/map/basemapStyle.ts";
import { WorldBasemap } from "../../../dashboard/src/map/basemapWorld.svelte.ts";
import { buildStyle } from "../../../dashboard/src/map/style.ts";

const FINE = { url: "blob:land-10m", resolution: "10m" } as const;

describe("resolutionForZoom() fetches the coarse land first and the fine land when zoomed in", () => {
  it("asks for 1:50m land zoomed out, 1:10m from FINE_MIN_ZOOM, and nothing twice", () => {
    expect(resolutionForZoom(2, new Set())).toBe("50m");
    expect(resolutionForZoom(2, new Set(["50m"]))).toBeUndefined();
    expect(resolutionForZoom(FINE_MIN_ZOOM, new Set(["50m"]))).toBe("10m");
    expect(resolutionForZoom(9.5, new Set())).toBe("10m");
    // Once the 1:10m land is there it serves every zoom: zooming out fetches nothing more.
    expect(resolutionForZoom(1, new Set(["10m"]))).toBeUndefined();
  });

  it("rejects a zoom that is not a number", () => {
    expect(() => resolutionForZoom(Number.NaN, new Set())).toThrow(/zoom.*NaN/);
  });
});

describe("buildStyle() with world land: beneath user tiles and our own basemap, credited to Natural Earth", () => {
  it("adds no world land unless given", () => {
    const style = buildStyle({ basemap: undefined });
    expect(style.sources[WORLD_LAND_SOURCE]).toBeUndefined();
    expect(style.layers.some((l) => l.id.startsWith("world-"))).toBe(false);
  });

  it("puts sea, land and coast right above the background, below the basemap's own land", () => {
    const ids = buildStyle({ basemap: undefined, worldLand: FINE }).layers.map((l) => l.id);
    expect(ids.slice(0, 4)).toEqual(["background", ...WORLD_LAND_LAYERS]);
    expect(ids.indexOf("world-coast")).toBeLessThan(ids.indexOf("land"));
    const source = buildStyle({ basemap: undefined, worldLand: FINE }).sources[WORLD_LAND_SOURCE];
    expect(source).toMatchObject({ type: "geojson", data: "blob:land-10m" });
    expect((source as { attribution?: string }).attribution).toBe(worldLandAttribution("10m"));
    expect(worldLandAttribution("10m")).toMatch(/Natural Earth 1:10 million \(public domain\)/);
  });

  it("draws the user's raster tiles over the world land", () => {
    const ids = buildStyle({
      basemap: undefined,
      worldLand: FINE,
      tileUrl: "https://tiles.example.invalid/{z}/{x}/{y}.png",
    }).layers.map((l) => l.id);
    expect(ids.indexOf("user-tiles")).toBeGreaterThan(ids.indexOf("world-coast"));
    expect(ids.indexOf("user-tiles")).toBeLessThan(ids.indexOf("land"));
  });
});

/** A loader whose answers the test releases by hand. */
function manualLoader() {
  const pending = new Map<LandResolution, { resolve(url: string): void; reject(e: Error): void }>();
  const calls: LandResolution[] = [];
  const load = (r: LandResolution) =>
    new Promise<string>((resolve, reject) => {
      calls.push(r);
      pending.set(r, { resolve, reject });
    });
  return { load, calls, pending };
}

const tick = () => new Promise((r) => setTimeout(r, 0));

describe("WorldBasemap keeps the finest land loaded and fetches each resolution once", () => {
  it("shows the coarse land until the fine land arrives, and ignores a coarse answer that comes late", async () => {
    const loader = manualLoader();
    const world = new WorldBasemap(loader.load);
    expect(world.status(true)).toBe("waiting");
    expect(world.status(false)).toBe("off");
    world.want(3);
    world.want(3.5);
    world.want(8);
    world.want(2);
    expect(loader.calls).toEqual(["50m", "10m"]);
    expect(world.status(true)).toBe("loading");
    loader.pending.get("10m")!.resolve("blob:fine");
    await tick();
    expect(world.source).toEqual({ url: "blob:fine", resolution: "10m" });
    loader.pending.get("50m")!.resolve("blob:coarse");
    await tick();
    expect(world.source).toEqual({ url: "blob:fine", resolution: "10m" });
    expect(world.status(true)).toBe("10m");
  });

  it("reports a failed fetch, keeps what it has, and tries again on the next view", async () => {
    const loader = manualLoader();
    const world = new WorldBasemap(loader.load);
    world.want(7);
    loader.pending.get("10m")!.reject(new Error("HTTP 404"));
    await tick();
    expect(world.source).toBeUndefined();
    expect(world.status(true)).toBe("error");
    expect(world.error).toMatch(/Natural Earth 1:10m.*HTTP 404/);
    world.want(7);
    expect(loader.calls).toEqual(["10m", "10m"]);
  });
});
