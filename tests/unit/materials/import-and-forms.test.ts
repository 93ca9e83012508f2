import { describe, expect, test } from "vitest";
import { checkMaterialsImport, csvProblemsToTable } from "@/lib/materials/import-check";
import { libraryToCsv, toEngineMaterial } from "@/lib/materials/engine-material";
import { checkMaterialParameters } from "@/lib/materials/parameters";
import { formValuesFrom, formatValue, parametersFromForm } from "@/lib/materials/parameter-form";
import { isMaterialKey, suggestMaterialKey } from "@/lib/materials/keys";
import { MATERIAL_COLORS, pickMaterialColor, pickMaterialColors } from "@/lib/materials/palette";
import { labCsvTemplate, parseLabCsv } from "@/lib/materials/lab-csv";

const HEADER = "id,name,model,gamma,gammaSat,c,phi,su,suGradient,suDatum";

describe("checkMaterialsImport", () => {
  test("checkMaterialsImport(csv, keys) reads a clean file into materials with their rows", () => {
    const check = checkMaterialsImport(
      [HEADER, "core,Core clay,mohr-coulomb,19,20,8,27,,,", "rock,,impenetrable,,,,,,,"].join("\n"),
      [],
    );
    expect(check.ok).toBe(true);
    expect(check.materials).toEqual([
      {
        row: 2,
        key: "core",
        name: "Core clay",
        parameters: { model: "mohr-coulomb", gamma: 19, gammaSat: 20, c: 8, phi: 27 },
      },
      { row: 3, key: "rock", name: "rock", parameters: { model: "impenetrable" } },
    ]);
  });

  test("checkMaterialsImport(...) lists a non-slug id and a key already in the library with the CSV's own problems", () => {
    const check = checkMaterialsImport(
      [HEADER, "Core,x,impenetrable,,,,,,,", "rock,x,impenetrable,,,,,,,", "soft,x,undrained,17,,,,-5,,"].join("\n"),
      ["rock"],
    );
    expect(check.ok).toBe(false);
    expect(check.materials).toEqual([]);
    expect(check.problems.map((p) => [p.row, p.column])).toEqual([
      [2, "id"],
      [3, "id"],
      [4, "su"],
    ]);
    expect(csvProblemsToTable(check.problems)[2].message).toMatch(/^H4: /);
  });

  test("libraryToCsv(materials) is read back by the import unchanged", () => {
    const lib = [
      {
        key: "core",
        name: "Core, zone 1",
        color: "#CC6677",
        parameters: { model: "undrained" as const, gamma: 17, su: 25, suGradient: 1.5, suDatum: 10 },
      },
    ];
    const back = checkMaterialsImport(libraryToCsv(lib), []);
    expect(back.materials).toEqual([
      { row: 2, key: "core", name: "Core, zone 1", color: "#CC6677", parameters: lib[0].parameters },
    ]);
    expect(toEngineMaterial(lib[0])).toEqual({
      id: "core",
      name: "Core, zone 1",
      color: "#CC6677",
      ...lib[0].parameters,
    });
  });
});

describe("checkMaterialParameters", () => {
  test("checkMaterialParameters(...) applies docs/engine.md §1: γsat must exceed γw, φ' below 60°; γ 25 only warns", () => {
    const out = checkMaterialParameters("core", { model: "mohr-coulomb", gamma: 25, gammaSat: 9.5, c: 5, phi: 60 });
    expect(Object.keys(out.errors).sort()).toEqual(["parameters.gammaSat", "parameters.phi"]);
    expect(out.warnings.map((w) => w.path)).toEqual(["parameters.gamma"]);
    expect(checkMaterialParameters("rock", { model: "impenetrable" }).errors).toEqual({});
  });
});

describe("parameter form", () => {
  test("parametersFromForm(values) keeps only the model's fields and refuses a decimal comma", () => {
    const values = {
      ...formValuesFrom({ model: "mohr-coulomb", gamma: 19, c: 8, phi: 27, su: 60 }),
      model: "undrained" as const,
    };
    expect(parametersFromForm(values)).toEqual({ ok: true, parameters: { model: "undrained", gamma: 19, su: 60 } });
    const bad = parametersFromForm({ ...values, su: "60,5" });
    expect(bad.ok).toBe(false);
    if (!bad.ok) expect(bad.fields["parameters.su"][0]).toMatch(/60.5/);
    expect(formatValue(-0.04, 1)).toBe("0.0");
    expect(formatValue(undefined)).toBe("—");
  });
});

describe("keys and colours", () => {
  test("suggestMaterialKey(name) makes a valid key from a name", () => {
    expect(suggestMaterialKey("Compacted clay fill (zone 2)")).toBe("compacted-clay-fill-zone-2");
    expect(suggestMaterialKey("2nd Drain")).toBe("nd-drain");
    expect(isMaterialKey("core-1")).toBe(true);
    expect(isMaterialKey("Core")).toBe(false);
    expect(isMaterialKey(`a${"b".repeat(60)}`)).toBe(false);
  });

  test("pickMaterialColor(used) takes the first free palette colour and cycles when all are used", () => {
    expect(pickMaterialColor([])).toBe(MATERIAL_COLORS[0]);
    expect(pickMaterialColor([MATERIAL_COLORS[0].toLowerCase()])).toBe(MATERIAL_COLORS[1]);
    expect(pickMaterialColors([], 3)).toEqual(MATERIAL_COLORS.slice(0, 3));
    expect(pickMaterialColor([...MATERIAL_COLORS])).toBe(MATERIAL_COLORS[0]);
  });
});

describe("lab CSV", () => {
  test("parseLabCsv(kind, labCsvTemplate(kind)) reads each kind's own template", () => {
    for (const kind of ["direct-shear", "triaxial-cu", "undrained", "compaction", "atterberg"] as const) {
      expect(parseLabCsv(kind, labCsvTemplate(kind)).ok).toBe(true);
    }
  });

  test("parseLabCsv(...) names the cell of a bad number", () => {
    const out = parseLabCsv("direct-shear", "specimen,normalStress,shearStress\nA,50,36\nB,1OO,59");
    expect(out.ok).toBe(false);
    if (!out.ok)
      expect(out.problems).toEqual([{ row: 3, column: "normalStress", cell: "B3", message: "'1OO' is not a number." }]);
  });
});
