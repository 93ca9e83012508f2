/**
 * Light fills for the section's materials, so the map and circles drawn over them stay the
 * strongest marks. A material's own colour (document or caller) wins; otherwise it takes a
 * muted earth tone in document order.
 */
import type { SectionDocument } from "@/lib/stability";

const EARTH_TONES = ["#e6d7b4", "#cfd8c2", "#dcc4b2", "#cbd3da", "#e2d2c4", "#d8d0b8", "#c9c2b3", "#e8dcc9"] as const;

/** Fill per material id. */
export function materialFills(doc: SectionDocument, given?: Record<string, string>): Record<string, string> {
  const out: Record<string, string> = {};
  doc.materials.forEach((m, i) => {
    out[m.id] =
      given?.[m.id] ?? m.color ?? (m.model === "impenetrable" ? "#bdb7ab" : EARTH_TONES[i % EARTH_TONES.length]);
  });
  return out;
}
