/**
 * Svelte action reporting an element's content width as it changes (for
 * charts that redraw at their container's size). Does nothing where
 * ResizeObserver is missing (e.g. jsdom), so charts keep their default size.
 */
export function trackWidth(node: HTMLElement, onWidth: (widthPx: number) => void): { destroy(): void } {
  if (typeof ResizeObserver === "undefined") return { destroy: () => undefined };
  const ro = new ResizeObserver((entries) => {
    const w = entries[0]?.contentRect.width;
    if (w && Number.isFinite(w)) onWidth(Math.round(w));
  });
  ro.observe(node);
  return { destroy: () => ro.disconnect() };
}

/** Chart width for a measured container: the given width, else the container clamped to [min, max], else `fallback`. */
export function chartWidth(
  given: number | undefined,
  measured: number,
  fallback: number,
  min = 340,
  max = 1100,
): number {
  if (given !== undefined) return given;
  return measured > 0 ? Math.min(max, Math.max(min, measured)) : fallback;
}
