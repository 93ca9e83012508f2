/**
 * What the colour bar under the FS map shows: tick values with their position along the
 * bar, the gradient's colour stops, and where the required FS falls.
 */
import { niceTicks } from "@/lib/scales";
import { FS_MAP_SCALE, scaleHex, type ColourScale } from "./colour-scale";
import { fsToUnit, type FsRange } from "./fs-map-cells";

export interface LegendTick {
  value: number;
  /** 0 at the left end of the bar, 1 at the right. */
  at: number;
  label: string;
}

export interface FsLegend {
  ticks: LegendTick[];
  /** Gradient stops for the bar (offset 0–1, colour). */
  gradient: { offset: number; colour: string }[];
  required: { value: number; at: number; outside: "below" | "above" | null } | null;
  lowLabel: string;
  highLabel: string;
}

/** FS to 2 decimals: enough to read a map, where the summary carries 3. */
const fmt2 = (v: number) => v.toFixed(2);

/**
 * The legend of an FS map's colour range.
 * @param requiredFs marked on the bar; pinned to an end (with `outside` set) when off the range
 */
export function buildFsLegend(
  range: FsRange,
  requiredFs?: number,
  scale: ColourScale = FS_MAP_SCALE,
  stops = 24,
): FsLegend {
  const ticks = niceTicks(range.lo, range.hi, 5)
    .filter((v) => v >= range.lo - 1e-9 && v <= range.hi + 1e-9)
    .map((v) => ({ value: v, at: fsToUnit(v, range), label: fmt2(v) }));
  const gradient = Array.from({ length: stops + 1 }, (_, i) => ({
    offset: i / stops,
    colour: scaleHex(scale, i / stops),
  }));
  let required: FsLegend["required"] = null;
  if (requiredFs !== undefined && Number.isFinite(requiredFs)) {
    const outside = requiredFs < range.lo ? "below" : requiredFs > range.hi ? "above" : null;
    required = { value: requiredFs, at: fsToUnit(requiredFs, range), outside };
  }
  return {
    ticks,
    gradient,
    required,
    lowLabel: fmt2(range.lo),
    highLabel: `${range.clipped ? "≥ " : ""}${fmt2(range.hi)}`,
  };
}
