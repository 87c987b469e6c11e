/**
 * Mixing diagram of one constituent as inline SVG: concentration against salinity with the
 * theoretical dilution line, the fitted curve and its 95 % band, the seaward tangent and C*₀.
 */
import type { ConstituentAnalysis } from "../mixing/result.ts";
import { mixingPlotModel } from "../output/mixingPlot.ts";
import { html, joinHtml, type SafeHtml } from "./html.ts";
import { axesSvg, c1, extentOf, legendSvg, linePath, makeFrame, PALETTE } from "./svgFrame.ts";

const W = 340;
const H = 235;

/**
 * Concentration vs salinity (Liss 1976 mixing diagram): stations (open circles below detection),
 * dilution line between the end-members (dashed), fitted curve with its 95 % bootstrap band,
 * reaction zone shaded, seaward tangent extrapolated to the river salinity and C*₀ with its
 * interval (Boyle et al. 1974).
 *
 * @param c the constituent's analysis
 * @param id unique id prefix for the SVG (clip paths)
 * @returns SVG markup, or undefined without station data
 */
export function mixingPlotSvg(c: ConstituentAnalysis, id: string): SafeHtml | undefined {
  const d = c.deviations;
  if (!d.length) return undefined;
  const fit = c.fit;
  const river = c.endmembers?.river;
  const sea = c.endmembers?.sea;
  const xs = [0, ...d.map((p) => p.salinity), sea?.salinity ?? 0];
  const ys = [
    0,
    ...d.map((p) => p.observed),
    ...(fit ? fit.upper : []),
    river?.conc ?? 0,
    c.effectiveEndmember?.upper ?? 0,
  ];
  const f = makeFrame([0, extentOf(xs, [0, 35])[1]], [0, extentOf(ys, [0, 1])[1] * 1.04], {
    width: W,
    height: H,
    top: 26,
  });
  const clip = `${id}-clip`;
  const parts: SafeHtml[] = [];
  const z = c.reactionZone;
  if (z) {
    const a = f.x(z.salinity[0]);
    const b = f.x(z.salinity[1]);
    parts.push(
      html`<rect
        class="zone"
        x="${c1(a)}"
        y="${c1(f.top)}"
        width="${c1(Math.max(0.5, b - a))}"
        height="${c1(f.height - f.bottom - f.top)}"
      />`,
    );
  }
  if (fit) {
    const up = linePath(f, fit.salinity, fit.upper);
    const lo = linePath(f, [...fit.salinity].reverse(), [...fit.lower].reverse()).replace(/^M/, "L");
    parts.push(html`<path class="band" d="${up}${lo}Z" fill="${PALETTE[1]}" fill-opacity="0.16" />`);
    parts.push(
      html`<path d="${linePath(f, fit.salinity, fit.conc)}" fill="none" stroke="${PALETTE[1]}" stroke-width="1.6" />`,
    );
  }
  const line = c.dilutionLine;
  if (line) {
    const s0 = line.river.salinity;
    const s1 = line.sea.salinity;
    parts.push(
      html`<path
        d="${linePath(f, [s0, s1], [line.intercept + line.slope * s0, line.intercept + line.slope * s1])}"
        fill="none"
        stroke="#555"
        stroke-width="1.2"
        stroke-dasharray="5 3"
      />`,
    );
  }
  // What is drawn follows the one mixing-plot model (analysis/output/mixingPlot.ts), as in the dashboard.
  const model = mixingPlotModel(c);
  const t = model.tangent;
  if (t) {
    parts.push(
      html`<path
        d="${linePath(f, [t.s0, t.s1], [t.c0, t.c1])}"
        fill="none"
        stroke="${PALETTE[4]}"
        stroke-width="1.2"
        stroke-dasharray="2 2"
      />`,
    );
    const e = model.effective;
    if (e) {
      const px = c1(f.x(e.salinity));
      parts.push(
        html`<line
            x1="${px}"
            x2="${px}"
            y1="${c1(f.y(e.lower))}"
            y2="${c1(f.y(e.upper))}"
            stroke="${PALETTE[4]}"
            stroke-width="1.4"
          /><rect
            x="${c1(f.x(e.salinity) - 3)}"
            y="${c1(f.y(e.value) - 3)}"
            width="6"
            height="6"
            fill="${PALETTE[4]}"
          />`,
      );
    }
  }
  const pts = d.map((p) =>
    p.censored
      ? html`<circle
          cx="${c1(f.x(p.salinity))}"
          cy="${c1(f.y(p.observed))}"
          r="2.4"
          fill="#fff"
          stroke="#222"
          stroke-width="0.9"
        />`
      : html`<circle cx="${c1(f.x(p.salinity))}" cy="${c1(f.y(p.observed))}" r="2.4" fill="#222" />`,
  );
  const legend = legendSvg(f, [
    { label: "stations", color: "#222", mark: "dot" },
    { label: "dilution line", color: "#555", mark: "dash" },
    ...(fit ? [{ label: "fit, 95 % band", color: PALETTE[1], mark: "line" as const }] : []),
    ...(t ? [{ label: "tangent, C*₀", color: PALETTE[4], mark: "dash" as const }] : []),
  ]);
  const x0 = f.left;
  const y0 = f.top;
  return html`<svg viewBox="0 0 ${W} ${H}" class="plot" role="img" aria-labelledby="${id}-t">
    <title id="${id}-t">${c.name} against salinity: stations, dilution line and fitted curve</title>
    <defs>
      <clipPath id="${clip}">
        <rect x="${c1(x0)}" y="${c1(y0)}" width="${c1(W - f.right - x0)}" height="${c1(H - f.bottom - y0)}" />
      </clipPath>
    </defs>
    ${axesSvg(f, "Salinity (PSS-78)", `${c.name} (${c.unit})`)}
    <g clip-path="url(#${clip})">${joinHtml(parts)}${joinHtml(pts)}</g>
    ${legend}
  </svg>`;
}
