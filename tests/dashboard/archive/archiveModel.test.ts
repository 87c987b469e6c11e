/**
 * The archive view's layout (dashboard/src/archive/*Model.ts) places the archive summary's own
 * values (analysis/archive summarizeArchive) and never re-decides them; the brush chooses surveys
 * by date. Invented synthetic archive (tests/archive/helpers/syntheticArchive.ts), no measurements.
 */
import { describe, expect, it } from "vitest";
import { DEFAULT_SEASONS, formatSignificant, summarizeArchive } from "../../../analysis/index.ts";
import { syntheticArchive } from "../../archive/helpers/syntheticArchive.ts";
import {
  dayMs,
  MULTIPLE_FRAME,
  NO_SEASON,
  seasonStyles,
  smallMultiples,
  timeAxis,
} from "../../../dashboard/src/archive/archiveModel.ts";
import { dischargeScatter } from "../../../dashboard/src/archive/scatterModel.ts";
import { STRIP_FRAME, zoneStrip } from "../../../dashboard/src/archive/stripModel.ts";
import { chosenRows, hoverWords, surveysInRange, toggleSurvey } from "../../../dashboard/src/archive/selectionModel.ts";
import { archiveOf } from "../../../dashboard/src/worker/archive.ts";
import { okabeIto } from "../../../dashboard/src/panels/lib/palette.ts";

const surveys = syntheticArchive({
  pctAt1000: -20,
  pctPerDecade: 15,
  pctNoiseSd: 3,
  l1000Km: 40,
  exponent: -0.3,
  lNoiseSd: 0.05,
});
const summary = summarizeArchive(surveys);
const styles = new Map(seasonStyles(summary.seasons).map((s) => [s.name, s]));

describe("archive view model", () => {
  it("seasonStyles() gives each default season a distinct Okabe & Ito (2008) colour and mark", () => {
    const list = seasonStyles(summary.seasons);
    expect(list.map((s) => s.name)).toEqual(DEFAULT_SEASONS.map((s) => s.name));
    expect(new Set(list.map((s) => s.colour)).size).toBe(4);
    expect(new Set(list.map((s) => s.mark)).size).toBe(4);
    for (const s of list) expect(Object.values(okabeIto)).toContain(s.colour);
    expect(list[0]!.months).toBe("Dec–Feb");
  });

  it("smallMultiples() puts one mark per survey of the series, ordered by date, with the summary's interval", () => {
    const time = timeAxis(summary, MULTIPLE_FRAME);
    const [si] = smallMultiples(summary, "percentChange", time, styles);
    expect(si!.name).toBe("Si");
    expect(si!.points).toHaveLength(84);
    const xs = si!.points.map((p) => p.x);
    expect([...xs].sort((a, b) => a - b)).toEqual(xs);
    for (const p of si!.points) {
      expect(p.x).toBeGreaterThanOrEqual(MULTIPLE_FRAME.x0);
      expect(p.x).toBeLessThanOrEqual(MULTIPLE_FRAME.x1);
      // SVG y grows downwards: the upper bound of the interval is drawn above the value.
      expect(p.y0!).toBeGreaterThanOrEqual(p.y);
      expect(p.y1!).toBeLessThanOrEqual(p.y);
    }
    const jan = si!.points.find((p) => p.survey === "cruise 2016-01")!;
    expect(jan.colour).toBe(styles.get("winter")!.colour);
    expect(jan.title).toContain(formatSignificant(summary.series[0]!.points[0]!.percentChange!.value, 3));
    expect(si!.unestimated).toHaveLength(0);
    const c0 = smallMultiples(summary, "effectiveEndmember", time, styles)[0]!;
    expect(c0.axis.title).toBe("C*₀ (µmol/L)");
  });

  it("smallMultiples() keeps a survey without an estimate as a hollow mark on the time axis", () => {
    const time = timeAxis(summary, MULTIPLE_FRAME);
    const cut = {
      ...summary,
      series: summary.series.map((s) => ({
        ...s,
        points: s.points.map((p, i) =>
          i === 3 ? { ...p, class: "insufficient-data" as const, percentChange: undefined } : p,
        ),
      })),
    };
    const [si] = smallMultiples(cut, "percentChange", time, styles);
    expect(si!.points).toHaveLength(83);
    expect(si!.unestimated).toHaveLength(1);
    expect(si!.unestimated[0]!.y).toBe(MULTIPLE_FRAME.y1 - 4);
    expect(si!.unestimated[0]!.title).toMatch(/no estimate/);
  });

  it("surveysInRange() chooses the surveys dated inside the brushed dates, in either drag direction", () => {
    const range: [number, number] = [dayMs("2018-01-01")!, dayMs("2018-12-31")!];
    const names = surveysInRange(summary, range);
    expect(names).toHaveLength(12);
    expect(names.every((n) => n.startsWith("cruise 2018-"))).toBe(true);
    expect(surveysInRange(summary, [range[1], range[0]])).toEqual(names);
    expect(toggleSurvey(names, "cruise 2018-05")).toHaveLength(11);
    expect(toggleSurvey(["a"], "b")).toEqual(["a", "b"]);
  });

  it("a brush from the time axis's px back to dates picks what lies between the px", () => {
    const time = timeAxis(summary, MULTIPLE_FRAME);
    const [si] = smallMultiples(summary, "percentChange", time, styles);
    const inside = si!.points.filter((p) => p.x >= 100 && p.x <= 160).map((p) => p.survey);
    expect(surveysInRange(summary, [time.ms(100), time.ms(160)])).toEqual(inside);
  });

  it("dischargeScatter() draws the analysis' fitted band and states its statement unchanged", () => {
    const series = summary.series[0]!;
    const sc = dischargeScatter(series, styles)!;
    expect(sc.points).toHaveLength(84);
    expect(sc.statement).toBe(series.vsDischarge.percentChange!.statement);
    expect(sc.line).toMatch(/^M/);
    expect(sc.band).toMatch(/Z$/);
    // more discharge, larger % change (the invented truth's slope is +15 % per tenfold discharge)
    const byQ = [...series.points].sort((a, b) => a.dischargeM3s! - b.dischargeM3s!);
    const first = sc.points.find((p) => p.survey === byQ[0]!.survey)!;
    const last = sc.points.find((p) => p.survey === byQ.at(-1)!.survey)!;
    expect(last.x).toBeGreaterThan(first.x);
  });

  it("zoneStrip() places each survey's zone and salt intrusion at its date, and chosenRows() lists only chosen surveys", () => {
    const time = timeAxis(summary, STRIP_FRAME);
    const strip = zoneStrip(summary, summary.series[0], time);
    expect(strip.columns).toHaveLength(84);
    const c = strip.columns[0]!;
    expect(c.zone!.y0).toBeLessThan(c.zone!.y1);
    expect(c.intrusion!.bound).toBeUndefined();
    expect(c.title).toContain("removal zone");
    const rows = chosenRows(summary, summary.series[0], new Set(["cruise 2017-03", "cruise 2016-02"]));
    expect(rows.map((r) => r.survey)).toEqual(["cruise 2016-02", "cruise 2017-03"]);
    expect(rows[0]!.season).toBe("winter");
    expect(rows[0]!.behaviour).not.toBe("");
    expect(NO_SEASON.colour).toBeTruthy();
  });

  it("hoverWords() describes a survey with the summary's own values", () => {
    const ip = summary.intrusion[1]!;
    const p = summary.series[0]!.points[1]!;
    const text = hoverWords(ip.survey, ip, p, "Si");
    expect(text).toContain("cruise 2016-02");
    expect(text).toContain("winter");
    expect(text).toContain(formatSignificant(p.percentChange!.value, 3));
    expect(hoverWords("x", undefined, undefined, "Si")).toBe("x");
  });

  it("archiveOf() in the worker is summarizeArchive() of the analysed surveys, and says why below three", () => {
    const answer = archiveOf(surveys as never);
    expect(answer.summary).toEqual(summary);
    const few = archiveOf([surveys[0], undefined, surveys[1]] as never);
    expect(few.summary).toBeUndefined();
    expect(few.reason).toMatch(/3 or more/);
  });
});

describe("ArchiveState", () => {
  it("refresh() keeps the newest of two overlapping answers from the worker", async () => {
    const { ArchiveState } = await import("../../../dashboard/src/archive/archiveState.svelte.ts");
    const waits: Array<(a: { reason: string }) => void> = [];
    const state = new ArchiveState(() => ({
      archive: () => new Promise((resolve) => waits.push(resolve)),
    }));
    const first = state.refresh();
    const second = state.refresh();
    expect(state.loading).toBe(true);
    waits[1]!({ reason: "newer" });
    await second;
    waits[0]!({ reason: "older" });
    await first;
    expect(state.answer?.reason).toBe("newer");
    expect(state.loading).toBe(false);
  });
});
