/**
 * Water and load checks (docs/engine.md §1): one water model at a time, a phreatic line with x
 * increasing that spans the section, γw in [9.7, 10.3], ru in [0, 1) (warning above 0.6),
 * kh in [0, 0.5] (warning above 0.3), surcharges with x1 < x2 and q ≥ 0.
 */
import { fmt, issue, type Issue } from "./issues";
import type { Loads, Water } from "./schema";

/** Checks the water block against the section's x extent (m). */
export function checkWater(
  water: Water | undefined,
  xmin: number,
  xmax: number,
  errors: Issue[],
  warnings: Issue[],
): void {
  if (!water) return;
  if (water.gammaW !== undefined && !(water.gammaW >= 9.7 && water.gammaW <= 10.3)) {
    errors.push(
      issue("gamma-w-out-of-range", "water.gammaW", `water.gammaW = ${water.gammaW} kN/m³ is outside 9.7–10.3.`),
    );
  }
  if (water.phreatic && water.ru !== undefined) {
    errors.push(issue("water-both-models", "water", "water has both a phreatic line and ru: keep one of them."));
  }
  if (water.source === "seepage" && water.ru !== undefined && !water.phreatic)
    errors.push(issue("water-both-models", "water", "water comes from seepage and has ru: keep one of them."));
  if (water.ru !== undefined) {
    if (!(water.ru >= 0 && water.ru < 1))
      errors.push(issue("ru-out-of-range", "water.ru", `water.ru = ${water.ru} is outside [0, 1).`));
    else if (water.ru > 0.6)
      warnings.push(issue("ru-high", "water.ru", `water.ru = ${water.ru} is unusually high (over 0.6).`));
  }
  const line = water.phreatic;
  if (!line) return;
  let ordered = true;
  for (let i = 1; i < line.length; i++) {
    if (!(line[i][0] > line[i - 1][0])) {
      ordered = false;
      errors.push(
        issue(
          "phreatic-x-order",
          `water.phreatic[${i}]`,
          `Phreatic line: point ${i} (x = ${fmt(line[i][0])} m) is not right of point ${i - 1} (x = ${fmt(line[i - 1][0])} m). Points must run left to right; delete or move it.`,
          line[i],
        ),
      );
    }
  }
  if (!ordered) return;
  const x0 = line[0][0];
  const x1 = line[line.length - 1][0];
  if (x0 > xmin + 1e-3 || x1 < xmax - 1e-3) {
    errors.push(
      issue(
        "phreatic-not-spanning",
        "water.phreatic",
        `The phreatic line runs from x = ${fmt(x0)} to ${fmt(x1)} m but the section runs from x = ${fmt(xmin)} to ${fmt(xmax)} m. Extend it to both sides of the section.`,
        x0 > xmin + 1e-3 ? line[0] : line[line.length - 1],
      ),
    );
  }
}

/** Checks surcharges and kh against the section's x extent (m). */
export function checkLoads(
  loads: Loads | undefined,
  xmin: number,
  xmax: number,
  errors: Issue[],
  warnings: Issue[],
): void {
  if (!loads) return;
  if (loads.kh !== undefined) {
    if (!(loads.kh >= 0 && loads.kh <= 0.5))
      errors.push(issue("kh-out-of-range", "loads.kh", `loads.kh = ${loads.kh} is outside 0–0.5.`));
    else if (loads.kh > 0.3) warnings.push(issue("kh-high", "loads.kh", `loads.kh = ${loads.kh} is high (over 0.3).`));
  }
  (loads.surcharges ?? []).forEach((s, i) => {
    const p = `loads.surcharges[${i}]`;
    if (!(s.x2 > s.x1))
      errors.push(
        issue("surcharge-order", p, `${p}: x1 = ${fmt(s.x1)} m must be left of x2 = ${fmt(s.x2)} m.`, [s.x1, 0]),
      );
    if (s.q < 0)
      errors.push(
        issue("surcharge-negative", `${p}.q`, `${p}: q = ${s.q} kPa is negative; surcharges press down (q ≥ 0).`),
      );
    if (s.x1 < xmin - 1e-3 || s.x2 > xmax + 1e-3)
      warnings.push(
        issue(
          "surcharge-outside",
          p,
          `${p} reaches outside the section (x = ${fmt(xmin)} to ${fmt(xmax)} m); the outside part is ignored.`,
        ),
      );
  });
}
