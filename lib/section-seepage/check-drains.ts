import type { SectionDocument } from "@/lib/stability";
import { distanceToSegment, pointInPolygon } from "@/lib/editor/hit-testing";
import type { SeepageSettingsInput } from "./types";

const ON_EDGE = 1e-6;

function inOrOn(p: [number, number], poly: readonly [number, number][]): boolean {
  if (pointInPolygon(p, poly)) return true;
  return poly.some((a, i) => distanceToSegment(p, a, poly[(i + 1) % poly.length]).distance < ON_EDGE);
}

/**
 * Drain points must lie in pervious material of the section (or on its outline), the rule the
 * solver applies (docs/seepage.md §2), checked when the settings are saved so a drain that cannot
 * be solved is never stored. Field errors are keyed `settings.drains[i][j]`.
 */
export function checkDrains(section: SectionDocument, settings: SeepageSettingsInput): Record<string, string[]> {
  const impenetrable = new Set(section.materials.filter((m) => m.model === "impenetrable").map((m) => m.id));
  const pervious = section.regions.filter((r) => !impenetrable.has(r.material)).map((r) => r.points);
  const fields: Record<string, string[]> = {};
  settings.drains.forEach((line, i) =>
    line.forEach((p, j) => {
      if (pervious.some((poly) => inOrOn(p, poly))) return;
      const where = section.regions.some((r) => inOrOn(p, r.points))
        ? "lies in impenetrable material"
        : "lies outside the section";
      fields[`settings.drains[${i}][${j}]`] = [
        `Drain ${i + 1}, point ${j + 1} (${p[0]}, ${p[1]}) ${where}: drains must run through pervious material.`,
      ];
    }),
  );
  return fields;
}
