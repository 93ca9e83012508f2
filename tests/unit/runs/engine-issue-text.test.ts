import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, test } from "vitest";
import { validateSection, type SectionDocument } from "@/lib/stability";
import { userIssue } from "@/lib/runs/view/engine-issue-text";
import { materialsToCsv, parseMaterialsCsv } from "@/lib/section-io";

const fixture = (): SectionDocument =>
  JSON.parse(
    readFileSync(path.resolve(__dirname, "../../fixtures/sections/drawdown-staged-embankment.json"), "utf8"),
  ) as SectionDocument;

/** The staged-drawdown fixture with the clay core's R envelope taken away. */
function coreWithoutR(): SectionDocument {
  const doc = fixture();
  for (const m of doc.materials)
    if (m.id === "core" && m.model === "mohr-coulomb") {
      delete m.cR;
      delete m.phiR;
    }
  return doc;
}

describe("the missing-R-envelope error in the user's words", () => {
  test("names the material by its name and says what to add, not 'materials[1]' or 'freeDraining: true'", () => {
    const doc = coreWithoutR();
    const v = validateSection(doc);
    expect(v.ok).toBe(false);
    if (v.ok) return;
    const missing = v.errors.filter((e) => e.code === "r-envelope-missing");
    // Only the core: the free-draining shell needs no R envelope (docs/engine.md §7(b)).
    expect(missing.map((e) => e.path)).toEqual(["materials[1]"]);
    const u = userIssue(missing[0], doc.materials);
    expect(u.where).toBe("Material 'Clay core'");
    expect(u.message).toMatch(/^needs an R envelope \(cR, φR\) for staged drawdown\./);
    expect(`${u.where} ${u.message}`).not.toMatch(/materials\[|freeDraining: true/);
  });

  test("other issues keep the engine's message, with the material named where the path gives one", () => {
    const u = userIssue(
      { code: "x", path: "materials[2].phi", message: "φ' is outside [0, 60)." },
      fixture().materials,
    );
    expect(u).toEqual({ where: "Material 'Silty clay foundation', φ′", message: "φ′ is outside [0, 60)." });
    expect(userIssue({ code: "x", path: "analysis.grid", message: "m" }, [])).toEqual({
      where: "Analysis settings, grid of centres",
      message: "m",
    });
    expect(userIssue({ code: "x", path: "regions[1].points[0]", message: "regions[1]: too thin" }, [])).toEqual({
      where: "Region 2, vertex 1",
      message: "Region 2: too thin",
    });
  });

  test("a section whose materials came through the CSV keeps the gravel free-draining and the clay's R envelope", () => {
    const doc = fixture();
    const parsed = parseMaterialsCsv(materialsToCsv(doc.materials as Parameters<typeof materialsToCsv>[0]));
    if (!parsed.ok) throw new Error("CSV did not read back");
    const imported = { ...doc, materials: parsed.value.materials } as SectionDocument;
    const v = validateSection(imported);
    expect(v.ok).toBe(true);
  });
});
