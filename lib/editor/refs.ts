/**
 * Names for the things the editor points at: a region's outline or the phreatic line
 * (an "owner" of points), and one vertex of either.
 */
import type { Point, SectionDocument } from "@/lib/stability";

export type Owner = { kind: "region"; region: number } | { kind: "phreatic" };

export type VertexRef = { kind: "region"; region: number; index: number } | { kind: "phreatic"; index: number };

/** What is selected: an owner, and optionally one of its vertices. */
export type Selection =
  { kind: "region"; region: number; vertex: number | null } | { kind: "phreatic"; vertex: number | null };

/** The points of an owner, or undefined when it does not exist in the document. */
export function ownerPoints(doc: SectionDocument, owner: Owner): Point[] | undefined {
  if (owner.kind === "region") return doc.regions[owner.region]?.points;
  return doc.water?.phreatic;
}

/** Regions are closed polygons; the phreatic line is open. */
export function isClosed(owner: Owner): boolean {
  return owner.kind === "region";
}

export function ownerOf(ref: VertexRef | Selection): Owner {
  return ref.kind === "region" ? { kind: "region", region: ref.region } : { kind: "phreatic" };
}

export function sameOwner(a: Owner, b: Owner): boolean {
  if (a.kind !== b.kind) return false;
  return a.kind === "phreatic" || (b.kind === "region" && a.region === b.region);
}

export function vertexRef(owner: Owner, index: number): VertexRef {
  return owner.kind === "region" ? { kind: "region", region: owner.region, index } : { kind: "phreatic", index };
}

/** The selected vertex as a reference, if a vertex is selected. */
export function selectedVertex(sel: Selection | null): VertexRef | null {
  if (!sel || sel.vertex === null) return null;
  return vertexRef(ownerOf(sel), sel.vertex);
}

/** The point a vertex reference names, or undefined when it is out of range. */
export function pointAt(doc: SectionDocument, ref: VertexRef): Point | undefined {
  return ownerPoints(doc, ownerOf(ref))?.[ref.index];
}

/** Every vertex of the document with its reference, regions first, then the phreatic line. */
export function allVertices(doc: SectionDocument): { ref: VertexRef; point: Point }[] {
  const out: { ref: VertexRef; point: Point }[] = [];
  doc.regions.forEach((r, region) =>
    r.points.forEach((point, index) => out.push({ ref: { kind: "region", region, index }, point })),
  );
  (doc.water?.phreatic ?? []).forEach((point, index) => out.push({ ref: { kind: "phreatic", index }, point }));
  return out;
}

/** A selection that still makes sense for `doc` (indices may vanish after undo or delete). */
export function clampSelection(doc: SectionDocument, sel: Selection | null): Selection | null {
  if (!sel) return null;
  const pts = ownerPoints(doc, ownerOf(sel));
  if (!pts) return null;
  if (sel.vertex !== null && sel.vertex >= pts.length) return { ...sel, vertex: null };
  return sel;
}
