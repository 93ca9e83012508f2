/**
 * The study on the real engine: on the embankment's cohesionless shell face the shell's φ′ swings
 * FS most, as FS ≈ tan φ′ / tan β for a cohesionless face says (infinite-slope form; Duncan,
 * Wright & Brandon 2014, ch. 6, from memory); the CSV carries every bar and the line.
 */
import { describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import path from "node:path";
import Papa from "papaparse";
import type { SectionDocument } from "@/lib/stability";
import { inputParameters } from "@/lib/sensitivity/parameters";
import { sensitivityCsv, sweepStudy, tornadoStudy } from "@/lib/sensitivity/study";
import { searchRecord } from "@/lib/runs/record/search-record";

const doc = JSON.parse(
  readFileSync(path.resolve(__dirname, "../../fixtures/sections/three-material-embankment.json"), "utf8"),
) as SectionDocument;
doc.analysis = {
  ...doc.analysis!,
  grid: { x1: 55, y1: 25, x2: 85, y2: 45, nx: 6, ny: 5 },
  radii: { tangentY1: 10, tangentY2: 1, n: 4 },
  refine: false,
};
const fsOf = async (d: SectionDocument) => {
  const r = searchRecord(d);
  return r.ok ? (r.result.results.bishop?.fs ?? null) : null;
};

describe("sensitivity study on the engine", () => {
  const params = inputParameters(doc);

  it("puts the shell's φ′ on top of the tornado for the shell face, swings in falling order", async () => {
    const bars = await tornadoStudy(doc, params, { kind: "percent", percent: 10 }, fsOf);
    expect(bars[0].label).toBe("φ′ of Sand-gravel shell");
    for (let i = 1; i < bars.length; i++) expect(bars[i].swing).toBeLessThanOrEqual(bars[i - 1].swing);
    // A stronger shell gives the higher FS.
    expect(bars[0].fsHigh!).toBeGreaterThan(bars[0].fsLow!);
  });

  it("finds where FS along the shell's φ′ reaches the base FS: at the stored φ′ itself", async () => {
    const base = (await fsOf(doc))!;
    const phi = params.find((p) => p.key === "material:shell:phi")!;
    const line = await sweepStudy(doc, params, phi, 5, base, fsOf);
    expect(line.points).toHaveLength(5);
    // The search is a minimum over a fixed grid, so FS is continuous in φ′ and the crossing is the stored 36°.
    expect(line.crossing!).toBeCloseTo(36, 1);
    const csv = Papa.parse<string[]>(sensitivityCsv(base, [], line), { skipEmptyLines: true }).data;
    expect(csv[0]).toEqual(["part", "input", "value_low", "value_high", "fs_low", "fs_high", "swing"]);
    expect(csv.filter((r) => r[0] === "line")).toHaveLength(5);
    expect(csv.at(-1)![0]).toBe("required FS reached");
  });
});
