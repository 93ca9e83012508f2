import { describe, expect, test } from "vitest";
import { csvTemplates, materialsToCsv, parseMaterialsCsv, parsePhreaticCsv, phreaticToCsv } from "@/lib/section-io";

describe("parsePhreaticCsv (docs/engine-io.md water.phreatic; docs/engine.md §1: x increasing)", () => {
  test("reads x,y rows into [x, y][] and accepts semicolons and exponents", () => {
    const r = parsePhreaticCsv("x;y\n0;18\n30.5;14\n6e1;1e1\n");
    expect(r.ok && r.value).toEqual([
      [0, 18],
      [30.5, 14],
      [60, 10],
    ]);
  });

  test("x not increasing is reported at the offending row's x cell", () => {
    const r = parsePhreaticCsv("x,y\n0,18\n30,14\n30,12\n20,11\n");
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.problems).toEqual([
      {
        row: 4,
        column: "x",
        cell: "A4",
        message: "x = 30 is not greater than x = 30 on row 3: list the points left to right without repeats.",
      },
      { row: 5, column: "x", cell: "A5", message: expect.stringMatching(/x = 20 is not greater than x = 30 on row 3/) },
    ]);
  });

  test("one point, an empty file, text cells and a missing column are all reported", () => {
    const one = parsePhreaticCsv("x,y\n0,1\n");
    expect(!one.ok && one.problems).toEqual([
      { row: 2, column: null, message: "A phreatic line needs at least 2 points." },
    ]);
    const empty = parsePhreaticCsv("");
    expect(!empty.ok && empty.problems[0]).toMatchObject({ row: 1, column: null });
    const text = parsePhreaticCsv("x,y\n0,high\n1,2\n");
    expect(!text.ok && text.problems).toEqual([
      { row: 2, column: "y", cell: "B2", message: "'high' is not a number." },
    ]);
    const noY = parsePhreaticCsv("x\n0\n1\n");
    expect(!noY.ok && noY.problems).toEqual([{ row: 1, column: "y", message: expect.stringMatching(/missing/) }]);
    const inf = parsePhreaticCsv("x,y\n0,Infinity\n1,NaN\n");
    expect(!inf.ok && inf.problems.map((p) => p.cell)).toEqual(["B2", "B3"]);
  });

  test("phreaticToCsv writes negative elevations as plain numbers", () => {
    expect(
      phreaticToCsv([
        [-5, -1.25],
        [10, 0],
      ]),
    ).toBe("\uFEFFx,y\r\n-5,-1.25\r\n10,0\r\n");
    expect(parsePhreaticCsv(csvTemplates.phreatic).ok).toBe(true);
  });
});

const HEADER = "id,name,model,gamma,gammaSat,c,phi,su,suGradient,suDatum";

describe("parseMaterialsCsv (docs/engine-io.md materials; bounds of docs/engine.md §1)", () => {
  test("reads each model with only the fields it uses, names kept aside", () => {
    const text = [
      HEADER,
      "fill,Fill,mohr-coulomb,19.5,20.5,8,28,,,",
      "soft,Soft clay,undrained,17,,,,25,1.5,10",
      "rock,,impenetrable,,,,,,,",
    ].join("\n");
    const r = parseMaterialsCsv(text);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    // The document of docs/engine-io.md's example, field for field.
    expect(r.value.materials).toEqual([
      { id: "fill", model: "mohr-coulomb", gamma: 19.5, gammaSat: 20.5, c: 8, phi: 28 },
      { id: "soft", model: "undrained", gamma: 17, su: 25, suGradient: 1.5, suDatum: 10 },
      { id: "rock", model: "impenetrable" },
    ]);
    expect(r.value.names).toEqual({ fill: "Fill", soft: "Soft clay" });
    expect(r.warnings).toEqual([]);
  });

  test("columns a model does not need may be left out of the header", () => {
    const r = parseMaterialsCsv("id;model;gamma;c;phi\nfill;Mohr-Coulomb;19;0;32\n");
    expect(r.ok && r.value.materials).toEqual([{ id: "fill", model: "mohr-coulomb", gamma: 19, c: 0, phi: 32 }]);
  });

  test("a wrong model, a duplicate id and a missing id are reported at their cells", () => {
    const text = [
      HEADER,
      "fill,,MC,19,,5,30,,,",
      "clay,,undrained,17,,,,20,,",
      "clay,,undrained,17,,,,30,,",
      ",,impenetrable,,,,,,,",
    ].join("\n");
    const r = parseMaterialsCsv(text);
    expect(!r.ok && r.problems).toEqual([
      {
        row: 2,
        column: "model",
        cell: "C2",
        message: "Model 'MC' is not one of mohr-coulomb, undrained, impenetrable.",
      },
      {
        row: 4,
        column: "id",
        cell: "A4",
        message: "Id 'clay' is already used on row 3: each material needs its own id.",
      },
      { row: 5, column: "id", cell: "A5", message: "The material id is missing." },
    ]);
  });

  test("a value the model requires is reported when blank, when not a number, and when its column is absent", () => {
    const r = parseMaterialsCsv(
      [
        HEADER,
        "fill,,mohr-coulomb,19,,,30,,,",
        "clay,,undrained,17,,,,12,5,,",
        "bank,,mohr-coulomb,19,,5,thirty,,,",
      ].join("\n"),
    );
    expect(!r.ok && r.problems).toEqual([
      { row: 2, column: "c", cell: "F2", message: "A number is needed here." },
      { row: 3, column: "suDatum", cell: "J3", message: expect.stringMatching(/suDatum.*needed when suGradient/) },
      { row: 4, column: "phi", cell: "G4", message: "'thirty' is not a number." },
    ]);
    const noPhi = parseMaterialsCsv("id,model,gamma,c\nfill,mohr-coulomb,19,5\n");
    expect(!noPhi.ok && noPhi.problems).toEqual([
      { row: 2, column: "phi", message: expect.stringMatching(/needs 'phi'.*no such column/) },
    ]);
  });

  test("values outside docs/engine.md §1's error bounds are problems; outside the usual range, warnings", () => {
    const bad = parseMaterialsCsv([HEADER, "a,,mohr-coulomb,35,9,-1,60,,,", "b,,undrained,17,,,,0,-1,5"].join("\n"));
    expect(!bad.ok && bad.problems.map((p) => p.cell)).toEqual(["D2", "E2", "F2", "G2", "H3", "I3"]);
    const odd = parseMaterialsCsv([HEADER, "a,,mohr-coulomb,25,24,250,50,,,", "b,,undrained,17,,,,600,,"].join("\n"));
    expect(odd.ok).toBe(true);
    expect(odd.warnings.map((w) => w.cell)).toEqual(["D2", "E2", "F2", "G2", "H3"]);
  });

  test("values a model ignores are warnings at their cells", () => {
    const r = parseMaterialsCsv([HEADER, "rock,,impenetrable,22,,,,,,", "clay,,undrained,17,,5,,20,,"].join("\n"));
    expect(r.ok).toBe(true);
    expect(r.warnings.map((w) => [w.row, w.column])).toEqual([
      [2, "gamma"],
      [3, "c"],
    ]);
  });

  test("an empty file and a header-only file are reported", () => {
    const empty = parseMaterialsCsv("\uFEFF");
    expect(!empty.ok && empty.problems).toEqual([{ row: 1, column: null, message: expect.stringMatching(/empty/) }]);
    const header = parseMaterialsCsv(HEADER + "\n");
    expect(!header.ok && header.problems[0].row).toBe(2);
  });

  test("materialsToCsv writes the full header, blank cells for absent fields, and guards text only", () => {
    const text = materialsToCsv(
      [{ id: "-weak", model: "undrained", gamma: 17, su: 20, suGradient: 1.2, suDatum: -3 }],
      { "-weak": "@layer" },
    );
    expect(text.split("\r\n")).toEqual([
      `\uFEFF${HEADER},cR,phiR,freeDraining,colour`,
      `"'-weak","'@layer",undrained,17,,,,20,1.2,-3,,,no,`,
      "",
    ]);
    expect(parseMaterialsCsv(csvTemplates.materials).ok).toBe(true);
  });
});

describe("materials CSV: R envelope, free drainage and colour, so an imported section can run staged drawdown", () => {
  const FULL = `${HEADER},cR,phiR,freeDraining,colour`;

  test("reads cR, phiR, freeDraining and colour, and writes them back unchanged", () => {
    const text = [
      FULL,
      "core,Clay core,mohr-coulomb,19,20,10,26,,,,22,15,no,#cc6677",
      "filter,Filter gravel,mohr-coulomb,20,21,0,36,,,,,,yes,#DDCC77",
      "rock,Bedrock,impenetrable,,,,,,,,,,,#DDDDDD",
    ].join("\n");
    const r = parseMaterialsCsv(text);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.value.materials).toEqual([
      {
        id: "core",
        model: "mohr-coulomb",
        gamma: 19,
        gammaSat: 20,
        c: 10,
        phi: 26,
        cR: 22,
        phiR: 15,
        color: "#CC6677",
      },
      {
        id: "filter",
        model: "mohr-coulomb",
        gamma: 20,
        gammaSat: 21,
        c: 0,
        phi: 36,
        freeDraining: true,
        color: "#DDCC77",
      },
      { id: "rock", model: "impenetrable", color: "#DDDDDD" },
    ]);
    const again = parseMaterialsCsv(materialsToCsv(r.value.materials, r.value.names));
    expect(again.ok && again.value.materials).toEqual(r.value.materials);
  });

  test("half an R envelope, a word that is not yes or no, and a colour name are each reported at their cell", () => {
    const text = [
      FULL,
      "core,,mohr-coulomb,19,20,10,26,,,,22,,no,",
      "filter,,mohr-coulomb,20,21,0,36,,,,,,perhaps,",
      "shell,,mohr-coulomb,20,21,0,34,,,,,,,red",
    ].join("\n");
    const r = parseMaterialsCsv(text);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.problems.map((p) => [p.row, p.column])).toEqual([
      [2, "phiR"],
      [3, "freeDraining"],
      [4, "colour"],
    ]);
    expect(r.problems[0].message).toMatch(/needs both cR \(kPa\) and phiR/);
  });

  test("files without the new columns still read (older exports)", () => {
    const r = parseMaterialsCsv([HEADER, "fill,Fill,mohr-coulomb,19.5,20.5,8,28,,,"].join("\n"));
    expect(r.ok).toBe(true);
  });
});
