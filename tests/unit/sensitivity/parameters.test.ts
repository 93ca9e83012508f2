/**
 * The what-if inputs of a run's document: at the stored values the document is the stored one
 * (so the stored FS comes back bit for bit), and moving an input moves FS the way the trade
 * expects (weaker soil, lower FS; a pseudo-static kh lowers FS).
 */
import { describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import path from "node:path";
import type { SectionDocument } from "@/lib/stability";
import { describeChange, inputParameters, withParameters } from "@/lib/sensitivity/parameters";
import { searchRecord } from "@/lib/runs/record/search-record";

const doc = JSON.parse(
  readFileSync(path.resolve(__dirname, "../../fixtures/sections/three-material-embankment.json"), "utf8"),
) as SectionDocument;
doc.analysis = {
  ...doc.analysis!,
  grid: { x1: 55, y1: 25, x2: 85, y2: 45, nx: 8, ny: 6 },
  radii: { tangentY1: 10, tangentY2: 1, n: 5 },
  refine: false,
};
const bishop = (d: SectionDocument) => {
  const r = searchRecord(d);
  if (!r.ok) throw new Error("search failed");
  return r.result.results.bishop!.fs;
};

describe("what-if inputs", () => {
  const params = inputParameters(doc);

  it("lists c′, φ′ and γ of each material and kh, with no ru beside a phreatic line", () => {
    const keys = params.map((p) => p.key);
    for (const m of ["shell", "core", "foundation"])
      for (const q of ["c", "phi", "gamma"]) expect(keys).toContain(`material:${m}:${q}`);
    expect(keys).toContain("loads:kh");
    expect(keys).not.toContain("water:ru");
    for (const p of params) expect(p.min <= p.stored && p.stored <= p.max).toBe(true);
  });

  it("gives back the stored document, and so the stored FS exactly, at the stored values", () => {
    const values = Object.fromEntries(params.map((p) => [p.key, p.stored]));
    const same = withParameters(doc, params, values);
    expect(same).toBe(doc);
    expect(Object.is(bishop(same), bishop(doc))).toBe(true);
  });

  it("lowers FS when the shell's φ′ drops or a horizontal seismic coefficient is added (common practice)", () => {
    const base = bishop(doc);
    expect(bishop(withParameters(doc, params, { "material:shell:phi": 30 }))).toBeLessThan(base);
    expect(bishop(withParameters(doc, params, { "loads:kh": 0.1 }))).toBeLessThan(base);
  });

  it("moves γsat with γ so the pair keeps its ratio", () => {
    const d = withParameters(doc, params, { "material:core:gamma": 20.9 });
    const core = d.materials.find((m) => m.id === "core")!;
    if (core.model === "impenetrable") throw new Error("core is soil");
    expect(core.gamma).toBe(20.9);
    expect(core.gammaSat).toBeCloseTo(20 * (20.9 / 19), 12);
  });

  it("says the change in words", () => {
    const phi = params.find((p) => p.key === "material:core:phi")!;
    expect(describeChange(phi, 22, 1.31, 1.22)).toBe("φ′ of Clay core 25.0° → 22.0°: FS 1.310 → 1.220");
  });
});
