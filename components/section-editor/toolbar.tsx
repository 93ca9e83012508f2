"use client";

import { TOOLS } from "./tools";
import type { ToolName } from "./types";

export const GRID_STEPS = [0, 0.1, 0.25, 0.5, 1, 2, 5] as const;
export const EXAGGERATIONS = [1, 2, 5] as const;

interface ToolbarProps {
  tool: ToolName;
  onTool(t: ToolName): void;
  readOnly: boolean;
  canUndo: boolean;
  canRedo: boolean;
  onUndo(): void;
  onRedo(): void;
  onZoomIn(): void;
  onZoomOut(): void;
  onFit(): void;
  gridStep: number;
  onGridStep(step: number): void;
  exaggeration: number;
  onExaggeration(ex: number): void;
}

const ICON_BTN = "btn-quiet px-2.5 py-1 text-xs";

/** Tools, undo/redo, zoom and view settings above the drawing. */
export function Toolbar(p: ToolbarProps) {
  return (
    <div className="flex flex-wrap items-center gap-x-4 gap-y-2" role="toolbar" aria-label="Section drawing tools">
      <div className="flex flex-wrap gap-1" role="group" aria-label="Tools">
        {TOOLS.map((t) => {
          const disabled = p.readOnly && t.name !== "select" && t.name !== "pan";
          const active = p.tool === t.name;
          return (
            <button
              key={t.name}
              type="button"
              data-testid={`tool-${t.name}`}
              aria-label={`${t.label} (${t.key.toUpperCase()})`}
              title={`${t.label} — key ${t.key.toUpperCase()}`}
              aria-pressed={active}
              disabled={disabled}
              onClick={() => p.onTool(t.name)}
              className={active ? "btn-primary px-2.5 py-1 text-xs" : ICON_BTN}
            >
              {t.label}
              <kbd
                className={`rounded px-1 font-mono text-[10px] ${active ? "bg-clay-700" : "bg-paper-sunk text-ink-faint"}`}
              >
                {t.key.toUpperCase()}
              </kbd>
            </button>
          );
        })}
      </div>
      <div className="flex gap-1" role="group" aria-label="History">
        <button
          type="button"
          data-testid="undo"
          aria-label="Undo (Ctrl+Z)"
          title="Undo — Ctrl+Z"
          disabled={!p.canUndo || p.readOnly}
          onClick={p.onUndo}
          className={ICON_BTN}
        >
          ↶ Undo
        </button>
        <button
          type="button"
          data-testid="redo"
          aria-label="Redo (Ctrl+Shift+Z)"
          title="Redo — Ctrl+Shift+Z or Ctrl+Y"
          disabled={!p.canRedo || p.readOnly}
          onClick={p.onRedo}
          className={ICON_BTN}
        >
          ↷ Redo
        </button>
      </div>
      <div className="flex gap-1" role="group" aria-label="Zoom">
        <button
          type="button"
          data-testid="zoom-in"
          aria-label="Zoom in (+)"
          title="Zoom in — +"
          onClick={p.onZoomIn}
          className={ICON_BTN}
        >
          +
        </button>
        <button
          type="button"
          data-testid="zoom-out"
          aria-label="Zoom out (−)"
          title="Zoom out — −"
          onClick={p.onZoomOut}
          className={ICON_BTN}
        >
          −
        </button>
        <button
          type="button"
          data-testid="zoom-fit"
          aria-label="Fit the section in view (F)"
          title="Fit — F"
          onClick={p.onFit}
          className={ICON_BTN}
        >
          Fit
        </button>
      </div>
      <label className="flex items-center gap-1.5 text-xs text-ink-soft">
        Snap to grid
        <select
          data-testid="grid-step"
          aria-label="Grid snap step"
          className="field w-auto py-0.5 text-xs"
          value={p.gridStep}
          onChange={(e) => p.onGridStep(Number(e.target.value))}
        >
          {GRID_STEPS.map((s) => (
            <option key={s} value={s}>
              {s === 0 ? "off" : `${s} m`}
            </option>
          ))}
        </select>
      </label>
      <label className="flex items-center gap-1.5 text-xs text-ink-soft">
        Vertical exaggeration
        <select
          data-testid="exaggeration"
          aria-label="Vertical exaggeration (view only)"
          className="field w-auto py-0.5 text-xs"
          value={p.exaggeration}
          onChange={(e) => p.onExaggeration(Number(e.target.value))}
        >
          {EXAGGERATIONS.map((x) => (
            <option key={x} value={x}>
              {x}×
            </option>
          ))}
        </select>
      </label>
    </div>
  );
}
