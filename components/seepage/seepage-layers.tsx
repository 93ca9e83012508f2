import type { Pool } from "@/lib/seepage";
import { toScreen, type RunView } from "@/lib/runs/view/view-fit";
import type { MeshField } from "./seepage.worker";
import { svgPath } from "./flow-net-view";

export type FieldColour = "none" | "head" | "pressure";

const POOL = "#5b8fc7";
const DRAIN = "#2f7d4f";

/** A pale-to-deep blue ramp; suction (negative pressure) is left grey. */
function ramp(t: number): string {
  const u = Math.min(1, Math.max(0, t));
  const r = Math.round(235 - u * 190);
  const g = Math.round(242 - u * 140);
  const b = Math.round(250 - u * 60);
  return `rgb(${r},${g},${b})`;
}

/** The value colouring an element: the mean of its corners' head or pressure (kPa). */
function cornerValues(mesh: MeshField, colour: Exclude<FieldColour, "none">): (number | null)[] {
  return mesh.head.map((h, i) => (h === null ? null : colour === "head" ? h : mesh.gammaW * (h - mesh.y[i])));
}

export interface FieldRange {
  min: number;
  max: number;
  unit: string;
}

/** The range the colour ramp spans, for the legend. */
export function fieldRange(mesh: MeshField, colour: Exclude<FieldColour, "none">): FieldRange {
  const v = cornerValues(mesh, colour).filter((x): x is number => x !== null);
  const min = colour === "pressure" ? 0 : Math.min(...v);
  return { min, max: Math.max(...v), unit: colour === "head" ? "m" : "kPa" };
}

/** Elements filled by head or pore pressure; with `showMesh`, their edges drawn. */
export function MeshLayer({
  view,
  mesh,
  colour,
  showMesh,
}: {
  view: RunView;
  mesh: MeshField;
  colour: FieldColour;
  showMesh: boolean;
}) {
  if (colour === "none" && !showMesh) return null;
  const values = colour === "none" ? null : cornerValues(mesh, colour);
  const range = colour === "none" ? null : fieldRange(mesh, colour);
  const span = range ? Math.max(1e-9, range.max - range.min) : 1;
  const tris: { d: string; fill: string }[] = [];
  for (let e = 0; e < mesh.tri.length / 3; e++) {
    const corners = [mesh.tri[3 * e], mesh.tri[3 * e + 1], mesh.tri[3 * e + 2]];
    if (corners.some((c) => mesh.head[c] === null)) continue;
    let fill = "none";
    if (values && range) {
      const mean = corners.reduce((s, c) => s + (values[c] as number), 0) / 3;
      fill = colour === "pressure" && mean < 0 ? "#d6d3cd" : ramp((mean - range.min) / span);
    }
    tris.push({
      d: `${svgPath(
        view,
        corners.map((c) => [mesh.x[c], mesh.y[c]] as [number, number]),
      )} Z`,
      fill,
    });
  }
  return (
    <g
      data-layer={showMesh ? "mesh" : "field"}
      data-colour={colour}
      stroke={showMesh ? "#6b665e" : "none"}
      strokeWidth={showMesh ? 0.3 : 0}
    >
      {tris.map((t, i) => (
        <path key={i} d={t.d} fill={t.fill} fillOpacity={colour === "none" ? 0 : 0.85} />
      ))}
    </g>
  );
}

/** Free water against the faces (a level line with the usual inverted-triangle mark) and the drains. */
export function WaterLayer({
  view,
  pools,
  drains,
  drawing,
  extent,
  onPoolDrag,
}: {
  view: RunView;
  pools: Pool[];
  /** Dragging a pool's mark up or down sets its level (m); absent, the marks stay put. */
  onPoolDrag?: (side: Pool["side"], level: number) => void;
  drains: [number, number][][];
  /** A drain being drawn, not yet added. */
  drawing: [number, number][] | null;
  /** The section's x range, so a pool line spans from its edge to where it meets the ground. */
  extent: { minX: number; maxX: number; groundAt: (x: number) => number };
}) {
  return (
    <g data-layer="water">
      {pools.map((p, i) => {
        // The pool reaches from its edge until the ground rises above the level.
        const step = (extent.maxX - extent.minX) / 400;
        let x = p.side === "left" ? extent.minX : extent.maxX;
        const dir = p.side === "left" ? 1 : -1;
        while (x > extent.minX - 1e-9 && x < extent.maxX + 1e-9 && extent.groundAt(x) <= p.level) x += dir * step;
        const [ax, ay] = toScreen(view, p.side === "left" ? extent.minX : extent.maxX, p.level);
        const [bx] = toScreen(view, x, p.level);
        const mid = (ax + bx) / 2;
        return (
          <g key={i} data-pool={p.side}>
            <line x1={ax} y1={ay} x2={bx} y2={ay} stroke={POOL} strokeWidth={2} />
            <path
              d={`M${mid - 6},${ay - 10} h12 l-6,9 Z`}
              fill={POOL}
              data-pool-handle={p.side}
              className={onPoolDrag ? "cursor-ns-resize" : undefined}
              onPointerDown={onPoolDrag ? (e) => e.currentTarget.setPointerCapture(e.pointerId) : undefined}
              onPointerMove={
                onPoolDrag
                  ? (e) => {
                      if (!e.currentTarget.hasPointerCapture(e.pointerId)) return;
                      const ctm = e.currentTarget.ownerSVGElement?.getScreenCTM();
                      if (!ctm) return;
                      const q = new DOMPoint(e.clientX, e.clientY).matrixTransform(ctm.inverse());
                      // The mark's tip sits 1 px above the level line; levels go to the centimetre.
                      const level = (view.offsetY - (q.y + 1)) / view.scale;
                      onPoolDrag(p.side, Math.round(level * 100) / 100);
                    }
                  : undefined
              }
              onPointerUp={onPoolDrag ? (e) => e.currentTarget.releasePointerCapture(e.pointerId) : undefined}
            />
            <text x={mid + 9} y={ay - 3} fontSize={11} fill="#1f1d1a">
              {p.level.toFixed(2)} m
            </text>
          </g>
        );
      })}
      {drains.map((d, i) => (
        <path
          key={i}
          data-drain={i}
          d={svgPath(view, d)}
          stroke={DRAIN}
          strokeWidth={4}
          strokeLinecap="round"
          fill="none"
        />
      ))}
      {drawing && drawing.length > 0 ? (
        <g data-layer="drain-drawing">
          <path d={svgPath(view, drawing)} stroke={DRAIN} strokeWidth={2} strokeDasharray="4 3" fill="none" />
          {drawing.map(([x, y], i) => {
            const [sx, sy] = toScreen(view, x, y);
            return <circle key={i} cx={sx} cy={sy} r={3.5} fill={DRAIN} />;
          })}
        </g>
      ) : null}
    </g>
  );
}
