/**
 * What a stability run takes from a seepage solution (docs/seepage.md §6): pore pressure at any
 * point as γw·(h − y), suction as zero (the contract, docs/engine-io.md §2), nothing outside the
 * pervious regions, the phreatic line as a pre-drawdown line and the pools as ponded water.
 */
import { describe, expect, test } from "vitest";
import { runSeepage, seepageWater } from "@/lib/seepage";
import { zonedDam } from "./sections";

describe("seepageWater(model, phreatic)", () => {
  const run = runSeepage(zonedDam(1.5));
  if (!run.ok) throw new Error(JSON.stringify(run.errors));
  const water = seepageWater(run.model, run.solution.phreatic);

  test("gives γw·(h − y) at the probes, where the pressure is positive", () => {
    for (const p of run.solution.probes) {
      expect(p.pressure).toBeGreaterThan(0);
      expect(water.porePressure(p.x, p.y)).toBeCloseTo(p.pressure, 2);
    }
  });

  test("counts suction above the phreatic surface as zero and gives nothing in rock or above the ground", () => {
    // The downstream shell well above the phreatic line.
    expect(water.porePressure(70, 18)).toBe(0);
    expect(water.porePressure(50, -2)).toBe(0);
    expect(water.porePressure(58, 30)).toBe(0);
    for (let x = 1; x < 120; x += 7)
      for (let y = -3; y < 24; y += 2.5) expect(water.porePressure(x, y)).toBeGreaterThanOrEqual(0);
  });

  test("hands over a phreatic line across the whole section, x increasing, and the pools", () => {
    const line = water.phreatic;
    expect(line[0][0]).toBe(0);
    expect(line[line.length - 1][0]).toBe(120);
    for (let i = 1; i < line.length; i++) expect(line[i][0]).toBeGreaterThan(line[i - 1][0]);
    // Upstream of the dam the line is the pool level; downstream, the tailwater.
    expect(line[0][1]).toBeCloseTo(21, 3);
    expect(line[line.length - 1][1]).toBeCloseTo(6, 3);
    expect(water.pools).toEqual([
      { side: "left", level: 21 },
      { side: "right", level: 6 },
    ]);
    // Below the phreatic line in the foundation the pressure is close to hydrostatic under it (within the
    // head lost downward, a fraction of a metre here).
    const y = 2;
    const x = 30;
    const below = water.porePressure(x, y);
    expect(below).toBeGreaterThan(9.81 * (19 - y));
    expect(below).toBeLessThanOrEqual(9.81 * (21 - y) + 1e-6);
  });
});
