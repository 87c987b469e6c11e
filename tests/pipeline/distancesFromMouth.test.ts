import { describe, expect, it } from "vitest";
import {
  analyzeSurvey,
  centerlineFromSurveys,
  distanceOrigin,
  distancesFromMouth,
  integralStationId,
  readStationTable,
  readSurveyText,
} from "../../analysis/index.ts";
import type { Station, Survey, ValueCell } from "../../analysis/index.ts";
import { expectWithin } from "../helpers/tolerance.ts";

type Placed = Station & { distanceKm?: number; sideArmKm?: number };

const cell = (value: number): ValueCell => ({ value, original: String(value), status: "measured", accepted: true });

/** A survey of stations at the given distances and salinities; silicate conservative with salinity. */
function survey(name: string, rows: Array<[id: string, km: number, salinity: number]>): Survey {
  const stations: Placed[] = rows.map(([id, km, s], i) => ({
    id,
    distanceKm: km,
    salinity: cell(s),
    values: { Si: cell(150 - 4 * s) },
    sourceRow: i + 2,
    sourceFile: `${name}.csv`,
  }));
  return { name, stations, constituents: [{ name: "Si", unit: "µmol/L", header: "Si" }] };
}

const byId = (s: Survey): Map<string, Placed> => new Map((s.stations as Placed[]).map((x) => [x.id, x]));

/**
 * A transect counted from the head of a side bay (0 km) through the bay entrance (50 km, the
 * salinity maximum) up a river (150 km): the side bay is slightly fresher at its head, the river
 * side falls to fresh water. Two surveys with a small offset, as a monitoring year would give.
 */
function sideArmTransect(shift = 0): Survey {
  const rows: Array<[string, number, number]> = [];
  for (let k = 0; k <= 4; k++) rows.push([`S${k}`, 10 * k, 28 + 0.7 * k + shift]); // side bay: 28 → 30.8
  rows.push(["M", 50, 31.5 + shift]); // entrance
  for (let k = 1; k <= 10; k++) rows.push([`R${k}`, 50 + 10 * k, Math.max(0.1, 31.5 - 3.5 * k + shift)]);
  return survey(`t${shift}`, rows);
}

describe("distance axis origin from salinity (common practice: the mouth is where along-axis salinity peaks; Spearman 1904)", () => {
  it("interior salinity maximum: re-origined at the maximum, km increase landward on the river arm, the other arm is a side arm", () => {
    const r = distancesFromMouth([sideArmTransect(0), sideArmTransect(0.3)]);
    const st = byId(r.surveys[0]!);
    expect(st.get("M")!.distanceKm).toBe(0);
    expectWithin(st.get("R1")!.distanceKm, 10, 1e-9, "first river station");
    expectWithin(st.get("R10")!.distanceKm, 100, 1e-9, "freshest station");
    expect(st.get("S0")!.distanceKm).toBeUndefined();
    expectWithin(st.get("S0")!.sideArmKm, 50, 1e-9, "side-arm head along the arm");
    expectWithin(st.get("S4")!.sideArmKm, 10, 1e-9, "side-arm station next to the mouth");
    const msg = r.notice!.message;
    expect(r.notice!.code).toBe("distanceOrigin");
    expect(msg).toContain("do not count from the mouth");
    expect(msg).toContain("S0, S1, S2, S3, S4");
    for (const control of ["--mouth start|end", "Mouth control", "--keep-off-channel", "off-channel setting"])
      expect(msg).toContain(control);
  });

  it("the side-arm stations are off the channel in the analysis: listed, out of the fits and of S(x); kept on request", () => {
    const placed = distancesFromMouth([sideArmTransect(0)]).surveys[0]!;
    const a = analyzeSurvey(placed, { bootstrapDraws: 50 });
    expect(a.offChannelStations!.map((o) => o.id)).toEqual(["S0", "S1", "S2", "S3", "S4"]);
    expect(a.offChannelStations!.every((o) => o.sideArm === true)).toBe(true);
    expect(a.stations.filter((p) => p.offChannel).every((p) => p.alongChannelKm === undefined)).toBe(true);
    const si = a.constituents[0]!;
    expect(si.endmembers!.sea.stationIds).toEqual(["M"]);
    const w = a.warnings.find((x) => x.code === "offChannel")!;
    expect(w.message).toContain("separate arm");
    // S = 2 lies between R8 (80 km from the mouth, S 3.5) and R9 (90 km, S 0.1); from the file's origin it would be ~135 km
    expect(a.survey.saltIntrusionKm).toBeGreaterThan(80);
    expect(a.survey.saltIntrusionKm).toBeLessThan(90);
    const kept = analyzeSurvey(placed, { bootstrapDraws: 50, keepOffChannel: true });
    expect(kept.constituents[0]!.endmembers!.sea.stationIds.some((id) => id.startsWith("S"))).toBe(true);
  });

  it("a side bay saltier than the entrance (evaporation in a dry season, one survey): the mouth stays at the end of the river's steep gradient, not at the side bay's salinity maximum", () => {
    // the side bay's head a little fresher (0–5 km), its saltiest water at 10 km, freshening to 32.1 by the entrance
    const rows: Array<[string, number, number]> = [
      ["H0", 0, 33.4],
      ["H1", 5, 33.9],
    ];
    for (const [k, sal] of [34.4, 33.4, 32.6, 32.1].entries()) rows.push([`S${k + 1}`, 10 * (k + 1), sal]);
    rows.push(["M", 50, 32.0]); // entrance
    for (let k = 1; k <= 10; k++) rows.push([`R${k}`, 50 + 10 * k, Math.max(0.1, 32.0 - 3.5 * k)]);
    const o = distanceOrigin(rows.map((r) => [r[1], r[2]] as const));
    expect(o).toMatchObject({ kind: "interior", maxKm: 10, mouthKm: 50, topKm: 40, riverSide: 1 });
    const r = distancesFromMouth([survey("dry", rows)]);
    const st = byId(r.surveys[0]!);
    expect(st.get("M")!.distanceKm).toBe(0);
    expectWithin(st.get("R10")!.distanceKm, 100, 1e-9, "freshest station");
    for (const id of ["H0", "H1", "S1", "S2", "S3", "S4"]) expect(st.get(id)!.distanceKm, id).toBeUndefined();
    expect(r.notice!.message).toContain("saltier than the bay entrance");
  });

  it("salinity rising with distance on a simple axis: reversed (km = max − d)", () => {
    const rows: Array<[string, number, number]> = [0, 10, 20, 30, 40].map((km, i) => [`X${i}`, km, 2 + 7 * i]);
    const r = distancesFromMouth([survey("rev", rows)]);
    const st = byId(r.surveys[0]!);
    expect(st.get("X4")!.distanceKm).toBe(0);
    expect(st.get("X0")!.distanceKm).toBe(40);
    expect([...st.values()].some((x) => x.sideArmKm !== undefined)).toBe(false);
    expect(r.notice!.message).toContain("Salinity rises with distance");
    expect(r.notice!.message).toContain("--mouth start|end");
  });

  it("distances already from the mouth are kept, also with a flat, noisy seaward end (no side arm of one station)", () => {
    const rows: Array<[string, number, number]> = [
      ["A", 0, 31.9],
      ["B", 5, 32.1],
      ["C", 10, 30],
      ["D", 20, 22],
      ["E", 30, 10],
      ["F", 40, 1],
    ];
    const r = distancesFromMouth([survey("fwd", rows)]);
    const st = byId(r.surveys[0]!);
    expect([...st.values()].map((x) => x.distanceKm)).toEqual([0, 5, 10, 20, 30, 40]);
    expect(r.notice!.message).toContain("counted from the mouth (salinity falls with distance");
    expect(distanceOrigin(rows.map((x) => [x[1], x[2]] as const))?.kind).toBe("asGiven");
  });

  it("a stated mouth wins: --mouth start keeps the distances, --mouth end reverses them; both say so", () => {
    const start = distancesFromMouth([sideArmTransect(0)], "start");
    expect(byId(start.surveys[0]!).get("S0")!.distanceKm).toBe(0);
    expect(start.notice!.message).toContain("as stated (--mouth start)");
    const end = distancesFromMouth([sideArmTransect(0)], "end");
    expect(byId(end.surveys[0]!).get("R10")!.distanceKm).toBe(0);
    expect(end.notice!.message).toContain("as stated (--mouth end)");
    const point = distancesFromMouth([sideArmTransect(0)], [-122.4, 37.8]);
    expect(byId(point.surveys[0]!).get("M")!.distanceKm).toBe(0);
    expect(point.notice!.message).toContain("it is not used for distances");
  });

  it("a station sampled once cannot hold the maximum (a dry-month visit would otherwise move the mouth)", () => {
    const once = survey("once", [["Z", 25, 40]]);
    const r = distanceOrigin(
      [sideArmTransect(0), sideArmTransect(0.1), sideArmTransect(0.2), sideArmTransect(0.3), once].flatMap((s) =>
        (s.stations as Placed[]).map((x) => [x.distanceKm!, x.salinity.value!] as const),
      ),
    );
    expect(r).toMatchObject({ kind: "interior", mouthKm: 50, riverSide: 1 });
  });
});

describe("centerline from stations when the file's distances count from a side arm's head (common practice)", () => {
  it("the side-arm stations are left off the line, which ends at the mouth", () => {
    // positions: the river arm runs east from the mouth at lon 0.5, the side bay runs south from it
    const withPositions = (s: Survey): Survey => ({
      ...s,
      stations: (s.stations as Placed[]).map((st) => {
        const d = st.distanceKm!;
        const lonLat: [number, number] = d >= 50 ? [0.5 + (d - 50) / 111, 0] : [0.5, -(50 - d) / 111];
        return { ...st, lonLat };
      }),
    });
    const line = centerlineFromSurveys([withPositions(sideArmTransect(0)), withPositions(sideArmTransect(0.3))])!;
    expect(line.properties.sideArm).toEqual(["S0", "S1", "S2", "S3", "S4"]);
    expect(line.properties.stationIds.some((id) => id.startsWith("S"))).toBe(false);
    expect(line.properties.stationIds.at(-1)).toBe("M");
    expect(line.properties.mouth).toBe("end");
  });
});

describe('station ids written as whole numbers with ".0" (common practice: float-typed id columns)', () => {
  it("integralStationId() strips a trailing .0 from whole numbers only", () => {
    expect(integralStationId("36.0")).toEqual({ id: "36", changed: true });
    expect(integralStationId("7.00")).toEqual({ id: "7", changed: true });
    for (const keep of ["21.5", "A.0", "036", "S36", "36", "1.05"])
      expect(integralStationId(keep)).toEqual({ id: keep, changed: false });
  });

  it('the reader uses "36", keeps "36.0" as idText, reports it once, and joins the table\'s "36"', () => {
    const table = readStationTable("Station,Latitude,Longitude\n36,37.4,-122.0\n21.5,37.6,-122.3\n", {
      fileName: "stations.csv",
    });
    const text = 'Station,Salinity,Si (µmol/L)\n"36.0",20,50\n"21.5",25,40\n"A.0",30,30\n"36.0",21,49\n';
    const r = readSurveyText(text, { fileName: "cruise.csv", stationTable: table, layer: { kind: "all" } });
    const st = r.surveys.flatMap((s) => s.stations) as Array<Station & { idText?: string }>;
    expect(st.map((x) => x.id)).toEqual(["36", "21.5", "A.0", "36"]);
    expect(st[0]!.idText).toBe("36.0");
    expect(st[1]!.idText).toBeUndefined();
    expect(st[0]!.lonLat).toEqual([-122.0, 37.4]);
    expect(r.issues.filter((i) => i.expected.includes('trailing ".0"')).length).toBe(1);
  });
});
