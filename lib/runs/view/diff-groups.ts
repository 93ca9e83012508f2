/**
 * Differences between two runs' inputs, grouped by area in a fixed reading order: what the
 * ground is made of, its shape, the water, the loads, then how it was analysed.
 */
import type { DiffArea, Difference } from "@/lib/sections/diff";

export const AREA_ORDER: readonly DiffArea[] = ["materials", "geometry", "water", "loads", "analysis"];

/** Non-empty groups in AREA_ORDER, each keeping the differences' own order. */
export function groupDifferences(diffs: readonly Difference[]): { area: DiffArea; items: Difference[] }[] {
  return AREA_ORDER.map((area) => ({ area, items: diffs.filter((d) => d.area === area) })).filter(
    (g) => g.items.length > 0,
  );
}
