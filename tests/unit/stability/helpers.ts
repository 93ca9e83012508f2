/** Shared helpers for the stability engine tests. */
import { readFileSync } from "node:fs";
import path from "node:path";
import { expect } from "vitest";
import {
  analyzeCircle,
  runGridSearch,
  type CircleSuccess,
  type GridSearchSuccess,
  type SectionDocument,
} from "@/lib/stability";

export const FIXTURES = path.resolve(__dirname, "../../fixtures/sections");

/** Reads a section fixture from tests/fixtures/sections. */
export function loadFixture(name: string): SectionDocument {
  return JSON.parse(readFileSync(path.join(FIXTURES, name), "utf8")) as SectionDocument;
}

/** Deep copy, so a test can change a fixture without touching others. */
export function clone<T>(v: T): T {
  return JSON.parse(JSON.stringify(v)) as T;
}

/** Runs a grid search that must succeed. */
export function search(doc: unknown): GridSearchSuccess {
  const r = runGridSearch(doc);
  if (!r.ok) throw new Error(`search failed: ${JSON.stringify(r.errors)}`);
  return r;
}

/** Analyses one circle that must be a valid input. */
export function circle(doc: unknown, xc: number, yc: number, r: number): CircleSuccess {
  const res = analyzeCircle(doc, { xc, yc, r });
  if (!res.ok) throw new Error(`circle failed: ${JSON.stringify(res.errors)}`);
  return res;
}

/** Bishop FS of the search's critical circle. */
export function bishopMin(doc: unknown): number {
  const fs = search(doc).results.bishop?.fs;
  if (fs === undefined) throw new Error("no Bishop result");
  return fs;
}

/** |actual − expected| ≤ rel·|expected|. */
export function expectRelative(actual: number | null | undefined, expected: number, rel: number): void {
  expect(actual).not.toBeNull();
  expect(actual).toBeDefined();
  const a = actual as number;
  const err = Math.abs(a - expected) / Math.abs(expected);
  if (!(err <= rel))
    throw new Error(
      `expected ${a} within ${(rel * 100).toFixed(3)}% of ${expected} (off by ${(err * 100).toFixed(3)}%)`,
    );
}

/** Replaces every x by sign·x + dx and y by y + dy in a section (regions, water, loads, grid). */
export function transform(doc: SectionDocument, sign: 1 | -1, dx: number, dy: number): SectionDocument {
  const d = clone(doc);
  const X = (x: number) => sign * x + dx;
  d.regions = d.regions.map((r) => ({ ...r, points: r.points.map(([x, y]) => [X(x), y + dy] as [number, number]) }));
  if (d.water?.phreatic) {
    const pts = d.water.phreatic.map(([x, y]) => [X(x), y + dy] as [number, number]);
    d.water.phreatic = sign === 1 ? pts : pts.reverse();
  }
  if (d.loads?.surcharges)
    d.loads.surcharges = d.loads.surcharges.map((s) => ({
      ...s,
      x1: Math.min(X(s.x1), X(s.x2)),
      x2: Math.max(X(s.x1), X(s.x2)),
    }));
  for (const m of d.materials) if (m.model !== "impenetrable" && m.suDatum !== undefined) m.suDatum += dy;
  const a = d.analysis;
  if (a?.grid) {
    const g = a.grid;
    const [x1, x2] = sign === 1 ? [X(g.x1), X(g.x2)] : [X(g.x2), X(g.x1)];
    a.grid = { ...g, x1, x2, y1: g.y1 + dy, y2: g.y2 + dy };
  }
  if (a?.radii && "tangentY1" in a.radii)
    a.radii = { ...a.radii, tangentY1: a.radii.tangentY1 + dy, tangentY2: a.radii.tangentY2 + dy };
  if (a?.direction === "left" || a?.direction === "right")
    a.direction = sign === 1 ? a.direction : a.direction === "left" ? "right" : "left";
  return d;
}
