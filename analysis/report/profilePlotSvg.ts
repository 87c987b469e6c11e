/**
 * Channel profile as inline SVG: a constituent's concentration and salinity against
 * along-channel distance from the mouth, with the reaction zone and maximum marked.
 */
import { scaleLinear } from "d3-scale";
import type { ConstituentAnalysis } from "../mixing/result.ts";
import type { StationPlacement } from "../pipeline/surveyAnalysis.ts";
import { formatSignificant } from "../output/formatNumber.ts";
import { html, joinHtml, type SafeHtml } from "./html.ts";
import { axesSvg, c1, extentOf, legendSvg, makeFrame, PALETTE } from "./svgFrame.ts";

const W = 340;
const H = 235;

/**
 * Concentration (left axis) and salinity (right axis, grey) against km from the mouth, stations
 * in channel order; the reaction zone's channel stretches shaded and the maximum's position marked.
 *
 * @param c the constituent's analysis (station observations in `deviations`)
 * @param stations placed stations of the survey (alongChannelKm [km], salinity)
 * @param id unique id prefix for the SVG
 * @returns SVG markup, or undefined when no station has a channel position
 */
export function profilePlotSvg(
  c: ConstituentAnalysis,
  stations: readonly StationPlacement[],
  id: string,
): SafeHtml | undefined {
  const kmOf = new Map<string, number>();
  for (const s of stations) if (s.alongChannelKm !== undefined && !kmOf.has(s.id)) kmOf.set(s.id, s.alongChannelKm);
  const obs = c.deviations.flatMap((d) =>
    kmOf.has(d.stationId) ? [{ km: kmOf.get(d.stationId)!, v: d.observed, censored: d.censored }] : [],
  );
  const sal = stations
    .flatMap((s) =>
      s.alongChannelKm !== undefined && s.salinity !== undefined ? [{ km: s.alongChannelKm, s: s.salinity }] : [],
    )
    .sort((a, b) => a.km - b.km);
  if (!obs.length) return undefined;
  const f = makeFrame(
    [0, extentOf([...obs.map((o) => o.km), ...sal.map((s) => s.km)], [0, 10])[1]],
    [
      0,
      extentOf(
        obs.map((o) => o.v),
        [0, 1],
      )[1] * 1.04,
    ],
    { width: W, height: H, right: 34, top: 26 },
  );
  const sMax = Math.max(35, ...sal.map((s) => s.s));
  const ys = scaleLinear()
    .domain([0, sMax])
    .range([H - f.bottom, f.top]);
  const parts: SafeHtml[] = [];
  for (const [a, b] of c.reactionZone?.km ?? [])
    parts.push(
      html`<rect
        class="zone"
        x="${c1(f.x(a))}"
        y="${c1(f.top)}"
        width="${c1(Math.max(0.8, f.x(b) - f.x(a)))}"
        height="${c1(H - f.bottom - f.top)}"
      />`,
    );
  for (const km of c.maximum?.km ?? [])
    parts.push(
      html`<line
        x1="${c1(f.x(km))}"
        x2="${c1(f.x(km))}"
        y1="${c1(f.top)}"
        y2="${c1(H - f.bottom)}"
        stroke="${PALETTE[0]}"
        stroke-width="1"
        stroke-dasharray="3 2"
      />`,
    );
  if (sal.length > 1) {
    const d = sal.map((p, i) => `${i ? "L" : "M"}${c1(f.x(p.km))} ${c1(ys(p.s))}`).join("");
    parts.push(html`<path d="${d}" fill="none" stroke="#999" stroke-width="1.1" />`);
  }
  for (const o of obs)
    parts.push(
      o.censored
        ? html`<circle cx="${c1(f.x(o.km))}" cy="${c1(f.y(o.v))}" r="2.4" fill="#fff" stroke="${PALETTE[1]}" />`
        : html`<circle cx="${c1(f.x(o.km))}" cy="${c1(f.y(o.v))}" r="2.4" fill="${PALETTE[1]}" />`,
    );
  const xr = W - f.right;
  const sTicks = ys
    .ticks(5)
    .map((t) => html`<text class="tick" x="${c1(xr + 4)}" y="${c1(ys(t) + 3)}">${formatSignificant(t, 3)}</text>`);
  const legend = legendSvg(f, [
    { label: `${c.name}`, color: PALETTE[1], mark: "dot" },
    { label: "salinity (right axis)", color: "#999", mark: "line" },
    ...(c.reactionZone?.km.length ? [{ label: "reaction zone", color: "#f3e3a6", mark: "band" as const }] : []),
    ...(c.maximum?.km.length ? [{ label: "maximum", color: PALETTE[0], mark: "dash" as const }] : []),
  ]);
  return html`<svg viewBox="0 0 ${W} ${H}" class="plot" role="img" aria-labelledby="${id}-t">
    <title id="${id}-t">${c.name} and salinity along the channel</title>
    ${axesSvg(f, "Distance from the mouth (km)", `${c.name} (${c.unit})`)}${joinHtml(parts)}
    <g class="axis-right">
      ${joinHtml(sTicks)}
      <text
        class="label"
        transform="translate(${c1(W - 4)} ${c1((f.top + H - f.bottom) / 2)}) rotate(90)"
        text-anchor="middle"
      >
        Salinity
      </text>
    </g>
    ${legend}
  </svg>`;
}
