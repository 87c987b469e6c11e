/** Pointer and keyboard helpers shared by the interactive plots. */

/**
 * Converts a pointer's clientX/clientY to the SVG's own coordinates (viewBox
 * units), so brushing works at any rendered size. Falls back to the raw client
 * coordinates when the element has no layout (e.g. in tests).
 */
export function toSvgPoint(svg: SVGSVGElement, clientX: number, clientY: number): { x: number; y: number } {
  const rect = svg.getBoundingClientRect();
  const vb = svg.viewBox?.baseVal;
  if (!rect.width || !rect.height || !vb || !vb.width) return { x: clientX, y: clientY };
  return {
    x: vb.x + ((clientX - rect.left) / rect.width) * vb.width,
    y: vb.y + ((clientY - rect.top) / rect.height) * vb.height,
  };
}

/** Index of the screen point nearest (px, py) within `radius` pixels, or -1. */
export function nearestIndex(
  points: ReadonlyArray<{ px: number; py: number }>,
  px: number,
  py: number,
  radius = 8,
): number {
  let best = -1;
  let bestD = radius * radius;
  for (let i = 0; i < points.length; i++) {
    const dx = points[i].px - px;
    const dy = points[i].py - py;
    const d = dx * dx + dy * dy;
    if (d <= bestD) {
      bestD = d;
      best = i;
    }
  }
  return best;
}

/** Next index for arrow/Home/End keys over `n` items ordered left to right; undefined for other keys. */
export function stepIndex(key: string, current: number, n: number): number | undefined {
  if (n === 0) return undefined;
  switch (key) {
    case "ArrowRight":
    case "ArrowUp":
      return Math.min(n - 1, current + 1);
    case "ArrowLeft":
    case "ArrowDown":
      return Math.max(0, current - 1);
    case "Home":
      return 0;
    case "End":
      return n - 1;
    default:
      return undefined;
  }
}

/** Pixels a pointer must travel before a press counts as a brush rather than a click. */
export const BRUSH_THRESHOLD_PX = 3;
