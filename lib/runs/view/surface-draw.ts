/**
 * Drawing a slip surface on the section: clicks become vertices, the first and last snapped onto
 * the ground (the engine wants both ends on it, docs/engine-io.md), vertices can be moved, and the
 * same points can be typed as "x,y x,y …". Pure, so the rules are tested without a canvas.
 */
import { groundAt } from "./section-outline";

export type Pt = [number, number];
type Ground = readonly (readonly [number, number])[];

/** The point on the ground above or below x. */
export function onGround(ground: Ground, x: number): Pt {
  return [x, groundAt(ground, x)];
}

export interface DrawState {
  points: Pt[];
  /** True once the surface has come back to the ground: further clicks start a new one. */
  finished: boolean;
}

/**
 * One click at (x, y) m. The first click starts on the ground at x. Later clicks inside the soil
 * add a bend; a click on the ground (within `snap` m) or above it ends the surface there, on the
 * ground. A click after the end starts a new surface.
 */
export function addClick(state: DrawState, x: number, y: number, ground: Ground, snap: number): DrawState {
  if (state.finished || state.points.length === 0) return { points: [onGround(ground, x)], finished: false };
  const top = groundAt(ground, x);
  if (!Number.isFinite(top)) return state;
  if (y >= top - snap) return { points: [...state.points, [x, top]], finished: true };
  return { points: [...state.points, [x, y]], finished: false };
}

/** Moves vertex i to (x, y); the two ends stay on the ground. */
export function moveVertex(points: readonly Pt[], i: number, x: number, y: number, ground: Ground): Pt[] {
  const out = points.map((p) => [p[0], p[1]] as Pt);
  if (i < 0 || i >= out.length) return out;
  out[i] = i === 0 || i === out.length - 1 ? onGround(ground, x) : [x, y];
  return out;
}

/** Rounds to the centimetre for display and for typing back. */
const cm = (v: number) => String(Math.round(v * 100) / 100);

/** The points as "x,y x,y …" (m, to the centimetre). */
export function surfaceText(points: readonly Pt[]): string {
  return points.map((p) => `${cm(p[0])},${cm(p[1])}`).join(" ");
}

export type ParsedSurface = { ok: true; points: Pt[] } | { ok: false; error: string };

/**
 * Reads typed points "x1,y1 x2,y2 …" (spaces, new lines or semicolons between points). Says which
 * point is wrong and why; needs at least two.
 */
export function parseSurfaceText(text: string): ParsedSurface {
  const parts = text
    .split(/[\s;]+/)
    .map((s) => s.trim())
    .filter(Boolean);
  if (parts.length < 2) return { ok: false, error: "Type at least two points, as x,y pairs in metres: 10,20 30,5 …" };
  const points: Pt[] = [];
  for (let i = 0; i < parts.length; i++) {
    const xy = parts[i].split(",");
    const x = Number(xy[0]);
    const y = Number(xy[1]);
    if (xy.length !== 2 || xy[0] === "" || xy[1] === "" || !Number.isFinite(x) || !Number.isFinite(y))
      return { ok: false, error: `Point ${i + 1} (“${parts[i]}”) is not a pair x,y of numbers in metres.` };
    points.push([x, y]);
  }
  return { ok: true, points };
}
