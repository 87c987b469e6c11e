/**
 * Brushing a date range on a time panel of the archive view: pointer positions to SVG x, a drag
 * (more than a few px) as a brush, a press without a drag as a click on the survey under it.
 * Plain DOM, no science.
 */

/** Horizontal SVG user-space coordinate of a pointer event on `svg`. */
export function svgX(svg: SVGSVGElement, clientX: number, clientY: number): number {
  const m = svg.getScreenCTM();
  if (!m) return clientX;
  const p = new DOMPoint(clientX, clientY).matrixTransform(m.inverse());
  return p.x;
}

/** SVG user-space point [x, y] of a pointer event on `svg`. */
export function svgPoint(svg: SVGSVGElement, clientX: number, clientY: number): [number, number] {
  const m = svg.getScreenCTM();
  if (!m) return [clientX, clientY];
  const p = new DOMPoint(clientX, clientY).matrixTransform(m.inverse());
  return [p.x, p.y];
}

/** What a time panel reports: a brush between two x (SVG units), or a click on a survey. */
export interface BrushHandlers {
  /** A brush from x0 to x1 (SVG units); `done` on release. */
  onBrush(x0: number, x1: number, done: boolean): void;
  /** A press without a drag, on a survey's mark (undefined: on empty space). */
  onClick(survey: string | undefined, additive: boolean): void;
}

/** Pixels of pointer travel that make a press a brush. */
const DRAG_PX = 4;

/**
 * Wires brushing and clicking onto an SVG panel; returns the listener remover. Moves are coalesced
 * to one brush report per animation frame.
 */
export function attachBrush(svg: SVGSVGElement, handlers: () => BrushHandlers): () => void {
  let start: { x: number; clientX: number; survey: string | undefined; id: number } | undefined;
  let dragging = false;
  let pending: number | undefined;
  let lastX = 0;
  const down = (e: PointerEvent) => {
    if (e.button !== 0) return;
    const target = (e.target as Element | null)?.closest?.("[data-survey]");
    start = {
      x: svgX(svg, e.clientX, e.clientY),
      clientX: e.clientX,
      survey: target?.getAttribute("data-survey") ?? undefined,
      id: e.pointerId,
    };
    dragging = false;
    try {
      svg.setPointerCapture?.(e.pointerId);
    } catch {
      // a pointer the browser does not track (a synthetic event): brushing works without capture
    }
  };
  const move = (e: PointerEvent) => {
    if (!start || e.pointerId !== start.id) return;
    if (!dragging && Math.abs(e.clientX - start.clientX) < DRAG_PX) return;
    dragging = true;
    lastX = svgX(svg, e.clientX, e.clientY);
    if (pending === undefined)
      pending = requestAnimationFrame(() => {
        pending = undefined;
        if (start && dragging) handlers().onBrush(start.x, lastX, false);
      });
  };
  const up = (e: PointerEvent) => {
    if (!start || e.pointerId !== start.id) return;
    if (pending !== undefined) cancelAnimationFrame(pending);
    pending = undefined;
    if (dragging) handlers().onBrush(start.x, svgX(svg, e.clientX, e.clientY), true);
    else handlers().onClick(start.survey, e.shiftKey || e.ctrlKey || e.metaKey);
    start = undefined;
    dragging = false;
  };
  svg.addEventListener("pointerdown", down);
  svg.addEventListener("pointermove", move);
  svg.addEventListener("pointerup", up);
  return () => {
    svg.removeEventListener("pointerdown", down);
    svg.removeEventListener("pointermove", move);
    svg.removeEventListener("pointerup", up);
  };
}

/** The survey of the mark under an event's target (its `data-survey`), or null. */
export function surveyUnder(target: EventTarget | null): string | null {
  return (target as Element | null)?.closest?.("[data-survey]")?.getAttribute("data-survey") ?? null;
}
