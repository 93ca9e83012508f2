/**
 * Everything the run canvas draws, worked out in metres before any drawing: regions and
 * water, the centre grid (as dots or as the FS map), the tangent band, the critical circles,
 * the lowest circles and the slices. Keeping this pure lets it be tested without a canvas
 * and keeps the konva components to placing shapes.
 */
import type { Grid, GridSearchSuccess, Radii, SectionDocument, SliceRow } from "@/lib/stability";
import { arcPoints, sliceSides, type SliceSide } from "./circle-arc";
import { methodCircles, overlayCircles, type DrawnCircle } from "./circle-styles";
import { fsMapCells, fsRange, type FsCell, type FsRange } from "./fs-map-cells";
import { bandLines, normaliseGrid, type BandLine } from "./grid-edit";
import { materialFills } from "./material-tints";
import { groundAt, groundLine, pondedWater, poolLevelSpans, sectionBox } from "./section-outline";
import { elevationAt } from "@/lib/plane-geometry";
import { poolSide, waterAfterDrawdown } from "./drawdown-water";
import { unionBoxes, type Box } from "./view-fit";

export type RunMethod = "bishop" | "fellenius";

/** A run laid over others for comparison. */
export interface CircleOverlay {
  label: string;
  color: string;
  circle: { xc: number; yc: number; r: number };
  entry: [number, number];
  exit: [number, number];
}

export interface RunSceneInput {
  document: SectionDocument;
  materialsColors?: Record<string, string>;
  grid?: Grid;
  radii?: Radii;
  result?: GridSearchSuccess;
  method?: RunMethod;
  slices?: readonly SliceRow[];
  overlays?: readonly CircleOverlay[];
  drawdownTo?: number;
  requiredFs?: number;
}

export interface RunScene {
  regions: { material: string; points: number[]; fill: string }[];
  ground: number[];
  /** The pore-water level analysed: after a drawdown, the lowered one (docs/engine-io.md). */
  phreatic: number[] | null;
  /** A drawdown's line before the pool was lowered, drawn faint, with its pool level and where to label it. */
  beforeDrawdown: { points: number[]; level: number | null; labelAt: [number, number] } | null;
  ponds: number[][];
  pool: { level: number; spans: [number, number][] } | null;
  /** The method whose map and lowest circles are shown. */
  method: RunMethod | null;
  cells: FsCell[];
  range: FsRange | null;
  /** Trial centres drawn as dots when there is no map. */
  centres: [number, number][];
  gridBox: Box | null;
  band: BandLine[];
  critical: DrawnCircle[];
  lowest: number[][];
  slices: SliceSide[];
  fitBox: Box;
  /**
   * Changes only when what the view should be fitted to changes (section, map, circles,
   * whether there is a grid), not while a grid is being dragged, so the view holds still.
   */
  fitKey: string;
}

/** Trial centres of a grid (nx × ny, corners included). */
export function gridCentres(g: Grid): [number, number][] {
  const n = normaliseGrid(g);
  const at = (a: number, b: number, k: number, i: number) => (k <= 1 ? a : a + ((b - a) * i) / (k - 1));
  const out: [number, number][] = [];
  for (let iy = 0; iy < n.ny; iy++)
    for (let ix = 0; ix < n.nx; ix++) out.push([at(n.x1, n.x2, n.nx, ix), at(n.y1, n.y2, n.ny, iy)]);
  return out;
}

function pickMethod(result: GridSearchSuccess | undefined, wanted: RunMethod | undefined): RunMethod | null {
  if (!result) return wanted ?? null;
  if (wanted && result.fsMap[wanted]) return wanted;
  return (["bishop", "fellenius"] as const).find((m) => result.fsMap[m]) ?? null;
}

/** Builds the scene for the given canvas props. */
export function buildRunScene(input: RunSceneInput): RunScene {
  const doc = input.document;
  const fills = materialFills(doc, input.materialsColors);
  const groundPts = groundLine(doc);
  const drawdownTo = input.drawdownTo !== undefined && Number.isFinite(input.drawdownTo) ? input.drawdownTo : null;
  const prePts = doc.water?.phreatic ?? null;
  const phreaticPts = prePts && drawdownTo !== null ? waterAfterDrawdown(prePts, groundPts, drawdownTo) : prePts;
  const ponds = phreaticPts ? pondedWater(phreaticPts, groundPts) : [];
  const pondsBefore = prePts ? pondedWater(prePts, groundPts) : [];
  const pool =
    drawdownTo !== null ? { level: drawdownTo, spans: poolLevelSpans(drawdownTo, groundPts, pondsBefore) } : null;
  const beforeDrawdown = prePts && drawdownTo !== null ? drawnBefore(prePts, groundPts) : null;
  const method = pickMethod(input.result, input.method);
  const map = method ? input.result?.fsMap[method] : undefined;
  const range = map ? fsRange(map.values, input.requiredFs) : null;
  const cells = map ? fsMapCells(map, range) : [];
  const grid = input.grid ?? input.document.analysis?.grid;
  const gridBox =
    map && map.xs.length > 0
      ? unionBoxes(cells.map((c) => ({ minX: c.x1, minY: c.y1, maxX: c.x2, maxY: c.y2 })))
      : grid
        ? (() => {
            const n = normaliseGrid(grid);
            return { minX: n.x1, minY: n.y1, maxX: n.x2, maxY: n.y2 };
          })()
        : null;
  const radii = input.radii ?? (input.grid ? input.document.analysis?.radii : undefined);
  const band = radii && grid ? bandLines(radii, grid) : [];
  const critical =
    input.overlays && input.overlays.length > 0 ? overlayCircles(input.overlays) : methodCircles(input.result?.results);
  const lowest =
    method && input.result ? (input.result.lowest[method] ?? []).map((c) => arcPoints(c.circle, c.entry, c.exit)) : [];
  const sliceCircle = critical.find((c) => c.method === method) ?? critical[0];
  const slices =
    sliceCircle && input.slices ? sliceSides(sliceCircle.circle, input.slices, (x) => groundAt(groundPts, x)) : [];
  const section = sectionBox(doc);
  const bandBox =
    section && band.length > 0
      ? {
          minX: section.minX,
          maxX: section.maxX,
          minY: Math.min(...band.map((b) => b.y)),
          maxY: Math.max(...band.map((b) => b.y)),
        }
      : null;
  const centreBoxes = critical.map((c) => ({
    minX: c.circle.xc,
    maxX: c.circle.xc,
    minY: c.circle.yc,
    maxY: c.circle.yc,
  }));
  const fitBox = unionBoxes([section, gridBox, bandBox, ...centreBoxes]) ?? { minX: 0, minY: 0, maxX: 10, maxY: 10 };
  return {
    regions: doc.regions.map((r) => ({
      material: r.material,
      points: r.points.flat(),
      fill: fills[r.material] ?? "#ddd6c8",
    })),
    ground: groundPts.flat(),
    phreatic: phreaticPts ? phreaticPts.flat() : null,
    beforeDrawdown,
    ponds,
    pool,
    method,
    cells,
    range,
    centres: !map && grid ? gridCentres(grid) : [],
    gridBox,
    band,
    critical,
    lowest,
    slices,
    fitBox,
    fitKey: JSON.stringify([
      section,
      map ? gridBox : null,
      critical.map((c) => [c.circle.xc, c.circle.yc, c.circle.r]),
      grid !== undefined,
    ]),
  };
}

/** The pre-drawdown line and, where it ponds, its pool level labelled at the reservoir-side edge. */
function drawnBefore(pre: [number, number][], ground: [number, number][]): RunScene["beforeDrawdown"] {
  const side = poolSide(pre, ground);
  const edge = side === "right" ? ground[ground.length - 1]?.[0] : ground[0]?.[0];
  const x = edge ?? pre[0][0];
  const level = side ? elevationAt(pre, x) : null;
  return { points: pre.flat(), level, labelAt: [x, level ?? elevationAt(pre, x)] };
}
