/**
 * Renders the briefing document model as one self-contained HTML file: inline CSS and SVG,
 * no scripts, no external requests, readable on screen and printable to A4.
 */
import type { BriefingDocument, BriefingFigure, BriefingTable } from "./briefingTypes.ts";
import { BRIEFING_CSS } from "./briefingCss.ts";
import type { Finding } from "./findings.ts";
import { html, joinHtml, SafeHtml } from "./html.ts";

const TAG: Readonly<Record<Finding["strength"], string>> = {
  clear: "clear",
  uncertain: "uncertain",
  insufficient: "too little data",
  context: "context",
};

function tableHtml(t: BriefingTable): SafeHtml {
  return html`<table>
      <caption>
        ${t.caption}
      </caption>
      <thead>
        <tr>
          ${t.header.map((h) => html`<th scope="col">${h}</th>`)}
        </tr>
      </thead>
      <tbody>
        ${t.rows.map(
          (r) =>
            html`<tr>
              ${r.map((c) => html`<td>${c}</td>`)}
            </tr>`,
        )}
      </tbody>
    </table>
    ${t.note ? html`<p class="table-note">${t.note}</p>` : ""}`;
}

function figureHtml(f: BriefingFigure): SafeHtml {
  const legend = f.legend?.length
    ? html` ${f.legend.map((l) => html`<span class="key"><span class="swatch" style="background:${l.color}"></span>${l.label}</span>`)}`
    : "";
  return html`<figure class="${f.size}" id="${f.id}">
    ${f.svg}
    <figcaption><b>${f.title}.</b> ${f.caption}${legend}</figcaption>
  </figure>`;
}

function findingsHtml(fs: readonly Finding[]): SafeHtml {
  return html`<ul class="findings">
    ${fs.map((f) => html`<li class="${f.strength}"><span class="tag ${f.strength}">${TAG[f.strength]}</span>${f.text}</li>`)}
  </ul>`;
}

/**
 * The briefing as HTML text (UTF-8, HTML5). Every text from the data is escaped; figures are
 * inline SVG; styles are inline; nothing is loaded from elsewhere and no script is needed.
 *
 * @param doc the document model from buildBriefing
 * @returns the complete HTML document
 * @see WHATWG HTML Living Standard; CSS Paged Media Module Level 3 (@page size A4).
 */
export function renderBriefingHtml(doc: BriefingDocument): string {
  const surveys = doc.surveys.map(
    (s) =>
      html`<section class="survey">
        <h2>${s.heading}</h2>
        <dl class="facts">
          ${s.facts.map(
            ([k, v]) =>
              html`<dt>${k}</dt>
                <dd>${v}</dd>`,
          )}
        </dl>
        <h3>Findings</h3>
        ${findingsHtml(s.findings)}${s.figures.map(figureHtml)}${tableHtml(s.table)}${
          s.warnings.length
            ? html`<h3>Notes on the data</h3>
                <ul class="warnings">
                  ${s.warnings.map((w) => html`<li>${w}</li>`)}
                </ul>`
            : ""
        }
      </section>`,
  );
  const c = doc.comparison;
  const comparison = c
    ? html`<section class="comparison">
        <h2>Comparison of the surveys</h2>
        <h3>Findings</h3>
        <ul class="findings">
          ${c.findings.map((f) => html`<li>${f}</li>`)}
        </ul>
        ${tableHtml(c.intrusionTable)}${
          c.scalingNotes.length > 1
            ? html`<h3>Discharge exponents of the isohalines</h3>
                <ul>
                  ${c.scalingNotes.slice(1).map((n) => html`<li>${n}</li>`)}
                </ul>`
            : ""
        }${c.figures.map(figureHtml)}${tableHtml(c.shiftTable)}
        <p class="table-note">${c.intervalMethod}</p>
      </section>`
    : "";
  const ar = doc.archive;
  const archive = ar
    ? html`<section class="archive">
        <h2>${ar.heading}</h2>
        <dl class="facts">
          ${ar.facts.map(
            ([k, v]) =>
              html`<dt>${k}</dt>
                <dd>${v}</dd>`,
          )}
        </dl>
        <h3>Findings</h3>
        <ul class="findings">
          ${ar.findings.map((f) => html`<li>${f}</li>`)}
        </ul>
        ${ar.figures.map(figureHtml)}${ar.tables.map(tableHtml)}
        ${ar.methods.map((m) => html`<p class="table-note">${m}</p>`)}
      </section>`
    : "";
  const body = html`<header>
      <h1>${doc.title}</h1>
      <p class="subtitle">${doc.subtitle}${doc.dateText ? html` · ${doc.dateText}` : ""}</p>
      ${doc.dataNotice ? html`<p class="notice">${doc.dataNotice}</p>` : ""}
      <p class="caution">${doc.cautions[doc.dataNotice ? 1 : 0] ?? ""}</p>
    </header>
    <section class="summary">
      <h2>In brief</h2>
      <ul class="summary">
        ${doc.summary.map((s) => html`<li>${s}</li>`)}
      </ul>
    </section>
    ${surveys}${comparison}${archive}
    <section class="back">
      <h2>Data provenance</h2>
      ${doc.provenance.map(tableHtml)}
      <h2>Methods</h2>
      ${doc.methods.map((m) => html`<p>${m}</p>`)}
      <h3>References</h3>
      <ol class="refs">
        ${doc.references.map((r) => html`<li>${r}</li>`)}
      </ol>
      <h2>Cautions</h2>
      <ul>
        ${doc.cautions.map((t) => html`<li>${t}</li>`)}
      </ul>
    </section>
    <footer>${doc.title} — ${doc.subtitle}. ${doc.cautions[doc.dataNotice ? 1 : 0] ?? ""}</footer>`;
  const page = html`<!DOCTYPE html>
    <html lang="en">
      <head>
        <meta charset="utf-8" />
        <meta name="viewport" content="width=device-width, initial-scale=1" />
        <title>${doc.title} — ${doc.subtitle}</title>
        <style>
          ${new SafeHtml(BRIEFING_CSS)}
        </style>
      </head>
      <body>
        ${body}
      </body>
    </html> `;
  return joinHtml([page]).markup;
}
