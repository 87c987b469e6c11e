/**
 * Svelte action for chart titles drawn in SVG, which cannot wrap: fills an empty `<text>` with
 * `text` and, when it is wider than `maxWidth` (SVG units), first lowers its font size (to no less
 * than `minPx`), then shortens it with an ellipsis and keeps the whole title as its tooltip
 * (`<title>`). Where text cannot be measured (no layout, e.g. jsdom) the text is set as given.
 */
export interface FitTextOptions {
  text: string;
  maxWidth: number;
  /** Smallest font size tried [px] (default 11). */
  minPx?: number;
}

export function fitText(node: SVGTextElement, options: FitTextOptions): { update(o: FitTextOptions): void } {
  const baseSize = Number(node.getAttribute("font-size")) || 14;
  const measure = (): number | undefined => {
    try {
      const len = typeof node.getComputedTextLength === "function" ? node.getComputedTextLength() : undefined;
      return len !== undefined && Number.isFinite(len) && len > 0 ? len : undefined;
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
