/**
 * Bad input to a seepage run: each problem is reported with its path and a message that says
 * what is wrong and where; nothing is solved.
 */
import { describe, expect, test } from "vitest";
import { runSeepage } from "@/lib/seepage";
import { zonedDam, type SeepageDoc } from "./sections";

function errorsOf(doc: unknown, maxNodes?: number) {
  const r = runSeepage(doc, { maxNodes });
  if (r.ok) throw new Error("expected the run to be refused");
  return r.errors;
}

describe("runSeepage refuses bad input with the place named", () => {
  test("a pool below all ground (and below the pervious part of its side)", () => {
    const doc = zonedDam(2);
    doc.seepage.pools = [{ side: "left", level: -1 }];
    const [e] = errorsOf(doc);
    expect(e.code).toBe("pool-below-ground");
    expect(e.path).toBe("seepage.pools[0].level");
    expect(e.message).toMatch(/left pool at -1 m/);
  });

  test("a drain outside the section, and one inside impenetrable rock", () => {
    const doc = zonedDam(2);
    doc.seepage.drains = [
      [
        [100, 6],
        [130, 6],
      ],
      [
        [30, -2],
        [40, 3],
      ],
    ];
    const errors = errorsOf(doc);
    expect(errors.map((e) => e.path)).toEqual(["seepage.drains[0][1]", "seepage.drains[1][0]"]);
    expect(errors[0].message).toMatch(/\(130, 6\) lies outside the section/);
    expect(errors[1].message).toMatch(/impenetrable/);
  });

  test("a material with no k, every one listed", () => {
    const doc = zonedDam(2);
    delete doc.materials[0].k;
    delete doc.materials[2].k;
    const errors = errorsOf(doc);
    expect(errors.map((e) => [e.code, e.path])).toEqual([
      ["missing-conductivity", "materials[0].k"],
      ["missing-conductivity", "materials[2].k"],
    ]);
    expect(errors[0].message).toMatch(/"core" has no hydraulic conductivity k/);
  });

  test("a mesh that would pass the node limit says which size would fit", () => {
    const [big] = errorsOf(zonedDam(0.02));
    expect(big.message).toMatch(/limit of 50000/);
    // The same rule with a small limit, so the mesh it suggests is quick to build here.
    const doc = zonedDam(0.3);
    const [e] = errorsOf(doc, 3000);
    expect(e.code).toBe("mesh-too-large");
    expect(e.path).toBe("seepage.meshSize");
    const suggested = Number(/at least ([\d.]+) m/.exec(e.message)?.[1]);
    expect(suggested).toBeGreaterThan(0.02);
    const fits = runSeepage(zonedDam(suggested), { maxNodes: 3000 });
    expect(fits.ok && fits.solution.mesh.nodes).toBeLessThanOrEqual(3000);
  }, 30_000);

  test("shape errors come from the schema with their paths; regions that overlap are named", () => {
    const errors = errorsOf({ materials: [{ id: "a", model: "mohr-coulomb", k: -1 }], regions: [], seepage: {} });
    expect(errors.map((e) => e.path)).toEqual(expect.arrayContaining(["materials[0].k", "regions"]));
    const doc: SeepageDoc = zonedDam(2);
    doc.regions.push({
      material: "shell",
      points: [
        [60, 10],
        [70, 10],
        [70, 14],
      ],
    });
    const overlap = errorsOf(doc);
    expect(overlap.some((e) => e.path.startsWith("regions"))).toBe(true);
  });

  test("a run with neither pool nor drain, and a probe outside the pervious regions", () => {
    const doc = zonedDam(2);
    doc.seepage.pools = [];
    doc.seepage.probes = [[10, -2]];
    const errors = errorsOf(doc);
    expect(errors.map((e) => [e.code, e.path])).toEqual([
      ["no-water", "seepage"],
      ["probe-outside", "seepage.probes[0]"],
    ]);
  });
});
