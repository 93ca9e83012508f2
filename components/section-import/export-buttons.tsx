"use client";

import { geometryToCsv, materialsToCsv, phreaticToCsv } from "@/lib/section-io";
import type { SectionDocument } from "@/lib/stability";
import { downloadText, slug } from "@/lib/client/download";

/** Downloads the section as the engine's JSON document or as the three CSV files. */
export function ExportButtons({ name, document: doc }: { name: string; document: SectionDocument }) {
  const base = slug(name);
  const names = Object.fromEntries(doc.materials.filter((m) => m.name).map((m) => [m.id, m.name!]));
  return (
    <div className="flex flex-wrap gap-2 text-sm" aria-label="Export">
      <button
        type="button"
        className="btn-quiet"
        onClick={() => downloadText(`${base}.json`, JSON.stringify(doc, null, 2) + "\n", "application/json")}
      >
        Section JSON
      </button>
      <button
        type="button"
        className="btn-quiet"
        onClick={() => downloadText(`${base}-geometry.csv`, geometryToCsv(doc.regions), "text/csv")}
      >
        Geometry CSV
      </button>
      <button
        type="button"
        className="btn-quiet"
        disabled={!doc.water?.phreatic}
        onClick={() => downloadText(`${base}-phreatic.csv`, phreaticToCsv(doc.water!.phreatic!), "text/csv")}
      >
        Phreatic CSV
      </button>
      <button
        type="button"
        className="btn-quiet"
        onClick={() => downloadText(`${base}-materials.csv`, materialsToCsv(doc.materials, names), "text/csv")}
      >
        Materials CSV
      </button>
    </div>
  );
}
