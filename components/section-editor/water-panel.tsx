"use client";

import { useState } from "react";
import type { SectionDocument } from "@/lib/stability";
import { reservoirLevel, type Side } from "@/lib/editor/reservoir-level";

interface WaterPanelProps {
  doc: SectionDocument;
  readOnly: boolean;
  onApply(side: Side, y: number): void;
}

/**
 * Reservoir levels typed as numbers. The document has no separate pool: a level rewrites
 * the phreatic line on that side, and the water above the ground is the reservoir.
 */
export function WaterPanel({ doc, readOnly, onApply }: WaterPanelProps) {
  const [side, setSide] = useState<Side>("left");
  const [text, setText] = useState("");
  const current = reservoirLevel(doc, side);
  const y = Number(text);
  const valid = text.trim() !== "" && Number.isFinite(y);
  return (
    <section className="panel p-3" data-testid="water-panel" aria-label="Reservoir level">
      <h3 className="label">Reservoir level</h3>
      <p className="mb-2 text-xs text-ink-soft">
        Water above the ground surface is reservoir water. A level here reshapes the phreatic line on that side, from
        the edge of the section to where the water meets the slope.
      </p>
      <form
        className="flex items-end gap-1.5"
        onSubmit={(e) => {
          e.preventDefault();
          if (valid) onApply(side, y);
        }}
      >
        <div>
          <label className="label" htmlFor="reservoir-side">
            Side
          </label>
          <select
            id="reservoir-side"
            data-testid="reservoir-side"
            className="field py-1 text-xs"
            value={side}
            onChange={(e) => setSide(e.target.value as Side)}
            disabled={readOnly}
          >
            <option value="left">left</option>
            <option value="right">right</option>
          </select>
        </div>
        <div className="min-w-0 flex-1">
          <label className="label" htmlFor="reservoir-elevation">
            Elevation (m)
          </label>
          <input
            id="reservoir-elevation"
            data-testid="reservoir-elevation"
            type="number"
            step="any"
            className="field py-1 text-xs"
            placeholder={current !== null ? current.toFixed(2) : "e.g. 14.5"}
            value={text}
            onChange={(e) => setText(e.target.value)}
            disabled={readOnly}
          />
        </div>
        <button
          type="submit"
          className="btn-quiet px-2 py-1 text-xs"
          data-testid="reservoir-apply"
          disabled={readOnly || !valid}
        >
          Set
        </button>
      </form>
      <p className="mt-1.5 text-[11px] text-ink-faint">
        Now on the {side}: {current !== null ? `${current.toFixed(2)} m` : "no reservoir"}.
      </p>
    </section>
  );
}
