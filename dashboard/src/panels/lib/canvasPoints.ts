/** Canvas renderer for dense point clouds, over the same screen geometry as the SVG plot. */
import { roles } from "./palette.ts";

/**
 * Draws points (in SVG units of a `width`×`height` plot) onto `canvas`, whose
 * backing store may be larger (e.g. 2× for sharp output). No-op without a 2D context.
 */
export function drawDensePoints(
  canvas: HTMLCanvasElement,
  points: ReadonlyArray<{ px: number; py: number; kind: string }>,
  width: number,
  height: number,
): void {
  const ctx = canvas.getContext("2d");
  if (!ctx) return;
  ctx.setTransform(canvas.width / width, 0, 0, canvas.height / height, 0, 0);
  ctx.clearRect(0, 0, width, height);
  ctx.globalAlpha = 0.6;
  for (const p of points) {
    ctx.fillStyle = p.kind === "rejected" ? roles.rejected : p.kind === "belowDetection" ? roles.censored : roles.point;
    ctx.fillRect(p.px - 1.5, p.py - 1.5, 3, 3);
  }
  ctx.globalAlpha = 1;
}
