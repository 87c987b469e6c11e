import { describe, expect, it } from "vitest";
import { buildBriefing } from "../../analysis/report/buildBriefing.ts";
import { renderBriefingHtml } from "../../analysis/report/renderHtml.ts";
import { summarizeArchive } from "../../analysis/archive/summarizeArchive.ts";
import { archiveName } from "../../analysis/archive/archiveSection.ts";
import { archiveTableRows, ARCHIVE_TABLE_COLUMNS } from "../../analysis/archive/archiveTable.ts";
import { syntheticArchive } from "./helpers/syntheticArchive.ts";

const TRUTH = { pctAt1000: -30, pctPerDecade: 20, pctNoiseSd: 5, l1000Km: 60, exponent: -0.3, lNoiseSd: 0.05 };

describe("archive briefing (invented synthetic archive)", () => {
  const analyses = syntheticArchive(TRUTH);
  const doc = buildBriefing({ analyses, dataNotice: "Invented data." });

  it("names the surveys by date range and count, not by listing them", () => {
    expect(doc.subtitle).toBe("Surveys: 84 surveys, 2016-01-15 to 2022-12-15");
    expect(doc.surveys).toEqual([]);
    expect(doc.comparison).toBeUndefined();
    const htmlText = renderBriefingHtml(doc);
    expect(htmlText).not.toContain("cruise 2016-01");
    expect(htmlText.length).toBeLessThan(400_000);
  });

  it("has the series figure, the channel × time strip, the discharge scatter, tables and findings with uncertainty", () => {
    const a = doc.archive!;
    expect(a.heading).toBe("Survey archive: 84 surveys, 2016-01-15 to 2022-12-15");
    expect(a.figures.map((f) => f.id)).toEqual(["arch-pc-0", "arch-strip", "arch-q"]);
    expect(a.tables[0]!.rows.map((r) => r[0])).toEqual(["winter", "spring", "summer", "autumn"]);
    expect(a.findings.some((f) => f.includes("larger than the uncertainty"))).toBe(true);
    expect(doc.references.some((r) => r.startsWith("Hyndman, R.J., Fan, Y. (1996)"))).toBe(true);
    // Entries recalled, not confirmed, are never printed in the reference list.
    expect(doc.references.some((r) => r.startsWith("Kruskal"))).toBe(false);
    const htmlText = renderBriefingHtml(doc);
    expect(htmlText).toContain('<section class="archive">');
    expect(htmlText).not.toMatch(/NaN|undefined/);
  });

  it("three surveys keep their sections and also get the archive section", () => {
    const d3 = buildBriefing({ analyses: analyses.slice(0, 3) });
    expect(d3.surveys).toHaveLength(3);
    expect(d3.archive?.heading).toBe(
      `Survey archive: ${archiveName({ nSurveys: 3, dateRange: ["2016-01-15", "2016-03-15"] })}`,
    );
  });
});

describe("archive long table", () => {
  it("archiveTableRows() has one row per survey, constituent and quantity with intervals", () => {
    const a = summarizeArchive(syntheticArchive(TRUTH).slice(0, 2));
    const { header, rows } = archiveTableRows(a);
    expect(header).toEqual(ARCHIVE_TABLE_COLUMNS);
    const pc = rows.filter((r) => r[7] === "percent_change");
    expect(pc).toHaveLength(2);
    expect(pc[0]![0]).toBe("cruise 2016-01");
    expect(pc[0]![1]).toBe("2016-01-15");
    expect(Number(pc[0]![10])).toBeLessThan(Number(pc[0]![9]));
    expect(rows.filter((r) => String(r[7]).startsWith("salt_intrusion"))).toHaveLength(2);
  });
});
