import { RowReader, finish, readCsvTable, type CsvParseResult, type CsvProblem } from "./csv-read";
import { writeCsv, type CsvCell } from "./csv-write";
import { MATERIAL_MODELS, type SectionMaterial } from "./section-types";

export const MATERIAL_COLUMNS = [
  "id",
  "name",
  "model",
  "gamma",
  "gammaSat",
  "c",
  "phi",
  "su",
  "suGradient",
  "suDatum",
  "cR",
  "phiR",
  "freeDraining",
  "colour",
] as const;
type NumberColumn = "gamma" | "gammaSat" | "c" | "phi" | "su" | "suGradient" | "suDatum" | "cR" | "phiR";
type Model = (typeof MATERIAL_MODELS)[number];

/** Columns each model needs, may use, and ignores (docs/engine-io.md, `materials[].model`). */
const NEEDS: Record<Model, { required: NumberColumn[]; optional: NumberColumn[] }> = {
  // su on a drained material is its end-of-construction strength (docs/engine-io.md load case "undrained").
  // cR, phiR: the R envelope a staged drawdown needs (docs/engine-io.md `materials[].cR`, `phiR`).
  "mohr-coulomb": {
    required: ["gamma", "c", "phi"],
    optional: ["gammaSat", "su", "suGradient", "suDatum", "cR", "phiR"],
  },
  undrained: { required: ["gamma", "su"], optional: ["gammaSat", "suGradient", "suDatum"] },
  impenetrable: { required: [], optional: [] },
};
const NUMBER_COLUMNS: NumberColumn[] = ["gamma", "gammaSat", "c", "phi", "su", "suGradient", "suDatum", "cR", "phiR"];
const YES = new Set(["yes", "y", "true", "1"]);
const NO = new Set(["no", "n", "false", "0"]);
const HEX = /^#[0-9a-fA-F]{6}$/;
const GAMMA_W = 9.81;

/** Materials with the optional display names from the `name` column, keyed by id. */
export interface MaterialsCsvValue {
  materials: SectionMaterial[];
  names: Record<string, string>;
}

/**
 * Parses a materials CSV: header `id,name,model,gamma,gammaSat,c,phi,su,suGradient,suDatum,cR,phiR,
 * freeDraining,colour` (every column but id and model may be left out of the header);
 * `model` is mohr-coulomb (needs gamma, c, phi; cR and phiR together), undrained (gamma, su; suDatum
 * when suGradient is given) or impenetrable (nothing). freeDraining is yes or no (blank: no);
 * colour is #RRGGBB. Values are checked against docs/engine.md §1's bounds: outside the error range is a
 * problem, outside the usual range a warning. Ids must be unique.
 */
export function parseMaterialsCsv(text: string): CsvParseResult<MaterialsCsvValue> {
  const problems: CsvProblem[] = [];
  const warnings: CsvProblem[] = [];
  const table = readCsvTable(text, MATERIAL_COLUMNS, ["id", "model"], problems, warnings);
  const value: MaterialsCsvValue = { materials: [], names: {} };
  if (!table) return finish(value, [], problems, warnings);

  const idRows = new Map<string, number>();
  for (const row of table.rows) {
    const r = new RowReader(table, row, problems);
    const id = r.text("id");
    if (id === "") r.problem("id", "The material id is missing.");
    else if (idRows.has(id))
      r.problem("id", `Id '${id}' is already used on row ${idRows.get(id)}: each material needs its own id.`);
    else idRows.set(id, r.rowNumber);

    const modelText = r.text("model");
    const model = MATERIAL_MODELS.find((m) => m === modelText.toLowerCase());
    if (!model) {
      r.problem(
        "model",
        modelText === ""
          ? "The model is missing: use mohr-coulomb, undrained or impenetrable."
          : `Model '${modelText}' is not one of mohr-coulomb, undrained, impenetrable.`,
      );
      continue;
    }
    const extras = readExtras(r, model, warnings);
    const numbers = readNumbers(r, model, table.columns, problems, warnings);
    if (!numbers || !extras || id === "") continue;
    const material = { ...buildMaterial(id, model, numbers), ...extras } as SectionMaterial;
    checkBounds(r, material, warnings);
    value.materials.push(material);
    // defineProperty, not assignment: an id such as "__proto__" must stay an ordinary key.
    if (r.text("name") !== "")
      Object.defineProperty(value.names, id, {
        value: r.text("name"),
        enumerable: true,
        writable: true,
        configurable: true,
      });
  }
  return finish(value, table.rows, problems, warnings);
}

function readNumbers(
  r: RowReader,
  model: Model,
  columns: Map<string, number>,
  problems: CsvProblem[],
  warnings: CsvProblem[],
): Partial<Record<NumberColumn, number>> | null {
  const need = NEEDS[model];
  const before = problems.length;
  const out: Partial<Record<NumberColumn, number>> = {};
  for (const col of NUMBER_COLUMNS) {
    const required = need.required.includes(col);
    if (!columns.has(col)) {
      if (required) r.problem(col, `A ${model} material needs '${col}', but the header has no such column.`);
      continue;
    }
    if (!required && !need.optional.includes(col)) {
      if (r.has(col)) warnings.push(r.at(col, `'${col}' is not used by a ${model} material and was ignored.`));
      continue;
    }
    if (!required && !r.has(col)) continue;
    const v = r.number(col);
    if (v !== null) out[col] = v;
  }
  if (out.suGradient !== undefined && out.suDatum === undefined && !r.has("suDatum")) {
    r.problem("suDatum", "suDatum (the elevation where su applies) is needed when suGradient is given.");
  }
  if ((out.cR === undefined) !== (out.phiR === undefined) && (r.has("cR") || r.has("phiR"))) {
    const missing = out.cR === undefined ? "cR" : "phiR";
    r.problem(missing, "The R envelope needs both cR (kPa) and phiR (°), from the same consolidated-undrained tests.");
  }
  return problems.length > before ? null : out;
}

/** freeDraining (yes/no) and colour (#RRGGBB); null when a cell cannot be read. */
function readExtras(
  r: RowReader,
  model: Model,
  warnings: CsvProblem[],
): { freeDraining?: boolean; color?: string } | null {
  const out: { freeDraining?: boolean; color?: string } = {};
  let ok = true;
  const drain = r.text("freeDraining").trim().toLowerCase();
  if (drain !== "") {
    if (model === "impenetrable")
      warnings.push(r.at("freeDraining", "'freeDraining' is not used by an impenetrable material and was ignored."));
    else if (YES.has(drain)) out.freeDraining = true;
    else if (!NO.has(drain)) {
      r.problem("freeDraining", `'${r.text("freeDraining")}' is not yes or no.`);
      ok = false;
    }
  }
  const colour = r.text("colour").trim();
  if (colour !== "") {
    if (HEX.test(colour)) out.color = colour.toUpperCase();
    else {
      r.problem("colour", `'${colour}' is not a colour written as #RRGGBB (for example #CC6677).`);
      ok = false;
    }
  }
  return ok ? out : null;
}

function buildMaterial(id: string, model: Model, n: Partial<Record<NumberColumn, number>>): SectionMaterial {
  if (model === "impenetrable") return { id, model };
  if (model === "mohr-coulomb") {
    return {
      id,
      model,
      gamma: n.gamma as number,
      ...(n.gammaSat !== undefined && { gammaSat: n.gammaSat }),
      c: n.c as number,
      phi: n.phi as number,
      ...(n.su !== undefined && { su: n.su }),
      ...(n.suGradient !== undefined && { suGradient: n.suGradient }),
      ...(n.suDatum !== undefined && { suDatum: n.suDatum }),
      ...(n.cR !== undefined && { cR: n.cR }),
      ...(n.phiR !== undefined && { phiR: n.phiR }),
    };
  }
  return {
    id,
    model,
    gamma: n.gamma as number,
    ...(n.gammaSat !== undefined && { gammaSat: n.gammaSat }),
    su: n.su as number,
    ...(n.suGradient !== undefined && { suGradient: n.suGradient }),
    ...(n.suDatum !== undefined && { suDatum: n.suDatum }),
  };
}

/**
 * docs/engine.md §1 bounds (error / warning): γ ∉ (5, 30] / ∉ [14, 24]; γsat ≤ γw / < γ; c' < 0 / > 200; φ' ∉ [0, 60) /
 * > 45; su ≤ 0 / > 500.
 */
function checkBounds(r: RowReader, m: SectionMaterial, warnings: CsvProblem[]): void {
  if (m.model === "impenetrable") return;
  const warn = (col: string, message: string) => warnings.push(r.at(col, message));
  if (!(m.gamma > 5 && m.gamma <= 30)) r.problem("gamma", `γ = ${m.gamma} kN/m³ is outside (5, 30].`);
  else if (m.gamma < 14 || m.gamma > 24) warn("gamma", `γ = ${m.gamma} kN/m³ is unusual (14–24 is typical).`);
  if (m.gammaSat !== undefined) {
    if (!(m.gammaSat > GAMMA_W)) r.problem("gammaSat", `γsat = ${m.gammaSat} kN/m³ must exceed γw = ${GAMMA_W}.`);
    else if (m.gammaSat < m.gamma) warn("gammaSat", `γsat = ${m.gammaSat} is below γ = ${m.gamma}.`);
  }
  if (m.model === "mohr-coulomb") {
    if (m.c < 0) r.problem("c", `c' = ${m.c} kPa must not be negative.`);
    else if (m.c > 200) warn("c", `c' = ${m.c} kPa is unusually high (over 200).`);
    if (!(m.phi >= 0 && m.phi < 60)) r.problem("phi", `φ' = ${m.phi}° is outside [0, 60).`);
    else if (m.phi > 45) warn("phi", `φ' = ${m.phi}° is unusually high (over 45°).`);
    if (m.cR !== undefined && m.cR < 0) r.problem("cR", `cR = ${m.cR} kPa must not be negative.`);
    if (m.phiR !== undefined && !(m.phiR >= 0 && m.phiR < 60)) r.problem("phiR", `φR = ${m.phiR}° is outside [0, 60).`);
    return;
  }
  if (!(m.su > 0)) r.problem("su", `su = ${m.su} kPa must be positive.`);
  else if (m.su > 500) warn("su", `su = ${m.su} kPa is unusually high (over 500).`);
  if (m.suGradient !== undefined && m.suGradient < 0)
    r.problem(
      "suGradient",
      `suGradient = ${m.suGradient} kPa/m must not be negative: su rises with depth in this model.`,
    );
}

/** Writes materials as a CSV with the full header; `names` fills the name column. */
export function materialsToCsv(materials: readonly SectionMaterial[], names: Record<string, string> = {}): string {
  const rows = materials.map((m): CsvCell[] => {
    const get = (key: NumberColumn): number | undefined =>
      key in m ? (m as unknown as Record<string, number | undefined>)[key] : undefined;
    const drains = "freeDraining" in m && m.freeDraining ? "yes" : m.model === "impenetrable" ? undefined : "no";
    return [m.id, names[m.id] ?? "", m.model, ...NUMBER_COLUMNS.map((k) => get(k)), drains, m.color];
  });
  return writeCsv(MATERIAL_COLUMNS, rows);
}
