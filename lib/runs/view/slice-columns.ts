/**
 * The slice table's columns: header, unit, number format and value, shared by the table on
 * screen and its CSV so both always show the same thing. Sorting keeps empty values last.
 */
import type { SliceRow } from "@/lib/stability";

export type SliceMethod = "bishop" | "fellenius";

export type SliceColumnKey =
  | "index"
  | "xLeft"
  | "xRight"
  | "width"
  | "material"
  | "weight"
  | "alpha"
  | "baseLength"
  | "porePressure"
  | "c"
  | "phi"
  | "mAlpha"
  | "normal"
  | "resisting"
  | "driving"
  | "governs"
  | "sigmaFc"
  | "tauFc"
  | "kc"
  | "tau2"
  | "tauDrained";

/** A slice with its number counted from the first slice of the mass (1-based). */
export interface NumberedSlice {
  n: number;
  row: SliceRow;
}

export interface SliceColumn {
  key: SliceColumnKey;
  /** Header text without the unit. */
  label: string;
  /** Unit shown in brackets after the label; empty when dimensionless or text. */
  unit: string;
  /** Decimals for numbers; null for text. */
  decimals: number | null;
  value: (s: NumberedSlice, method: SliceMethod) => number | string | null;
}

const num = (v: number | null | undefined) => (v === null || v === undefined || !Number.isFinite(v) ? null : v);

/** What governs a slice's base in the final stage of a staged drawdown, in words. */
export function governingText(row: SliceRow): string {
  const st = row.stage;
  if (!st) return "";
  if (st.drainage === "fixed") return "su, every stage";
  if (st.drainage === "free-draining") return "free-draining";
  return st.governing === "undrained" ? "undrained (stage 2)" : "drained (stage 3)";
}

/**
 * Columns of a staged drawdown's slices (docs/engine.md §7(b)): the final-stage strength is a
 * total-stress strength on undrained bases (c = τff, φ = 0, no pore pressure) and c′, φ′ on
 * drained ones, so its columns are not headed c′, φ′; the stage-1 stresses and the stage
 * strengths follow.
 */
function stagedColumns(): SliceColumn[] {
  const st = (s: NumberedSlice) => s.row.stage;
  return [
    { key: "c", label: "c, final stage", unit: "kPa", decimals: 1, value: (s) => s.row.c },
    { key: "phi", label: "φ, final stage", unit: "°", decimals: 1, value: (s) => s.row.phi },
    { key: "governs", label: "Governing strength", unit: "", decimals: null, value: (s) => governingText(s.row) },
    { key: "sigmaFc", label: "σ′fc, stage 1", unit: "kPa", decimals: 1, value: (s) => num(st(s)?.sigmaFc) },
    { key: "tauFc", label: "τfc, stage 1", unit: "kPa", decimals: 1, value: (s) => num(st(s)?.tauFc) },
    { key: "kc", label: "Kc", unit: "", decimals: 2, value: (s) => num(st(s)?.kc) },
    { key: "tau2", label: "τ, stage 2", unit: "kPa", decimals: 1, value: (s) => num(st(s)?.tau2) },
    { key: "tauDrained", label: "τ drained, stage 3", unit: "kPa", decimals: 1, value: (s) => num(st(s)?.tauDrained) },
  ];
}

/** True when the slices come from a staged drawdown (they carry stage data). */
export function isStagedSlices(rows: readonly SliceRow[]): boolean {
  return rows.some((r) => r.stage !== undefined);
}

/**
 * Columns in display order. N′ and the resisting term follow the method the table shows; a staged
 * drawdown's slices get the stage columns in place of c′, φ′.
 */
export function sliceColumns(method: SliceMethod, staged = false): SliceColumn[] {
  const cols = baseColumns(method);
  if (!staged) return cols;
  const at = cols.findIndex((c) => c.key === "c");
  const u = cols.findIndex((c) => c.key === "porePressure");
  // Undrained bases carry total-stress strengths, so no pore pressure acts on them in the final stage.
  cols[u] = {
    ...cols[u],
    label: "u, final stage",
    value: (s) =>
      s.row.stage?.governing === "undrained" && s.row.stage.drainage !== "free-draining" ? null : s.row.porePressure,
  };
  return [...cols.slice(0, at), ...stagedColumns(), ...cols.slice(at + 2)];
}

function baseColumns(method: SliceMethod): SliceColumn[] {
  const m = method === "bishop" ? "Bishop" : "ordinary";
  return [
    // Not "#": a header starting with "#" would read as one of the comment lines.
    { key: "index", label: "Slice", unit: "", decimals: 0, value: (s) => s.n },
    { key: "xLeft", label: "x left", unit: "m", decimals: 2, value: (s) => s.row.xLeft },
    { key: "xRight", label: "x right", unit: "m", decimals: 2, value: (s) => s.row.xRight },
    { key: "width", label: "Width b", unit: "m", decimals: 2, value: (s) => s.row.xRight - s.row.xLeft },
    { key: "material", label: "Base material", unit: "", decimals: null, value: (s) => s.row.material },
    { key: "weight", label: "Weight W", unit: "kN/m", decimals: 1, value: (s) => s.row.weight },
    { key: "alpha", label: "Base angle α", unit: "°", decimals: 1, value: (s) => s.row.alpha },
    { key: "baseLength", label: "Base length l", unit: "m", decimals: 2, value: (s) => s.row.baseLength },
    { key: "porePressure", label: "Pore pressure u", unit: "kPa", decimals: 1, value: (s) => s.row.porePressure },
    { key: "c", label: "c′", unit: "kPa", decimals: 1, value: (s) => s.row.c },
    { key: "phi", label: "φ′", unit: "°", decimals: 1, value: (s) => s.row.phi },
    { key: "mAlpha", label: "mα", unit: "", decimals: 3, value: (s) => num(s.row.mAlpha) },
    {
      key: "normal",
      label: `N′ (${m})`,
      unit: "kN/m",
      decimals: 1,
      value: (s, md) => (md === "bishop" ? num(s.row.normalBishop) : num(s.row.normalOrdinary)),
    },
    {
      key: "resisting",
      label: `Resisting (${m})`,
      unit: "kN/m",
      decimals: 1,
      value: (s, md) => (md === "bishop" ? num(s.row.resistingBishop) : num(s.row.resistingOrdinary)),
    },
    { key: "driving", label: "Driving", unit: "kN/m", decimals: 1, value: (s) => s.row.driving },
  ];
}

/** Header text with its unit: `Weight W (kN/m)`. */
export function columnHeader(c: SliceColumn): string {
  return c.unit ? `${c.label} (${c.unit})` : c.label;
}

/** A cell as text: fixed decimals for numbers, an empty string for no value. */
export function formatCell(c: SliceColumn, v: number | string | null): string {
  if (v === null) return "";
  if (typeof v === "string") return v;
  const s = v.toFixed(c.decimals ?? 3);
  // "-0.0" reads as a sign error in a table; show it as zero.
  return /^-0(\.0*)?$/.test(s) ? s.slice(1) : s;
}

/** Numbers the slices 1…n in their order along the slip surface. */
export function numberSlices(rows: readonly SliceRow[]): NumberedSlice[] {
  return rows.map((row, i) => ({ n: i + 1, row }));
}

export type SortDirection = "ascending" | "descending";

/**
 * Slices sorted by a column; stable, with empty cells last in either direction.
 */
export function sortSlices(
  slices: readonly NumberedSlice[],
  column: SliceColumn,
  dir: SortDirection,
  method: SliceMethod,
): NumberedSlice[] {
  const sign = dir === "ascending" ? 1 : -1;
  return slices
    .map((s, i) => ({ s, i, v: column.value(s, method) }))
    .sort((a, b) => {
      if (a.v === null || b.v === null) return a.v === b.v ? a.i - b.i : a.v === null ? 1 : -1;
      const d = typeof a.v === "number" && typeof b.v === "number" ? a.v - b.v : String(a.v).localeCompare(String(b.v));
      return d !== 0 ? sign * d : a.i - b.i;
    })
    .map((x) => x.s);
}
