"use client";

import type { SectionDocument } from "@/lib/stability";
import { ownerOf, ownerPoints, type Selection } from "@/lib/editor/refs";
import type { SnapKind } from "@/lib/editor/snapping";
import { toolInfo } from "./tools";
import type { MaterialSwatch, ToolName } from "./types";
import type { Hover } from "./use-canvas-pointer";
import { countOf } from "@/lib/format";

interface StatusBarProps {
  tool: ToolName;
  hover: Hover | null;
  message: string | null;
  /** What the keyboard has chosen, in words (see describeSelection). */
  chosen: string | null;
}

/** The chosen region, line or vertex in the panel's numbering, for the status line and screen readers. */
export function describeSelection(
  doc: SectionDocument,
  sel: Selection | null,
  materials: readonly MaterialSwatch[],
): string | null {
  if (!sel) return null;
  const pts = ownerPoints(doc, ownerOf(sel)) ?? [];
  let item = "Phreatic line";
  if (sel.kind === "region") {
    const key = doc.regions[sel.region]?.material ?? "";
    item = `Region ${sel.region + 1} (${materials.find((m) => m.key === key)?.name ?? key})`;
  }
  const p = sel.vertex === null ? undefined : pts[sel.vertex];
  if (!p || sel.vertex === null) return `${item}, ${countOf(pts.length, "vertex", "vertices")}`;
  return `${item}, vertex ${sel.vertex + 1} of ${pts.length}: x ${p[0].toFixed(2)} m, elevation ${p[1].toFixed(2)} m`;
}

const SNAP_WORDS: Record<SnapKind, string> = { vertex: "on a vertex", grid: "on the grid", none: "" };

/** Cursor position, the active tool's hint and the last message, below the drawing. */
export function StatusBar({ tool, hover, message, chosen }: StatusBarProps) {
  return (
    <div className="mt-1.5 flex flex-col gap-1 text-xs text-ink-soft">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <span className="font-mono" data-testid="cursor-readout">
          {hover
            ? `x ${hover.snapped[0].toFixed(2)} m · elevation ${hover.snapped[1].toFixed(2)} m ${SNAP_WORDS[hover.snap]}`
            : "Move over the drawing to read coordinates."}
        </span>
        <span id="editor-chosen" data-testid="editor-chosen" aria-live="polite" className="text-ink">
          {chosen ?? ""}
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
