import { parseDecimal } from "@/lib/section-io";
import { LAB_KIND_INFO, LAB_ROW_NOUN, type LabTestKind } from "./lab-kinds";
import type { TableProblem } from "./problem-keys";

/** A row of the editable table: cell text keyed by column. */
export type LabRow = Record<string, string>;

/** The settings of a test set, as the form holds them (numbers still as typed text). */
export interface LabOptions {
  zeroCohesion: boolean;
  space: "p-q" | "s-t";
  /** CU triaxial: back pressure (kPa) on the datum of the cell and pore pressures. */
  backPressure: string;
  source: "uu" | "vane";
  model: "constant" | "linear";
  groundElevation: string;
  datumElevation: string;
  /** How vane readings are corrected: not at all, by a typed factor, or by Bjerrum's μ(PI). */
  vaneCorrection: "none" | "factor" | "bjerrum";
  vaneCorrectionFactor: string;
  vanePlasticityIndex: string;
  specificGravity: string;
  acceptancePercent: string;
  nonPlastic: boolean;
  permeabilityMethod: "constant-head" | "falling-head";
  /** Permeability: specimen length L, diameter D and standpipe diameter d (mm). */
  specimenLength: string;
  specimenDiameter: string;
  standpipeDiameter: string;
}

export const DEFAULT_LAB_OPTIONS: LabOptions = {
  zeroCohesion: false,
  space: "p-q",
  backPressure: "",
  source: "uu",
  model: "constant",
  groundElevation: "",
  datumElevation: "",
  vaneCorrection: "none",
  vaneCorrectionFactor: "",
  vanePlasticityIndex: "",
  specificGravity: "2.70",
  acceptancePercent: "95",
  nonPlastic: false,
  permeabilityMethod: "falling-head",
  specimenLength: "",
  specimenDiameter: "",
  standpipeDiameter: "",
};

/** A row with every cell blank. */
export function emptyLabRow(kind: LabTestKind): LabRow {
  return Object.fromEntries(LAB_KIND_INFO[kind].columns.map((c) => [c.key, ""]));
}

const isBlank = (row: LabRow) => Object.values(row).every((v) => v.trim() === "");

export type LabInputOutcome = { ok: true; data: Record<string, unknown> } | { ok: false; problems: TableProblem[] };

/**
 * Turns the typed table and settings into lib/lab's input for `kind`. Blank rows at the end are
 * dropped; a blank row between filled ones is a problem, so row numbers keep matching the table.
 * Cells that are not numbers are reported here; everything else is left to lib/lab's checks.
 */
export function buildLabInput(kind: LabTestKind, rows: readonly LabRow[], options: LabOptions): LabInputOutcome {
  const info = LAB_KIND_INFO[kind];
  const problems: TableProblem[] = [];
  let last = rows.length;
  while (last > 0 && isBlank(rows[last - 1])) last--;
  const used = rows.slice(0, info.rowsKey === null ? Math.min(last, 1) : last);

  const records = used.map((row, i) => {
    if (isBlank(row))
      problems.push({
        row: i + 1,
        column: null,
        message: `${LAB_ROW_NOUN} ${i + 1} is empty: fill it in or remove it.`,
      });
    const out: Record<string, unknown> = {};
    for (const col of info.columns) {
      const text = (row[col.key] ?? "").trim();
      if (text === "") continue;
      if (!col.numeric) {
        out[col.key] = text;
        continue;
      }
      const n = parseDecimal(text);
      if (n.ok) out[col.key] = n.value;
      else
        problems.push({ row: i + 1, column: col.key, message: `${LAB_ROW_NOUN} ${i + 1}: ${col.label}: ${n.message}` });
    }
    return out;
  });

  const setting = (name: string, text: string, label: string): number | undefined => {
    if (text.trim() === "") return undefined;
    const n = parseDecimal(text.trim());
    if (n.ok) return n.value;
    problems.push({ row: null, column: name, message: `${label}: ${n.message}` });
    return undefined;
  };

  let data: Record<string, unknown>;
  switch (kind) {
    case "direct-shear":
      data = { tests: records, zeroCohesion: options.zeroCohesion };
      break;
    case "triaxial-cu":
      data = {
        specimens: records,
        space: options.space,
        backPressure: setting("backPressure", options.backPressure, "Back pressure"),
      };
      break;
    case "undrained":
      data = {
        tests: records,
        source: options.source,
        model: options.model,
        groundElevation: setting("groundElevation", options.groundElevation, "Ground elevation"),
        datumElevation: setting("datumElevation", options.datumElevation, "Datum elevation"),
        vaneCorrectionFactor:
          options.source === "vane" && options.vaneCorrection === "factor"
            ? setting("vaneCorrectionFactor", options.vaneCorrectionFactor, "Vane correction factor")
            : undefined,
        vanePlasticityIndex:
          options.source === "vane" && options.vaneCorrection === "bjerrum"
            ? setting("vanePlasticityIndex", options.vanePlasticityIndex, "Plasticity index PI")
            : undefined,
      };
      if (options.source === "vane" && options.vaneCorrection === "bjerrum" && data.vanePlasticityIndex === undefined)
        problems.push({
          row: null,
          column: "vanePlasticityIndex",
          message: "Plasticity index PI: enter the clay's PI (%) for Bjerrum's μ, or choose no correction.",
        });
      break;
    case "compaction":
      data = {
        points: records,
        specificGravity: setting("specificGravity", options.specificGravity, "Specific gravity of solids"),
        acceptancePercent: setting("acceptancePercent", options.acceptancePercent, "Acceptance percentage"),
      };
      break;
    case "atterberg":
      data = { ...(records[0] ?? {}), nonPlastic: options.nonPlastic || undefined };
      break;
    case "permeability": {
      const falling = options.permeabilityMethod === "falling-head";
      // Each method reads only its own columns, so a stray cell of the other is not stored.
      const readings = records.map((r) => {
        const out = { ...r };
        delete out[falling ? "volume" : "headEnd"];
        return out;
      });
      data = {
        method: options.permeabilityMethod,
        length: setting("length", options.specimenLength, "Specimen length L"),
        diameter: setting("diameter", options.specimenDiameter, "Specimen diameter D"),
        standpipeDiameter: falling
          ? setting("standpipeDiameter", options.standpipeDiameter, "Standpipe diameter d")
          : undefined,
        readings,
      };
      break;
    }
  }
  // Unset settings are left out so the stored input shows only what the user gave.
  for (const k of Object.keys(data)) if (data[k] === undefined) delete data[k];
  return problems.length > 0 ? { ok: false, problems } : { ok: true, data };
}

/** The table and settings that show a stored input again (the reverse of {@link buildLabInput}). */
export function labInputToRows(
  kind: LabTestKind,
  data: Record<string, unknown>,
): { rows: LabRow[]; options: LabOptions } {
  const info = LAB_KIND_INFO[kind];
  const raw = info.rowsKey === null ? [data] : ((data[info.rowsKey] as Record<string, unknown>[] | undefined) ?? []);
  const rows = raw.map((r) =>
    Object.fromEntries(info.columns.map((c) => [c.key, r[c.key] === undefined ? "" : String(r[c.key])])),
  );
  const text = (v: unknown, fallback: string) => (v === undefined ? fallback : String(v));
  const options: LabOptions = {
    zeroCohesion: data.zeroCohesion === true,
    space: data.space === "s-t" ? "s-t" : "p-q",
    backPressure: text(data.backPressure, ""),
    source: data.source === "vane" ? "vane" : "uu",
    model: data.model === "linear" ? "linear" : "constant",
    groundElevation: text(data.groundElevation, ""),
    datumElevation: text(data.datumElevation, ""),
    vaneCorrection:
      data.vanePlasticityIndex !== undefined ? "bjerrum" : data.vaneCorrectionFactor !== undefined ? "factor" : "none",
    vaneCorrectionFactor: text(data.vaneCorrectionFactor, ""),
    vanePlasticityIndex: text(data.vanePlasticityIndex, ""),
    specificGravity: text(data.specificGravity, DEFAULT_LAB_OPTIONS.specificGravity),
    acceptancePercent: text(data.acceptancePercent, DEFAULT_LAB_OPTIONS.acceptancePercent),
    nonPlastic: data.nonPlastic === true,
    permeabilityMethod: data.method === "constant-head" ? "constant-head" : "falling-head",
    specimenLength: text(data.length, ""),
    specimenDiameter: text(data.diameter, ""),
    standpipeDiameter: text(data.standpipeDiameter, ""),
  };
  return { rows, options };
}
