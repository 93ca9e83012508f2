"use client";

import type { SnapKind } from "@/lib/editor/snapping";
import { toolInfo } from "./tools";
import type { ToolName } from "./types";
import type { Hover } from "./use-canvas-pointer";
import { SHORTCUTS } from "./use-editor-keys";

interface StatusBarProps {
  tool: ToolName;
  hover: Hover | null;
  message: string | null;
}

const SNAP_WORDS: Record<SnapKind, string> = { vertex: "on a vertex", grid: "on the grid", none: "" };

/** Cursor position, the active tool's hint and the last message, below the drawing. */
export function StatusBar({ tool, hover, message }: StatusBarProps) {
  return (
    <div className="mt-1.5 flex flex-col gap-1 text-xs text-ink-soft">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <span className="font-mono" data-testid="cursor-readout">
          {hover
            ? `x ${hover.snapped[0].toFixed(2)} m · elevation ${hover.snapped[1].toFixed(2)} m ${SNAP_WORDS[hover.snap]}`
            : "Move over the drawing to read coordinates."}
        </span>
        <span
          role="status"
          aria-live="polite"
          data-testid="editor-message"
          className={message ? "font-medium text-clay-700" : ""}
        >
          {message ?? ""}
        </span>
      </div>
      <p className="text-ink-faint">{toolInfo(tool).hint}</p>
    </div>
  );
}

/** The keyboard shortcuts, folded away until asked for. */
export function ShortcutHelp() {
  return (
    <details className="text-xs text-ink-soft">
      <summary className="cursor-pointer select-none text-ink-faint hover:text-ink">Keyboard shortcuts</summary>
      <dl className="mt-1 grid grid-cols-[auto_1fr] gap-x-3 gap-y-0.5">
        {SHORTCUTS.map(([keys, what]) => (
          <div key={keys} className="contents">
            <dt className="font-mono text-ink">{keys}</dt>
            <dd>{what}</dd>
          </div>
        ))}
      </dl>
    </details>
  );
}
