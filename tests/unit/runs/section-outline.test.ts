import { describe, expect, it } from "vitest";
import { groundAt, groundLine, pondedWater, poolLevelSpans } from "@/lib/runs/view/section-outline";
import { embankment } from "./engine-run";

/** Shoelace area of a flat ring, m². */
function area(ring: number[]): number {
  let s = 0;
  for (let i = 0; i < ring.length; i += 2) {
    const j = (i + 2) % ring.length;
    s += ring[i] * ring[j + 1] - ring[j] * ring[i + 1];
  }
  return Math.abs(s) / 2;
}

describe("pondedWater", () => {
  it("fills a V-shaped valley up to a level line: a triangle of ½·10·5 = 25 m²", () => {
    const ponds = pondedWater(
      [
        [0, 5],
        [20, 5],
      ],
      [
        [0, 10],
        [10, 0],
        [20, 10],
      ],
    );
    expect(ponds).toHaveLength(1);
    expect(area(ponds[0])).toBeCloseTo(25, 9);
  });

  it("stops at a vertical face: water 5 m deep over 10 m against a wall is 50 m²", () => {
    const ponds = pondedWater(
      [
        [0, 5],
        [20, 5],
      ],
      [
        [0, 0],
        [10, 0],
        [10, 8],
        [20, 8],
      ],
    );
    expect(ponds).toHaveLength(1);
    expect(area(ponds[0])).toBeCloseTo(50, 9);
    const xs = ponds[0].filter((_, i) => i % 2 === 0);
    expect(Math.max(...xs)).toBe(10);
  });

  it("finds the reservoir of the embankment fixture: 10 m deep to x = 20, then a wedge up the 0.4 face to x = 45 (200 + 125 m²)", () => {
    const doc = embankment();
    const ground = groundLine(doc);
    expect(groundAt(ground, 45)).toBeCloseTo(20, 9);
    const ponds = pondedWater(doc.water!.phreatic!, ground);
    expect(ponds).toHaveLength(1);
    expect(area(ponds[0])).toBeCloseTo(325, 6);
  });

  it("is empty when the water line stays below the ground", () => {
    expect(
      pondedWater(
        [
          [0, -1],
          [20, -1],
        ],
        [
          [0, 0],
          [20, 0],
        ],
      ),
    ).toEqual([]);
  });
});

describe("poolLevelSpans", () => {
  it("draws a lowered pool only over the reservoir side: 14 m meets the upstream face at x = 30", () => {
    const doc = embankment();
    const ground = groundLine(doc);
    const ponds = pondedWater(doc.water!.phreatic!, ground);
    const spans = poolLevelSpans(14, ground, ponds);
    expect(spans).toHaveLength(1);
    expect(spans[0][0]).toBeCloseTo(0, 9);
    expect(spans[0][1]).toBeCloseTo(30, 9);
    // Without a reservoir every low stretch counts, downstream too (the 1:2 face reaches 14 m at x = 72).
    const all = poolLevelSpans(14, ground, []);
    expect(all).toHaveLength(2);
    expect(all[1][0]).toBeCloseTo(72, 9);
  });
});
