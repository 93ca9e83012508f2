"use client";

import { useState } from "react";
import type { SurfaceCheck } from "@/lib/runs/record/rigorous-part";
import { parseSurfaceText, surfaceText, type Pt } from "@/lib/runs/view/surface-draw";
import { placeText } from "@/lib/runs/view/rigorous-text";

export interface SurfaceFieldProps {
  points: Pt[];
  finished: boolean;
  drawing: boolean;
  onDrawing: (on: boolean) => void;
  /** Typed points replace the drawn ones (their ends are snapped onto the ground by the caller). */
  onTyped: (points: Pt[]) => void;
  onClear: () => void;
  /** The engine's verdict on the surface; null while it is being drawn. */
  check: SurfaceCheck | null;
}

/**
 * A slip surface of the user's own, beside the drawing: draw it with clicks (ends snap to the
 * ground), drag its vertices, or type its points. A refused surface shows the engine's reason and
 * place, never a factor.
 */
export function SurfaceField({ points, finished, drawing, onDrawing, onTyped, onClear, check }: SurfaceFieldProps) {
  const [text, setText] = useState<string | null>(null);
  const [typedError, setTypedError] = useState<string | null>(null);
  const shown = text ?? surfaceText(points);

  function useTyped() {
    const parsed = parseSurfaceText(shown);
    if (!parsed.ok) return setTypedError(parsed.error);
    setTypedError(null);
    setText(null);
    onTyped(parsed.points);
  }

  return (
    <section className="panel space-y-2 p-3 text-sm" aria-label="Slip surface of your own" data-testid="surface-field">
      <div className="flex flex-wrap items-center gap-2">
        <h3 className="mr-auto font-semibold">Slip surface of your own</h3>
        <button
          type="button"
          className={drawing ? "btn-primary" : "btn-quiet"}
          aria-pressed={drawing}
          onClick={() => onDrawing(!drawing)}
        >
          {drawing ? "Done drawing" : "Draw on the section"}
        </button>
        <button
          type="button"
          className="btn-quiet"
          disabled={points.length === 0}
          onClick={() => {
            setText(null);
            setTypedError(null);
            onClear();
          }}
        >
          Clear surface
        </button>
      </div>
      {drawing ? (
        <p className="text-xs text-ink-soft" data-testid="surface-hint">
          {points.length === 0
            ? "Click on the ground where the slip starts."
            : finished
              ? "Drag a point to move it, or click again to start a new surface."
              : "Click inside the soil for each bend; click on or above the ground to end it there."}
        </p>
      ) : null}
      <div className="flex flex-wrap items-end gap-2">
        <div className="min-w-64 flex-1">
          <label className="label" htmlFor="surface-points">
            Points x,y (m), upper end first or last
          </label>
          <input
            id="surface-points"
            className="field font-mono text-xs"
            value={shown}
            placeholder="37,20 48,6.2 72,6.2 80,8"
            onChange={(e) => setText(e.target.value)}
          />
        </div>
        <button type="button" className="btn-quiet" onClick={useTyped}>
          Use these points
        </button>
      </div>
      {typedError ? <p className="field-error">{typedError}</p> : null}
      {!drawing && !finished && points.length > 0 ? (
        <p className="field-error" data-testid="surface-unfinished">
          The surface is not finished: draw again and end it with a click on the ground, or clear it.
        </p>
      ) : null}
      {check && !check.ok ? (
        <p className="field-error" role="alert" data-testid="surface-refused">
          Not a usable slip surface: {check.text}
        </p>
      ) : null}
      {check && check.ok && check.surface.entry && check.surface.exit ? (
        <p className="text-ink-soft" data-testid="surface-accepted">
          Surface accepted: from {placeText(check.surface.entry)} to {placeText(check.surface.exit)},{" "}
          {check.surface.surface.length - 2} bend{check.surface.surface.length === 3 ? "" : "s"}. Its factors appear
          with the search.
        </p>
      ) : null}
    </section>
  );
}
