/**
 * Horizontal brush state for a plot: press, drag, release. Holds screen x
 * positions while dragging; the plot turns the result into data values.
 */
import { BRUSH_THRESHOLD_PX } from "./pointer.ts";

export class HorizontalBrush {
  /** Screen x where the press started, or null when idle. */
  start = $state<number | null>(null);
  /** Current screen x while dragging. */
  current = $state<number | null>(null);

  constructor(
    private readonly lo: () => number,
    private readonly hi: () => number,
  ) {}

  private clamp(x: number): number {
    return Math.min(this.hi(), Math.max(this.lo(), x));
  }

  press(x: number): void {
    this.start = this.clamp(x);
    this.current = this.start;
  }

  move(x: number): void {
    if (this.start !== null) this.current = this.clamp(x);
  }

  /**
   * Ends the gesture. Returns the screen interval when the pointer travelled far
   * enough to count as a brush, "click" for a short press, or null when idle.
   */
  release(x: number): [number, number] | "click" | null {
    if (this.start === null) return null;
    const a = this.start;
    const b = this.clamp(x);
    this.start = null;
    this.current = null;
    if (Math.abs(b - a) < BRUSH_THRESHOLD_PX) return "click";
    return [Math.min(a, b), Math.max(a, b)];
  }

  /** The interval being dragged, or null. */
  get live(): [number, number] | null {
    if (this.start === null || this.current === null) return null;
    return [Math.min(this.start, this.current), Math.max(this.start, this.current)];
  }
}
