import { describe, expect, test } from "vitest";
import { renderToStaticMarkup } from "react-dom/server";
import { deriveCompactionCurve, zeroAirVoidsDensity } from "@/lib/lab";
import { clipPolyline, clipSegment } from "@/lib/materials/clip-polyline";
import { CompactionPlot } from "@/components/materials/plots/compaction-plot";
import { StrengthLinePlot } from "@/components/materials/plots/strength-line-plot";

// The frame of PlotFrame's default 380 × 260 plot: margins left 52, right 14, top 12, bottom 40.
const FRAME = { x0: 52, x1: 366, y0: 12, y1: 220 };

function polylinePoints(html: string): [number, number][] {
  return [...html.matchAll(/<polyline points="([^"]*)"/g)].flatMap((m) =>
    m[1].split(" ").map((pair) => pair.split(",").map(Number) as [number, number]),
  );
}
const inside = ([x, y]: [number, number]) =>
  x >= FRAME.x0 - 1e-9 && x <= FRAME.x1 + 1e-9 && y >= FRAME.y0 - 1e-9 && y <= FRAME.y1 + 1e-9;

describe("clipping lines to a plot's frame (Liang & Barsky 1984)", () => {
  test("a segment crossing the frame is cut where it meets it; one outside is dropped", () => {
    const r = { x0: 0, x1: 10, y0: 0, y1: 10 };
    expect(clipSegment([-5, 5], [15, 5], r)).toEqual([
      [0, 5],
      [10, 5],
    ]);
    expect(clipSegment([-5, -5], [-1, -1], r)).toBeNull();
    // A line through the corner region: y = x + 8 leaves through the top edge at x = 2.
    expect(clipSegment([0, 8], [10, 18], r)).toEqual([
      [0, 8],
      [2, 10],
    ]);
    expect(
      clipPolyline(
        [
          [-1, 5],
          [5, 5],
          [5, 20],
          [8, 5],
        ],
        r,
      ),
    ).toEqual([
      [
        [0, 5],
        [5, 5],
        [5, 10],
      ],
      // (5, 20)–(8, 5) meets y = 10 at t = 10/15, x = 5 + 3 · 2/3 = 7 (hand calculation).
      [
        [7, 10],
        [8, 5],
      ],
    ]);
  });
});

describe("lab plots", () => {
  // Craig's compaction example, as in tests/unit/lab/compaction.test.ts (values from memory).
  const result = deriveCompactionCurve({
    points: [
      { moistureContent: 12.8, bulkDensity: 2.01, id: "c1" },
      { moistureContent: 14.5, bulkDensity: 2.092, id: "c2" },
      { moistureContent: 15.6, bulkDensity: 2.114, id: "c3" },
      { moistureContent: 16.8, bulkDensity: 2.1, id: "c4" },
      { moistureContent: 19.2, bulkDensity: 2.055, id: "c5" },
    ],
    specificGravity: 2.73,
  });

  test("the compaction plot keeps every line, the zero-air-voids curve too, within the frame", () => {
    // ρd,zav = Gs ρw / (1 + w Gs) (zero air voids; Craig's Soil Mechanics, common practice) rises far
    // above the test densities on the dry side, so part of it lies outside the chart's range.
    expect(zeroAirVoidsDensity(10, 2.73)).toBeGreaterThan(2.1);
    const html = renderToStaticMarkup(<CompactionPlot result={result} />);
    const pts = polylinePoints(html);
    expect(pts.length).toBeGreaterThan(10);
    for (const p of pts) expect(inside(p), `${p}`).toBe(true);
    expect(html).toContain("zero air voids, Gs 2.73");
  });

  test("measured points are drawn outside the clipped group, so a point on the frame shows whole", () => {
    const html = renderToStaticMarkup(
      <StrengthLinePlot
        title="Direct shear"
        xLabel="σn (kPa)"
        yLabel="τ (kPa)"
        points={[
          { x: 0, y: 5, index: 1 },
          { x: 100, y: 62, index: 2 },
          { x: 200, y: 120, index: 3 },
        ]}
        line={[
          [0, 5],
          [200, 120],
        ]}
      />,
    );
    const clipped = /<g clip-path="[^"]*">([\s\S]*?)<\/g>/.exec(html)![1];
    expect(clipped).not.toContain("<circle");
    expect((html.match(/<circle/g) ?? []).length).toBe(3);
    for (const p of polylinePoints(html)) expect(inside(p), `${p}`).toBe(true);
  });
});
