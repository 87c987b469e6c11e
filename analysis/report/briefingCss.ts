/** Inline style sheet of the briefing: system fonts only, A4 print rules, no external resources. */
export const BRIEFING_CSS = `
@page { size: A4; margin: 16mm 14mm 18mm 14mm; }
:root { color-scheme: light; }
* { box-sizing: border-box; }
body { font-family: "Helvetica Neue", Arial, "Liberation Sans", "DejaVu Sans", sans-serif; font-size: 10.5pt; line-height: 1.42; color: #1b1b1b; margin: 0 auto; max-width: 190mm; padding: 8mm 4mm; background: #fff; }
h1 { font-size: 20pt; margin: 0 0 2mm; color: #14324d; }
h2 { font-size: 14.5pt; margin: 7mm 0 2.5mm; color: #14324d; border-bottom: 1.5px solid #14324d; padding-bottom: 1mm; }
h3 { font-size: 11.5pt; margin: 5mm 0 2mm; color: #14324d; }
p { margin: 0 0 2.5mm; }
.subtitle { font-size: 11pt; color: #444; margin-bottom: 4mm; }
.notice { border: 2px solid #c92a2a; background: #fff5f5; padding: 3mm 4mm; margin: 3mm 0 4mm; font-weight: 600; }
.caution { border-left: 4px solid #d9480f; background: #fff4e6; padding: 2.5mm 4mm; margin: 3mm 0; }
.summary li { margin-bottom: 1.5mm; }
ul { margin: 0 0 3mm; padding-left: 6mm; }
.findings li { margin-bottom: 1.4mm; }
.findings li.uncertain { color: #5c4a00; }
.findings li.insufficient { color: #666; }
.findings li.context { color: #333; }
.tag { font-size: 8pt; text-transform: uppercase; letter-spacing: 0.04em; padding: 0 1.2mm; border-radius: 1mm; margin-right: 1.5mm; white-space: nowrap; }
.tag.clear { background: #e7f5ff; color: #1864ab; }
.tag.uncertain { background: #fff3bf; color: #5c4a00; }
.tag.insufficient { background: #eee; color: #555; }
.tag.context { background: #f1f3f5; color: #495057; }
table { border-collapse: collapse; width: 100%; margin: 2mm 0 1mm; font-size: 8.6pt; page-break-inside: auto; }
caption { text-align: left; font-weight: 600; margin-bottom: 1mm; font-size: 9.5pt; }
th, td { border: 0.5px solid #bbb; padding: 1mm 1.4mm; vertical-align: top; text-align: left; overflow-wrap: anywhere; }
th { background: #eef2f6; }
thead { display: table-header-group; }
tr { break-inside: avoid; page-break-inside: avoid; }
.table-note { font-size: 8.4pt; color: #555; margin-bottom: 4mm; }
dl.facts { display: grid; grid-template-columns: 38mm 1fr; gap: 0.8mm 3mm; margin: 0 0 3mm; }
dl.facts dt { font-weight: 600; color: #333; }
dl.facts dd { margin: 0; }
figure { margin: 3mm 0 4mm; break-inside: avoid; page-break-inside: avoid; }
figure.half { display: inline-block; width: 49%; vertical-align: top; margin-right: 0.5%; }
figcaption { font-size: 8.6pt; color: #444; margin-top: 1mm; }
figcaption b { color: #1b1b1b; }
.key { display: inline-block; margin-right: 4mm; }
.swatch { display: inline-block; width: 3.2mm; height: 2.4mm; margin-right: 1mm; vertical-align: middle; }
svg { width: 100%; height: auto; display: block; background: #fff; }
svg text { font-family: inherit; }
svg .tick { font-size: 8px; fill: #333; }
svg .tick.muted { fill: #888; font-style: italic; }
svg .label { font-size: 9px; fill: #222; }
svg .legend { font-size: 8px; fill: #222; }
svg .km { font-size: 8.5px; fill: #14324d; paint-order: stroke; stroke: #fff; stroke-width: 2.2px; }
svg .stn { font-size: 7.5px; fill: #222; paint-order: stroke; stroke: #fff; stroke-width: 2px; }
svg .place { font-size: 8.5px; fill: #333; font-style: italic; paint-order: stroke; stroke: #fff; stroke-width: 2px; }
svg .mark { font-size: 8px; fill: #b03a06; paint-order: stroke; stroke: #fff; stroke-width: 2px; }
svg .grid { stroke: #e6e6e6; stroke-width: 0.6; }
svg .frame { fill: none; stroke: #888; stroke-width: 0.8; }
svg .zone { fill: #f3e3a6; fill-opacity: 0.55; }
section.survey, section.comparison, section.back { break-before: page; page-break-before: always; }
.refs li { margin-bottom: 1mm; font-size: 9pt; }
.warnings li { font-size: 9pt; color: #444; }
footer { margin-top: 8mm; font-size: 8.5pt; color: #555; border-top: 0.5px solid #bbb; padding-top: 2mm; }
@media print {
  body { max-width: none; padding: 0; }
  a { color: inherit; text-decoration: none; }
}
`;
