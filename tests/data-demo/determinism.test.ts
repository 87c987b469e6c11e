import { mkdtempSync, readFileSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { format } from "prettier";
import * as babelPlugin from "prettier/plugins/babel";
import * as estreePlugin from "prettier/plugins/estree";
import * as markdownPlugin from "prettier/plugins/markdown";
import { afterAll, describe, expect, it } from "vitest";
import { DEFAULT_SEED, generateDemo } from "../../data-demo/generator/generateDemo.ts";
import { writeFiles } from "../../data-demo/generator/writeFiles.ts";
import { main } from "../../cli/main.ts";

const DEMO_DIR = fileURLToPath(new URL("../../data-demo/", import.meta.url));
const temps: string[] = [];
function tempDir(): string {
  const d = mkdtempSync(join(tmpdir(), "brackline-demo-"));
  temps.push(d);
  return d;
}
afterAll(() => temps.forEach((d) => rmSync(d, { recursive: true, force: true })));

describe("demo generator determinism (seeded d3-random randomLcg, common practice)", () => {
  const files = generateDemo(DEFAULT_SEED);

  it("generateDemo(1974) writes exactly the seven documented files", () => {
    expect([...files.keys()].sort()).toEqual(
      [
        "basemap.geojson",
        "centerline.geojson",
        "surveys/README.md",
        "surveys/both-surveys.csv",
        "surveys/dry-2025-09.csv",
        "surveys/wet-2025-03.csv",
        "truth.json",
      ].sort(),
    );
  });

  it("generateDemo(1974) written to a temp dir is byte-identical to the committed data-demo files", () => {
    const dir = tempDir();
    writeFiles(dir, files);
    for (const rel of files.keys()) {
      const generated = readFileSync(join(dir, rel));
      const committed = readFileSync(join(DEMO_DIR, rel));
      expect(
        generated.equals(committed),
        `${rel} differs from the committed file: regenerate with npx tsx data-demo/generator/generate.ts`,
      ).toBe(true);
    }
  });

  it("generateDemo() twice with the same seed gives identical text; another seed changes the surveys but not the geometry", () => {
    const again = generateDemo(DEFAULT_SEED);
    for (const [rel, text] of files) expect(again.get(rel), rel).toBe(text);
    const other = generateDemo(7);
    expect(other.get("surveys/wet-2025-03.csv")).not.toBe(files.get("surveys/wet-2025-03.csv"));
    expect(other.get("centerline.geojson")).toBe(files.get("centerline.geojson"));
  });

  it("generateDemo() rejects a non-integer seed with a RangeError naming the function", () => {
    expect(() => generateDemo(1.5)).toThrow(RangeError);
    expect(() => generateDemo(-1)).toThrow(/generateDemo\(\).*seed/);
  });

  it("`brackline demo --out <dir>` regenerates the committed files and `--seed x` is a usage error (exit 64)", async () => {
    const dir = tempDir();
    const out: string[] = [];
    const io = { out: (t: string) => out.push(t), err: (t: string) => out.push(t) };
    expect(await main(["demo", "--out", dir, "--seed", String(DEFAULT_SEED)], io)).toBe(0);
    for (const rel of files.keys()) {
      expect(readFileSync(join(dir, rel)).equals(readFileSync(join(DEMO_DIR, rel))), rel).toBe(true);
    }
    expect(await main(["demo", "--out", dir, "--seed", "x"], io)).toBe(64);
    expect(await main(["demo"], io)).toBe(64);
  });

  it("truth.json and surveys/README.md come out already in the project's Prettier layout (npm run lint stays clean)", async () => {
    const prettierrc = readFileSync(fileURLToPath(new URL("../../.prettierrc", import.meta.url)), "utf8");
    const { printWidth } = JSON.parse(prettierrc) as { printWidth: number };
    for (const rel of ["truth.json", "surveys/README.md"]) {
      const text = files.get(rel) ?? "";
      const parser = rel.endsWith(".json") ? "json" : "markdown";
      const plugins = [babelPlugin, estreePlugin, markdownPlugin];
      expect(await format(text, { printWidth, parser, plugins }), rel).toBe(text);
    }
  });
});
