/**
 * Svelte action for chart titles drawn in SVG, which cannot wrap: fills an empty `<text>` with
 * `text` and, when it is wider than `maxWidth` (SVG units), first lowers its font size (to no less
 * than `minPx`), then shortens it with an ellipsis and keeps the whole title as its tooltip
 * (`<title>`). Where text cannot be measured (no layout, e.g. jsdom) the text is set as given.
 *
 * The text is measured on a canvas in the font the chart gives it (its `font-family`, `font-size` and
 * `font-weight` attributes), which needs no layout of the page: measuring the SVG text itself
 * (getComputedTextLength) made the browser lay out the whole page again for each chart title, while
 * the panels were being built. Only where no canvas is at hand is the SVG text measured.
 */
export interface FitTextOptions {
  text: string;
  maxWidth: number;
  /** Smallest font size tried [px] (default 11). */
  minPx?: number;
}

/** An offscreen 2-D canvas context for measuring text (shared), or null where there is none (jsdom). */
let measuring: OffscreenCanvasRenderingContext2D | null | undefined;

function measuringContext(): OffscreenCanvasRenderingContext2D | null {
  if (measuring !== undefined) return measuring;
  try {
    measuring = typeof OffscreenCanvas === "function" ? new OffscreenCanvas(1, 1).getContext("2d") : null;
  } catch {
    measuring = null;
  }
  return measuring;
}

/** An attribute of `node` or of its nearest ancestor that has it (SVG presentation attributes inherit). */
function inherited(node: Element, name: string): string | undefined {
  return node.closest(`[${name}]`)?.getAttribute(name) ?? undefined;
}

export function fitText(node: SVGTextElement, options: FitTextOptions): { update(o: FitTextOptions): void } {
  const baseSize = Number(node.getAttribute("font-size")) || 14;
  const family = inherited(node, "font-family");
  const weight = inherited(node, "font-weight") ?? "normal";
  const canvas = family ? measuringContext() : null;
  const positive = (len: number | undefined) =>
    len !== undefined && Number.isFinite(len) && len > 0 ? len : undefined;
  const measure = canvas
    ? (): number | undefined => {
        canvas.font = `${weight} ${node.getAttribute("font-size") ?? baseSize}px ${family}`;
        return positive(canvas.measureText(node.textContent ?? "").width);
      }
    : (): number | undefined => {
        try {
          return positive(typeof node.getComputedTextLength === "function" ? node.getComputedTextLength() : undefined);
        } catch {
          return undefined;
        }
      };
  function fit({ text, maxWidth, minPx = 11 }: FitTextOptions): void {
    node.textContent = text;
    node.setAttribute("font-size", String(baseSize));
    const len = measure();
    if (len === undefined || len <= maxWidth) return;
    const size = Math.max(minPx, Math.floor(((baseSize * maxWidth) / len) * 10) / 10);
    node.setAttribute("font-size", String(size));
    if ((measure() ?? 0) > maxWidth) {
      let lo = 0;
      let hi = text.length;
      while (lo < hi) {
        const mid = (lo + hi + 1) >> 1;
        node.textContent = `${text.slice(0, mid).trimEnd()}…`;
        if ((measure() ?? 0) <= maxWidth) lo = mid;
        else hi = mid - 1;
      }
      node.textContent = `${text.slice(0, lo).trimEnd()}…`;
    }
    const tip = document.createElementNS("http://www.w3.org/2000/svg", "title");
    tip.textContent = text;
    node.append(tip);
  }
  fit(options);
  return { update: fit };
}
