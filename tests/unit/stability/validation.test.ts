/**
 * validateSection(doc) reports every problem with where it is (docs/engine.md §1, docs/engine-io.md
 * "Errors"). The limits checked are docs/engine.md §1's bounds: φ' in [0°, 60°), γ required.
 */
import { describe, expect, test } from "vitest";
import { validateSection, type Issue } from "@/lib/stability";
import { clone, loadFixture } from "./helpers";

function errorsOf(doc: unknown): Issue[] {
  const r = validateSection(doc);
  if (r.ok) throw new Error("expected validation errors");
  return r.errors;
}

describe("validateSection(doc)", () => {
  test("accepts a valid section and returns it with no errors", () => {
    const r = validateSection(loadFixture("three-material-embankment.json"));
    expect(r.ok).toBe(true);
    if (r.ok) expect(r.section.regions).toHaveLength(4);
  });

  test("reports a polygon that crosses itself, with the crossing point", () => {
    const [e] = errorsOf(loadFixture("bad-self-crossing.json"));
    expect(e.code).toBe("polygon-self-crossing");
    expect(e.path).toMatch(/^regions\[0\]\.points\[\d+\]$/);
    expect(e.at).toEqual([20, 10]);
    expect(e.message).toMatch(/cross at \(20\.00, 10\.00\)/);
  });

  test("reports regions that overlap, naming both", () => {
    const errs = errorsOf(loadFixture("bad-overlapping-regions.json"));
    const e = errs.find((x) => x.code === "regions-overlap");
    expect(e?.message).toMatch(/regions\[0\] and regions\[1\] overlap/);
    expect(e?.at).toBeDefined();
  });

  test("lists every problem of a document at once: missing γ, φ' out of range, phreatic line too short", () => {
    const errs = errorsOf(loadFixture("bad-many-errors.json"));
    const byCode = new Map(errs.map((e) => [e.code, e]));
    expect(byCode.get("missing-unit-weight")?.path).toBe("materials[0].gamma");
    expect(byCode.get("missing-unit-weight")?.message).toMatch(/'fill' has no unit weight/);
    expect(byCode.get("phi-out-of-range")?.path).toBe("materials[1].phi");
    expect(byCode.get("phi-out-of-range")?.message).toMatch(/65° is outside 0–60°/);
    const p = byCode.get("phreatic-not-spanning");
    expect(p?.path).toBe("water.phreatic");
    expect(p?.message).toMatch(/runs from x = 5\.00 to 55\.00 m but the section runs from x = 0\.00 to 60\.00 m/);
    expect(errs).toHaveLength(3);
  });

  test("φ' = 60° is already out of range; 0° is allowed", () => {
    const doc = clone(loadFixture("acads-1a.json"));
    const m = doc.materials[0];
    if (m.model !== "mohr-coulomb") throw new Error("fixture changed");
    m.phi = 60;
    expect(errorsOf(doc).map((e) => e.code)).toContain("phi-out-of-range");
    m.phi = 0;
    expect(validateSection(doc).ok).toBe(true);
  });

  test("reports shape errors from the schema with their paths", () => {
    const errs = errorsOf({
      version: 1,
      materials: [{ id: "a", model: "clay" }],
      regions: [
        {
          material: "a",
          points: [
            [0, 0],
            [1, "x"],
          ],
        },
      ],
    });
    expect(errs.find((e) => e.path === "materials[0].model")?.message).toMatch(
      /must be one of "mohr-coulomb", "undrained", "impenetrable"/,
    );
    expect(errs.find((e) => e.path === "regions[0].points[1][1]")?.code).toBe("wrong-type");
  });

  test("reports a void below the ground (an overhang)", () => {
    const doc = clone(loadFixture("acads-1a.json"));
    doc.regions = [
      {
        material: "soil",
        points: [
          [20, 20],
          [70, 20],
          [70, 25],
          [20, 25],
        ],
      },
      {
        material: "soil",
        points: [
          [20, 30],
          [70, 30],
          [70, 35],
          [20, 35],
        ],
      },
    ];
    expect(errorsOf(doc).map((e) => e.code)).toContain("regions-void");
  });

  test("a drawdown case without a pool is an error", () => {
    const doc = clone(loadFixture("acads-1a.json"));
    doc.water = {
      phreatic: [
        [20, 22],
        [70, 22],
      ],
    };
    doc.analysis = { ...doc.analysis, case: "drawdown", drawdown: { from: 30, to: 24 } };
    expect(errorsOf(doc).map((e) => e.code)).toContain("drawdown-no-pool");
  });

  test("warns about a repeated closing point and drops it", () => {
    const doc = clone(loadFixture("acads-1a.json"));
    doc.regions[0].points.push([20, 25]);
    const r = validateSection(doc);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.warnings.map((w) => w.code)).toContain("region-closing-point");
    expect(r.section.regions[0].points).toHaveLength(6);
  });
});
