/**
 * Load cases (docs/engine.md §7(a), §8): rapid drawdown by the effective-stress method with B̄ = 1,
 * and end of construction with undrained strengths.
 */
import { describe, expect, test } from "vitest";
import { type SectionDocument } from "@/lib/stability";
import { circle, clone, expectRelative, loadFixture, search } from "./helpers";

const GW = 9.81;

/** The demo embankment analysed on its upstream face (pool on the left at 20 m). */
function upstream(): SectionDocument {
  const doc = clone(loadFixture("three-material-embankment.json"));
  doc.analysis = {
    ...doc.analysis,
    direction: "left",
    grid: { x1: 15, y1: 25, x2: 45, y2: 45, nx: 16, ny: 11 },
    radii: { tangentY1: 10, tangentY2: 2, n: 9 },
  };
  return doc;
}

function drawdown(from: number, to: number): SectionDocument {
  const doc = upstream();
  doc.analysis = { ...doc.analysis, case: "drawdown", drawdown: { from, to, method: "effective" } };
  return doc;
}

describe("rapid drawdown, effective-stress method (docs/engine.md §7(a))", () => {
  test("a drawdown of zero depth gives the steady-seepage FS (docs/references.md: check by property)", () => {
    const steady = search(upstream());
    const dd = search(drawdown(20, 20));
    expectRelative(dd.results.bishop!.fs, steady.results.bishop!.fs, 1e-9);
    expectRelative(dd.results.fellenius!.fs, steady.results.fellenius!.fs, 1e-9);
  });

  test("lowering the pool lowers the upstream FS (common practice: drawdown governs the upstream face)", () => {
    const full = search(drawdown(20, 20)).results.bishop!.fs;
    const half = search(drawdown(20, 15)).results.bishop!.fs;
    const empty = search(drawdown(20, 10)).results.bishop!.fs;
    expect(half).toBeLessThan(full);
    expect(empty).toBeLessThan(half);
  });

  test("pore pressures keep the pre-drawdown line, held at the ground or the lowered pool", () => {
    const yL = 14;
    const r = circle(drawdown(20, yL), 30, 30, 19);
    expect(r.fs.bishop).not.toBeNull();
    let heldAtGround = 0;
    let underPool = 0;
    for (const s of r.slices) {
      const xm = (s.xLeft + s.xRight) / 2;
      const yg = xm <= 20 ? 10 : 10 + (xm - 20) / 2.5; // upstream face of the fixture, 2.5H:1V
      if (xm > 44) continue; // inside the core the line is the drawn one
      const expectedWater = Math.min(20, Math.max(yg, yL));
      // The base's mean pore pressure over its width: the water level less the mean arc height
      // (docs/engine.md §3), with G the primitive of √(R² − d²) for the circle (30, 30, 19).
      const G = (d: number) => 0.5 * (d * Math.sqrt(361 - d * d) + 361 * Math.asin(d / 19));
      const meanArc = 30 - (G(s.xRight - 30) - G(s.xLeft - 30)) / (s.xRight - s.xLeft);
      expect(s.porePressure).toBeCloseTo(GW * Math.max(0, expectedWater - meanArc), 6);
      if (yg > yL) heldAtGround++;
      else {
        underPool++;
        expect(s.pondedLoad).toBeCloseTo(GW * (s.xRight - s.xLeft) * (yL - yg), 3);
      }
    }
    expect(heldAtGround).toBeGreaterThan(0);
    expect(underPool).toBeGreaterThan(0);
  });
});

describe("end of construction (undrained case)", () => {
  test("materials with su use it; the rest are free-draining with a warning", () => {
    const doc = upstream();
    doc.materials = doc.materials.map((m) => (m.id === "core" && m.model === "mohr-coulomb" ? { ...m, su: 40 } : m));
    doc.analysis = {
      ...doc.analysis,
      case: "undrained",
      direction: "right",
      grid: { x1: 55, y1: 25, x2: 85, y2: 45, nx: 16, ny: 11 },
    };
    const r = circle(doc, 65, 30, 19);
    const warning = r.warnings.find((w) => w.code === "treated-as-free-draining");
    expect(warning?.message).toMatch(/'shell', 'foundation'/);
    const coreSlices = r.slices.filter((s) => s.material === "core");
    expect(coreSlices.length).toBeGreaterThan(0);
    for (const s of coreSlices) {
      expect(s.c).toBe(40);
      expect(s.phi).toBe(0);
    }
    // Undrained strength ignores pore pressure, so Bishop = ordinary on the φ = 0 slices.
    for (const s of coreSlices) expect(s.resistingOrdinary).toBeCloseTo(40 * s.baseLength, 9);
  });

  test("an undrained material used in a steady case is flagged", () => {
    const r = search(loadFixture("griffiths-lane-ex2.json"));
    expect(r.warnings.map((w) => w.code)).toContain("undrained-in-long-term-case");
  });
});
