/**
 * The search and one-circle API contracts the web app relies on: re-checking a stored
 * critical circle gives the same FS, counts add up, the FS map and lowest circles are
 * consistent, progress and cancellation work. Facts of the trade are marked as common practice.
 */
import { describe, expect, test } from "vitest";
import { analyzeCircle, resolveAnalysis, runGridSearch } from "@/lib/stability";
import { circle, clone, loadFixture, search } from "./helpers";

const embankment = loadFixture("three-material-embankment.json");

describe("runGridSearch(doc) results", () => {
  const r = search(embankment);

  test("analyzeCircle re-checks each method's critical circle to exactly the same FS", () => {
    for (const m of ["bishop", "fellenius"] as const) {
      const crit = r.results[m]!;
      const one = circle(embankment, crit.circle.xc, crit.circle.yc, crit.circle.r);
      expect(one.fs[m]).toBe(crit.fs);
      expect(one.entry).toEqual(crit.entry);
      expect(one.exit).toEqual(crit.exit);
    }
  });

  test("tried = valid + rejected, and the map's minimum is the critical FS", () => {
    const rejected = Object.values(r.circles.rejected).reduce((a, b) => a + b, 0);
    expect(r.circles.tried).toBe(40 * 40 * 20);
    expect(r.circles.valid + rejected).toBe(r.circles.tried);
    const map = r.fsMap.bishop!;
    expect(map.values).toHaveLength(map.nx * map.ny);
    const min = Math.min(...map.values.filter((v): v is number => v !== null));
    expect(min).toBe(r.results.bishop!.fs);
  });

  test("the lowest circles are sorted and start with the critical circle", () => {
    const low = r.lowest.bishop!;
    expect(low).toHaveLength(10);
    for (let i = 1; i < low.length; i++) expect(low[i].fs).toBeGreaterThanOrEqual(low[i - 1].fs);
    expect(low[0].fs).toBe(r.results.bishop!.fs);
  });

  test("Bishop's simplified method is not below the ordinary method here (common practice: the ordinary method is conservative)", () => {
    expect(r.results.bishop!.fs).toBeGreaterThan(r.results.fellenius!.fs);
  });
});

describe("runGridSearch(doc, { onProgress })", () => {
  test("reports rising fractions ending at 1", () => {
    const seen: number[] = [];
    runGridSearch(embankment, {
      onProgress: (f) => {
        seen.push(f);
      },
    });
    expect(seen.length).toBeGreaterThanOrEqual(40);
    for (let i = 1; i < seen.length; i++) expect(seen[i]).toBeGreaterThanOrEqual(seen[i - 1]);
    expect(seen[seen.length - 1]).toBe(1);
  });

  test("returning false cancels the search", () => {
    let calls = 0;
    const r = runGridSearch(embankment, { onProgress: () => ++calls < 5 });
    if (!r.ok) throw new Error("search failed");
    expect(r.cancelled).toBe(true);
    expect(r.circles.tried).toBe(5 * 40 * 20);
    expect(r.warnings.map((w) => w.code)).toContain("search-cancelled");
  });
});

describe("analysis defaults and inputs", () => {
  test("resolveAnalysis fills slices 50, direction auto, both methods, steady", () => {
    const a = resolveAnalysis(undefined);
    expect(a).toMatchObject({
      slices: 50,
      direction: "auto",
      methods: ["bishop", "fellenius"],
      case: "steady",
      ordinaryForm: "classical",
      lowestCount: 10,
    });
  });

  test("a search without grid or radii returns an error list, not an exception", () => {
    const doc = clone(embankment);
    delete doc.analysis;
    const r = runGridSearch(doc);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.errors.map((e) => e.code).sort()).toEqual(["analysis-missing"]);
  });

  test("a circle that misses the ground gives fs null with a reason", () => {
    const r = analyzeCircle(embankment, { xc: 70, yc: 60, r: 5 });
    if (!r.ok) throw new Error("unexpected");
    expect(r.fs).toEqual({ bishop: null, fellenius: null });
    expect(r.reason).toBe("no-slip-mass");
  });

  test("a circle into impenetrable material gives fs null with reason impenetrable", () => {
    const r = analyzeCircle(loadFixture("griffiths-lane-ex1.json"), { xc: 30, yc: 12, r: 15 });
    if (!r.ok) throw new Error("unexpected");
    expect(r.fs.bishop).toBeNull();
    expect(r.reason).toBe("impenetrable");
  });

  test("a minimum on the grid's edge is flagged", () => {
    const doc = clone(loadFixture("acads-1a.json"));
    doc.analysis!.grid = { x1: 36, y1: 45, x2: 44, y2: 55, nx: 5, ny: 5 };
    const r = search(doc);
    expect(r.warnings.map((w) => w.code)).toContain("minimum-on-grid-edge");
  });
});
