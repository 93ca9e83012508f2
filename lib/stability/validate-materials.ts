/**
 * Material checks (docs/engine.md §1 "Bounds"): errors block a run, warnings flag unusual values.
 * γ ∉ (5, 30] / ∉ [14, 24]; γsat ≤ γw / < γ; c' < 0 / > 200 kPa; φ' ∉ [0°, 60°) / > 45°;
 * su ≤ 0 / > 500 kPa; R envelope (staged drawdown, §7(b)): cR < 0 / > 200 kPa, φR ∉ [0°, 60°) / > 45°,
 * and both or neither.
 */
import { issue, type Issue } from "./issues";
import type { LenientSectionDocument } from "./schema";

/** A material as validation sees it: γ may still be missing. */
type LenientMaterial = LenientSectionDocument["materials"][number];

/** Checks every material; pushes errors and warnings. */
export function checkMaterials(
  materials: ReadonlyArray<LenientMaterial>,
  gammaW: number,
  errors: Issue[],
  warnings: Issue[],
): void {
  const seen = new Map<string, number>();
  materials.forEach((m, i) => {
    const p = `materials[${i}]`;
    const name = `Material '${m.id}'`;
    const first = seen.get(m.id);
    if (first !== undefined)
      errors.push(
        issue(
          "duplicate-material-id",
          `${p}.id`,
          `${name} (${p}) has the same id as materials[${first}]. Give each material its own id.`,
        ),
      );
    else seen.set(m.id, i);
    if (m.model === "impenetrable") {
      if (m.gamma !== undefined && !(m.gamma > 0 && m.gamma <= 30))
        errors.push(
          issue("unit-weight-out-of-range", `${p}.gamma`, `${name}: γ = ${m.gamma} kN/m³ must be in (0, 30].`),
        );
      return;
    }
    if (m.gamma === undefined) {
      errors.push(
        issue(
          "missing-unit-weight",
          `${p}.gamma`,
          `${name} has no unit weight: give gamma (γ, kN/m³), typically 16–22.`,
        ),
      );
    } else if (!(m.gamma > 5 && m.gamma <= 30)) {
      errors.push(
        issue(
          "unit-weight-out-of-range",
          `${p}.gamma`,
          `${name}: γ = ${m.gamma} kN/m³ is outside (5, 30]. Check the units (kN/m³).`,
        ),
      );
    } else if (m.gamma < 14 || m.gamma > 24) {
      warnings.push(
        issue("unit-weight-unusual", `${p}.gamma`, `${name}: γ = ${m.gamma} kN/m³ is unusual for soil (14–24).`),
      );
    }
    if (m.gammaSat !== undefined) {
      if (!(m.gammaSat > gammaW))
        errors.push(
          issue(
            "saturated-weight-too-low",
            `${p}.gammaSat`,
            `${name}: γsat = ${m.gammaSat} kN/m³ must exceed γw = ${gammaW} kN/m³.`,
          ),
        );
      else if (m.gamma !== undefined && m.gammaSat < m.gamma)
        warnings.push(
          issue(
            "saturated-weight-below-gamma",
            `${p}.gammaSat`,
            `${name}: γsat (${m.gammaSat}) is below γ (${m.gamma}); usually γsat ≥ γ.`,
          ),
        );
      if (m.gammaSat > 30)
        errors.push(
          issue(
            "unit-weight-out-of-range",
            `${p}.gammaSat`,
            `${name}: γsat = ${m.gammaSat} kN/m³ is above 30. Check the units (kN/m³).`,
          ),
        );
    }
    if (m.model === "mohr-coulomb") {
      if (m.c < 0)
        errors.push(issue("cohesion-negative", `${p}.c`, `${name}: c' = ${m.c} kPa is negative; give c' ≥ 0.`));
      else if (m.c > 200)
        warnings.push(issue("cohesion-high", `${p}.c`, `${name}: c' = ${m.c} kPa is high for soil (over 200 kPa).`));
      if (!(m.phi >= 0 && m.phi < 60))
        errors.push(
          issue(
            "phi-out-of-range",
            `${p}.phi`,
            `${name}: φ' = ${m.phi}° is outside 0–60°. Give the friction angle in degrees.`,
          ),
        );
      else if (m.phi > 45) warnings.push(issue("phi-high", `${p}.phi`, `${name}: φ' = ${m.phi}° is high (over 45°).`));
      checkREnvelope(m, p, name, errors, warnings);
    }
    if (m.su !== undefined) checkSu(m, p, name, errors, warnings);
  });
}

function checkSu(
  m: Exclude<LenientMaterial, { model: "impenetrable" }>,
  p: string,
  name: string,
  errors: Issue[],
  warnings: Issue[],
): void {
  const su = m.su as number;
  if (!(su > 0)) errors.push(issue("su-not-positive", `${p}.su`, `${name}: su = ${su} kPa must be positive.`));
  else if (su > 500) warnings.push(issue("su-high", `${p}.su`, `${name}: su = ${su} kPa is high (over 500 kPa).`));
  const g = m.suGradient ?? 0;
  if (g < 0)
    errors.push(
      issue(
        "su-gradient-negative",
        `${p}.suGradient`,
        `${name}: suGradient = ${g} kPa/m is negative; su may only rise with depth.`,
      ),
    );
  if (g !== 0 && m.suDatum === undefined)
    errors.push(
      issue(
        "su-datum-missing",
        `${p}.suDatum`,
        `${name}: suGradient is set but suDatum is missing; give the elevation (m) where su applies.`,
      ),
    );
}

/** The total-stress (R) envelope of a Mohr–Coulomb material, when given: both keys, in range. */
function checkREnvelope(
  m: Extract<LenientMaterial, { model: "mohr-coulomb" }>,
  p: string,
  name: string,
  errors: Issue[],
  warnings: Issue[],
): void {
  if (m.cR === undefined && m.phiR === undefined) return;
  if (m.cR === undefined || m.phiR === undefined) {
    const missing = m.cR === undefined ? "cR" : "phiR";
    errors.push(
      issue(
        "r-envelope-incomplete",
        `${p}.${missing}`,
        `${name}: the R envelope needs both cR (kPa) and phiR (°); ${missing} is missing. Give both from consolidated-undrained tests, or neither.`,
      ),
    );
    return;
  }
  if (m.cR < 0)
    errors.push(issue("r-cohesion-negative", `${p}.cR`, `${name}: cR = ${m.cR} kPa is negative; give cR ≥ 0.`));
  else if (m.cR > 200)
    warnings.push(issue("r-cohesion-high", `${p}.cR`, `${name}: cR = ${m.cR} kPa is high for soil (over 200 kPa).`));
  if (!(m.phiR >= 0 && m.phiR < 60))
    errors.push(
      issue(
        "r-phi-out-of-range",
        `${p}.phiR`,
        `${name}: φR = ${m.phiR}° is outside 0–60°. Give the R-envelope angle in degrees.`,
      ),
    );
  else if (m.phiR > 45) warnings.push(issue("r-phi-high", `${p}.phiR`, `${name}: φR = ${m.phiR}° is high (over 45°).`));
}
