import { describe, expect, it } from "vitest";
import { collectIssues, parseIssuePath } from "@/lib/editor/issue-paths";
import { validateSection } from "@/lib/stability";
import { embankment } from "./fixtures";

describe("issue paths", () => {
  it("parseIssuePath reads regions, vertices, the phreatic line and materials", () => {
    expect(parseIssuePath("regions[2].points[4]")).toEqual({ kind: "region", region: 2, vertex: 4 });
    expect(parseIssuePath("regions[2].points")).toEqual({ kind: "region", region: 2, vertex: null });
    expect(parseIssuePath("regions[0].material")).toEqual({ kind: "region", region: 0, vertex: null });
    expect(parseIssuePath("regions[11]")).toEqual({ kind: "region", region: 11, vertex: null });
    expect(parseIssuePath("water.phreatic[3]")).toEqual({ kind: "phreatic", vertex: 3 });
    expect(parseIssuePath("water.phreatic[3][1]")).toEqual({ kind: "phreatic", vertex: 3 });
    expect(parseIssuePath("water.phreatic")).toEqual({ kind: "phreatic", vertex: null });
    expect(parseIssuePath("materials[1].phi")).toEqual({ kind: "material", material: 1 });
    expect(parseIssuePath("analysis.grid")).toEqual({ kind: "other" });
    expect(parseIssuePath("")).toEqual({ kind: "other" });
  });

  it("collectIssues(validateSection(doc)) tags errors and warnings with paths the editor can read", () => {
    const doc = embankment();
    doc.regions[0].points[1] = [45, 25];
    const issues = collectIssues(validateSection(doc));
    expect(issues.length).toBeGreaterThan(0);
    expect(issues.every((i) => i.severity === "error" || i.severity === "warning")).toBe(true);
    expect(collectIssues({ warnings: [{ code: "w", path: "x", message: "m" }] })).toEqual([
      { code: "w", path: "x", message: "m", severity: "warning" },
    ]);
  });
});
