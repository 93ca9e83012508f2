/**
 * The solver's parts against independent references: the sparse IC(0)-CG solve against a dense
 * LU solve (ml-matrix), the saturated share of a triangle against its geometry, the mesh against
 * the outlines it must honour.
 */
import fc from "fast-check";
import { Matrix, solve as denseSolve } from "ml-matrix";
import { describe, expect, test } from "vitest";
import { elementMatrices, wetFraction } from "@/lib/seepage/elements";
import { buildMesh, checkCoverage, triangleArea } from "@/lib/seepage/mesh";
import { buildPattern, solveMasked } from "@/lib/seepage/sparse";
import { runSeepage, type Point } from "@/lib/seepage";
import { floorOnLayer, toeDrainDam, zonedDam, type SeepageDoc } from "./sections";

describe("seepage solver parts", () => {
  test("solveMasked(IC(0)-CG) matches a dense LU solve of the same anisotropic system to 1e-8", () => {
    const poly: Point[] = [
      [0, 0],
      [8, 0],
      [8, 3],
      [5, 5],
      [0, 5],
    ];
    const r = buildMesh({ polygons: [poly], filled: [true], drains: [], levels: [], h: 0.8 });
    if (!r.ok) throw new Error("mesh failed");
    const { mesh } = r;
    const n = mesh.x.length;
    const ne = mesh.region.length;
    const ke = elementMatrices(mesh, new Float64Array(ne).fill(2e-5), new Float64Array(ne).fill(5e-6));
    const p = buildPattern(n, mesh.tri);
    const val = new Float64Array(p.col.length);
    for (let e = 0; e < ne; e++) for (let k = 0; k < 9; k++) val[p.elementSlots[9 * e + k]] += ke[9 * e + k];
    const fixed = new Uint8Array(n);
    const x = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      if (mesh.x[i] === 0) [fixed[i], x[i]] = [1, 10];
      else if (mesh.x[i] === 8 && mesh.y[i] <= 3) [fixed[i], x[i]] = [1, mesh.y[i]];
    }
    const res = solveMasked(p, val, x, fixed, 1e-12);
    expect(res.converged).toBe(true);
    // Dense reference: rows of the free nodes, the fixed values moved to the right-hand side.
    const free = Array.from({ length: n }, (_, i) => i).filter((i) => !fixed[i]);
    const where = new Map(free.map((v, i) => [v, i]));
    const A = Matrix.zeros(free.length, free.length);
    const b = Matrix.zeros(free.length, 1);
    free.forEach((row, i) => {
      for (let k = p.rowPtr[row]; k < p.rowPtr[row + 1]; k++) {
        const c = p.col[k];
        if (fixed[c]) b.set(i, 0, b.get(i, 0) - val[k] * x[c]);
        else A.set(i, where.get(c) as number, val[k]);
      }
    });
    const ref = denseSolve(A, b);
    free.forEach((v, i) => expect(Math.abs(x[v] - ref.get(i, 0))).toBeLessThan(1e-8));
    // A conductivity matrix has zero row sums (a uniform head drives no flow): Zienkiewicz & Taylor.
    for (let i = 0; i < n; i++) {
      let s = 0;
      for (let k = p.rowPtr[i]; k < p.rowPtr[i + 1]; k++) s += val[k];
      expect(Math.abs(s)).toBeLessThan(1e-18);
    }
  });

  test("wetFraction is the share of the triangle where the linear pressure is not negative", () => {
    // One corner at +1, two at −1: p = 0 cuts both edges at their midpoints, leaving a quarter.
    expect(wetFraction(1, -1, -1)).toBeCloseTo(0.25, 12);
    expect(wetFraction(-1, 1, 1)).toBeCloseTo(0.75, 12);
    expect(wetFraction(2, 3, 0)).toBe(1);
    expect(wetFraction(-2, -3, -0.1)).toBe(0);
    // A corner at 3 and two at −1: the cut is 3/4 along each edge, (3/4)² of the area.
    expect(wetFraction(-1, 3, -1)).toBeCloseTo(0.5625, 12);
  });

  test("buildMesh honours region edges, an inner drain and the pool level; no slivers", () => {
    const polygons: Point[][] = [
      [
        [0, 0],
        [40, 0],
        [40, 4],
        [0, 4],
      ],
      [
        [5, 4],
        [35, 4],
        [22, 12],
        [18, 12],
      ],
    ];
    const r = buildMesh({
      polygons,
      filled: [true, true],
      drains: [
        [
          [24, 5],
          [30, 5],
        ],
      ],
      levels: [9],
      h: 0.7,
    });
    if (!r.ok) throw new Error("mesh failed");
    const { mesh } = r;
    expect(checkCoverage(mesh, polygons)).toEqual([]);
    const has = (x: number, y: number) =>
      mesh.x.some((v, i) => Math.abs(v - x) < 1e-9 && Math.abs(mesh.y[i] - y) < 1e-9);
    expect(has(24, 5) && has(30, 5)).toBe(true);
    // The pool level crosses the upstream face at x = 5 + 13·5/8.
    expect(has(5 + (13 * 5) / 8, 9)).toBe(true);
    let worst = 180;
    for (let e = 0; e < mesh.region.length; e++) {
      expect(triangleArea(mesh, e)).toBeGreaterThan(0);
      const t = [0, 1, 2].map((s) => mesh.tri[3 * e + s]);
      for (let s = 0; s < 3; s++) {
        const [a, b, c] = [t[s], t[(s + 1) % 3], t[(s + 2) % 3]];
        const u = [mesh.x[b] - mesh.x[a], mesh.y[b] - mesh.y[a]];
        const v = [mesh.x[c] - mesh.x[a], mesh.y[c] - mesh.y[a]];
        const angle =
          (Math.acos((u[0] * v[0] + u[1] * v[1]) / Math.hypot(u[0], u[1]) / Math.hypot(v[0], v[1])) * 180) / Math.PI;
        worst = Math.min(worst, angle);
      }
    }
    expect(worst).toBeGreaterThan(10);
  });

  test("buildMesh meshes sections with long straight outlines and drains at any element size", () => {
    const sections: SeepageDoc[] = [zonedDam(1), toeDrainDam(1e-6, 1), floorOnLayer(5, 10, 12, 10.5, 1e-5, 1)];
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 2 }), fc.double({ min: 0.25, max: 2.5, noNaN: true }), (i, h) => {
        const doc = sections[i];
        const polygons = doc.regions.map((r) => r.points);
        const pervious = doc.regions.map((r) => r.material !== "rock" && r.material !== "floor");
        const drains = (doc.seepage.drains ?? []) as Point[][];
        const levels = (doc.seepage.pools as { level: number }[]).map((p) => p.level);
        const r = buildMesh({ polygons, filled: pervious, drains, levels, h });
        expect(r.ok).toBe(true);
        if (r.ok) expect(checkCoverage(r.mesh, polygons)).toEqual([]);
      }),
      { numRuns: 25 },
    );
  }, 60_000);

  test("runSeepage reports each free-surface round and stops with `cancelled` when told to", () => {
    const seen: number[] = [];
    const done = runSeepage(zonedDam(2), { onRound: (round) => void seen.push(round) });
    expect(done.ok).toBe(true);
    expect(seen[0]).toBe(1);
    expect(seen.length).toBeGreaterThanOrEqual(done.ok ? done.solution.iterations.freeSurface : 0);
    const stopped = runSeepage(zonedDam(2), { onRound: (round) => round < 2 });
    expect(stopped.ok).toBe(false);
    if (!stopped.ok) expect(stopped.errors[0].code).toBe("cancelled");
  });

  test("the flow net of a dam with a toe filter: lines run from the pool face to the filter; equal head drops", () => {
    const run = runSeepage(toeDrainDam(1e-6, 0.5));
    if (!run.ok) throw new Error(JSON.stringify(run.errors));
    const net = run.solution.flowNet;
    expect(net.flowLines.length).toBe(net.drawnChannels - 1);
    for (const line of net.flowLines) {
      const [x0, y0] = line[0];
      const [x1, y1] = line[line.length - 1];
      // Starts on the wetted upstream face (x = y/2 for the 0.5H:1V face), ends within a metre of the filter.
      expect(Math.abs(x0 - y0 / 2)).toBeLessThan(0.05);
      expect(y0).toBeLessThanOrEqual(19 + 1e-6);
      expect(x1).toBeGreaterThan(25);
      expect(y1).toBeLessThan(1);
    }
    const heads = net.equipotentials.map((e) => e.head);
    // Heads are reported to six figures.
    for (let i = 1; i < heads.length; i++) expect(heads[i - 1] - heads[i]).toBeCloseTo(net.deltaH / net.headDrops, 3);
  });
});
