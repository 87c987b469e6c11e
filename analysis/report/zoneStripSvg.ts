/**
 * Reaction zones on a km axis as inline SVG: one row per constituent (and survey), bars for
 * the channel stretches where it departs from conservative mixing, diamonds for maxima and a
 * vertical mark for each survey's salt intrusion.
 */
import { scaleLinear } from "d3-scale";
import { formatSignificant } from "../output/formatNumber.ts";
import { html, joinHtml, type SafeHtml } from "./html.ts";
import { c1, PALETTE } from "./svgFrame.ts";

/** One row of the strip chart. */
export interface ZoneRow {
  label: string;
  kind?: "removal" | "addition";
  km: Array<[number, number]>;
  maximumKm?: number[];
}

/** Colour of a zone kind: removal red, addition blue. */
export const zoneColor = (kind: "removal" | "addition" | undefined): string =>
  kind === "addition" ? PALETTE[1] : PALETTE[0];

/**
 * The strip chart.
 *
 * @param rows rows top to bottom
 * @param maxKm right end of the axis [km from the mouth]
 * @param marks vertical marks (e.g. "S = 2, wet") at km
 * @param id unique id prefix
 * @returns SVG markup
 */
export function zoneStripSvg(
  rows: readonly ZoneRow[],
  maxKm: number,
  marks: ReadonlyArray<{ km: number; label: string }>,
  id: string,
): SafeHtml {
  const W = 680;
  const left = 150;
  const right = 16;
  const rowH = 16;
  const top = 22;
  const H = top + rows.length * rowH + 30;
  const x = scaleLinear()
    .domain([0, maxKm])
    .range([left, W - right])
    .nice();
  const out: SafeHtml[] = [];
  for (const t of x.ticks(8))
    out.push(
      html`<line class="grid" x1="${c1(x(t))}" x2="${c1(x(t))}" y1="${top}" y2="${c1(H - 28)}" /><text
          class="tick"
          x="${c1(x(t))}"
          y="${c1(H - 17)}"
          text-anchor="middle"
          >${formatSignificant(t, 4)}</text
        >`,
    );
  rows.forEach((r, i) => {
    const y = top + i * rowH;
    if (i % 2 === 0) out.push(html`<rect x="0" y="${y}" width="${W}" height="${rowH}" fill="#f4f4f4" />`);
    out.push(html`<text class="tick" x="${left - 6}" y="${y + 11}" text-anchor="end">${r.label}</text>`);
    for (const [a, b] of r.km)
      out.push(
        html`<rect
          x="${c1(x(a))}"
          y="${y + 3}"
          width="${c1(Math.max(1.5, x(b) - x(a)))}"
          height="${rowH - 6}"
          fill="${zoneColor(r.kind)}"
          fill-opacity="0.7"
        />`,
      );
    for (const m of r.maximumKm ?? []) out.push(html`<path d="M${c1(x(m))} ${y + 2}l5 6l-5 6l-5 -6Z" fill="#222" />`);
    if (!r.km.length && !(r.maximumKm ?? []).length)
      out.push(html`<text class="tick muted" x="${left + 4}" y="${y + 11}">no reaction zone found</text>`);
  });
  marks.forEach((m, i) => {
    const xx = c1(x(m.km));
    out.push(
      html`<line
          x1="${xx}"
          x2="${xx}"
          y1="${top - 4}"
          y2="${c1(H - 28)}"
          stroke="#d9480f"
          stroke-width="1.2"
          stroke-dasharray="4 2"
        /><text class="mark" x="${xx}" y="${top - 8 - (i % 2) * 0}" text-anchor="${i % 2 ? "start" : "end"}"
          >${m.label}</text
        >`,
    );
  });
  out.push(
    html`<text class="label" x="${c1((left + W - right) / 2)}" y="${c1(H - 3)}" text-anchor="middle"
      >Distance from the mouth (km)</text
    >`,
  );
  return html`<svg viewBox="0 0 ${W} ${c1(H)}" class="strip" role="img" aria-labelledby="${id}-t">
    <title id="${id}-t">Reaction zones and maxima along the channel</title>
    ${joinHtml(out)}
  </svg>`;
}
