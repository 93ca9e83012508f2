/**
 * Surveyed grounds of thousands of vertices (docs/engine.md §1, §3 "Slice boundaries"): the
 * result must not change beyond the slice resolution with the number of vertices, and no
 * circle may be dropped silently. The outline (a 2H:1V slope over a weak layer, 4 ground
 * vertices) is the reference; the surveys are the same shape with 4,001 vertices.
 */
import { describe, expect, test } from "vitest";
import { analyzeCircle, runGridSearch, validateSection, type SectionDocument } from "@/lib/stability";
import { clone, expectRelative, loadFixture, search } from "./helpers";

const outline = loadFixture("weak-layer-outline.json");

/** The outline's ground resampled every 5 cm (4,001 vertices), each raised by noise(i) m. */
function surveyed(noise: (i: number) => number): SectionDocument {
  const d = clone(outline);
  const ground: [number, number][] = [];
  for (let i = 0; i <= 4000; i++) {
    const x = i * 0.05;
    const y = x <= 80 ? 20 : x >= 120 ? 0 : 20 - (x - 80) / 2;
    ground.push([x, y + noise(i)]);
  }
  d.regions[0].points = [...ground, [200, -2], [0, -2]];
  return d;
}

describe("a ground surveyed at 5 cm gives the outline's result", () => {
  const base = search(outline);

  test("4,001 collinear vertices: every circle valid and the same critical FS", () => {
    const r = search(surveyed(() => 0));
    expect(r.circles.valid).toBe(r.circles.tried);
    expect(r.circles.rejected).toEqual({});
    expectRelative(r.results.bishop!.fs, base.results.bishop!.fs, 1e-9);
    expectRelative(r.results.fellenius!.fs, base.results.fellenius!.fs, 1e-9);
  });

  test("a survey with ±2 mm of relief: within 0.1 % (the slice resolution), no warning", () => {
    const r = search(surveyed((i) => 0.002 * Math.sin(i * 1.3)));
    expect(r.circles.valid).toBe(r.circles.tried);
    expectRelative(r.results.bishop!.fs, base.results.bishop!.fs, 1e-3);
    expectRelative(r.results.fellenius!.fs, base.results.fellenius!.fs, 1e-3);
    expect(r.warnings.map((w) => w.code)).not.toContain("circles-too-complex");
  });

  test("20,000 vertices validate (near-linear checks) and analyse one circle", () => {
    const d = clone(outline);
    const ground: [number, number][] = [];
    for (let i = 0; i < 20000; i++) {
      const x = (200 * i) / 19999;
      const y = x <= 80 ? 20 : x >= 120 ? 0 : 20 - (x - 80) / 2;
      ground.push([x, y + 0.003 * Math.sin(i * 0.7)]);
    }
    d.regions[0].points = [...ground, [200, -2], [0, -2]];
    expect(validateSection(d).ok).toBe(true);
    const r = analyzeCircle(d, { xc: 100, yc: 40, r: 43 });
    const o = analyzeCircle(outline, { xc: 100, yc: 40, r: 43 });
    if (!r.ok || !o.ok) throw new Error("invalid");
    expectRelative(r.fs.bishop, o.fs.bishop!, 2e-3);
  });
});

describe("no circle is dropped silently", () => {
  // A ground sawtooth 5 cm long and 1 m high: a flat circle crosses it over a thousand times.
  const saw = clone(outline);
  const ground: [number, number][] = [];
  for (let i = 0; i <= 4000; i++) ground.push([i * 0.05, i % 2 === 0 ? 9.5 : 10.5]);
  saw.regions[0].points = [...ground, [200, -2], [0, -2]];

  test("a circle beyond the caps is rejected as too complex, with its reason", () => {
    const r = analyzeCircle(saw, { xc: 100, yc: 1010, r: 1000 });
    if (!r.ok) throw new Error("invalid");
    expect(r.fs.bishop).toBeNull();
    expect(r.reason).toBe("too-complex");
  });

  test("a search warns with the count of circles the caps rejected", () => {
    const d = clone(saw);
    d.analysis = {
      grid: { x1: 99, y1: 1005, x2: 101, y2: 1010, nx: 2, ny: 2 },
      radii: { tangentY1: 10, tangentY2: 10, n: 1 },
    };
    const r = runGridSearch(d);
    if (!r.ok) throw new Error("invalid");
    const n = r.circles.rejected["too-complex"] ?? 0;
    expect(n).toBeGreaterThan(0);
    const w = r.warnings.find((x) => x.code === "circles-too-complex");
    expect(w?.message).toContain(`${n} of ${r.circles.tried}`);
  });
});
