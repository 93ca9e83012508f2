import { describe, expect, test } from "vitest";
import { DEFAULT_LAB_OPTIONS, buildLabInput, emptyLabRow, labInputToRows } from "@/lib/materials/lab-rows";
import { checkAndDeriveLabTest } from "@/lib/materials/lab-derive";
import { fieldsToProblems, parseProblemKey, problemKey, problemsToFields } from "@/lib/materials/problem-keys";

const row = (normalStress: string, shearStress: string, specimen = "") => ({ specimen, normalStress, shearStress });

describe("buildLabInput", () => {
  test("buildLabInput(direct-shear) turns typed cells into numbers and drops trailing blank rows", () => {
    const out = buildLabInput(
      "direct-shear",
      [row("50", "36", "DS-1"), row("100", "59"), emptyLabRow("direct-shear")],
      { ...DEFAULT_LAB_OPTIONS, zeroCohesion: true },
    );
    expect(out).toEqual({
      ok: true,
      data: {
        tests: [
          { specimen: "DS-1", normalStress: 50, shearStress: 36 },
          { normalStress: 100, shearStress: 59 },
        ],
        zeroCohesion: true,
      },
    });
  });

  test("buildLabInput(...) reports each bad cell and a blank row between filled ones, by row", () => {
    const out = buildLabInput(
      "direct-shear",
      [row("50", "36"), emptyLabRow("direct-shear"), row("12,5", "x")],
      DEFAULT_LAB_OPTIONS,
    );
    expect(out.ok).toBe(false);
    if (out.ok) return;
    expect(out.problems.map((p) => [p.row, p.column])).toEqual([
      [2, null],
      [3, "normalStress"],
      [3, "shearStress"],
    ]);
    expect(out.problems[1].message).toMatch(/write 12.5/);
  });

  test("buildLabInput(compaction) reads the settings; a bad setting has no row", () => {
    const out = buildLabInput(
      "compaction",
      [{ specimen: "", moistureContent: "12", dryDensity: "1.7", bulkDensity: "" }],
      { ...DEFAULT_LAB_OPTIONS, specificGravity: "2.6x" },
    );
    expect(out.ok).toBe(false);
    if (!out.ok)
      expect(out.problems).toEqual([
        { row: null, column: "specificGravity", message: "Specific gravity of solids: '2.6x' is not a number." },
      ]);
  });

  test("labInputToRows(kind, data) gives back the table that built the input", () => {
    const rows = [row("50", "36", "A"), row("100", "59", "B")];
    const built = buildLabInput("direct-shear", rows, DEFAULT_LAB_OPTIONS);
    if (!built.ok) throw new Error("expected a clean input");
    expect(labInputToRows("direct-shear", built.data).rows).toEqual(rows);
  });
});

describe("checkAndDeriveLabTest", () => {
  test("checkAndDeriveLabTest(...) puts zod problems on the row and column of the table", () => {
    const out = checkAndDeriveLabTest("direct-shear", {
      tests: [
        { normalStress: 50, shearStress: 30 },
        { normalStress: -1, shearStress: 40 },
      ],
    });
    expect(out.ok).toBe(false);
    if (out.ok) return;
    expect(out.problems[0]).toMatchObject({ row: 2, column: "normalStress" });
    expect(out.problems[0].message).toMatch(/^test 2: Normal stress σn \(kPa\)/);
  });

  test("checkAndDeriveLabTest(...) reads the row back from lib/lab's own messages", () => {
    const out = checkAndDeriveLabTest("triaxial-cu", {
      space: "s-t",
      specimens: [
        { cellPressure: 300, deviatorStress: 150, porePressure: 200 },
        { specimen: "CU-2", cellPressure: 300, deviatorStress: 200, porePressure: 300 },
      ],
    });
    expect(out.ok).toBe(false);
    if (!out.ok)
      expect(out.problems).toEqual([
        { row: 2, column: "porePressure", message: "test 2 (CU-2): effective cell pressure σ3 − u must be positive" },
      ]);
  });
});

describe("problem keys", () => {
  test("problemKey and parseProblemKey round-trip rows, columns and settings", () => {
    expect(problemKey(3, "c")).toBe("row 3, column c");
    expect(parseProblemKey("row 3, column c")).toEqual({ row: 3, column: "c" });
    expect(parseProblemKey("row 7")).toEqual({ row: 7, column: null });
    expect(parseProblemKey("specificGravity")).toEqual({ row: null, column: "specificGravity" });
    const problems = [
      { row: 2, column: "phi", message: "too steep" },
      { row: null, column: null, message: "empty" },
    ];
    expect(fieldsToProblems(problemsToFields(problems))).toEqual(problems);
  });
});
