/**
 * The placement specification that follows from a fill material's compaction test: the least
 * dry density (the acceptance percentage of the maximum) and the moisture window where the
 * fitted curve stays above it (lib/lab/compaction.ts), with the dry mass the fill volume needs.
 */
import type { CompactionResult } from "@/lib/lab/compaction";

export interface CompactionSpec {
  /** Which test set it came from. */
  setName: string;
  materialKey: string;
  maxDryDensity: number;
  optimumMoisture: number;
  percent: number;
  /** Least accepted dry density (Mg/m³). */
  minDryDensity: number;
  moistureFrom: number;
  moistureTo: number;
  /** Either limit read from the curve's extension beyond the tested points. */
  extrapolated: boolean;
  /** Dry soil to place for the fill volume at the least accepted density (Mg = t). */
  dryMassForVolume: number | null;
  warnings: string[];
}

/**
 * @param result the compaction set's derived result
 * @param fillVolume compacted fill volume (m³), or null when unknown
 */
export function compactionSpec(
  setName: string,
  materialKey: string,
  result: CompactionResult,
  fillVolume: number | null,
): CompactionSpec {
  const a = result.acceptance;
  return {
    setName,
    materialKey,
    maxDryDensity: result.maxDryDensity,
    optimumMoisture: result.optimumMoistureContent,
    percent: a.percent,
    minDryDensity: a.dryDensity,
    moistureFrom: a.dryLimit.moistureContent,
    moistureTo: a.wetLimit.moistureContent,
    extrapolated: a.dryLimit.extrapolated || a.wetLimit.extrapolated,
    dryMassForVolume: fillVolume === null ? null : fillVolume * a.dryDensity,
    warnings: result.warnings,
  };
}
