/**
 * Why a circle (or one method on it) has no factor of safety. Numbers in the hot loop,
 * kebab-case names in results (docs/engine.md §3, §4).
 */
export const OK = 0;
export const NO_MASS = 1;
export const UPPER_ARC = 2;
export const OUT_OF_SECTION = 3;
export const RIGID = 4;
export const SHALLOW = 5;
export const NO_DRIVING = 6;
export const BAD_RADIUS = 7;
export const M_ALPHA = 8;
export const NOT_CONVERGED = 9;
export const TOO_MANY_BREAKS = 10;
export const RIGID_NO_WEIGHT = 11;

/** Result names of the status codes. */
export const REASONS: readonly string[] = [
  "ok",
  "no-slip-mass",
  "upper-arc",
  "out-of-section",
  "impenetrable",
  "too-shallow",
  "no-driving-moment",
  "radius-not-positive",
  "m-alpha-not-positive",
  "not-converged",
  "too-complex",
  "impenetrable-without-weight",
];

/** Plain-language explanation of each reason, for one-circle results. */
export const REASON_TEXT: readonly string[] = [
  "",
  "The circle does not cut the ground: there is no slip mass.",
  "The ground crosses the upper half of the circle; move the centre higher or shorten the radius.",
  "The slip mass reaches a side of the section, or the arc leaves the bottom of the regions.",
  "The circle enters impenetrable material.",
  "The slip mass is thinner than the minimum depth.",
  "The weight of the slip mass does not drive it in the sliding direction.",
  "The radius is not positive (a tangent elevation above the centre).",
  "Bishop's mα is zero or negative on a slice at the solution: the exit is too steep.",
  "Bishop's iteration did not converge.",
  "The section is too detailed under this circle (too many slice breaks).",
  "The slip mass carries a block of impenetrable material that has no unit weight; " +
    "give it gamma so its weight is carried.",
];

/** The reason text for an impenetrable block without γ inside a slip mass, naming its material. */
export function rigidNoWeightText(material: string | undefined): string {
  return (
    `The slip mass carries impenetrable material '${material ?? "?"}', which has no unit weight: ` +
    "give it gamma (γ, kN/m³) so that its weight is carried, or move the circle clear of it."
  );
}
