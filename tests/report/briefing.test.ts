import { describe, it, expect, beforeAll } from "vitest";
import { JSDOM } from "jsdom";
import { buildBriefing } from "../../analysis/report/buildBriefing.ts";
import { renderBriefingHtml } from "../../analysis/report/renderHtml.ts";
import type { BriefingDocument } from "../../analysis/report/briefingTypes.ts";
import type { SurveyAnalysis } from "../../analysis/pipeline/surveyAnalysis.ts";
import { fractionInWords } from "../../analysis/report/wording.ts";
import { formatSignificant } from "../../analysis/output/formatNumber.ts";
import { demoAnalyses, demoBasemap, demoCenterline, truth } from "../compare/helpers/demoAnalyses.ts";
import { externalReferences, parseErrors } from "./helpers/htmlChecks.ts";

let analyses: SurveyAnalysis[];
let doc: BriefingDocument;
let text: string;
const notice = "INVENTED DEMO DATA: test notice.";

beforeAll(() => {
  analyses = demoAnalyses(200);
  const { network } = demoCenterline();
  doc = buildBriefing({
    analyses,
    network,
    basemap: demoBasemap(),
    dataNotice: notice,
    files: [{ name: "wet-2025-03.csv", role: "survey", bytes: 1 }],
  });
  text = renderBriefingHtml(doc);
});

const bodyText = (t: string): string => new JSDOM(t).window.document.body.textContent ?? "";

describe("renderBriefingHtml() on the invented demo surveys", () => {
  it("renderBriefingHtml() output parses without errors in parse5 (WHATWG HTML parser) and starts with <!DOCTYPE html>", () => {
    expect(text.startsWith("<!DOCTYPE html>")).toBe(true);
    const errors = parseErrors(text);
    expect(errors.map((e) => `${e.code} at line ${e.startLine}`)).toEqual([]);
  });

  it("renderBriefingHtml() output makes no external requests and has no script (no <script>, <link>, <img>, on* handlers, http(s) or // URLs)", () => {
    expect(externalReferences(text)).toEqual([]);
    expect(text).toContain("<style>");
    expect(text).toContain("@page { size: A4");
  });

  it("renderBriefingHtml() text is readable without script (jsdom, scripts disabled): summary, findings, table, methods, cautions, invented-data notice", () => {
    const t = bodyText(text);
    for (const s of [
      "In brief",
      "Findings",
      "Results by constituent",
      "Comparison of the surveys",
      "Data provenance",
      "Methods",
      "References",
      "Cautions",
      notice,
    ])
      expect(t).toContain(s);
    expect(t).toContain("Screening analysis, not a compliance assessment");
    expect(t).toContain("defer to local regulations and licensed practice");
    expect(t).toContain("Boyle, E., Collier, R., Dengler, A.T., Edmond, J.M., Ng, A.C., Stallard, R.F. (1974)");
    expect(t).toContain("method after Loder & Reichard 1981");
    expect(t).not.toContain("Loder, T.C., Reichard, R.P. (1981)"); // recalled, so not listed as checked
    expect(new JSDOM(text).window.document.querySelectorAll("svg").length).toBeGreaterThan(6);
  });

  it("Fe finding states the removal in words matching truth.json (−92.5 % → 'nine tenths') with the estimated % change and interval and the zone in km and salinity", () => {
    const fe = analyses[0]!.constituents.find((c) => c.name === "Fe")!;
    const f = doc.surveys[0]!.findings.find((x) => x.constituent === "Fe")!;
    expect(fractionInWords(-truth.surveys["wet-2025-03"]!.constituents.Fe!.percentChange / 100)).toBe(
      "about nine tenths",
    );
    expect(f.text).toMatch(
      /^About nine tenths of the dissolved iron \(Fe\) brought by the river is removed between km \d+ and km \d+, where salinity rises from [\d.]+ to [\d.]+/,
    );
    expect(f.text).toContain(
      `net change ${formatSignificant(fe.percentChange!.value, 2, true)} %, 95 % interval ${formatSignificant(fe.percentChange!.lower, 2, true)} to ${formatSignificant(fe.percentChange!.upper, 2, true)} %`,
    );
    const z = fe.reactionZone!;
    expect(f.text).toContain(
      `between km ${Math.round(Math.max(...z.km.flat()))} and km ${Math.round(Math.min(...z.km.flat()))}`,
    );
  });

  it("a change whose interval includes zero is reported as indistinguishable from conservative mixing (NO3, truth.json −5 %)", () => {
    const no3 = analyses[0]!.constituents.find((c) => c.name === "NO3")!;
    const f = doc.surveys[0]!.findings.find((x) => x.constituent === "NO3")!;
    if (no3.percentChange && no3.percentChange.lower <= 0 && no3.percentChange.upper >= 0)
      expect(f.text).toMatch(/cannot be distinguished from conservative mixing/);
    else expect(f.text).not.toMatch(/cannot be distinguished/);
  });

  it("the comparison findings give the salt intrusion of both surveys with discharges and the apparent exponent note", () => {
    const cmp = doc.comparison!;
    expect(cmp.findings[0]).toMatch(/in wet-2025-03 \(450 m³\/s\), against about \d+ km in dry-2025-09 \(60 m³\/s\)/);
    expect(cmp.findings[1]).toMatch(/Apparent n = −0\.\d\d for salt intrusion/);
  });

  it("renderBriefingHtml(buildBriefing()) is byte-identical for identical input and contains no clock time", () => {
    const again = renderBriefingHtml(
      buildBriefing({
        analyses,
        network: demoCenterline().network,
        basemap: demoBasemap(),
        dataNotice: notice,
        files: [{ name: "wet-2025-03.csv", role: "survey", bytes: 1 }],
      }),
    );
    expect(again === text).toBe(true);
    expect(text).not.toMatch(/\b20\d\d-\d\d-\d\dT\d\d:\d\d/);
  });

  it("a hostile station id and survey name <script>alert(1)</script> appear as text only, never as markup", () => {
    const evil = "<script>alert(1)</script>";
    const a = structuredClone(analyses[0]!);
    a.survey.name = evil;
    a.stations[0]!.id = evil;
    for (const c of a.constituents) if (c.deviations[0]) c.deviations[0].stationId = evil;
    a.warnings.push({ code: "x", message: `station ${evil} "quoted" & more` });
    const out = renderBriefingHtml(
      buildBriefing({ analyses: [a], network: demoCenterline().network, files: [{ name: evil, role: "survey" }] }),
    );
    expect(out).not.toContain(evil);
    expect(out).toContain("&lt;script&gt;alert(1)&lt;/script&gt;");
    const dom = new JSDOM(out);
    expect(dom.window.document.querySelectorAll("script").length).toBe(0);
    expect(dom.window.document.body.textContent).toContain(evil);
    expect(parseErrors(out)).toEqual([]);
  });

  it("buildBriefing() of one survey without a channel has no comparison and no map but keeps findings, zone chart and table", () => {
    const one = buildBriefing({ analyses: [analyses[1]!] });
    expect(one.comparison).toBeUndefined();
    expect(one.surveys[0]!.figures.some((f) => f.id.endsWith("-map"))).toBe(false);
    expect(one.surveys[0]!.figures.some((f) => f.id.endsWith("-zones"))).toBe(true);
    const out = renderBriefingHtml(one);
    expect(out).not.toContain("Comparison of the surveys");
    expect(parseErrors(out)).toEqual([]);
    expect(externalReferences(out)).toEqual([]);
  });

  it("buildBriefing() throws RangeError naming the function without analyses", () => {
    expect(() => buildBriefing({ analyses: [] })).toThrow(/buildBriefing: input.analyses/);
  });
});
