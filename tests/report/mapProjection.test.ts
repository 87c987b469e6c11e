import { describe, it } from "vitest";
import { fitProjection } from "../../analysis/report/mapProjection.ts";
import { expectWithin, expectWithinRel } from "../helpers/tolerance.ts";

// Equidistant cylindrical projection with standard parallel φ₀ (Snyder 1987, USGS PP 1395, §12, Eq. 12-1, 12-2):
// x = R(λ − λ₀)cos φ₀, y = R(φ − φ₀); 1° of arc = 111.195 km on the mean Earth radius 6371.0088 km (IUGG, from memory).
describe("fitProjection", () => {
  it("fitProjection() scales 0.1° of latitude to 11.1195 km (Snyder 1987 Eq. 12-2, mean Earth radius) within 1e-6 relative", () => {
    const p = fitProjection(
      [
        [-35.5, 45.0],
        [-35.4, 45.2],
      ],
      600,
    );
    const [, y1] = p.project([-35.45, 45.05]);
    const [, y2] = p.project([-35.45, 45.15]);
    expectWithinRel(Math.abs(y2 - y1) / p.unitsPerKm, 11.11950802, 1e-6, "0.1° latitude [km]");
  });

  it("fitProjection() scales 0.1° of longitude by cos φ₀ at the mid latitude (Snyder 1987 Eq. 12-1): 7.8626 km at 45° N within 1e-4 relative", () => {
    const p = fitProjection(
      [
        [-35.5, 44.9],
        [-35.3, 45.1],
      ],
      600,
    );
    const [x1] = p.project([-35.45, 45.0]);
    const [x2] = p.project([-35.35, 45.0]);
    expectWithinRel(
      Math.abs(x2 - x1) / p.unitsPerKm,
      11.11950802 * Math.cos(Math.PI / 4),
      1e-4,
      "0.1° longitude at 45° N [km]",
    );
  });

  it("fitProjection() keeps every input point inside the SVG frame and puts north up", () => {
    const pts = [
      [-35.5, 45.0],
      [-35.2, 45.3],
      [-35.4, 45.1],
    ];
    const p = fitProjection(pts, 500);
    for (const q of pts) {
      const [x, y] = p.project(q);
      expectWithin(Math.min(Math.max(x, 0), 500), x, 0, "x inside [0, width]");
      expectWithin(Math.min(Math.max(y, 0), p.height), y, 0, "y inside [0, height]");
    }
    const [, yS] = p.project([-35.4, 45.0]);
    const [, yN] = p.project([-35.4, 45.3]);
    expectWithin(Math.sign(yS - yN), 1, 0, "north above south");
  });
});
