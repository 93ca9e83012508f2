/**
 * Engine warning codes and rejection reasons in plain sentences for the results panel.
 * The engine's own message stays as the detail, since it carries the numbers (which edge,
 * how far to move, the mα value and where).
 */
import type { EngineWarning } from "@/lib/stability";

export type WarningWeight = "check" | "note";

export interface WarningSentence {
  code: string;
  /** One sentence on what it means for the result. */
  headline: string;
  /** What to do about it. */
  action: string;
  /** The engine's message, with its numbers. */
  detail: string;
  /** "check" when the FS shown may not be the lowest or may be unreliable. */
  weight: WarningWeight;
}

const KNOWN: Record<string, { headline: string; action: string; weight: WarningWeight }> = {
  "minimum-on-grid-edge": {
    headline: "The lowest FS sits on the edge of the centre grid, so a lower one may lie beyond it.",
    action: "Move the grid toward that edge, about half its width, and run again.",
    weight: "check",
  },
  "minimum-at-radius-limit": {
    headline: "The lowest FS uses the first or last radius of the range, so a lower one may need a radius outside it.",
    action: "Widen the tangent band or radius range past that end and run again.",
    weight: "check",
  },
  "m-alpha-low": {
    headline: "mα is small on part of the critical circle, where Bishop's simplified method can overstate the FS.",
    action:
      "The exit is steep: move the grid so circles exit less steeply, or check the surface with a method that satisfies force equilibrium.",
    weight: "check",
  },
  "negative-normal": {
    headline: "Some slices came out with a negative base normal force; it was set to zero there.",
    action: "Usually a steep exit or high cohesion near the crest; look at those slices in the table.",
    weight: "note",
  },
  "mass-near-section-side": {
    headline: "The critical slip mass reaches close to a side of the section, which may cut it short.",
    action: "Extend the section on that side so the boundary does not limit the circle.",
    weight: "check",
  },
  "no-valid-circle": {
    headline: "No trial circle gave a factor of safety for this method.",
    action: "Check that the grid lies above the slope and that the radii reach the ground.",
    weight: "check",
  },
  "several-slip-masses": {
    headline: "The circle cuts the ground into separate pieces; the lowest FS among them is reported.",
    action: "The slices shown belong to the governing piece.",
    weight: "note",
  },
  "search-cancelled": {
    headline: "The search was stopped before it finished.",
    action: "The results cover only the circles tried; run it again to completion before relying on them.",
    weight: "check",
  },
};

/** A warning in plain words; unknown codes keep the engine's message as the headline. */
export function describeWarning(w: EngineWarning): WarningSentence {
  const k = KNOWN[w.code];
  if (!k) return { code: w.code, headline: w.message, action: "", detail: "", weight: "note" };
  return { code: w.code, ...k, detail: w.message };
}

/** Warnings in plain words, the ones that call the result into question first. */
export function describeWarnings(ws: readonly EngineWarning[]): WarningSentence[] {
  const out = ws.map(describeWarning);
  return [...out.filter((w) => w.weight === "check"), ...out.filter((w) => w.weight === "note")];
}

const REASON_WORDS: Record<string, string> = {
  "no-slip-mass": "did not cut the ground",
  "upper-arc": "the ground crossed the upper half of the circle",
  "out-of-section": "the slip mass reached a side of the section, or the arc left its bottom",
  impenetrable: "entered impenetrable material",
  "too-shallow": "slip mass thinner than the minimum depth",
  "no-driving-moment": "nothing drives the mass in the sliding direction",
  "radius-not-positive": "radius not positive (tangent level above the centre)",
  "m-alpha-not-positive": "Bishop's mα reached zero or below (exit too steep)",
  "not-converged": "Bishop's iteration did not converge",
  "too-complex": "too many slice breaks under the circle",
  "impenetrable-without-weight": "the slip mass carries impenetrable material that has no unit weight",
};

/** Why circles were rejected, in words. */
export function rejectionText(reason: string): string {
  return REASON_WORDS[reason] ?? reason.replace(/-/g, " ");
}

/** Rejection counts as sentences, largest first. */
export function rejectionList(rejected: Record<string, number>): { reason: string; count: number; text: string }[] {
  return Object.entries(rejected)
    .filter(([, n]) => n > 0)
    .sort((a, b) => b[1] - a[1] || a[0].localeCompare(b[0]))
    .map(([reason, count]) => ({ reason, count, text: rejectionText(reason) }));
}

/** The ordinary method's form (docs/engine-io.md), stated beside its FS. */
export function ordinaryFormText(form: string | undefined): string {
  return form === "effective-weight"
    ? "effective-weight form: N′ = (W − u·b)·cos α − kh·W·sin α"
    : "classical form: N′ = N − u·l, with N from every force on the slice but the base forces";
}

// The method names live with every other code-to-words mapping, in lib/vocabulary.ts.
export { METHOD_NAME, METHOD_SHORT } from "@/lib/vocabulary";
