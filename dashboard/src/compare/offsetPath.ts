/**
 * Screen-space helpers for the comparison map: a polyline shifted sideways by
 * a fixed number of pixels (so each survey's stretch runs parallel to the
 * channel) and an SVG path of it.
 */
export type XY = [number, number];

/** The polyline moved `offsetPx` to its left (negative: right), with mitred joints limited to 2× the offset. */
export function offsetPolyline(points: readonly XY[], offsetPx: number): XY[] {
  if (points.length < 2 || offsetPx === 0) return points.map((p) => [p[0], p[1]]);
  const normals: XY[] = [];
  for (let i = 0; i < points.length - 1; i++) {
    const dx = points[i + 1][0] - points[i][0];
    const dy = points[i + 1][1] - points[i][1];
    const len = Math.hypot(dx, dy) || 1;
    normals.push([dy / len, -dx / len]);
  }
  return points.map((p, i) => {
    const a = normals[Math.max(0, i - 1)];
    const b = normals[Math.min(normals.length - 1, i)];
    let nx = a[0] + b[0];
    let ny = a[1] + b[1];
    const len = Math.hypot(nx, ny);
    if (len < 1e-9) {
      nx = b[0];
      ny = b[1];
    } else {
      nx /= len;
      ny /= len;
    }
    const cos = nx * b[0] + ny * b[1];
    const scale = Math.min(2, 1 / Math.max(cos, 0.5));
    return [p[0] + nx * offsetPx * scale, p[1] + ny * offsetPx * scale];
  });
}

/** SVG path data of a polyline, to 0.1 px. */
export function pathData(points: readonly XY[]): string {
  return points.map((p, i) => `${i === 0 ? "M" : "L"}${p[0].toFixed(1)},${p[1].toFixed(1)}`).join("");
}
