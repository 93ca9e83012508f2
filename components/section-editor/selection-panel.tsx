"use client";

import type { SectionDocument } from "@/lib/stability";
import type { Selection } from "@/lib/editor/refs";
import type { MaterialSwatch, ToolName } from "./types";
import { countOf } from "@/lib/format";

interface SelectionPanelProps {
  doc: SectionDocument;
  materials: MaterialSwatch[];
  selection: Selection | null;
  tool: ToolName;
  readOnly: boolean;
  newRegionMaterial: string;
  onNewRegionMaterial(key: string): void;
  onSetMaterial(region: number, key: string): void;
  onDeleteSelection(): void;
  onInsertAfterSelection(): void;
}

function MaterialSelect(props: {
  id: string;
  value: string;
  materials: MaterialSwatch[];
  disabled: boolean;
  onChange(key: string): void;
}) {
  const known = props.materials.some((m) => m.key === props.value);
  return (
    <select
      id={props.id}
      data-testid={props.id}
      className="field text-xs"
      value={props.value}
      disabled={props.disabled}
      onChange={(e) => props.onChange(e.target.value)}
    >
      {!known && (
        <option value={props.value}>{props.value ? `Not in the library: ${props.value}` : "Choose a material"}</option>
      )}
      {props.materials.map((m) => (
        <option key={m.key} value={m.key}>
          {m.name}
        </option>
      ))}
    </select>
  );
}

/** What is selected, its material, and the actions on it. */
export function SelectionPanel(p: SelectionPanelProps) {
  const sel = p.selection;
  const region = sel?.kind === "region" ? p.doc.regions[sel.region] : undefined;
  const swatch = region && p.materials.find((m) => m.key === region.material);
  return (
    <section className="panel p-3" data-testid="selection-panel" aria-label="Selection">
      {p.tool === "region" && !p.readOnly && (
        <div className="mb-3">
          <label className="label" htmlFor="new-region-material">
            New regions are made of
          </label>
          <MaterialSelect
            id="new-region-material"
            value={p.newRegionMaterial}
            materials={p.materials}
            disabled={false}
            onChange={p.onNewRegionMaterial}
          />
        </div>
      )}
      {sel?.kind === "region" && region ? (
        <>
          <div className="mb-2 flex items-center gap-2">
            <span
              aria-hidden
              className="inline-block h-3.5 w-3.5 rounded-sm border border-ink/40"
              style={{ background: swatch?.color ?? "#bdb6aa" }}
            />
            <h3 className="text-sm font-semibold">Region {sel.region + 1}</h3>
            <span className="text-xs text-ink-faint">{countOf(region.points.length, "vertex", "vertices")}</span>
          </div>
          <label className="label" htmlFor="region-material">
            Material
          </label>
          <MaterialSelect
            id="region-material"
            value={region.material}
            materials={p.materials}
            disabled={p.readOnly}
            onChange={(k) => p.onSetMaterial(sel.region, k)}
          />
        </>
      ) : sel?.kind === "phreatic" && p.doc.water?.phreatic ? (
        <div className="mb-1">
          <h3 className="text-sm font-semibold">Phreatic line</h3>
          <p className="text-xs text-ink-faint">{countOf(p.doc.water.phreatic.length, "point")}, left to right.</p>
        </div>
      ) : (
        <p className="text-xs text-ink-faint">
          Nothing selected. Click a region or the phreatic line, or press Tab in the drawing.
        </p>
      )}
      {sel && !p.readOnly && (
        <div className="mt-3 flex flex-wrap gap-1.5">
          <button
            type="button"
            className="btn-quiet px-2 py-1 text-xs"
            data-testid="insert-vertex"
            disabled={sel.vertex === null}
            onClick={p.onInsertAfterSelection}
            title="Adds a vertex halfway along the edge after the selected vertex — key I"
          >
            Add vertex after
          </button>
          <button
            type="button"
            className="btn-danger px-2 py-1 text-xs"
            data-testid="delete-selection"
            onClick={p.onDeleteSelection}
            title="Delete — Delete key"
          >
            {sel.vertex !== null ? "Delete vertex" : sel.kind === "region" ? "Delete region" : "Remove line"}
          </button>
        </div>
      )}
    </section>
  );
}
