import { describe, expect, test } from "vitest";
import { detectSectionFile, geometryToCsv, parseGeometryCsv, parsePhreaticCsv } from "@/lib/section-io";
import { parseDroppedFile } from "@/components/section-import/parse-drop";
import type { SectionDocument } from "@/lib/stability";

const EMPTY = { version: 1, materials: [], regions: [] } as unknown as SectionDocument;

describe("importing a section: names, near-miss headers, materials checked against a rejected file", () => {
  test("region names from the geometry CSV are kept in the document and written back out", () => {
    const text = "region,material,x,y\nCore,clay,0,0\nCore,,4,0\nCore,,2,3\nShell,fill,4,0\nShell,,8,0\nShell,,4,3\n";
    const drop = parseDroppedFile("geometry.csv", text, ["clay", "fill"]);
    expect(drop.problems).toEqual([]);
    const doc = drop.apply!(EMPTY);
    expect(doc.regions.map((r) => r.name)).toEqual(["Core", "Shell"]);
    expect(geometryToCsv(doc.regions).split(/\r?\n/)[1]).toMatch(/^Core,clay,/);
  });

  test("a near-miss header (x,elev) is read as the phreatic line with its missing y column named", () => {
    expect(detectSectionFile("water.csv", "x,elev\n0,10\n5,9\n")).toBe("phreatic");
    const r = parsePhreaticCsv("x,elev\n0,10\n5,9\n");
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.problems).toEqual([
      expect.objectContaining({
        row: 1,
        column: "y",
        message: expect.stringMatching(/'y' is missing.*'elev' instead/),
      }),
    ]);
  });

  test("a geometry header with elev for y is still a geometry file, with y named as missing", () => {
    expect(detectSectionFile("g.csv", "region,material,x,elev\nA,m,0,0\n")).toBe("geometry");
    const r = parseGeometryCsv("region,material,x,elev\nA,m,0,0\n");
    expect(!r.ok && r.problems.map((p) => p.column)).toEqual(["y"]);
  });

  test("with the materials file unreadable, the geometry is not reported for every material", () => {
    const geometry = "region,material,x,y\nA,clay,0,0\nA,,4,0\nA,,2,3\n";
    expect(parseDroppedFile("geometry.csv", geometry, null).problems).toEqual([]);
    // Checked against the ids a rejected materials file still names, a wrong id is still caught.
    expect(parseDroppedFile("geometry.csv", geometry, ["fill"]).problems).toEqual([
      expect.objectContaining({ column: "material" }),
    ]);
  });
});
