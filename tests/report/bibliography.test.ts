import { readdirSync, readFileSync, statSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { BIBLIOGRAPHY, bibEntry, referenceList } from "../../analysis/report/referencesBibliography.ts";
import { briefingReferences, cite, methodsParagraphs } from "../../analysis/report/references.ts";

const entries = Object.values(BIBLIOGRAPHY);

function tsFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((n) => {
    const p = join(dir, n);
    return statSync(p).isDirectory() ? tsFiles(p) : p.endsWith(".ts") ? [p] : [];
  });
}

describe("bibliography", () => {
  it("has complete entries: authors, year, title, container, a checked mark and what it was checked against", () => {
    for (const e of entries) {
      expect(e.authors.trim(), e.key).not.toBe("");
      expect(Number.isInteger(e.year) && e.year > 1900 && e.year < 2100, e.key).toBe(true);
      expect(e.title.trim(), e.key).not.toBe("");
      expect(e.container.trim(), e.key).not.toBe("");
      expect(["confirmed", "fromMemory"], e.key).toContain(e.checked);
      expect(e.checkedAgainst.trim(), e.key).not.toBe("");
      if (e.doi) expect(e.doi, e.key).toMatch(/^10\.\d{4,}\//);
    }
  });
  it("marks an entry confirmed only when nothing in it is said to be from memory", () => {
    for (const e of entries.filter((x) => x.checked === "confirmed"))
      expect(e.checkedAgainst, e.key).not.toMatch(/memory|recalled|not retrieved/i);
  });
  it("throws RangeError naming an unknown key", () => {
    expect(() => bibEntry("noSuchKey")).toThrow(/"noSuchKey"/);
  });
  it("leaves entries recalled from memory out of a reference list", () => {
    expect(referenceList(["boyle1974", "officer1979"])).toEqual([
      "Boyle, E., Collier, R., Dengler, A.T., Edmond, J.M., Ng, A.C., Stallard, R.F. (1974) On the chemical mass-balance in estuaries. Geochimica et Cosmochimica Acta 38, 1719–1728.",
    ]);
  });
  it("cites entries recalled from memory as 'method after …'", () => {
    expect(cite("officer1979", "boyle1974", "loderReichard1981")).toBe(
      "Boyle et al. 1974; method after Officer 1979; Loder & Reichard 1981",
    );
    expect(cite("officerLynch1981")).toBe("method after Officer & Lynch 1981");
  });
  it("resolves every '@see bibliography key(s) …' in analysis/ to an entry", () => {
    const missing: string[] = [];
    for (const f of tsFiles("analysis")) {
      const text = readFileSync(f, "utf8");
      for (const m of text.matchAll(/bibliography keys? ([^\n(]*)/g))
        for (const k of m[1].split(/[,;\s().]+/).filter((w) => /^[a-z][A-Za-z]*\d{4}[A-Za-z0-9]*$/.test(w)))
          if (!Object.hasOwn(BIBLIOGRAPHY, k)) missing.push(`${f}: ${k}`);
    }
    expect(missing).toEqual([]);
  });
});

describe("briefing methods and references", () => {
  const text = [
    ...methodsParagraphs("a smoothing spline", { draws: 200, seed: 1 }, true),
    ...briefingReferences(true),
  ].join("\n");
  it("name no file a reader does not have and carry no internal notes", () => {
    expect(text).not.toMatch(/\.md\b|§|from memory|check before citing|reference sheet/i);
  });
  it("list only confirmed entries", () => {
    const confirmed = new Set(entries.filter((e) => e.checked === "confirmed").map((e) => e.authors));
    for (const r of briefingReferences(true))
      expect(
        [...confirmed].some((a) => r.startsWith(a)),
        r,
      ).toBe(true);
    expect(briefingReferences(true).length).toBeGreaterThan(0);
  });
});
