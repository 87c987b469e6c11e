/**
 * The pointer and keyboard handling shared by the station plots (channel profile, mixing plot):
 * click a point to select it (shift/meta/ctrl adds), press-drag-release a horizontal brush, arrow
 * keys move between points in drawing order, Enter/Space toggles, Escape clears. Each plot turns a
 * brushed screen range into its own selection (stations in a km or salinity range).
 */
import type { Selection } from "../../state/selection.svelte.ts";
import { HorizontalBrush } from "./brush.svelte.ts";
import { stepIndex, toSvgPoint } from "./pointer.ts";

export class PlotPointer {
  /** The plot's SVG element (bound by the component). */
  svg = $state<SVGSVGElement>();
  /** Index, in drawing order, of the point that takes the keyboard focus. */
  active = $state(0);
  readonly brush: HorizontalBrush;

  /**
   * @param selection the shared selection (read each time: the prop may be replaced)
   * @param x0 left end of the plot area [SVG units]
   * @param x1 right end of the plot area [SVG units]
   * @param orderedIds station ids of the points in drawing order (keyboard order)
   */
  constructor(
    private readonly selection: () => Selection,
    x0: () => number,
    x1: () => number,
    private readonly orderedIds: () => readonly string[],
  ) {
    this.brush = new HorizontalBrush(x0, x1);
  }

  /** Selects a station, or adds/removes it when `additive`. */
  pick(id: string, additive: boolean): void {
    if (additive) this.selection().toggleStation(id);
    else this.selection().selectStations([id]);
  }

  /** The pointer's position in SVG units (client coordinates before the SVG is mounted). */
  svgPoint(e: PointerEvent): { x: number; y: number } {
    return this.svg ? toSvgPoint(this.svg, e.clientX, e.clientY) : { x: e.clientX, y: e.clientY };
  }

  /** Starts a brush on the primary button. */
  press = (e: PointerEvent): void => {
    if (e.button !== 0) return;
    this.brush.press(this.svgPoint(e).x);
    (e.currentTarget as Element).setPointerCapture?.(e.pointerId);
  };

  /** Drags the brush. */
  move = (e: PointerEvent): void => this.brush.move(this.svgPoint(e).x);

  /** Ends the brush: the screen range, "click" for a short press, or null when no brush was going. */
  release(e: PointerEvent): [number, number] | "click" | null {
    return this.brush.release(this.svgPoint(e).x);
  }

  /** Selects the stations of a brushed range (added to the selection with shift). */
  selectBrushed(ids: readonly string[], e: PointerEvent): void {
    const selection = this.selection();
    selection.selectStations(e.shiftKey ? [...selection.stationIds, ...ids] : [...ids]);
  }

  /** Keyboard on a point: Enter/Space toggles it, Escape clears, arrows move the focus along the points. */
  pointKey(e: KeyboardEvent, id: string): void {
    const selection = this.selection();
    if (e.key === "Enter" || e.key === " ") {
      e.preventDefault();
      selection.toggleStation(id);
      return;
    }
    if (e.key === "Escape") {
      selection.clear();
      return;
    }
    const ids = this.orderedIds();
    const next = stepIndex(e.key, this.active, ids.length);
    if (next === undefined) return;
    e.preventDefault();
    this.active = next;
    selection.hoveredStationId = ids[next]!;
    this.svg?.querySelector<SVGGElement>(`[data-order="${next}"]`)?.focus();
  }
}
