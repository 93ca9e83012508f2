/** Which water a kept run analysed, in the words every view of the run uses. */
import type { SeepageSummary } from "@/lib/seepage-stability/types";
import { formatCount } from "@/lib/format";

export const SINGLE_WATER_TEXT = "The section's single water line (no named water conditions)";

/** The seepage summary a run on seepage water keeps in its result, or null. */
export function runSeepage(run: { result?: unknown }): SeepageSummary | null {
  const r = run.result as { seepage?: SeepageSummary } | null | undefined;
  return r && typeof r === "object" && r.seepage && typeof r.seepage.q === "number" ? r.seepage : null;
}

export function waterUsedText(run: { waterCondition: { name: string } | null; result?: unknown }): string {
  const name = run.waterCondition?.name ?? SINGLE_WATER_TEXT;
  return runSeepage(run) ? `${name}, pore pressures from its seepage solution` : name;
}

/** q in m³/s per metre, three significant figures in scientific form (2.23 × 10⁻⁶). */
function flowText(q: number): string {
  if (q === 0) return "0";
  const e = Math.floor(Math.log10(Math.abs(q)));
  const sup = String(e).replace(/[-0-9]/g, (c) => "⁻⁰¹²³⁴⁵⁶⁷⁸⁹"["-0123456789".indexOf(c)]);
  return `${(q / 10 ** e).toFixed(2)} × 10${sup}`;
}

/** Where the pore pressures came from, for the run page, the review and the PDF. */
export function seepageUsedText(s: SeepageSummary): string {
  return (
    `from a finite-element seepage solution (steady state, linear triangles): q = ${flowText(s.q)} m³/s per metre, ` +
    `${formatCount(s.nodes)} nodes and ${formatCount(s.elements)} elements of about ${s.meshSize.toPrecision(2)} m` +
    (s.converged ? "" : "; its phreatic surface had not fully settled, see the warnings")
  );
}

/**
 * The document a run on seepage water is drawn with: its frozen document asks for the solution, so
 * the solved water line kept with the result is put in for the drawing. Other runs draw as stored.
 */
export function documentToDraw<T extends { water?: object }>(doc: T, seepage: SeepageSummary | null): T {
  if (!seepage || !Array.isArray(seepage.waterLine) || seepage.waterLine.length < 2) return doc;
  return { ...doc, water: { ...doc.water, phreatic: seepage.waterLine } };
}
