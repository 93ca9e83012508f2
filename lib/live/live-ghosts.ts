/**
 * What the editor draws from a live search: each method's critical circle and FS, or, when the
 * drawing under the pointer cannot be analysed, the engine's first objection in its own words.
 */
import type { Circle, GridSearchResult, Method } from "@/lib/stability";

export interface LiveGhost {
  method: Method;
  fs: number;
  circle: Circle;
  entry: [number, number];
  exit: [number, number];
}

export interface LiveOutcome {
  ghosts: LiveGhost[];
  /** Why there is no circle to show (invalid drawing, or no valid circle for a method). */
  problem: string | null;
  circlesTried: number;
}

export function liveOutcome(result: GridSearchResult): LiveOutcome {
  if (!result.ok) {
    const first = result.errors[0];
    return {
      ghosts: [],
      problem: first ? `${first.message}${first.path ? ` (${first.path})` : ""}` : "The drawing cannot be analysed.",
      circlesTried: 0,
    };
  }
  const ghosts: LiveGhost[] = [];
  for (const method of result.methods) {
    const best = result.results[method];
    if (best) ghosts.push({ method, fs: best.fs, circle: best.circle, entry: best.entry, exit: best.exit });
  }
  return {
    ghosts,
    problem: ghosts.length < result.methods.length ? "No valid slip circle in the search grid for every method." : null,
    circlesTried: result.circles.tried,
  };
}
