/**
 * Fill quantities of the parametric embankment: cross-section areas by the shoelace formula and
 * volumes for a crest length, taken as a prism (the section is the maximum one, so the volume is
 * an upper bound for a dam whose height falls toward the abutments).
 */
import { polygonArea } from "@/lib/plane-geometry";
import type { EmbankmentGeometry } from "./embankment-geometry";

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
