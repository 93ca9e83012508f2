/**
 * Triangular mesh of the section's regions: the planar graph of pslg.ts triangulated by
 * Delaunator and made to honour every region edge and drain with Constrainautor (a constrained
 * Delaunay triangulation). Each triangle takes the region its centroid lies in; triangles in no
 * region (the convex hull's fill) are dropped.
 */
import Constrainautor from "@kninnug/constrainautor";
import Delaunator from "delaunator";
import { bounds, insidePolygon, signedArea } from "./geometry";
import { fmt, issue } from "./issues";
import { buildPslg, type Pslg } from "./pslg";
import type { Point, SeepageIssue, TriMesh } from "./types";

export interface MeshRequest {
  polygons: Point[][];
  filled: boolean[];
  drains: Point[][];
  levels: number[];
  h: number;
}

export type MeshOutcome = { ok: true; mesh: TriMesh } | { ok: false; errors: SeepageIssue[] };

/** Nodes a request would make, estimated from the filled area and the outline length. */
export function estimateNodes(req: Pick<MeshRequest, "polygons" | "filled" | "h">): number {
  let area = 0;
  let perimeter = 0;
  req.polygons.forEach((poly, r) => {
    if (req.filled[r]) area += Math.abs(signedArea(poly));
    for (let i = 0; i < poly.length; i++) {
      const a = poly[i];
      const b = poly[(i + 1) % poly.length];
      perimeter += Math.hypot(b[0] - a[0], b[1] - a[1]);
    }
  });
  return Math.ceil(area / ((req.h * req.h * Math.sqrt(3)) / 2) + perimeter / req.h);
}

export function buildMesh(req: MeshRequest): MeshOutcome {
  const box = bounds(req.polygons);
  const scale = Math.max(box.x1 - box.x0, box.y1 - box.y0, 1e-9);
  const g = buildPslg(req, scale);
  // Four far corners make the convex hull, so no point of the section lies on it: long straight
  // runs of collinear hull points can stall the constraining (its input must have a convex hull).
  const pad = 2 * scale;
  g.px.push(box.x0 - pad, box.x1 + pad, box.x1 + pad, box.x0 - pad);
  g.py.push(box.y0 - pad, box.y0 - pad, box.y1 + pad, box.y1 + pad);
  const coords = new Float64Array(g.px.length * 2);
  for (let i = 0; i < g.px.length; i++) {
    coords[2 * i] = g.px[i];
    coords[2 * i + 1] = g.py[i];
  }
  const del = new Delaunator(coords);
  try {
    new Constrainautor(del, g.edges);
  } catch (e) {
    return {
      ok: false,
      errors: [
        issue(
          "regions-cross",
          "regions",
          `The region outlines cross each other or themselves, so they cannot be meshed (${(e as Error).message}).`,
        ),
      ],
    };
  }
  return { ok: true, mesh: keepRegionTriangles(del, g, req.polygons) };
}

/**
 * Keeps the triangles inside a region, counter-clockwise, and renumbers the nodes they use.
 * Triangles joined across unconstrained edges lie in one region, so one centroid test per such
 * patch places them all (a survey outline of thousands of points stays quick).
 */
function keepRegionTriangles(del: Delaunator<ArrayLike<number>>, g: Pslg, polygons: Point[][]): TriMesh {
  const { triangles, halfedges } = del;
  const { px, py } = g;
  const np = px.length;
  const constrained = new Set<number>();
  for (const [a, b] of g.edges) constrained.add(Math.min(a, b) * np + Math.max(a, b));
  const nt = triangles.length / 3;
  const signed = new Float64Array(nt);
  const flat = new Uint8Array(nt);
  for (let t = 0; t < nt; t++) {
    const [a, b, c] = [triangles[3 * t], triangles[3 * t + 1], triangles[3 * t + 2]];
    signed[t] = (px[b] - px[a]) * (py[c] - py[a]) - (px[c] - px[a]) * (py[b] - py[a]);
    // Three nearly collinear points (a flat triangle along a straight outline) carry no area: drop them.
    const longest = Math.max(
      (px[b] - px[a]) ** 2 + (py[b] - py[a]) ** 2,
      (px[c] - px[b]) ** 2 + (py[c] - py[b]) ** 2,
      (px[a] - px[c]) ** 2 + (py[a] - py[c]) ** 2,
    );
    flat[t] = Math.abs(signed[t]) <= 1e-9 * longest ? 1 : 0;
  }
  const patch = new Int32Array(nt).fill(-1);
  const regionOfPatch: number[] = [];
  const stack: number[] = [];
  for (let seed = 0; seed < nt; seed++) {
    if (patch[seed] >= 0) continue;
    const id = regionOfPatch.length;
    patch[seed] = id;
    stack.push(seed);
    let best = -1;
    while (stack.length) {
      const t = stack.pop() as number;
      if (!flat[t] && (best < 0 || Math.abs(signed[t]) > Math.abs(signed[best]))) best = t;
      for (let s = 0; s < 3; s++) {
        const h = halfedges[3 * t + s];
        if (h < 0) continue;
        const other = Math.floor(h / 3);
        if (patch[other] >= 0) continue;
        const a = triangles[3 * t + s];
        const b = triangles[3 * t + ((s + 1) % 3)];
        if (constrained.has(Math.min(a, b) * np + Math.max(a, b))) continue;
        patch[other] = id;
        stack.push(other);
      }
    }
    regionOfPatch.push(best < 0 ? -1 : regionAt(best));
  }
  function regionAt(t: number): number {
    const [a, b, c] = [triangles[3 * t], triangles[3 * t + 1], triangles[3 * t + 2]];
    const cx = (px[a] + px[b] + px[c]) / 3;
    const cy = (py[a] + py[b] + py[c]) / 3;
    return polygons.findIndex((poly) => insidePolygon(cx, cy, poly));
  }
  const kept: number[] = [];
  const region: number[] = [];
  for (let t = 0; t < nt; t++) {
    const r = regionOfPatch[patch[t]];
    if (r < 0 || flat[t]) continue;
    const [a, b, c] = [triangles[3 * t], triangles[3 * t + 1], triangles[3 * t + 2]];
    if (signed[t] > 0) kept.push(a, b, c);
    else kept.push(a, c, b);
    region.push(r);
  }
  const index = new Int32Array(np).fill(-1);
  let n = 0;
  for (const v of kept) if (index[v] < 0) index[v] = n++;
  const x = new Float64Array(n);
  const y = new Float64Array(n);
  for (let v = 0; v < np; v++)
    if (index[v] >= 0) {
      x[index[v]] = px[v];
      y[index[v]] = py[v];
    }
  return { x, y, tri: Int32Array.from(kept, (v) => index[v]), region: Int32Array.from(region) };
}

/** Regions whose meshed area falls short of their outline's: they overlap another region or cross themselves. */
export function checkCoverage(mesh: TriMesh, polygons: Point[][]): SeepageIssue[] {
  const meshed = new Float64Array(polygons.length);
  for (let e = 0; e < mesh.region.length; e++) meshed[mesh.region[e]] += triangleArea(mesh, e);
  const out: SeepageIssue[] = [];
  polygons.forEach((poly, r) => {
    const want = Math.abs(signedArea(poly));
    if (Math.abs(meshed[r] - want) > 1e-6 * want + 1e-9) {
      out.push(
        issue(
          "regions-overlap",
          `regions[${r}].points`,
          `Region ${r} (first point ${fmt(poly[0])}) overlaps another region or crosses itself: ` +
            `its outline encloses ${want.toFixed(3)} m² but only ${meshed[r].toFixed(3)} m² is its own.`,
        ),
      );
    }
  });
  return out;
}

export function triangleArea(mesh: TriMesh, e: number): number {
  const a = mesh.tri[3 * e];
  const b = mesh.tri[3 * e + 1];
  const c = mesh.tri[3 * e + 2];
  return ((mesh.x[b] - mesh.x[a]) * (mesh.y[c] - mesh.y[a]) - (mesh.x[c] - mesh.x[a]) * (mesh.y[b] - mesh.y[a])) / 2;
}
