/**
 * Whether a polyline is an admissible slip surface (docs/engine.md §12 "Admissible surfaces"):
 * at least two points; it does not cross itself; x runs one way only (no fold back, no vertical
 * step); both ends on the ground (within END_TOL, then snapped onto it); no point between the
 * ends above the ground; no reverse bend (the base steepening again in the sliding direction by
 * more than REVERSE_BEND_DEG). Impenetrable material and the section's base are found by slicing.
 * Each refusal is a reason with a sentence and the place.
 */
import { segmentCrossing } from "../geometry";
import { groundAt } from "../ground";
import { fmt, fmtPoint } from "../issues";
import type { PreparedSection } from "../prepare";
import type { XY } from "../rigorous-types";

/** An end is on the ground when within this (m) of it, or 1/1000 of the surface's width if larger. */
export const END_TOL = 0.01;
/** A vertex may bend the base back by at most this angle (°) before the surface is refused. */
export const REVERSE_BEND_DEG = 2;

export interface SurfaceRefusal {
  ok: false;
  reason: string;
  reasonText: string;
  at: XY | null;
}

export interface SurfaceAccepted {
  ok: true;
  /** x strictly increasing, ends on the ground. */
  px: Float64Array;
  py: Float64Array;
}

function refuse(reason: string, reasonText: string, at: XY | null = null): SurfaceRefusal {
  return { ok: false, reason, reasonText, at };
}

/** Checks a polyline given in either direction; returns it left to right with its ends on the ground. */
export function checkSurface(
  P: PreparedSection,
  points: ReadonlyArray<readonly [number, number]>,
): SurfaceAccepted | SurfaceRefusal {
  if (points.length < 2) return refuse("too-few-points", "A slip surface needs at least two points.");
  for (const p of points)
    if (!Number.isFinite(p[0]) || !Number.isFinite(p[1]))
      return refuse("not-finite", "Every point of the slip surface needs finite x and y (m).");
  for (let i = 0; i + 1 < points.length; i++)
    for (let j = i + 2; j + 1 < points.length; j++) {
      const hit = segmentCrossing(points[i], points[i + 1], points[j], points[j + 1]);
      if (hit)
        return refuse(
          "crosses-itself",
          `The slip surface crosses itself at ${fmtPoint(hit[0], hit[1])} (segments ${i + 1} and ${j + 1}).`,
          hit,
        );
    }
  const pts = points[points.length - 1][0] < points[0][0] ? [...points].reverse() : [...points];
  for (let i = 0; i + 1 < pts.length; i++)
    if (!(pts[i + 1][0] > pts[i][0]))
      return refuse(
        "folds-back",
        `The slip surface folds back or steps vertically at ${fmtPoint(pts[i + 1][0], pts[i + 1][1])}: ` +
          "its x must run one way from end to end.",
        [pts[i + 1][0], pts[i + 1][1]],
      );
  const n = pts.length;
  const px = Float64Array.from(pts, (p) => p[0]);
  const py = Float64Array.from(pts, (p) => p[1]);
  if (px[0] < P.xmin - 1e-9 || px[n - 1] > P.xmax + 1e-9)
    return refuse(
      "out-of-section",
      `The slip surface runs from x = ${fmt(px[0])} to ${fmt(px[n - 1])} m, beyond the section (x = ${fmt(P.xmin)} to ${fmt(P.xmax)} m).`,
    );
  const tol = Math.max(END_TOL, 1e-3 * (px[n - 1] - px[0]));
  for (const i of [0, n - 1]) {
    const g = groundAt(P.ground, px[i]);
    if (Math.abs(py[i] - g) > tol)
      return refuse(
        "end-not-on-ground",
        `The slip surface's ${i === 0 ? "left" : "right"} end ${fmtPoint(px[i], py[i])} is ${fmt(Math.abs(py[i] - g))} m ` +
          `${py[i] > g ? "above" : "below"} the ground (${fmt(g)} m there); both ends must lie on the ground.`,
        [px[i], py[i]],
      );
    py[i] = g;
  }
  for (let i = 1; i + 1 < n; i++) {
    const g = groundAt(P.ground, px[i]);
    if (py[i] > g + 1e-6) return aboveGround(px[i], py[i]);
  }
  const gx = P.ground.x;
  const gy = P.ground.y;
  let s = 0;
  for (let k = 0; k < gx.length; k++) {
    const x = gx[k];
    if (!(x > px[0] && x < px[n - 1])) continue;
    while (px[s + 1] < x) s++;
    const y = py[s] + ((py[s + 1] - py[s]) * (x - px[s])) / (px[s + 1] - px[s]);
    if (y > gy[k] + 1e-6) return aboveGround(x, y);
  }
  const bend = (REVERSE_BEND_DEG * Math.PI) / 180;
  for (let i = 1; i + 1 < n; i++) {
    const a0 = Math.atan2(py[i] - py[i - 1], px[i] - px[i - 1]);
    const a1 = Math.atan2(py[i + 1] - py[i], px[i + 1] - px[i]);
    if (a1 < a0 - bend)
      return refuse(
        "reverse-bend",
        `The slip surface bends back at ${fmtPoint(px[i], py[i])} (its inclination drops by ` +
          `${(((a0 - a1) * 180) / Math.PI).toFixed(1)}°): a rigid mass cannot slide over a hump in its base.`,
        [px[i], py[i]],
      );
  }
  return { ok: true, px, py };
}

function aboveGround(x: number, y: number): SurfaceRefusal {
  return refuse(
    "above-ground",
    `The slip surface passes above the ground at ${fmtPoint(x, y)}; between its ends it must stay in the soil.`,
    [x, y],
  );
}
