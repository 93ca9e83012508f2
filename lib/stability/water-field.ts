/**
 * Pore pressures from outside the engine (docs/engine.md §3(d)): `"water": {"source": "seepage"}`
 * takes the pore pressure at each slice base from a field the caller supplies, such as a
 * finite-element seepage solution. The engine stays pure: it knows only this interface, and the
 * orchestrator in lib/seepage-stability solves the seepage and fills the document's `phreatic`
 * (which still sets the saturated weights and the ponded water) before calling it.
 */
import { issue, type Issue } from "./issues";
import type { LoadCase, SectionDocument } from "./schema";

/** A pore-pressure field: u (kPa) at (x, y) in m; suction must already be counted as zero. */
export interface WaterField {
  porePressure(x: number, y: number): number;
}

/** Options shared by the search and the one-circle report for water from a field. */
export interface WaterFieldOptions {
  /** Required when the document's water comes from seepage and the case is not a drawdown. */
  waterField?: WaterField;
}

/** True when the document's pore pressures come from a seepage solution. */
export function usesSeepageWater(doc: Pick<SectionDocument, "water">): boolean {
  return doc.water?.source === "seepage";
}

/**
 * The field a prepared section uses: only for seepage water outside a drawdown. A drawdown takes
 * the solution's phreatic surface as its pre-drawdown line (docs/engine-io.md §2), so the line
 * alone governs there and a field passed in is not used.
 */
export function activeField(
  doc: Pick<SectionDocument, "water">,
  loadCase: LoadCase,
  field: WaterField | undefined,
): WaterField | null {
  if (!usesSeepageWater(doc) || loadCase === "drawdown" || !field) return null;
  return field;
}

/**
 * Errors when seepage water reaches a run unsolved: without the solution's line (every case) or,
 * outside a drawdown, without its field. validateSection accepts such a document: it is a valid
 * section, which only a run through the orchestrator can compute.
 */
export function checkWaterField(
  doc: Pick<SectionDocument, "water">,
  loadCase: LoadCase,
  field: WaterField | undefined,
): Issue[] {
  if (!usesSeepageWater(doc)) return [];
  const how = "run the document through the seepage orchestrator (scripts/analyze.ts and the app do).";
  if (!doc.water?.phreatic)
    return [
      issue("seepage-not-solved", "water.source", `water.source = "seepage" reached the engine unsolved: ${how}`),
    ];
  if (loadCase === "drawdown" || field) return [];
  return [
    issue(
      "seepage-field-missing",
      "water.source",
      `water.source = "seepage" needs the solved seepage field for its pore pressures: ${how}`,
    ),
  ];
}

/**
 * The mean pore pressure over a slice base from the field at the base's midpoint (xm, ym).
 * `areaTerm` = γw·(area between the arc and its midpoint height)/b ≤ 0 moves the midpoint value
 * to the mean depth of the arc, as the phreatic line's pressure does (docs/engine.md §3): exact
 * for a hydrostatic field, second order in the slice width otherwise.
 */
export function fieldPressure(field: WaterField, xm: number, ym: number, areaTerm: number): number {
  const u = field.porePressure(xm, ym);
  if (!(u > 0)) return 0;
  const mean = u + areaTerm;
  return mean > 0 ? mean : 0;
}
