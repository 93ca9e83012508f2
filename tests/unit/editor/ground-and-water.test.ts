import { describe, expect, it } from "vitest";
import type { Point, Region } from "@/lib/stability";
import { groundAt, groundSurface } from "@/lib/editor/ground-surface";
import { pondedWater } from "@/lib/editor/ponded-water";
import { reservoirLevel, setReservoirLevel, shoreX } from "@/lib/editor/reservoir-level";
import { embankment } from "./fixtures";

function area(ring: Point[]): number {
  let a = 0;
  for (let i = 0; i < ring.length; i++) {
    const [p, q] = [ring[i], ring[(i + 1) % ring.length]];
    a += p[0] * q[1] - q[0] * p[1];
  }
  return Math.abs(a) / 2;
}

describe("ground surface", () => {
  it("groundSurface(regions) is the top of all regions, without inner edges", () => {
    expect(groundSurface(embankment().regions)).toEqual([
      [0, 10],
      [20, 10],
      [25, 20],
      [35, 20],
      [50, 10],
      [60, 10],
    ]);
  });

  it("groundSurface(regions) keeps a vertical face as two points", () => {
    const regions: Region[] = [
      {
        material: "a",
        points: [
          [0, 0],
          [10, 0],
          [10, 5],
          [4, 5],
          [4, 8],
          [0, 8],
        ],
      },
    ];
    expect(groundSurface(regions)).toEqual([
      [0, 8],
      [4, 8],
      [4, 5],
      [10, 5],
    ]);
  });

  it("groundSurface(regions) switches edge where two top edges cross", () => {
    const regions: Region[] = [
      {
        material: "a",
        points: [
          [0, 0],
          [10, 0],
          [10, 10],
        ],
      },
      {
        material: "b",
        points: [
          [0, 0],
          [10, 0],
          [0, 10],
        ],
      },
    ];
    const g = groundSurface(regions);
    expect(g[0]).toEqual([0, 10]);
    expect(g[g.length - 1]).toEqual([10, 10]);
    expect(groundAt(g, 5)).toBeCloseTo(5, 9);
  });

  it("groundAt(ground, x) interpolates and is null outside", () => {
    const g = groundSurface(embankment().regions);
    expect(groundAt(g, 22.5)).toBeCloseTo(15, 9);
    expect(groundAt(g, -1)).toBeNull();
    expect(groundSurface([])).toEqual([]);
  });
});

describe("ponded water", () => {
  it("pondedWater(phreatic, ground) finds the pool in front of the upstream face", () => {
    const doc = embankment();
    const pools = pondedWater(doc.water!.phreatic!, groundSurface(doc.regions));
    expect(pools).toHaveLength(1);
    // 2 m deep from x = 0 to the face at x = 21, where the water meets the ground.
    expect(area(pools[0])).toBeCloseTo(2 * 20 + 0.5 * 2 * 1, 6);
  });

  it("pondedWater is empty when the line stays below the ground", () => {
    const ground: Point[] = [
      [0, 10],
      [60, 10],
    ];
    expect(
      pondedWater(
        [
          [0, 5],
          [60, 2],
        ],
        ground,
      ),
    ).toEqual([]);
  });

  it("pondedWater splits into two pools on either side of a crest", () => {
    const ground: Point[] = [
      [0, 0],
      [10, 0],
      [15, 10],
      [20, 0],
      [30, 0],
    ];
    const pools = pondedWater(
      [
        [0, 4],
        [30, 4],
      ],
      ground,
    );
    expect(pools).toHaveLength(2);
    expect(area(pools[0])).toBeCloseTo(4 * 10 + 0.5 * 4 * 2, 6);
  });
});

describe("reservoir level", () => {
  it("shoreX(ground, side, y) walks in from the chosen edge", () => {
    const g = groundSurface(embankment().regions);
    expect(shoreX(g, "left", 15)).toBeCloseTo(22.5, 9);
    expect(shoreX(g, "right", 15)).toBeCloseTo(42.5, 9);
    expect(shoreX(g, "left", 5)).toBe(0);
    expect(shoreX(g, "left", 25)).toBeNull();
  });

  it("setReservoirLevel(doc, left, y) levels the line up to the upstream face and keeps the rest", () => {
    const r = setReservoirLevel(embankment(), "left", 15);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.doc.water?.phreatic).toEqual([
      [0, 15],
      [22.5, 15],
      [50, 9],
      [60, 9],
    ]);
    expect(reservoirLevel(r.doc, "left")).toBe(15);
    expect(reservoirLevel(r.doc, "right")).toBeNull();
  });

  it("setReservoirLevel(doc, right, y) works from the right edge", () => {
    const r = setReservoirLevel(embankment(), "right", 12);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const line = r.doc.water!.phreatic!;
    expect(line.slice(-2)).toEqual([
      [47, 12],
      [60, 12],
    ]);
    expect(line[0]).toEqual([0, 12]);
    expect(line.every((p, i) => i === 0 || p[0] > line[i - 1][0])).toBe(true);
  });

  it("setReservoirLevel starts a line when there is none, and refuses to flood everything", () => {
    const { water: _w, ...dry } = embankment();
    const r = setReservoirLevel(dry, "left", 14);
    expect(r.ok && r.doc.water?.phreatic).toEqual([
      [0, 14],
      [22, 14],
      [60, 10],
    ]);
    const over = setReservoirLevel(dry, "left", 30);
    expect(over.ok).toBe(false);
    if (!over.ok) expect(over.reason).toMatch(/whole section/);
  });
});
