/**
 * Where the phreatic line lies above the ground the water between is ponded (reservoir)
 * water. This finds those areas as polygons so the canvas can shade them.
 */
import type { Point } from "@/lib/stability";

/** Values of a polyline at x approached from the left and from the right (they differ at a step). */
function limits(line: readonly Point[], x: number): { left: number; right: number } | null {
  let first = -1;
  let last = -1;
  for (let i = 0; i < line.length; i++) {
    if (line[i][0] === x) {
      if (first < 0) first = i;
      last = i;
    }
  }
  if (first >= 0) return { left: line[first][1], right: line[last][1] };
  for (let i = 0; i + 1 < line.length; i++) {
    const [a, b] = [line[i], line[i + 1]];
    if (a[0] < x && x < b[0]) {
      const y = a[1] + ((b[1] - a[1]) * (x - a[0])) / (b[0] - a[0]);
      return { left: y, right: y };
    }
  }
  return null;
}

function pushDistinct(chain: Point[], p: Point): void {
  const last = chain[chain.length - 1];
  if (!last || last[0] !== p[0] || last[1] !== p[1]) chain.push(p);
}

/**
 * Polygons of water above the ground (m), each the water line on top and the ground below.
 * @param phreatic water line, x increasing
 * @param ground ground surface, x non-decreasing
 */
export function pondedWater(phreatic: readonly Point[], ground: readonly Point[]): Point[][] {
  if (phreatic.length < 2 || ground.length < 2) return [];
  const lo = Math.max(phreatic[0][0], ground[0][0]);
  const hi = Math.min(phreatic[phreatic.length - 1][0], ground[ground.length - 1][0]);
  if (!(hi > lo)) return [];
  const xs = [...new Set([...phreatic, ...ground].map((p) => p[0]).filter((x) => x >= lo && x <= hi))].sort(
    (a, b) => a - b,
  );

  const polygons: Point[][] = [];
  let top: Point[] | null = null;
  let bottom: Point[] = [];
  const close = () => {
    if (top) {
      const ring = [...top, ...bottom.reverse()];
      if (ring.length >= 3) polygons.push(ring);
    }
    top = null;
    bottom = [];
  };

  for (let k = 0; k + 1 < xs.length; k++) {
    const [xa, xb] = [xs[k], xs[k + 1]];
    const [w0, g0, w1, g1] = [limits(phreatic, xa), limits(ground, xa), limits(phreatic, xb), limits(ground, xb)];
    if (!w0 || !g0 || !w1 || !g1) {
      close();
      continue;
    }
    const [wa, ga, wb, gb] = [w0.right, g0.right, w1.left, g1.left];
    const [da, db] = [wa - ga, wb - gb];
    const crossAt = (): Point => {
      const x = xa + ((xb - xa) * da) / (da - db);
      return [x, wa + ((wb - wa) * (x - xa)) / (xb - xa)];
    };
    if (da > 0) {
      if (!top) top = [];
      pushDistinct(top, [xa, wa]);
      pushDistinct(bottom, [xa, ga]);
    } else {
      close();
      if (db > 0) {
        top = [crossAt()];
        bottom = [];
      }
    }
    if (!top) continue;
    if (db > 0) {
      pushDistinct(top, [xb, wb]);
      pushDistinct(bottom, [xb, gb]);
    } else {
      pushDistinct(top, crossAt());
      close();
    }
  }
  close();
  return polygons;
}
