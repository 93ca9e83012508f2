/**
 * Edits to the section document as pure functions: each returns a new document and
 * leaves its input untouched, so the undo history can keep old documents as they are.
 * Edits that would make a shape impossible are refused with a reason instead.
 */
import type { Point, SectionDocument } from "@/lib/stability";
import { ownerOf, ownerPoints, type Owner, type VertexRef } from "./refs";

export type EditResult = { ok: true; doc: SectionDocument } | { ok: false; reason: string };

/** Fewest points a region outline and the phreatic line can have. */
export const MIN_REGION_POINTS = 3;
export const MIN_PHREATIC_POINTS = 2;

/** Two vertices closer than this (m) count as the same, shared vertex. */
const SAME_POINT_M = 1e-9;

function copyPoint(p: Point): Point {
  return [p[0], p[1]];
}

function withOwnerPoints(doc: SectionDocument, owner: Owner, points: Point[]): SectionDocument {
  if (owner.kind === "region") {
    return { ...doc, regions: doc.regions.map((r, i) => (i === owner.region ? { ...r, points } : r)) };
  }
  return { ...doc, water: { ...doc.water, phreatic: points } };
}

function requirePoints(doc: SectionDocument, owner: Owner): Point[] {
  const pts = ownerPoints(doc, owner);
  if (!pts)
    throw new Error(owner.kind === "region" ? `region ${owner.region} does not exist` : "there is no phreatic line");
  return pts;
}

/** Appends a region of `material` with the given outline (at least 3 points). */
export function addRegion(doc: SectionDocument, material: string, points: readonly Point[]): SectionDocument {
  if (points.length < MIN_REGION_POINTS) throw new Error("a region needs at least 3 points");
  return { ...doc, regions: [...doc.regions, { material, points: points.map(copyPoint) }] };
}

/** Moves one vertex of a region or of the phreatic line to p (m). */
export function moveVertex(doc: SectionDocument, ref: VertexRef, p: Point): SectionDocument {
  const owner = ownerOf(ref);
  const pts = requirePoints(doc, owner);
  if (ref.index < 0 || ref.index >= pts.length) throw new Error(`vertex ${ref.index} does not exist`);
  return withOwnerPoints(
    doc,
    owner,
    pts.map((q, i) => (i === ref.index ? copyPoint(p) : q)),
  );
}

/**
 * Moves a region vertex together with every region vertex lying on the same spot, so
 * regions that share a corner keep sharing it. Phreatic points move alone.
 */
export function moveSharedVertex(doc: SectionDocument, ref: VertexRef, p: Point): SectionDocument {
  if (ref.kind === "phreatic") return moveVertex(doc, ref, p);
  const from = requirePoints(doc, ownerOf(ref))[ref.index];
  if (!from) throw new Error(`vertex ${ref.index} does not exist`);
  const same = (q: Point) => Math.abs(q[0] - from[0]) <= SAME_POINT_M && Math.abs(q[1] - from[1]) <= SAME_POINT_M;
  return {
    ...doc,
    regions: doc.regions.map((r) =>
      r.points.some(same) ? { ...r, points: r.points.map((q) => (same(q) ? copyPoint(p) : q)) } : r,
    ),
  };
}

/** Inserts p after index `after` of a region or the phreatic line (after = -1 puts it first). */
export function insertPoint(doc: SectionDocument, owner: Owner, after: number, p: Point): SectionDocument {
  const pts = requirePoints(doc, owner);
  if (after < -1 || after >= pts.length) throw new Error(`cannot insert after vertex ${after}`);
  return withOwnerPoints(doc, owner, [...pts.slice(0, after + 1), copyPoint(p), ...pts.slice(after + 1)]);
}

/** Removes one point, refusing to leave a region below 3 points or the phreatic line below 2. */
export function deletePoint(doc: SectionDocument, owner: Owner, index: number): EditResult {
  const pts = requirePoints(doc, owner);
  if (index < 0 || index >= pts.length) throw new Error(`vertex ${index} does not exist`);
  const min = owner.kind === "region" ? MIN_REGION_POINTS : MIN_PHREATIC_POINTS;
  if (pts.length <= min) {
    return {
      ok: false,
      reason:
        owner.kind === "region"
          ? "A region needs at least 3 vertices. Delete the whole region instead."
          : "The phreatic line needs at least 2 points. Remove the whole line instead.",
    };
  }
  return {
    ok: true,
    doc: withOwnerPoints(
      doc,
      owner,
      pts.filter((_, i) => i !== index),
    ),
  };
}

/** Inserts p into region `regionIndex` after vertex `afterIndex`. */
export function insertVertex(doc: SectionDocument, regionIndex: number, afterIndex: number, p: Point): SectionDocument {
  return insertPoint(doc, { kind: "region", region: regionIndex }, afterIndex, p);
}

/** Deletes vertex `index` of region `regionIndex`, refusing to go below 3 vertices. */
export function deleteVertex(doc: SectionDocument, regionIndex: number, index: number): EditResult {
  return deletePoint(doc, { kind: "region", region: regionIndex }, index);
}

export function deleteRegion(doc: SectionDocument, regionIndex: number): SectionDocument {
  if (!doc.regions[regionIndex]) throw new Error(`region ${regionIndex} does not exist`);
  return { ...doc, regions: doc.regions.filter((_, i) => i !== regionIndex) };
}

export function setRegionMaterial(doc: SectionDocument, regionIndex: number, material: string): SectionDocument {
  if (!doc.regions[regionIndex]) throw new Error(`region ${regionIndex} does not exist`);
  return { ...doc, regions: doc.regions.map((r, i) => (i === regionIndex ? { ...r, material } : r)) };
}

/**
 * Sets the phreatic line (null removes it). A phreatic line replaces a pore-pressure
 * ratio, since the document holds one or the other.
 */
export function setPhreatic(doc: SectionDocument, points: readonly Point[] | null): SectionDocument {
  const { phreatic: _old, ru: _ru, ...rest } = doc.water ?? {};
  if (points === null) {
    const water = doc.water?.ru !== undefined ? { ...rest, ru: doc.water.ru } : rest;
    if (Object.keys(water).length === 0) {
      const { water: _w, ...noWater } = doc;
      return noWater;
    }
    return { ...doc, water };
  }
  if (points.length < MIN_PHREATIC_POINTS) throw new Error("a phreatic line needs at least 2 points");
  return { ...doc, water: { ...rest, phreatic: points.map(copyPoint) } };
}
