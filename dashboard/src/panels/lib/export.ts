/**
 * Exports: panels as SVG (styles inlined) and PNG (2×), results as CSV and
 * JSON through the output spec of analysis/output (the CLI's columns and CSV
 * writer), the map view as PNG, and the file names. Nothing here computes a
 * result; it writes out what analysis/ gave.
 */
import {
  DEVIATION_COLUMNS,
  RESULT_COLUMNS,
  SCREENING_CAUTION,
  deviationRows,
  resultRows,
  tableCsv,
} from "../../../../analysis/index.ts";
import type { SurveyAnalysisView } from "./types.ts";

/** "Wet season 2025-03" → "wet-season-2025-03"; accents dropped; never empty. */
export function slug(text: string, fallback = "survey"): string {
  const s = text
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, "-")
    .replace(/^-+|-+$/g, "");
  return s || fallback;
}

/** brackline-<survey>[-<constituent>]-<what>.<ext> */
export function exportFileName(surveyName: string, what: string, ext: string, constituent?: string): string {
  const parts = [
    "brackline",
    slug(surveyName),
    ...(constituent ? [slug(constituent, "constituent")] : []),
    slug(what, "export"),
  ];
  return `${parts.join("-")}.${ext}`;
}

/** Presentation properties copied from computed style onto each exported element. */
const STYLE_PROPS = [
  "fill",
  "fill-opacity",
  "stroke",
  "stroke-width",
  "stroke-dasharray",
  "stroke-opacity",
  "opacity",
  "font-family",
  "font-size",
  "font-weight",
  "text-anchor",
  "dominant-baseline",
  "paint-order",
  "visibility",
] as const;

/**
 * Serialises an SVG element as a standalone SVG document: computed styles
 * inlined (so stylesheet rules survive), interaction attributes removed,
 * explicit size and namespace set.
 */
export function serializeSvg(svg: SVGSVGElement): string {
  const clone = svg.cloneNode(true) as SVGSVGElement;
  const view = svg.ownerDocument.defaultView;
  const originals = [svg, ...svg.querySelectorAll("*")];
  const copies = [clone, ...clone.querySelectorAll("*")];
  originals.forEach((el, i) => {
    const copy = copies[i] as SVGElement;
    const cs = view?.getComputedStyle(el);
    if (cs) {
      for (const p of STYLE_PROPS) {
        const v = cs.getPropertyValue(p);
        if (v && !copy.getAttribute(p)) copy.style.setProperty(p, v);
      }
    }
    for (const a of ["tabindex", "class"]) copy.removeAttribute(a);
    copy.style.removeProperty("cursor");
    copy.style.removeProperty("outline");
  });
  const vb = svg.viewBox?.baseVal;
  if (vb && vb.width) {
    clone.setAttribute("width", String(vb.width));
    clone.setAttribute("height", String(vb.height));
  }
  clone.setAttribute("xmlns", "http://www.w3.org/2000/svg");
  clone.style.removeProperty("max-width");
  clone.style.removeProperty("height");
  return `<?xml version="1.0" encoding="UTF-8"?>\n${new XMLSerializer().serializeToString(clone)}`;
}

/** Size of an SVG in its own units (viewBox, else width/height attributes). */
function svgSize(svg: SVGSVGElement): { width: number; height: number } {
  const vb = svg.viewBox?.baseVal;
  if (vb && vb.width && vb.height) return { width: vb.width, height: vb.height };
  return { width: Number(svg.getAttribute("width")) || 640, height: Number(svg.getAttribute("height")) || 400 };
}

function canvasToBlob(canvas: HTMLCanvasElement): Promise<Blob> {
  return new Promise((resolve, reject) =>
    canvas.toBlob((b) => (b ? resolve(b) : reject(new Error("canvas.toBlob() returned no image"))), "image/png"),
  );
}

/** Draws the SVG on a white canvas at `scale`× its size and returns it as a PNG blob. */
export async function svgToPngBlob(svg: SVGSVGElement, scale = 2): Promise<Blob> {
  if (!(scale > 0)) throw new RangeError(`svgToPngBlob(): scale must be > 0, got ${scale}`);
  const { width, height } = svgSize(svg);
  const text = serializeSvg(svg);
  const img = new Image();
  await new Promise<void>((resolve, reject) => {
    img.onload = () => resolve();
    img.onerror = () => reject(new Error("svgToPngBlob(): the browser could not draw the SVG"));
    img.src = `data:image/svg+xml;charset=utf-8,${encodeURIComponent(text)}`;
  });
  const canvas = document.createElement("canvas");
  canvas.width = Math.round(width * scale);
  canvas.height = Math.round(height * scale);
  const ctx = canvas.getContext("2d");
  if (!ctx) throw new Error("svgToPngBlob(): no 2D canvas context");
  ctx.fillStyle = "#ffffff";
  ctx.fillRect(0, 0, canvas.width, canvas.height);
  ctx.drawImage(img, 0, 0, canvas.width, canvas.height);
  return canvasToBlob(canvas);
}

/**
 * The map view as PNG: the given canvases (base map first, then overlays such
 * as the deck.gl canvas) composited at their backing-store size. WebGL
 * canvases must be captured right after a frame (or created with
 * preserveDrawingBuffer) or they read back empty.
 */
export async function mapCanvasToPngBlob(canvases: HTMLCanvasElement | readonly HTMLCanvasElement[]): Promise<Blob> {
  const list = Array.isArray(canvases) ? canvases : [canvases as HTMLCanvasElement];
  if (list.length === 0) throw new RangeError("mapCanvasToPngBlob(): no canvas given");
  const out = document.createElement("canvas");
  out.width = list[0].width;
  out.height = list[0].height;
  const ctx = out.getContext("2d");
  if (!ctx) throw new Error("mapCanvasToPngBlob(): no 2D canvas context");
  ctx.fillStyle = "#ffffff";
  ctx.fillRect(0, 0, out.width, out.height);
  for (const c of list) ctx.drawImage(c, 0, 0, out.width, out.height);
  return canvasToBlob(out);
}

/**
 * Results table of the survey: the output spec's columns (analysis/output RESULT_COLUMNS), written by
 * its CSV writer — the same file `brackline analyze --format csv` writes.
 */
export function resultsCsv(analysis: SurveyAnalysisView): string {
  return tableCsv(RESULT_COLUMNS, resultRows([analysis]));
}

/** Station deviations table: the output spec's DEVIATION_COLUMNS through the same CSV writer. */
export function deviationsCsv(analysis: SurveyAnalysisView): string {
  return tableCsv(DEVIATION_COLUMNS, deviationRows([analysis]));
}

/** The analysis result as JSON, with the one caution; non-finite numbers become null. */
export function resultsJson(analysis: SurveyAnalysisView): string {
  const doc = { generator: "Brackline", ...analysis, caution: SCREENING_CAUTION };
  return JSON.stringify(doc, (_k, v: unknown) => (typeof v === "number" && !Number.isFinite(v) ? null : v), 2) + "\n";
}

/** Offers a blob to the user as a download named `fileName`. */
export function downloadBlob(blob: Blob, fileName: string): void {
  const url = URL.createObjectURL(blob);
  const a = document.createElement("a");
  a.href = url;
  a.download = fileName;
  a.rel = "noopener";
  document.body.append(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}
