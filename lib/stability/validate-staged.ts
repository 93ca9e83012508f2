/**
 * Checks a staged rapid drawdown needs (docs/engine.md §7(b)): every low-permeability
 * Mohr–Coulomb material that a region uses must carry its total-stress (R) envelope (cR, phiR),
 * unless it is marked free-draining; undrained (su) materials keep su in every stage.
 */
import { issue, type Issue } from "./issues";
import type { Analysis, LenientSectionDocument } from "./schema";

/** Pushes errors for materials a staged drawdown cannot treat, and notes on the rest. */
export function checkStagedMaterials(
  doc: Pick<LenientSectionDocument, "materials" | "regions">,
  a: Analysis | undefined,
  errors: Issue[],
  warnings: Issue[],
): void {
  const d = a?.drawdown;
  if (!d) return;
  if (d.stagedVariant !== undefined && d.method !== "staged") {
    warnings.push(
      issue(
        "staged-variant-unused",
        "analysis.drawdown.stagedVariant",
        'analysis.drawdown.stagedVariant is ignored unless analysis.drawdown.method is "staged".',
      ),
    );
  }
  if (a?.case !== "drawdown" || d.method !== "staged") return;
  const used = new Set(doc.regions.map((r) => r.material));
  const fixed: string[] = [];
  doc.materials.forEach((m, i) => {
    if (!used.has(m.id) || m.model === "impenetrable") return;
    if (m.model === "undrained") {
      fixed.push(`'${m.id}'`);
      return;
    }
    if (m.freeDraining || (m.cR !== undefined && m.phiR !== undefined)) return;
    if (m.cR !== undefined || m.phiR !== undefined) return; // reported as r-envelope-incomplete
    errors.push(
      issue(
        "r-envelope-missing",
        `materials[${i}]`,
        `Material '${m.id}': a staged drawdown needs the total-stress (R) envelope of each low-permeability material. Add cR (kPa) and phiR (°) from consolidated-undrained tests, or set freeDraining: true if it drains as fast as the pool falls.`,
      ),
    );
  });
  if (fixed.length > 0) {
    warnings.push(
      issue(
        "staged-undrained-material",
        "materials",
        `Staged drawdown: ${fixed.join(", ")} ${fixed.length > 1 ? "are undrained materials" : "is an undrained material"}; ${fixed.length > 1 ? "their" : "its"} su is used unchanged in every stage.`,
      ),
    );
  }
}
