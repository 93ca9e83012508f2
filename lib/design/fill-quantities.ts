/**
 * Fill quantities of the parametric embankment: cross-section areas by the shoelace formula and
 * volumes for a crest length, taken as a prism (the section is the maximum one, so the volume is
 * an upper bound for a dam whose height falls toward the abutments).
 */
import type { EmbankmentGeometry, XY } from "./embankment-geometry";

/** Area of a simple polygon (m²), by the shoelace formula; positive for either orientation. */
export function polygonArea(points: readonly XY[]): number {
  if (points.length < 3) return 0;
  let twice = 0;
  for (let i = 0; i < points.length; i++) {
    const [x1, y1] = points[i];
    const [x2, y2] = points[(i + 1) % points.length];
    twice += x1 * y2 - x2 * y1;
  }
  return Math.abs(twice) / 2;
}

export interface FillQuantities {
  /** Whole embankment above the foundation (m² per metre of dam, i.e. m³/m). */
  sectionArea: number;
  drainArea: number;
  /** Earth fill: the section less the drain (homogeneous), or core and shells together (zoned). */
  fillArea: number;
  coreArea: number | null;
  shellArea: number | null;
  crestLength: number;
  /** Volumes for the crest length as a prism (m³). */
  fillVolume: number;
  drainVolume: number;
  coreVolume: number | null;
  shellVolume: number | null;
}

export function fillQuantities(geometry: EmbankmentGeometry, crestLength: number): FillQuantities {
  if (!(crestLength > 0)) throw new Error("crest length must be a positive number of metres");
  const sectionArea = polygonArea(geometry.outline);
  const drainArea = polygonArea(geometry.drain.polygon);
  const fillArea = sectionArea - drainArea;
  const coreArea = geometry.core ? polygonArea(geometry.core.polygon) : null;
  const shellArea = coreArea === null ? null : fillArea - coreArea;
  return {
    sectionArea,
    drainArea,
    fillArea,
    coreArea,
    shellArea,
    crestLength,
    fillVolume: fillArea * crestLength,
    drainVolume: drainArea * crestLength,
    coreVolume: coreArea === null ? null : coreArea * crestLength,
    shellVolume: shellArea === null ? null : shellArea * crestLength,
  };
}
