/**
 * The estuary map as inline SVG: basemap polygons, centerline, km ticks, stations,
 * salt-intrusion mark and reaction zones as highlighted channel stretches.
 */
import { channelStretch } from "../geometry/channelStretch.ts";
import { kmTicks } from "../geometry/kmTicks.ts";
import { pointAtKm } from "../geometry/alongChannel.ts";
import type { ChannelNetwork } from "../geometry/types.ts";
import type { StationPlacement } from "../pipeline/surveyAnalysis.ts";
import { formatSignificant } from "../output/formatNumber.ts";
import { BASEMAP_FILL, type BasemapShape } from "./basemap.ts";
import { html, joinHtml, type SafeHtml } from "./html.ts";
import { fitProjection, type MapProjection } from "./mapProjection.ts";
import { c1 } from "./svgFrame.ts";

/** A highlighted channel stretch (a reaction zone) on the map. */
export interface MapZone {
  label: string;
  color: string;
  km: Array<[number, number]>;
}

/** What the map shows. */
export interface MapInput {
  network: ChannelNetwork;
  basemap?: BasemapShape[];
  stations?: StationPlacement[];
  zones?: MapZone[];
  /** Salt intrusion: km from the mouth and the isohaline. */
  intrusion?: { km: number; salinity: number };
  width?: number;
}

const wrap = (lon: number, ref: number): number => lon + 360 * Math.round((ref - lon) / 360);

function pathOf(p: MapProjection, line: ReadonlyArray<readonly number[]>, ref: number, close = false): string {
  return (
    line
      .map(
        (q, i) =>
          `${i ? "L" : "M"}${p
            .project([wrap(q[0]!, ref), q[1]!])
            .map(c1)
            .join(" ")}`,
      )
      .join("") + (close ? "Z" : "")
  );
}

function niceKm(target: number): number {
  const e = 10 ** Math.floor(Math.log10(target));
  return [1, 2, 5, 10].map((m) => m * e).reduce((a, b) => (Math.abs(b - target) < Math.abs(a - target) ? b : a));
}

/**
 * The map (local equirectangular projection, north up) of the channel network and stations.
 *
 * @param input network, basemap shapes, placed stations, zones, intrusion mark, width
 * @param id unique id prefix for the SVG
 * @returns SVG markup
 */
export function mapSvg(input: MapInput, id: string): SafeHtml {
  const { network } = input;
  const ref = network.centerLonDeg;
  const W = input.width ?? 680;
  const stations = (input.stations ?? []).filter((s) => s.lonLat);
  const pts = [
    ...network.branches.flatMap((b) => b.coordinates),
    ...stations.map((s) => [wrap(s.lonLat![0], ref), s.lonLat![1]]),
  ];
  const p = fitProjection(pts, W);
  const H = p.height;
  const out: SafeHtml[] = [html`<rect x="0" y="0" width="${W}" height="${c1(H)}" fill="${BASEMAP_FILL.water}" />`];
  for (const s of input.basemap ?? [])
    for (const poly of s.polygons ?? [])
      out.push(
        html`<path
          d="${poly.map((r) => pathOf(p, r, ref, true)).join("")}"
          fill="${BASEMAP_FILL[s.kind] ?? "#e4e4e4"}"
          fill-rule="evenodd"
          stroke="#b9b4a6"
          stroke-width="0.5"
        />`,
      );
  for (const [i, z] of (input.zones ?? []).entries())
    for (const [a, b] of z.km) {
      const g = channelStretch(network, [a, b], network.mainBranchId);
      if (!g) continue;
      const lines = g.type === "LineString" ? [g.coordinates] : g.coordinates;
      const w = Math.max(3, 13 - 3 * i);
      for (const l of lines)
        out.push(
          html`<path
            d="${pathOf(p, l as number[][], ref)}"
            fill="none"
            stroke="${z.color}"
            stroke-opacity="0.75"
            stroke-width="${w}"
            stroke-linecap="butt"
          />`,
        );
    }
  for (const b of network.branches)
    out.push(html`<path d="${pathOf(p, b.coordinates, ref)}" fill="none" stroke="#1f3b57" stroke-width="1.4" />`);
  const main = network.branches[0]!;
  const spacing = niceKm(main.lengthKm / 7);
  for (const t of kmTicks(network, spacing).features) {
    const [x, y] = p.project([wrap(t.geometry.coordinates[0], ref), t.geometry.coordinates[1]]);
    const rad = (t.properties.bearingDeg * Math.PI) / 180;
    const [ux, uy] = [Math.cos(rad), Math.sin(rad)];
    out.push(
      html`<line
          x1="${c1(x - 5 * ux)}"
          y1="${c1(y - 5 * uy)}"
          x2="${c1(x + 5 * ux)}"
          y2="${c1(y + 5 * uy)}"
          stroke="#1f3b57"
          stroke-width="1"
        /><text class="km" x="${c1(x + 9 * ux)}" y="${c1(y + 9 * uy + 3)}" text-anchor="${ux >= 0 ? "start" : "end"}"
          >${t.properties.label}</text
        >`,
    );
  }
  if (input.intrusion && input.intrusion.km <= main.kmEnd && input.intrusion.km >= 0) {
    const [x, y] = p.project(pointAtKm(network, input.intrusion.km).map((v, i) => (i === 0 ? wrap(v, ref) : v)));
    out.push(
      html`<path
          d="M${c1(x)} ${c1(y - 4)}L${c1(x - 6)} ${c1(y - 15)}L${c1(x + 6)} ${c1(y - 15)}Z"
          fill="#d9480f"
          stroke="#fff"
          stroke-width="0.8"
        /><text class="mark" x="${c1(x - 9)}" y="${c1(y - 8)}" text-anchor="end"
          >S = ${formatSignificant(input.intrusion.salinity, 3)} at km ${formatSignificant(input.intrusion.km, 3)}</text
        >`,
    );
  }
  const byKm = [...stations].sort((a, b) => (a.alongChannelKm ?? 0) - (b.alongChannelKm ?? 0));
  byKm.forEach((s, i) => {
    const [x, y] = p.project([wrap(s.lonLat![0], ref), s.lonLat![1]]);
    out.push(
      html`<circle
        cx="${c1(x)}"
        cy="${c1(y)}"
        r="2.8"
        fill="#fff"
        stroke="${s.offChannel ? "#c92a2a" : "#222"}"
        stroke-width="${s.offChannel ? 1.6 : 1}"
      />`,
    );
    if (i === 0 || i === byKm.length - 1 || i % 5 === 0 || s.offChannel)
      out.push(html`<text class="stn" x="${c1(x + 4)}" y="${c1(y - 4)}">${s.id}</text>`);
  });
  for (const s of input.basemap ?? [])
    if (s.point) {
      const [x, y] = p.project([wrap(s.point[0], ref), s.point[1]]);
      const end = x > W - 6 * (s.name ?? "").length - 10;
      out.push(
        html`<circle cx="${c1(x)}" cy="${c1(y)}" r="2" fill="#555" /><text
            class="place"
            x="${c1(end ? x - 4 : x + 4)}"
            y="${c1(y + 3)}"
            text-anchor="${end ? "end" : "start"}"
            >${s.name ?? ""}</text
          >`,
      );
    }
  const barKm = niceKm((W * 0.22) / p.unitsPerKm);
  const barW = barKm * p.unitsPerKm;
  out.push(
    html`<g class="scalebar"
        ><rect x="10" y="${c1(H - 24)}" width="${c1(barW + 12)}" height="18" fill="#fff" fill-opacity="0.8" /><line
          x1="16"
          x2="${c1(16 + barW)}"
          y1="${c1(H - 12)}"
          y2="${c1(H - 12)}"
          stroke="#222"
          stroke-width="2"
        /><text class="km" x="${c1(16 + barW / 2)}" y="${c1(H - 15)}" text-anchor="middle"
          >${formatSignificant(barKm, 3)} km</text
        ></g
      ><g class="north"
        ><path d="M${W - 20} 12L${W - 26} 30L${W - 20} 26L${W - 14} 30Z" fill="#222" /><text
          class="km"
          x="${W - 20}"
          y="42"
          text-anchor="middle"
          >N</text
        ></g
      >`,
  );
  return html`<svg viewBox="0 0 ${W} ${c1(H)}" class="map" role="img" aria-labelledby="${id}-t">
    <title id="${id}-t">Map of the estuary: channel, distance marks from the mouth, stations and reaction zones</title>
    <defs>
      <clipPath id="${id}-clip"><rect x="0" y="0" width="${W}" height="${c1(H)}" /></clipPath>
    </defs>
    <g clip-path="url(#${id}-clip)">${joinHtml(out)}</g>
    <rect x="0.5" y="0.5" width="${W - 1}" height="${c1(H - 1)}" fill="none" stroke="#888" />
  </svg>`;
}
