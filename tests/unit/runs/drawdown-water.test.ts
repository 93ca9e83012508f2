import { describe, expect, it } from "vitest";
import { buildDemoSection, DEMO_POOL } from "@/db/seeds/demo-section";
import { buildRunScene } from "@/lib/runs/view/run-scene";
import { waterAfterDrawdown } from "@/lib/runs/view/drawdown-water";
import { elevationAt } from "@/lib/plane-geometry";

/*
 * The rule drawn is the engine's for rapid drawdown water (docs/engine-io.md): on the pool side, from the
 * reservoir-side edge to the crest, the pore-water level after drawdown is min(pre-drawdown line,
 * max(ground, lowered pool)); beyond the crest the line stands unchanged. It is the simple effective-stress
 * treatment that keeps steady-seepage pore pressures in the soil and lowers only the external water (common
 * practice; e.g. USACE EM 1110-2-1902 (2003), Appendix G, from memory). Expected values below are worked by hand.
 */
describe("the pore-water level after drawdown", () => {
  // Ground: level 0 to x = 10, up 1:2 to a crest at 10 m (x 30–40), down to 0 at x 60, level to x 70.
  const ground: [number, number][] = [
    [0, 0],
    [10, 0],
    [30, 10],
    [40, 10],
    [60, 0],
    [70, 0],
  ];
  // Pool at 8 m on the left meeting the face at x = 26, then through the embankment to the right toe.
  const pre: [number, number][] = [
    [0, 8],
    [26, 8],
    [50, 3],
    [70, 0],
  ];
  const after = waterAfterDrawdown(pre, ground, 4);

  it("stands at the lowered pool over the reservoir and at the ground on the drained face", () => {
    expect(elevationAt(after, 5)).toBeCloseTo(4, 9); // ground 0 < 4: free water at the lowered pool
    expect(elevationAt(after, 18)).toBeCloseTo(4, 9); // ground 4 here: the shore of the lowered pool
    expect(elevationAt(after, 20)).toBeCloseTo(5, 9); // ground 5 > 4, pre 8: saturated to the ground surface
    expect(elevationAt(after, 24)).toBeCloseTo(7, 9); // ground 7, pre 8
  });

  it("keeps the pre-drawdown line inside the soil and beyond the crest", () => {
    // At x = 28 the ground (9) is above the pre-drawdown line: 8 − 5 × 2/24.
    expect(elevationAt(after, 28)).toBeCloseTo(8 - (5 * 2) / 24, 9);
    expect(elevationAt(after, 45)).toBeCloseTo(elevationAt(pre, 45), 9);
    expect(elevationAt(after, 65)).toBeCloseTo(elevationAt(pre, 65), 9);
  });

  it("is the pre-drawdown line itself when no side is ponded", () => {
    const dry: [number, number][] = [
      [0, -1],
      [70, -1],
    ];
    expect(waterAfterDrawdown(dry, ground, 4)).toEqual(dry);
  });
});

describe("the drawdown figure of the demo dam", () => {
  const doc = buildDemoSection();
  const scene = buildRunScene({ document: doc, drawdownTo: DEMO_POOL.drawdownTo });

  it("draws the lowered pool as the only free water on the upstream side, and the line before it faint", () => {
    const pondTops = scene.ponds.flatMap((ring) => ring.filter((_, i) => i % 2 === 1));
    expect(Math.max(...pondTops)).toBeCloseTo(DEMO_POOL.drawdownTo, 6);
    expect(scene.pool?.level).toBe(DEMO_POOL.drawdownTo);
    expect(scene.beforeDrawdown?.level).toBeCloseTo(DEMO_POOL.normal, 6);
    expect(scene.beforeDrawdown?.points).toEqual(doc.water!.phreatic!.flat());
    // The analysed line at the reservoir edge is the lowered pool, not the 16 m of the steady line.
    expect(scene.phreatic![1]).toBeCloseTo(DEMO_POOL.drawdownTo, 6);
  });

  it("draws the steady line unchanged when the run is not a drawdown", () => {
    const steady = buildRunScene({ document: doc });
    expect(steady.beforeDrawdown).toBeNull();
    expect(steady.phreatic).toEqual(doc.water!.phreatic!.flat());
  });
});
