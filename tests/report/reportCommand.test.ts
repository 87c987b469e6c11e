import { describe, it, expect } from "vitest";
import { execFileSync } from "node:child_process";
import { existsSync, mkdtempSync, readFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { main } from "../../cli/main.ts";
import { DEMO_DIR } from "../compare/helpers/demoAnalyses.ts";
import { externalReferences, parseErrors } from "./helpers/htmlChecks.ts";

async function run(argv: string[]): Promise<{ code: number; err: string }> {
  let err = "";
  const code = await main(argv, { out: () => undefined, err: (t) => (err += `${t}\n`) });
  return { code, err };
}

const dir = mkdtempSync(join(tmpdir(), "brackline-report-"));
const args = (out: string): string[] => [
  "report",
  `${DEMO_DIR}surveys/wet-2025-03.csv`,
  `${DEMO_DIR}surveys/dry-2025-09.csv`,
  "--centerline",
  `${DEMO_DIR}centerline.geojson`,
  "--basemap",
  `${DEMO_DIR}basemap.geojson`,
  "--discharge",
  "wet-2025-03=450,dry-2025-09=60",
  "--draws",
  "60",
  "--seed",
  "5",
  "--out",
  out,
];

const CHROMIUM = "/usr/bin/chromium";
const haveChromium = existsSync(CHROMIUM);
if (!haveChromium)
  console.log(
    `note: ${CHROMIUM} not found; the PDF print check is skipped${process.env.CI === "true" ? " (but CI=true: it will fail)" : ""}`,
  );

describe("brackline report", () => {
  it("brackline report writes a byte-identical, well-formed, self-contained briefing for identical input and seed, with the invented-data statement from the GeoJSON", async () => {
    const a = join(dir, "a.html");
    const b = join(dir, "b.html");
    const r1 = await run(args(a));
    expect(r1.code, r1.err).toBe(0);
    expect(r1.err).toMatch(/building the briefing \(2 surveys\)/);
    await run(args(b));
    const ta = readFileSync(a, "utf8");
    expect(ta === readFileSync(b, "utf8")).toBe(true);
    expect(parseErrors(ta)).toEqual([]);
    expect(externalReferences(ta)).toEqual([]);
    expect(ta).toContain("INVENTED DEMO DATA");
    expect(ta).toMatch(/wet-2025-03\.csv<\/td><td>survey<\/td><td>\d+<\/td><td>[0-9a-f]{64}<\/td>/);
    const dated = join(dir, "c.html");
    await run([...args(dated), "--date", "2026-01-15"]);
    expect(readFileSync(dated, "utf8")).toContain("2026-01-15");
  });

  it.skipIf(!haveChromium && process.env.CI !== "true")(
    "the briefing prints to a multi-page A4 PDF with headless Chromium",
    async () => {
      const html = join(dir, "print.html");
      expect((await run(args(html))).code).toBe(0);
      const pdf = join(dir, "print.pdf");
      execFileSync(
        CHROMIUM,
        [
          "--headless",
          "--no-sandbox",
          "--disable-gpu",
          "--no-pdf-header-footer",
          `--print-to-pdf=${pdf}`,
          `file://${html}`,
        ],
        { stdio: "ignore", timeout: 120_000 },
      );
      const bytes = readFileSync(pdf);
      expect(bytes.subarray(0, 5).toString("latin1")).toBe("%PDF-");
      const pages = (bytes.toString("latin1").match(/\/Type\s*\/Page[^s]/g) ?? []).length;
      expect(pages).toBeGreaterThan(4);
      const mediaBox = /\/MediaBox\s*\[\s*0 0 ([\d.]+) ([\d.]+)\s*\]/.exec(bytes.toString("latin1"));
      expect(mediaBox, "a MediaBox").not.toBeNull();
      expect(Math.round(Number(mediaBox![1]))).toBe(595); // A4 = 595 × 842 pt (ISO 216)
      expect(Math.round(Number(mediaBox![2]))).toBe(842);
    },
  );
});
