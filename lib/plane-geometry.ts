/**
 * The plane-geometry helpers shared outside the engine (lib/stability keeps its own, so it stays
 * free of imports). Coordinates in metres.
 */

type XY = readonly [number, number];

/**
 * Area of a simple polygon (m²) by the shoelace formula, positive for either orientation. Taken
 * about the first point: map-grid coordinates (10⁵–10⁷ m) would otherwise cancel in the products.
 */
export function polygonArea(points: readonly XY[]): number {
  if (points.length < 3) return 0;
  const [x0, y0] = points[0];
  let twice = 0;
  points.forEach(([x1, y1], i) => {
    const [x2, y2] = points[(i + 1) % points.length];
    twice += (x1 - x0) * (y2 - y0) - (x2 - x0) * (y1 - y0);
  });
  return Math.abs(twice) / 2;
}

/**
 * Elevation of a polyline with increasing x at `x`, by linear interpolation, held level beyond its
 * ends as the engine extends a phreatic line (docs/engine.md); NaN for an empty line.
 */
export function elevationAt(line: readonly XY[], x: number): number {
  const n = line.length;
  if (n === 0) return NaN;
  if (x <= line[0][0]) return line[0][1];
  if (x >= line[n - 1][0]) return line[n - 1][1];
  let i = 0;
  while (i + 2 < n && line[i + 1][0] < x) i++;
  const [xa, ya] = line[i];
  const [xb, yb] = line[i + 1];
  return xb === xa ? yb : ya + ((yb - ya) * (x - xa)) / (xb - xa);
}
