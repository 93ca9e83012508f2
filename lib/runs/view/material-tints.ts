/**
 * Fills for the section's materials on the run canvas: the one palette (lib/sections/material-palette),
 * unless the caller gives its own colours.
 */
import type { SectionDocument } from "@/lib/stability";
import { materialColorMap } from "@/lib/sections/material-palette";

/** Fill per material id. */
export function materialFills(doc: SectionDocument, given?: Record<string, string>): Record<string, string> {
  const own = materialColorMap(doc.materials);
  return Object.fromEntries(doc.materials.map((m) => [m.id, given?.[m.id] ?? own[m.id]]));
}
