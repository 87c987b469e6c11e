/**
 * The archive view's own inputs: a discharge table joined to each survey's analysis by the
 * analysis' rule (the CLI's discharge-table rule) and reported by the worker, the seasons editor text, the neutral no-discharge warning with
 * per-front-end hints, and the workspace round trip of both choices (older workspaces: defaults).
 * Invented synthetic archive and an invented flows table; no measurements.
 */
import { describe, expect, it } from "vitest";
import { parse } from "valibot";
import {
  createWorkspace,
  DEFAULT_SEASONS,
  DISCHARGE_JOIN_RULE,
  parseSeasons,
  readDischargeTable,
  surveyDischarge,
  workspaceSchema,
} from "../../../analysis/index.ts";
import { syntheticArchive } from "../../archive/helpers/syntheticArchive.ts";
import { archiveOf } from "../../../dashboard/src/worker/archive.ts";
import { chosenZonePaths, MIN_ZONE_ALPHA, zoneAlpha } from "../../../dashboard/src/archive/chosenZonesLayer.ts";
import { expectWithin } from "../../helpers/tolerance.ts";
import { surveysInBox } from "../../../dashboard/src/archive/scatterModel.ts";
import { readSeasonsText, seasonsText } from "../../../dashboard/src/archive/archiveChoices.ts";
import { fromWorkspaceDocument, toWorkspaceDocument } from "../../../dashboard/src/state/workspaceDoc.ts";

const truth = { pctAt1000: -20, pctPerDecade: 15, pctNoiseSd: 3, l1000Km: 40, exponent: -0.3, lNoiseSd: 0.05 };
/** The synthetic archive of 2016 only, with the files' discharges taken away. */
const noFlow = syntheticArchive(truth, 7, [2016]).map((a) => {
  const { riverDischargeM3s: _, ...survey } = a.survey;
  return { ...a, survey };
});
/** The same as the worker holds them (the synthetic surveys carry only what the archive reads). */
const held = noFlow as never;

/** INVENTED daily flows (not measurements): one row a week, 2015-12-01 … 2016-12-31, 500 + 10·week m³/s. */
function inventedFlows(): string {
  const lines = ["date,flow_m3s"];
  for (let d = Date.UTC(2015, 11, 1), w = 0; d <= Date.UTC(2016, 11, 31); d += 7 * 86_400_000, w++)
    lines.push(`${new Date(d).toISOString().slice(0, 10)},${500 + 10 * w}`);
  lines.push("2016-13-01,5"); // a bad row: reported, never dropped silently
  return lines.join("\n");
}

describe("discharge table in the archive view (invented flows)", () => {
  it("without discharges the warning is neutral and carries a hint per front end", () => {
    const answer = archiveOf(held);
    const w = answer.summary!.warnings.find((x) => x.code === "no-discharge")!;
    expect(w.message).not.toMatch(/--/);
    expect(w.message).toMatch(/River discharge not known for 12 of 12 surveys/);
    expect(w.hint!.cli).toMatch(/--discharge-table/);
    expect(w.hint!.dashboard).toMatch(/discharge table/);
    expect(w.hint!.dashboard).not.toMatch(/--/);
  });

  it("archiveOf() reports what the table gave the analyses (from their stated sources) and the series use those discharges", () => {
    const text = inventedFlows();
    const table = readDischargeTable(text, "invented-flows.csv");
    // What analyzeInputs does for each survey given the table (AnalysisSettings.dischargeTable): surveyDischarge.
    const analysed = noFlow.map((a) => {
      const q = surveyDischarge(a.survey, { table })!;
      const { dischargeM3s, ...dischargeSource } = q;
      return { ...a, survey: { ...a.survey, riverDischargeM3s: dischargeM3s, dischargeSource } };
    });
    const answer = archiveOf(analysed as never, DEFAULT_SEASONS, { name: "invented-flows.csv", text });
    const report = answer.discharge!;
    expect(report.rule).toBe(DISCHARGE_JOIN_RULE);
    expect(report.joined).toBe(12);
    expect(report.ownDischarge).toBe(0);
    expect(report.missing).toEqual([]);
    expect(report.issues).toHaveLength(1);
    expect(report.issues[0]).toMatchObject({ file: "invented-flows.csv", column: "date", value: "2016-13-01" });
    // Same numbers as the CLI's: each survey's discharge by surveyDischarge with the table.
    const points = answer.summary!.intrusion;
    for (const p of points)
      expect(p.dischargeM3s).toBe(
        surveyDischarge(noFlow.find((a) => a.survey.name === p.survey)!.survey, { table })!.dischargeM3s,
      );
    // 2016-01-15 (a Friday): the weekly rows fall on Tuesdays from 2015-12-01, so 2016-01-12 is used (3 days before).
    const jan = answer.summary!.series[0]!.points.find((p) => p.date === "2016-01-15")!;
    expect(jan.dischargeSource).toMatch(
      /discharge of 2016-01-12 \(3 days before the survey\) from invented-flows\.csv/,
    );
    expect(answer.summary!.warnings.some((x) => x.code === "no-discharge")).toBe(false);
    // Analyses run without the table: the table is reported as giving none of them a discharge.
    expect(archiveOf(held, DEFAULT_SEASONS, { name: "invented-flows.csv", text }).discharge!.joined).toBe(0);
  });

  it("surveyDischarge() with a table leaves surveys with no row within 31 days before them without one", () => {
    const table = readDischargeTable("date,Q m3/s\n2016-03-01,10\n", "invented.csv");
    const q = (name: string, startDate?: string) =>
      surveyDischarge({ name, ...(startDate ? { startDate } : {}) }, { table })?.dischargeM3s;
    expect(q("a", "2016-03-20")).toBe(10);
    expect([q("b", "2016-02-20"), q("c", "2016-05-01"), q("d")]).toEqual([undefined, undefined, undefined]);
  });
});

describe("seasons editor text", () => {
  it("seasonsText() writes seasons that parseSeasons reads back unchanged", () => {
    expect(seasonsText(DEFAULT_SEASONS)).toBe("winter=Dec-Feb, spring=Mar-May, summer=Jun-Aug, autumn=Sep-Nov");
    const odd = parseSeasons("wet=Dec-Apr, dry=Aug-Nov, odd=May+Jul");
    expect(parseSeasons(seasonsText(odd))).toEqual(odd);
  });

  it("readSeasonsText() gives the analysis' message for a bad text and nothing for an empty one", () => {
    expect(readSeasonsText("wet=Dec-Apr, dry=Apr-Nov").error).toMatch(/Apr is in both "wet" and "dry"/);
    expect(readSeasonsText("  ")).toEqual({});
    expect(readSeasonsText("wet=Dec-Apr").seasons).toEqual([{ name: "wet", months: [12, 1, 2, 3, 4] }]);
  });
});

describe("workspace keeps the archive choices", () => {
  const base = fromWorkspaceDocument(createWorkspace("t"));
  it("an older workspace (no archive choices) opens with the defaults", () => {
    expect(base.archive).toEqual({});
  });
  it("seasons and the discharge table survive a save and a schema check", () => {
    const archive = {
      seasons: parseSeasons("wet=Dec-Apr,dry=Aug-Nov"),
      dischargeTable: { name: "f.csv", text: "date,q\n" },
    };
    const doc = toWorkspaceDocument({ ...base, archive }, "2026-01-01T00:00:00Z");
    const checked = parse(workspaceSchema, JSON.parse(JSON.stringify(doc)));
    expect(fromWorkspaceDocument(checked as typeof doc).archive).toEqual(archive);
  });
});

describe("box on the discharge scatter", () => {
  it("surveysInBox() takes the marks inside the box, corners in any order, edges included", () => {
    const pts = [
      { survey: "a", x: 10, y: 10 },
      { survey: "b", x: 20, y: 30 },
      { survey: "c", x: 40, y: 5 },
    ];
    expect(surveysInBox(pts, [25, 35, 5, 10])).toEqual(["a", "b"]);
    expect(surveysInBox(pts, [0, 0, 1, 1])).toEqual([]);
  });
});

describe("the main map follows the chosen surveys", () => {
  it("chosenZonePaths() takes the chosen surveys' zone stretches of one constituent, with their kind", () => {
    const o = (kind: "removal" | "addition" | undefined, n: number) => ({
      isohalines: [],
      constituents: {
        Si: {
          zonePaths: Array.from({ length: n }, () => [[0, 0] as [number, number], [1, 1] as [number, number]]),
          zoneKind: kind,
          maximumPoints: [],
        },
      },
    });
    const paths = chosenZonePaths(
      ["b", "c"],
      ["a", "b", "c"],
      [o("removal", 1), o("addition", 2), o(undefined, 0)],
      "Si",
    );
    expect(paths.map((p) => [p.survey, p.kind])).toEqual([
      ["b", "addition"],
      ["b", "addition"],
    ]);
    expect(chosenZonePaths(["b"], ["a", "b"], [o("removal", 1), undefined], "Si")).toEqual([]);
  });

  it("zoneAlpha(): k overlapping zones together reach 90 % opacity, one zone never below the floor", () => {
    expect(zoneAlpha(40)).toBe(MIN_ZONE_ALPHA);
    for (const k of [1, 2, 5]) {
      const a = zoneAlpha(k) / 255;
      // rounding alpha to a byte moves the total by at most ~0.02
      expectWithin(1 - Math.pow(1 - a, k), 0.9, 0.02, `k = ${k}`);
    }
  });
});
