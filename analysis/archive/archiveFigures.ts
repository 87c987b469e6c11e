/**
 * Inline SVG figures of the archive for the briefing: % change against date with intervals (small
 * multiples, coloured by season), the channel-distance × time strip of reaction zones and salt
 * intrusion, and a quantity against discharge with its fitted line and band.
 */
import { formatSignificant } from "../output/formatNumber.ts";
import { html, joinHtml, type SafeHtml } from "../report/html.ts";
import { axesSvg, c1, extentOf, legendSvg, linePath, makeFrame, PALETTE } from "../report/svgFrame.ts";
import type { ConstituentSeries, DischargeRelation, IntrusionPoint } from "./types.ts";
import { dayMs, paddedTimeDomain, timeTicks } from "./timeTicks.ts";
import type { PlotFrame } from "../report/svgFrame.ts";

/** A frame whose x axis is time [ms] over the padded domain of the survey days, with calendar ticks. */
function timeFrame(
  ms: readonly number[],
  yDomain: [number, number],
  size: { width: number; height: number },
  nTicks: number,
): { f: PlotFrame; ticks: Array<{ value: number; label: string }> } {
  const domain = paddedTimeDomain(ms);
  const f = makeFrame(domain, yDomain, { ...size, niceX: false });
  return { f, ticks: timeTicks(domain, nTicks).map((t) => ({ value: t.ms, label: t.label })) };
}

/** Colour of a season by its position in the season list (grey when in no season). */
export function seasonColor(season: string | undefined, seasons: readonly string[]): string {
  const i = season === undefined ? -1 : seasons.indexOf(season);
  return i < 0 ? "#9a9a9a" : PALETTE[(i + 2) % PALETTE.length]!;
}

const svgWrap = (w: number, h: number, id: string, title: string, body: SafeHtml): SafeHtml =>
  html`<svg viewBox="0 0 ${w} ${h}" role="img" aria-labelledby="${id}-t">
    <title id="${id}-t">${title}</title>
    ${body}
  </svg>`;

/**
 * % change against date for one constituent: a dot per survey with its 95 % interval, coloured by season.
 *
 * @param s the constituent's series
 * @param seasons season names in order (for colours)
 * @param id unique id prefix
 * @param surveyDaysMs the days [ms] the date axis spans (every survey of the archive, so that the small
 *   multiples share one axis); default: the days of this constituent's points
 */
export function percentChangeSeriesSvg(
  s: ConstituentSeries,
  seasons: readonly string[],
  id: string,
  surveyDaysMs?: readonly number[],
): SafeHtml {
  const pts = s.points.filter((p) => dayMs(p.date) !== undefined && p.percentChange);
  if (!pts.length)
    return svgWrap(
      340,
      200,
      id,
      `${s.name} % change by survey date`,
      html`<text x="170" y="100" text-anchor="middle" class="tick"
        >No survey has a determined % change of ${s.name}.</text
      >`,
    );
  const xs = pts.map((p) => dayMs(p.date)!);
  const lo = pts.map((p) => p.percentChange!.lower);
  const hi = pts.map((p) => p.percentChange!.upper);
  const { f, ticks } = timeFrame(
    surveyDaysMs?.length ? surveyDaysMs : xs,
    extentOf([...lo, ...hi, 0], [-10, 10]),
    { width: 340, height: 200 },
    4,
  );
  const marks = pts.map((p, i) => {
    const x = c1(f.x(xs[i]!));
    const col = seasonColor(p.season, seasons);
    return html`<line
        x1="${x}"
        x2="${x}"
        y1="${c1(f.y(lo[i]!))}"
        y2="${c1(f.y(hi[i]!))}"
        stroke="${col}"
        stroke-width="0.9"
      /><circle cx="${x}" cy="${c1(f.y(p.percentChange!.value))}" r="2.2" fill="${col}" />`;
  });
  const zero = html`<line
    x1="${c1(f.left)}"
    x2="${c1(f.width - f.right)}"
    y1="${c1(f.y(0))}"
    y2="${c1(f.y(0))}"
    stroke="#555"
    stroke-dasharray="3 2"
  />`;
  return svgWrap(
    340,
    200,
    id,
    `${s.name} % change by survey date`,
    html`${axesSvg(f, "Survey date", `${s.name} % change (%)`, ticks)}${zero}${joinHtml(marks)}`,
  );
}

/**
 * Distance along the channel × time: each survey's reaction zones of one constituent as vertical
 * bars (red removal, blue addition), its maxima as diamonds, and the salt intrusion as a line.
 *
 * @param s the constituent's series (zones)
 * @param intrusion salt-intrusion points
 * @param id unique id prefix
 */
export function channelTimeStripSvg(
  s: ConstituentSeries | undefined,
  intrusion: readonly IntrusionPoint[],
  id: string,
): SafeHtml {
  const dated = intrusion.filter((p) => dayMs(p.date) !== undefined);
  const zones = (s?.points ?? []).filter(
    (p) => dayMs(p.date) !== undefined && (p.reactionZoneKm || p.maximumKm !== undefined),
  );
  const xs = [...dated.map((p) => dayMs(p.date)!), ...zones.map((p) => dayMs(p.date)!)];
  const kms = [
    0,
    ...dated.flatMap((p) => (p.saltIntrusionKm !== undefined ? [p.saltIntrusionKm] : [])),
    ...zones.flatMap((p) => [...(p.reactionZoneKm ?? []), ...(p.maximumKm !== undefined ? [p.maximumKm] : [])]),
  ];
  const { f, ticks } = timeFrame(xs, extentOf(kms, [0, 10]), { width: 680, height: 220 }, 8);
  const bars = zones.map((p) => {
    const x = f.x(dayMs(p.date)!);
    const z = p.reactionZoneKm;
    const bar = z
      ? html`<rect
          x="${c1(x - 2)}"
          y="${c1(f.y(z[1]))}"
          width="4"
          height="${c1(Math.max(1.5, f.y(z[0]) - f.y(z[1])))}"
          fill="${p.reactionZoneKind === "addition" ? PALETTE[1] : PALETTE[0]}"
          fill-opacity="0.6"
        />`
      : "";
    const max =
      p.maximumKm !== undefined
        ? html`<path d="M${c1(x)} ${c1(f.y(p.maximumKm) - 4)}l3 4l-3 4l-3 -4Z" fill="#222" />`
        : "";
    return html`${bar}${max}`;
  });
  const withL = dated.filter((p) => p.saltIntrusionKm !== undefined);
  const line = linePath(
    f,
    withL.map((p) => dayMs(p.date)!),
    withL.map((p) => p.saltIntrusionKm!),
  );
  const dots = withL.map(
    (p) => html`<circle cx="${c1(f.x(dayMs(p.date)!))}" cy="${c1(f.y(p.saltIntrusionKm!))}" r="1.8" fill="#d9480f" />`,
  );
  const legend = legendSvg(f, [
    { label: `salt intrusion (S = ${intrusion[0]?.saltIntrusionSalinity ?? 2})`, color: "#d9480f", mark: "line" },
    ...(s
      ? [
          { label: `${s.name} removal zone`, color: PALETTE[0], mark: "band" as const },
          { label: `${s.name} addition zone`, color: PALETTE[1], mark: "band" as const },
          { label: "maximum", color: "#222", mark: "dot" as const },
        ]
      : []),
  ]);
  return svgWrap(
    680,
    220,
    id,
    "Reaction zones and salt intrusion along the channel over time",
    html`${axesSvg(f, "Survey date", "Distance from the mouth (km)", ticks)}${joinHtml(bars)}<path
        d="${line}"
        fill="none"
        stroke="#d9480f"
        stroke-width="1.2"
      />${joinHtml(dots)}${legend}`,
  );
}

/**
 * A quantity against log₁₀ discharge: points coloured by season, the fitted line and its 95 % band.
 *
 * @param rel the relation (with its band)
 * @param points the points plotted (discharge, value, season)
 * @param seasons season names (for colours)
 * @param id unique id prefix
 */
export function dischargeScatterSvg(
  rel: DischargeRelation,
  points: ReadonlyArray<{ dischargeM3s: number; value: number; season?: string }>,
  seasons: readonly string[],
  id: string,
): SafeHtml {
  const xs = points.map((p) => Math.log10(p.dischargeM3s));
  const ys = [...points.map((p) => p.value), ...rel.band.flatMap((b) => [b.lower, b.upper])];
  const f = makeFrame(extentOf(xs, [1, 2]), extentOf(ys, [0, 1]), { width: 340, height: 200 });
  const bx = rel.band.map((b) => Math.log10(b.dischargeM3s));
  const band = rel.band.length
    ? html`<path
          d="${linePath(
            f,
            bx,
            rel.band.map((b) => b.upper),
          )}L${linePath(f, [...bx].reverse(), rel.band.map((b) => b.lower).reverse()).slice(1)}Z"
          fill="#999"
          fill-opacity="0.25"
        /><path
          d="${linePath(
            f,
            bx,
            rel.band.map((b) => b.value),
          )}"
          fill="none"
          stroke="#333"
          stroke-width="1.2"
        />`
    : "";
  const dots = points.map(
    (p, i) =>
      html`<circle
        cx="${c1(f.x(xs[i]!))}"
        cy="${c1(f.y(p.value))}"
        r="2.2"
        fill="${seasonColor(p.season, seasons)}"
      />`,
  );
  const u = rel.unit === "%" ? "%" : rel.unit;
  return svgWrap(
    340,
    200,
    id,
    `${rel.quantity} against river discharge`,
    html`${axesSvg(f, "River discharge (log₁₀ of m³/s)", `${rel.quantity} (${u})`)}${band}${joinHtml(dots)}<text
        class="tick"
        x="${c1(f.width - f.right - 2)}"
        y="${c1(f.top + 9)}"
        text-anchor="end"
        >n = ${rel.n}${rel.spearman ? `, ρ = ${formatSignificant(rel.spearman.statistic, 2)}` : ""}</text
      >`,
  );
}
