import { parseMaterialsCsv, type CsvPreviewRow, type CsvProblem, type SectionMaterial } from "@/lib/section-io";
import { MATERIAL_KEY_HINT, isMaterialKey } from "./keys";
import type { MaterialParameters } from "./parameters";
import type { TableProblem } from "./problem-keys";

/** A material read from a CSV row, ready to store. */
export interface ImportedMaterial {
  row: number;
  key: string;
  name: string;
  /** #RRGGBB from the colour column; absent when the file leaves it blank. */
  color?: string;
  parameters: MaterialParameters;
}

export interface MaterialsImportCheck {
  ok: boolean;
  materials: ImportedMaterial[];
  /** Every problem, by row and column; nothing is saved while there is one. */
  problems: CsvProblem[];
  warnings: CsvProblem[];
  preview: CsvPreviewRow[];
}

export const MAX_IMPORT_ROWS = 500;

/**
 * Reads a materials CSV (lib/section-io's format: id,name,model,gamma,…,cR,phiR,freeDraining,colour)
 * for the library. On top of the CSV's own checks, each id must be a material key and must not be
 * in the library already. Runs in the browser for the preview and again on the server.
 */
export function checkMaterialsImport(text: string, existingKeys: readonly string[]): MaterialsImportCheck {
  const parsed = parseMaterialsCsv(text);
  const problems: CsvProblem[] = parsed.ok ? [] : [...parsed.problems];
  const existing = new Set(existingKeys);
  const rowOf = new Map<string, CsvPreviewRow>();
  for (const row of parsed.preview) {
    const key = row.cells.id ?? "";
    if (!rowOf.has(key)) rowOf.set(key, row);
    if (key === "") continue;
    const at = { row: row.row, column: "id" };
    if (!isMaterialKey(key))
      problems.push({ ...at, message: `Id '${key}' is not a material key. ${MATERIAL_KEY_HINT}` });
    else if (existing.has(key))
      problems.push({
        ...at,
        message: `The library already has a material '${key}': rename it in the file or delete the one in the library.`,
      });
  }
  if (parsed.preview.length > MAX_IMPORT_ROWS)
    problems.push({
      row: parsed.preview[MAX_IMPORT_ROWS].row,
      column: null,
      message: `At most ${MAX_IMPORT_ROWS} materials can be imported at once.`,
    });
  problems.sort((a, b) => a.row - b.row);

  const materials: ImportedMaterial[] = parsed.ok
    ? parsed.value.materials.map((m) => ({
        row: rowOf.get(m.id)?.row ?? 0,
        key: m.id,
        name: parsed.value.names[m.id] ?? m.id,
        ...(m.color !== undefined && { color: m.color }),
        parameters: withoutId(m),
      }))
    : [];
  return {
    ok: problems.length === 0,
    materials: problems.length === 0 ? materials : [],
    problems,
    warnings: parsed.warnings,
    preview: parsed.preview,
  };
}

/** The library keeps id and colour in columns of their own, not among the parameters. */
function withoutId(m: SectionMaterial): MaterialParameters {
  const { id: _id, color: _color, ...rest } = m;
  return rest as MaterialParameters;
}

/** CSV problems in the shape the API's `fields` carry ("row 3, column c"). */
export function csvProblemsToTable(problems: readonly CsvProblem[]): TableProblem[] {
  return problems.map((p) => ({
    row: p.row,
    column: p.column,
    message: p.cell ? `${p.cell}: ${p.message}` : p.message,
  }));
}
