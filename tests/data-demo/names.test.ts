import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { INVENTED_DATA_NOTE, INVENTED_NAME_LIST } from "../../data-demo/generator/names.ts";

const read = (rel: string) => readFileSync(new URL(`../../data-demo/${rel}`, import.meta.url), "utf8");
/** A few real estuaries and rivers of the mixing literature (from memory), as a guard against reuse. */
const REAL_NAMES_FROM_MEMORY = [
  "Thames",
  "Severn",
  "Tamar",
  "Mersey",
  "Humber",
  "Tay",
  "Forth",
  "Clyde",
  "Gironde",
  "Loire",
  "Seine",
  "Rhône",
  "Scheldt",
  "Ems",
  "Elbe",
  "Weser",
  "Rhine",
  "Tagus",
  "Hudson",
  "Delaware",
  "Merrimack",
  "Chesapeake",
  "Amazon",
  "Mississippi",
  "Mackenzie",
  "Yangtze",
  "Changjiang",
  "Pearl",
  "Chao Phraya",
  "Krka",
  "Ochlockonee",
  "Savannah",
  "Luce",
  "Beaulieu",
  "Conwy",
  "Dee",
  "Avon",
  "Exe",
  "Tyne",
  "Wear",
];

function namesIn(rel: string): string[] {
  const fc = JSON.parse(read(rel)) as { features: Array<{ properties: { name?: string } }> };
  return fc.features.map((f) => f.properties.name).filter((n): n is string => typeof n === "string");
}

describe("demo names are documented as invented", () => {
  it("every invented name is listed in data-demo/README.md and in truth.json geometry.inventedNames", () => {
    const readme = read("README.md");
    const truth = JSON.parse(read("truth.json")) as { geometry: { inventedNames: string[] } };
    for (const n of INVENTED_NAME_LIST) expect(readme, n).toContain(n);
    expect(truth.geometry.inventedNames).toEqual([...INVENTED_NAME_LIST]);
  });

  it("every named GeoJSON feature uses a name built from the documented invented list", () => {
    const roots = INVENTED_NAME_LIST.map((n) => n.split(" ")[0]);
    for (const name of [...namesIn("centerline.geojson"), ...namesIn("basemap.geojson")]) {
      if (name === "Invented coast") continue;
      expect(
        roots.some((r) => name.includes(r)),
        name,
      ).toBe(true);
    }
  });

  it("no invented name contains a real estuary or river name of the mixing literature (list from memory)", () => {
    for (const n of INVENTED_NAME_LIST) {
      for (const real of REAL_NAMES_FROM_MEMORY)
        expect(n.toLowerCase().includes(real.toLowerCase()), `${n} ~ ${real}`).toBe(false);
    }
  });

  it("README.md, surveys/README.md and the generator's doc comment say the data are invented", () => {
    expect(read("README.md")).toMatch(/Everything in this folder is invented/);
    expect(read("surveys/README.md")).toContain(INVENTED_DATA_NOTE);
    expect(read("generator/generateDemo.ts")).toMatch(/Everything this module produces is invented/);
  });
});
