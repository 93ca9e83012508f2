/**
 * Facts of limit equilibrium that hold for Spencer and Morgenstern–Price on any surface (common
 * practice, derived from the equations in docs/engine.md §11): F enters only as c'/F and tan φ'/F, so
 * scaling c' and tan φ' by k scales F by k (λ unchanged); the equations do not see where the origin
 * is, nor which way the slope faces (mirroring turns the section and the surface, not F or λ).
 */
import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { analyzeCircle, type SectionDocument } from "@/lib/stability";
import { analyzeSurface } from "@/lib/stability/surfaces/analyze-surface";
import { clone, loadFixture, transform } from "./helpers";

const embankment = loadFixture("three-material-embankment.json");
embankment.analysis = { ...embankment.analysis, methods: ["spencer", "morgenstern-price"] };

function scaleStrength(doc: SectionDocument, k: number): SectionDocument {
  const d = clone(doc);
  for (const m of d.materials) {
    if (m.model !== "mohr-coulomb") continue;
    m.c *= k;
    m.phi = (Math.atan(k * Math.tan((m.phi * Math.PI) / 180)) * 180) / Math.PI;
  }
  return d;
}

const trial = fc.record({
  xc: fc.double({ min: 60, max: 80, noNaN: true }),
  yc: fc.double({ min: 28, max: 40, noNaN: true }),
  depth: fc.double({ min: 2, max: 8, noNaN: true }),
  sag: fc.double({ min: 0, max: 2, noNaN: true }),
});

/** The circle, and a polyline through its entry and exit sagging below it (x increasing). */
function shapes(t: { xc: number; yc: number; depth: number; sag: number }) {
  const r = t.yc - 10 + t.depth;
  const res = analyzeCircle(embankment, { xc: t.xc, yc: t.yc, r });
  if (!res.ok || !res.entry || !res.exit || res.fs.spencer === null || res.fs.spencer === undefined) return null;
  const [a, b] = res.entry[0] < res.exit[0] ? [res.entry, res.exit] : [res.exit, res.entry];
  const pts: [number, number][] = [];
  for (let i = 0; i <= 6; i++) {
    const x = a[0] + ((b[0] - a[0]) * i) / 6;
    const arc = t.yc - Math.sqrt(Math.max(0, r * r - (x - t.xc) ** 2));
    pts.push([x, i === 0 ? a[1] : i === 6 ? b[1] : arc - t.sag * Math.sin((Math.PI * i) / 6)]);
  }
  return { circle: { xc: t.xc, yc: t.yc, r }, fs: res.fs, lambda: res.lambda, pts };
}

function close(a: number | null | undefined, b: number | null | undefined, rel: number): void {
  expect(a).toBeTypeOf("number");
  expect(b).toBeTypeOf("number");
  expect(Math.abs((a as number) - (b as number))).toBeLessThanOrEqual(rel * Math.abs(b as number) + 1e-12);
}

describe("Spencer and Morgenstern–Price: properties on random circles and polylines of the embankment", () => {
  test("scaling c' and tan φ' by k scales F by k", () => {
    let polylines = 0;
    fc.assert(
      fc.property(trial, fc.double({ min: 0.5, max: 2, noNaN: true }), (t, k) => {
        const s = shapes(t);
        if (!s) return;
        const scaled = scaleStrength(embankment, k);
        const c = analyzeCircle(scaled, s.circle);
        if (!c.ok) throw new Error("invalid");
        close(c.fs.spencer, k * (s.fs.spencer ?? NaN), 1e-6);
        close(c.fs["morgenstern-price"], k * (s.fs["morgenstern-price"] ?? NaN), 1e-6);
        const p0 = analyzeSurface(embankment, s.pts);
        const p1 = analyzeSurface(scaled, s.pts);
        if (!p0.ok || !p1.ok || p0.fs.spencer === null) return;
        close(p1.fs.spencer, k * (p0.fs.spencer ?? NaN), 1e-6);
        close(p1.lambda.spencer, p0.lambda.spencer, 1e-5);
        polylines++;
      }),
      { numRuns: 15 },
    );
    expect(polylines).toBeGreaterThanOrEqual(8);
  }, 60_000);

  test("translation and mirroring leave F and λ unchanged", () => {
    let polylines = 0;
    fc.assert(
      fc.property(
        trial,
        fc.double({ min: -500, max: 500, noNaN: true }),
        fc.double({ min: -100, max: 100, noNaN: true }),
        fc.constantFrom<1 | -1>(1, -1),
        (t, dx, dy, sign) => {
          const s = shapes(t);
          if (!s) return;
          const moved = transform(embankment, sign, dx, dy);
          const c = analyzeCircle(moved, { xc: sign * s.circle.xc + dx, yc: s.circle.yc + dy, r: s.circle.r });
          if (!c.ok) throw new Error("invalid");
          close(c.fs.spencer, s.fs.spencer, 1e-7);
          close(c.fs["morgenstern-price"], s.fs["morgenstern-price"], 1e-7);
          close(c.lambda?.spencer, s.lambda?.spencer, 1e-5);
          const p0 = analyzeSurface(embankment, s.pts);
          const p1 = analyzeSurface(
            moved,
            s.pts.map(([x, y]) => [sign * x + dx, y + dy] as [number, number]),
          );
          if (!p0.ok || !p1.ok || p0.fs.spencer === null) return;
          close(p1.fs.spencer, p0.fs.spencer, 1e-7);
          close(p1.fs["morgenstern-price"], p0.fs["morgenstern-price"], 1e-7);
          close(p1.lambda.spencer, p0.lambda.spencer, 1e-5);
          polylines++;
        },
      ),
      { numRuns: 15 },
    );
    expect(polylines).toBeGreaterThanOrEqual(8);
  }, 60_000);
});
