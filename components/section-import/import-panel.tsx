"use client";

import { useCallback, useState } from "react";
import { useDropzone } from "react-dropzone";
import type { SectionDocument } from "@/lib/stability";
import { parseDroppedFile, type ParsedDrop } from "./parse-drop";
import { DropPreview } from "./drop-preview";

const MAX_BYTES = 2 * 1024 * 1024;

export interface ImportPanelProps {
  knownMaterialIds: string[];
  /** Receives the changes of every clean file, applied in order. Nothing is saved here. */
  onApply: (apply: (doc: SectionDocument) => SectionDocument, description: string) => void;
}

/** Drop geometry, phreatic-line and materials CSVs (or a section JSON) to preview before applying. */
export function ImportPanel({ knownMaterialIds, onApply }: ImportPanelProps) {
  const [drops, setDrops] = useState<ParsedDrop[]>([]);

  const onDrop = useCallback(
    async (files: File[]) => {
      const parsed: ParsedDrop[] = [];
      // Materials first, so a geometry file dropped with them may name them.
      const ordered = [...files].sort((a, b) => Number(/mater/i.test(b.name)) - Number(/mater/i.test(a.name)));
      const ids = new Set(knownMaterialIds);
      let materialsUnread = false;
      for (const file of ordered) {
        if (file.size > MAX_BYTES) {
          parsed.push({
            fileName: file.name,
            kind: "unknown",
            problems: [
              { row: 0, column: null, message: `The file is ${(file.size / 1e6).toFixed(1)} MB; the limit is 2 MB.` },
            ],
            warnings: [],
            preview: [],
            columns: [],
            summary: "Too large",
          });
          continue;
        }
        const p = parseDroppedFile(file.name, await file.text(), materialsUnread ? null : [...ids]);
        if (p.kind === "materials" && p.apply)
          for (const m of p.apply({ version: 1, materials: [], regions: [] } as unknown as SectionDocument).materials)
            ids.add(m.id);
        // A rejected materials file still names its materials: the geometry is checked against those
        // ids, so its own report is not buried under "unknown material" for every region.
        else if (p.kind === "materials") {
          for (const row of p.preview) if (row.cells.id) ids.add(row.cells.id.trim());
          // Not even the ids could be read: the geometry's materials are checked once that file is fixed.
          if (p.preview.length === 0) materialsUnread = true;
        }
        parsed.push(p);
      }
      setDrops(parsed);
    },
    [knownMaterialIds],
  );

  const { getRootProps, getInputProps, isDragActive } = useDropzone({
    onDrop,
    accept: { "text/csv": [".csv"], "text/plain": [".csv", ".txt"], "application/json": [".json"] },
    multiple: true,
  });

  const clean = drops.length > 0 && drops.every((d) => d.apply);

  function applyAll() {
    const applies = drops.map((d) => d.apply!);
    onApply((doc) => applies.reduce((acc, f) => f(acc), doc), `Imported ${drops.map((d) => d.fileName).join(", ")}`);
    setDrops([]);
  }

  return (
    <section className="panel space-y-3 p-3" data-testid="import-panel" aria-label="Import files">
      <div
        {...getRootProps()}
        className={`cursor-pointer rounded-md border-2 border-dashed px-4 py-5 text-center text-sm ${isDragActive ? "border-clay-500 bg-clay-50" : "border-rule text-ink-soft"}`}
      >
        <input {...getInputProps()} data-testid="import-input" />
        Drop the geometry, phreatic-line and materials CSV files here (or a section JSON), or click to choose them.
      </div>
      <p className="text-xs text-ink-faint">
        Templates:{" "}
        {(["geometry", "phreatic", "materials"] as const).map((k, i) => (
          <span key={k}>
            {i > 0 ? " · " : ""}
            <a className="text-clay-600 hover:underline" href={`/api/templates/${k}`} download>
              {k}.csv
            </a>
          </span>
        ))}
      </p>
      {drops.map((d) => (
        <DropPreview key={d.fileName} drop={d} />
      ))}
      {drops.length > 0 ? (
        <div className="flex items-center gap-2">
          <button type="button" className="btn-primary" disabled={!clean} onClick={applyAll} data-testid="import-apply">
            Apply to the drawing
          </button>
          <button type="button" className="btn-quiet" onClick={() => setDrops([])}>
            Discard
          </button>
          {!clean ? (
            <span className="text-xs text-alarm-700">
              Fix the problems listed and drop the files again; nothing has been changed.
            </span>
          ) : (
            <span className="text-xs text-ink-faint">
              Applying changes the drawing only; save a version to keep it.
            </span>
          )}
        </div>
      ) : null}
    </section>
  );
}
