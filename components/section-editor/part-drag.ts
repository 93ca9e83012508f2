/**
 * Dragging a whole part of the section with the select tool: a region (pressed inside it, away
 * from its corners) or a surcharge (pressed on its band above the ground). Like a vertex drag,
 * the moved document is shown as a preview while the pointer moves, so live check follows it,
 * and is committed as one edit on release.
 */
import type { Point, SectionDocument } from "@/lib/stability";
import { groundSurface } from "@/lib/editor/ground-surface";
import { hitSurcharge, moveRegion, moveSurcharge } from "@/lib/editor/move-parts";
import { screenToWorld, type ViewTransform } from "@/lib/editor/view-transform";

/** A press on a region or a surcharge that may become a drag. */
export interface PartDrag {
  kind: "part";
  part: { region: number } | { surcharge: number };
  /** Where the press was, in metres and in pixels. */
  from: Point;
  startX: number;
  startY: number;
  moved: boolean;
  detach: boolean;
  result: SectionDocument | null;
}

/** Pixels the pointer must travel before a press on a part becomes a drag. */
const DRAG_THRESHOLD_PX = 3;

/** The surcharge under a press, as a drag to start (null when the press is not on one). */
export function pressSurcharge(
  doc: SectionDocument,
  view: ViewTransform,
  sx: number,
  sy: number,
): { index: number; drag: PartDrag } | null {
  if (!doc.loads?.surcharges?.length) return null;
  const index = hitSurcharge(doc, groundSurface(doc.regions), view, sx, sy);
  if (index < 0) return null;
  return { index, drag: partDrag({ surcharge: index }, view, sx, sy, false) };
}

/** A drag of region `region` pressed at (sx, sy); Alt moves it without its neighbours' shared corners. */
export function pressRegion(region: number, view: ViewTransform, sx: number, sy: number, alt: boolean): PartDrag {
  return partDrag({ region }, view, sx, sy, alt);
}

function partDrag(part: PartDrag["part"], view: ViewTransform, sx: number, sy: number, detach: boolean): PartDrag {
  return {
    kind: "part",
    part,
    from: screenToWorld(view, sx, sy),
    startX: sx,
    startY: sy,
    moved: false,
    detach,
    result: null,
  };
}

/** A move on the grid's step (m) when there is one, so parts land on round coordinates. */
function onGrid(d: number, step: number): number {
  return step > 0 ? Math.round(d / step) * step : d;
}

/**
 * The drag after the pointer moved to (sx, sy) over base document `doc`: unchanged (same object)
 * until the pointer has travelled past the threshold, then with the moved document as `result`.
 */
export function dragPart(
  g: PartDrag,
  doc: SectionDocument,
  view: ViewTransform,
  sx: number,
  sy: number,
  gridStep: number,
  alt: boolean,
): PartDrag {
  if (!g.moved && Math.hypot(sx - g.startX, sy - g.startY) < DRAG_THRESHOLD_PX) return g;
  const w = screenToWorld(view, sx, sy);
  const dx = onGrid(w[0] - g.from[0], gridStep);
  const dy = onGrid(w[1] - g.from[1], gridStep);
  const result =
    "region" in g.part
      ? moveRegion(doc, g.part.region, dx, dy, g.detach || alt)
      : moveSurcharge(doc, g.part.surcharge, dx);
  return { ...g, moved: true, result };
}

/** The status line after a part drag is committed. */
export function partMessage(g: PartDrag): string {
  if ("region" in g.part) return `Region ${g.part.region + 1} moved.`;
  const s = g.result?.loads?.surcharges?.[g.part.surcharge];
  return s
    ? `Surcharge ${g.part.surcharge + 1} moved to x = ${Math.min(s.x1, s.x2).toFixed(2)}–${Math.max(s.x1, s.x2).toFixed(2)} m.`
    : "Surcharge moved.";
}
