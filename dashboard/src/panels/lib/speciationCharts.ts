/** Turns the speciation model's series into chart inputs (colours, axes, markers). Layout only. */
import { FE_SPECIES, FE_SPECIES_LABELS, type SeriesSet } from "../../../../analysis/index.ts";
import type { ChartMarker, ChartPoint, ChartSeries } from "./chart.ts";
import { categorical, neutral, roles } from "./palette.ts";
import { formatFixed, formatNumber } from "./format.ts";
import type { SpeciationModel } from "../../worker/speciation.ts";

/** Series of a SeriesSet as chart lines, coloured in order; `pick` filters and `style` adjusts per key. */
export function toChartSeries(
  set: SeriesSet,
  pick: (key: string) => boolean = () => true,
  style: (key: string) => Partial<ChartSeries> = () => ({}),
): ChartSeries[] {
  return set.series
    .filter((s) => pick(s.key))
    .map((s, i) => ({
      key: s.key,
      label: s.label,
      x: set.x,
      y: s.values,
      colour: categorical[i % categorical.length],
      ...style(s.key),
    }));
}

/** Fe(III) species fractions at the station, largest first: "Fe(OH)₂⁺ 62 %". */
export function feFractionsText(m: SpeciationModel): string {
  if (!m.atStation?.ok) return "";
  const f = m.atStation.value.fe.fractions;
  return FE_SPECIES.map((k, i) => ({ label: FE_SPECIES_LABELS[i], v: f[k] }))
    .filter((x) => x.v > 0.005)
    .sort((a, b) => b.v - a.v)
    .map((x) => `${x.label} ${formatNumber(100 * x.v, 2)} %`)
    .join(", ");
}

/** Vertical marker at the focus station's salinity. */
export function salinityMarker(m: SpeciationModel, label: string): ChartMarker[] {
  return m.station ? [{ x: m.salinity, label: `${m.station.id}: ${label}`, colour: roles.selected }] : [];
}

/** Marker at the focus station's measured pH on the Fe(III) chart. */
export function pHMarker(m: SpeciationModel): ChartMarker[] {
  const pH = m.station?.pH;
  return m.station && pH !== undefined && Number.isFinite(pH)
    ? [{ x: pH, label: `${m.station.id}: pH ${formatFixed(pH, 2)}`, colour: roles.selected }]
    : [];
}

/** Measured pH of the stations as clickable points. */
export function measuredPhPoints(m: SpeciationModel, isSelected: (id: string) => boolean): ChartPoint[] {
  return m.measuredPh.map((p) => ({
    id: p.stationId,
    x: p.salinity,
    y: p.pH,
    label: `Station ${p.stationId}: salinity ${formatFixed(p.salinity, 2)}, measured pH ${formatFixed(p.pH, 2)}${isSelected(p.stationId) ? ", selected" : ""}`,
    selected: isSelected(p.stationId),
  }));
}

/** Expected pH along the mixing line as a chart line. */
export function expectedPhSeries(m: SpeciationModel): ChartSeries[] {
  if (!m.carbonate?.ok) return [];
  const set = m.carbonate.value;
  return toChartSeries(
    set,
    (k) => k === "pH_T",
    () => ({ label: "Expected pH, conservative mixing (total scale)", colour: roles.fit, width: 2 }),
  );
}

/** Every validity note from the analysis, without repeats. */
export function speciationNotes(m: SpeciationModel): string[] {
  const notes: string[] = [];
  for (const o of [m.fe, m.cd, m.ions, m.carbonate]) if (o?.ok) notes.push(...o.value.warnings);
  if (m.atStation?.ok) notes.push(...m.atStation.value.warnings);
  return [...new Set(notes)];
}

export const muted = neutral.muted;
