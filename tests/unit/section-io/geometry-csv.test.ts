import { describe, expect, test } from "vitest";
import { csvTemplates, geometryToCsv, parseGeometryCsv } from "@/lib/section-io";

function problemsOf(text: string, options?: Parameters<typeof parseGeometryCsv>[1]) {
  const r = parseGeometryCsv(text, options);
  if (r.ok) throw new Error("expected problems");
  return r.problems;
}

describe("parseGeometryCsv: well-formed files (shape of docs/engine-io.md regions)", () => {
  test("parseGeometryCsv(text) gives {material, points}[] with the material taken from each region's first row", () => {
    const text =
      "region,material,x,y\nbank,fill,0,0\nbank,,20,0\nbank,,10,5\nbed,clay,0,0\nbed,clay,20,0\nbed,,20,-4\nbed,,0,-4\n";
    const r = parseGeometryCsv(text);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.value).toEqual([
      {
        name: "bank",
        material: "fill",
        points: [
          [0, 0],
          [20, 0],
          [10, 5],
        ],
      },
      {
        name: "bed",
        material: "clay",
        points: [
          [0, 0],
          [20, 0],
          [20, -4],
          [0, -4],
        ],
      },
    ]);
    expect(r.preview[0]).toEqual({ row: 2, cells: { region: "bank", material: "fill", x: "0", y: "0" } });
    expect(r.warnings).toEqual([]);
  });

  test("semicolons, a BOM, CRLF, blank lines and trailing spaces are accepted; rows keep their spreadsheet numbers", () => {
    const text =
      "\uFEFFRegion ; Material ; X ; Y\r\n\r\nbank ; fill ; 0 ; 0\r\nbank;;20.5;0\r\n\r\nbank;;10;5.25  \r\n";
    const r = parseGeometryCsv(text);
    expect(r.ok && r.value).toEqual([
      {
        name: "bank",
        material: "fill",
        points: [
          [0, 0],
          [20.5, 0],
          [10, 5.25],
        ],
      },
    ]);
    expect(r.preview.map((p) => p.row)).toEqual([3, 4, 6]);
  });

  test("a repeated closing point is dropped with a warning (docs/engine-io.md: first point not repeated)", () => {
    const r = parseGeometryCsv("region,material,x,y\nA,m,0,0\nA,,4,0\nA,,0,3\nA,,0,0\n");
    expect(r.ok && r.value[0].points).toEqual([
      [0, 0],
      [4, 0],
      [0, 3],
    ]);
    expect(r.warnings).toEqual([expect.objectContaining({ row: 5 })]);
  });

  test("map-grid coordinates keep a small region's area (regression: a fast-check counterexample lost 0.125 m² to cancellation)", () => {
    const r = parseGeometryCsv(
      "region,material,x,y\nA,m,-2652274.66,-758498409.2\nA,,-2652274.16,-758498409.2\nA,,-2652274.66,-758498408.7\n",
    );
    expect(r.ok).toBe(true);
  });

  test("the downloadable template parses cleanly", () => {
    const r = parseGeometryCsv(csvTemplates.geometry);
    expect(r.ok).toBe(true);
    expect(r.warnings).toEqual([]);
  });
});

describe("parseGeometryCsv: every problem with its row and column", () => {
  test("an empty file (or only blank lines) asks for the header on row 1", () => {
    expect(problemsOf("")).toEqual([
      { row: 1, column: null, message: expect.stringMatching(/empty.*region,material,x,y/) },
    ]);
    expect(problemsOf("\uFEFF\n\n  \n")[0].row).toBe(1);
  });

  test("a header without data rows is reported on row 2", () => {
    expect(problemsOf("region,material,x,y\n")).toEqual([
      { row: 2, column: null, message: expect.stringMatching(/no data rows/) },
    ]);
  });

  test("a missing column is reported on the header row by name", () => {
    expect(problemsOf("region,material,x\nA,m,0\nA,,1\nA,,2\n")).toEqual([
      { row: 1, column: "y", message: expect.stringMatching(/'y' is missing/) },
    ]);
  });

  test("non-numeric and decimal-comma cells name their cell (C3, D4)", () => {
    const problems = problemsOf("region;material;x;y\nA;m;0;0\nA;;abc;0\nA;;1;12,5\n");
    expect(problems).toEqual([
      { row: 3, column: "x", cell: "C3", message: "'abc' is not a number." },
      { row: 4, column: "y", cell: "D4", message: "'12,5' uses a comma as the decimal mark: write 12.5." },
    ]);
  });

  test("a decimal comma in a comma-separated file shows up as an extra cell on that row", () => {
    const problems = problemsOf("region,material,x,y\nA,m,0,0\nA,,12,5,3\nA,,1,4\n");
    expect(problems).toEqual([
      { row: 3, column: null, message: expect.stringMatching(/5 cells but the header has 4.*decimal comma/) },
    ]);
  });

  test("an empty numeric cell is a problem at its cell", () => {
    expect(problemsOf("region,material,x,y\nA,m,0,0\nA,,,1\nA,,2,2\n")).toEqual([
      { row: 3, column: "x", cell: "C3", message: "A number is needed here." },
    ]);
  });

  test("a region with 2 points is reported on its first row, column region", () => {
    expect(problemsOf("region,material,x,y\nA,m,0,0\nA,m,1,0\nB,m,0,0\nB,,1,0\nB,,0,1\n")).toEqual([
      { row: 2, column: "region", message: "Region 'A' has 2 points; a region needs at least 3." },
    ]);
  });

  test("a region whose rows are split by another region is reported where it comes back", () => {
    const problems = problemsOf("region,material,x,y\nA,m,0,0\nA,,1,0\nB,m,5,5\nB,,6,5\nB,,6,6\nA,,0,1\n");
    expect(problems).toEqual([
      { row: 7, column: "region", cell: "A7", message: expect.stringMatching(/continues here.*began on row 2/) },
    ]);
  });

  test("a region without a material on its first row, or with a conflicting one later, is reported", () => {
    expect(problemsOf("region,material,x,y\nA,,0,0\nA,m,1,0\nA,,0,1\n")).toEqual([
      { row: 2, column: "material", cell: "B2", message: "Region 'A' needs a material on its first row." },
      { row: 3, column: "material", cell: "B3", message: expect.stringMatching(/differs/) },
    ]);
    expect(problemsOf("region,material,x,y\nA,m,0,0\nA,n,1,0\nA,,0,1\n")).toEqual([
      {
        row: 3,
        column: "material",
        cell: "B3",
        message: "Material 'n' differs from 'm' given for region 'A' on row 2.",
      },
    ]);
  });

  test("a missing region name, collinear points and an unknown material are reported", () => {
    expect(problemsOf("region,material,x,y\n,m,0,0\n")[0]).toMatchObject({ row: 2, column: "region", cell: "A2" });
    expect(problemsOf("region,material,x,y\nA,m,0,0\nA,,1,1\nA,,2,2\n")).toEqual([
      { row: 2, column: "region", message: expect.stringMatching(/no area/) },
    ]);
    expect(problemsOf("region,material,x,y\nA,rock,0,0\nA,,1,0\nA,,0,1\n", { knownMaterialIds: ["fill"] })).toEqual([
      { row: 2, column: "material", message: expect.stringMatching(/'rock'.*does not define/) },
    ]);
  });

  test("an unclosed quote is reported rather than swallowed (RFC 4180 quoting)", () => {
    const r = parseGeometryCsv('region,material,x,y\n"A,m,0,0\nA,,1,0\nA,,0,1\n');
    expect(r.ok).toBe(false);
  });

  test("an unknown column is a warning, not a problem", () => {
    const r = parseGeometryCsv("region,material,x,y,note\nA,m,0,0,x\nA,,1,0,\nA,,0,1,\n");
    expect(r.ok).toBe(true);
    expect(r.warnings).toEqual([{ row: 1, column: "note", cell: "E1", message: expect.stringMatching(/not used/) }]);
  });
});

describe("geometryToCsv", () => {
  test("negative coordinates stay numbers while text starting with - is guarded (OWASP CSV injection)", () => {
    const text = geometryToCsv(
      [
        {
          material: "-fill",
          points: [
            [-1.5, -2],
            [3, 0],
            [0, 4],
          ],
        },
      ],
      ["=bank"],
    );
    // papaparse quotes the cells it escapes; the file starts with a byte-order mark and ends with CRLF.
    expect(text.split("\r\n")).toEqual([
      "\uFEFFregion,material,x,y",
      `"'=bank","'-fill",-1.5,-2`,
      `"'=bank","'-fill",3,0`,
      `"'=bank","'-fill",0,4`,
      "",
    ]);
    const back = parseGeometryCsv(text);
    expect(back.ok && back.value).toEqual([
      {
        name: "=bank",
        material: "-fill",
        points: [
          [-1.5, -2],
          [3, 0],
          [0, 4],
        ],
      },
    ]);
  });

  test("labels must be unique", () => {
    const square = {
      material: "m",
      points: [
        [0, 0],
        [1, 0],
        [0, 1],
      ] as [number, number][],
    };
    expect(() => geometryToCsv([square, square], ["A", "A"])).toThrow(/unique/);
  });
});
