import { describe, expect, test } from "vitest";
import { elevationAt, polygonArea } from "@/lib/plane-geometry";

describe("polygonArea (shoelace formula, a fact of plane geometry)", () => {
  test("a 4 m by 3 m rectangle has 12 m² in either orientation", () => {
    const ccw: [number, number][] = [
      [0, 0],
      [4, 0],
      [4, 3],
      [0, 3],
    ];
    expect(polygonArea(ccw)).toBe(12);
    expect(polygonArea([...ccw].reverse())).toBe(12);
  });

  test("keeps its precision at map-grid coordinates (a 1 m² square near 10⁶ m)", () => {
    const e = 512_345.25;
    const n = 6_123_456.75;
    expect(
      polygonArea([
        [e, n],
        [e + 1, n],
        [e + 1, n + 1],
        [e, n + 1],
      ]),
    ).toBeCloseTo(1, 9);
  });

  test("points on one line, and fewer than three points, enclose nothing", () => {
    expect(
      polygonArea([
        [0, 0],
        [1, 1],
        [2, 2],
      ]),
    ).toBe(0);
    expect(
      polygonArea([
        [0, 0],
        [1, 1],
      ]),
    ).toBe(0);
  });
});

describe("elevationAt (linear interpolation, held level beyond the ends as the engine extends a line)", () => {
  const line: [number, number][] = [
    [0, 10],
    [10, 6],
    [20, 6],
  ];
  test("interpolates between points and holds the end values outside", () => {
    expect(elevationAt(line, 5)).toBe(8);
    expect(elevationAt(line, 15)).toBe(6);
    expect(elevationAt(line, -3)).toBe(10);
    expect(elevationAt(line, 30)).toBe(6);
  });

  test("an empty line has no elevation", () => {
    expect(elevationAt([], 1)).toBeNaN();
  });
});
