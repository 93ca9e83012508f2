import type { ZodError, ZodType } from "zod";
import {
  LabInputError,
  atterbergInputSchema,
  classifyAtterbergLimits,
  compactionInputSchema,
  deriveCompactionCurve,
  deriveDirectShearStrength,
  deriveTriaxialCuStrength,
  deriveUndrainedStrength,
  derivePermeability,
  directShearInputSchema,
  permeabilityInputSchema,
  triaxialCuInputSchema,
  undrainedStrengthInputSchema,
} from "@/lib/lab";
import { LAB_KIND_INFO, LAB_ROW_NOUN, type LabInputByKind, type LabTestKind, type LabTestRecord } from "./lab-kinds";
import type { TableProblem } from "./problem-keys";

const INPUT_SCHEMAS: { [K in LabTestKind]: ZodType<LabInputByKind[K]> } = {
  "direct-shear": directShearInputSchema,
  "triaxial-cu": triaxialCuInputSchema,
  undrained: undrainedStrengthInputSchema,
  compaction: compactionInputSchema,
  atterberg: atterbergInputSchema,
  permeability: permeabilityInputSchema,
};

export type LabDeriveOutcome =
  { ok: true; record: LabTestRecord; warnings: string[] } | { ok: false; problems: TableProblem[] };

/**
 * Checks a lab test set with lib/lab's zod schema, then derives its result with lib/lab.
 * Every problem comes back with the 1-based row it sits on, so a table can mark the cell;
 * the same function runs in the browser (preview) and on the server (before storing).
 */
export function checkAndDeriveLabTest(kind: LabTestKind, raw: unknown): LabDeriveOutcome {
  const parsed = INPUT_SCHEMAS[kind].safeParse(raw);
  if (!parsed.success) return { ok: false, problems: zodProblems(kind, parsed.error) };
  try {
    const record = derive(kind, parsed.data);
    return { ok: true, record, warnings: record.result.warnings };
  } catch (err) {
    if (err instanceof LabInputError) return { ok: false, problems: labProblems(err) };
    // lib/lab's fits throw plain Errors for degenerate data; they are still the user's input.
    if (err instanceof Error) return { ok: false, problems: [{ row: null, column: null, message: err.message }] };
    throw err;
  }
}

function derive(kind: LabTestKind, data: unknown): LabTestRecord {
  // `data` has passed INPUT_SCHEMAS[kind], so each cast below is the schema's own type.
  switch (kind) {
    case "direct-shear": {
      const d = data as LabInputByKind["direct-shear"];
      return { kind, data: d, result: deriveDirectShearStrength(d) };
    }
    case "triaxial-cu": {
      const d = data as LabInputByKind["triaxial-cu"];
      return { kind, data: d, result: deriveTriaxialCuStrength(d) };
    }
    case "undrained": {
      const d = data as LabInputByKind["undrained"];
      return { kind, data: d, result: deriveUndrainedStrength(d) };
    }
    case "compaction": {
      const d = data as LabInputByKind["compaction"];
      return { kind, data: d, result: deriveCompactionCurve(d) };
    }
    case "atterberg": {
      const d = data as LabInputByKind["atterberg"];
      return { kind, data: d, result: classifyAtterbergLimits(d) };
    }
    case "permeability": {
      const d = data as LabInputByKind["permeability"];
      return { kind, data: d, result: derivePermeability(d) };
    }
  }
}

function columnLabel(kind: LabTestKind, key: string): string {
  const col = LAB_KIND_INFO[kind].columns.find((c) => c.key === key);
  return col ? `${col.label}${col.unit ? ` (${col.unit})` : ""}` : key;
}

/** zod issues at ["tests", 2, "normalStress"] become "test 3: Normal stress σn (kPa): …" on row 3. */
function zodProblems(kind: LabTestKind, error: ZodError): TableProblem[] {
  const rowsKey = LAB_KIND_INFO[kind].rowsKey;
  return error.issues.map((issue) => {
    const [first, second, third] = issue.path;
    if (rowsKey !== null && first === rowsKey && typeof second === "number") {
      const column = typeof third === "string" ? third : null;
      const what = column ? `${columnLabel(kind, column)}: ` : "";
      return { row: second + 1, column, message: `${LAB_ROW_NOUN} ${second + 1}: ${what}${issue.message}` };
    }
    if (rowsKey === null && typeof first === "string") {
      return { row: 1, column: first, message: `sample: ${columnLabel(kind, first)}: ${issue.message}` };
    }
    const column = typeof first === "string" ? first : null;
    return { row: null, column, message: `${column ? `${columnLabel(kind, column)}: ` : ""}${issue.message}` };
  });
}

/** lib/lab writes "test 3 (S-3)" or "sample"; the row number is read back from that. */
function labProblems(err: LabInputError): TableProblem[] {
  return err.problems.map((p) => {
    const m = new RegExp(`^${LAB_ROW_NOUN} (\\d+)`).exec(p.where);
    const row = m ? Number(m[1]) : p.where.startsWith("sample") ? 1 : null;
    return { row, column: p.field || null, message: `${p.where}: ${p.message}` };
  });
}
