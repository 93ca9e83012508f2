/**
 * The slice table as CSV (RFC 4180: comma separated, CRLF line ends, fields with a comma,
 * quote or line break quoted with doubled quotes). Leading lines starting with `#` carry the
 * engineering caution and the run's details. Text that a spreadsheet would run as a formula
 * (starting with =, +, -, @, tab or carriage return) is prefixed with a single quote, as
 * the OWASP "CSV Injection" guidance advises.
 */
import { CAUTION_TEXT } from "../caution";
import {
  columnHeader,
  formatCell,
  isStagedSlices,
  numberSlices,
  sliceColumns,
  type SliceMethod,
} from "./slice-columns";
import { VARIANT_TEXT, stageLine, type StagedView } from "./staged-view";
import type { Circle, SliceRow } from "@/lib/stability";

/** What the leading comment lines say about the run. */
export interface SliceCsvMeta {
  /** Method whose N′ and resisting terms fill the table. */
  method: SliceMethod;
  /** Name of the run. */
  title?: string;
  /** Section name and version, as shown to the user. */
  section?: string;
  loadCase?: string;
  /** FS of each method the run used (null: no valid circle); a method left out was not run. */
  fs?: { bishop?: number | null; fellenius?: number | null };
  requiredFs?: number;
  circle?: Circle;
  ordinaryForm?: string;
  engineVersion?: string;
  /** When the run was made, ISO 8601. */
  runAt?: string;
  /** A staged drawdown's procedure and each method's stage factors. */
  staged?: StagedView | null;
}

const FORMULA_START = /^[=+\-@\t\r]/;

/** A text cell made safe from formula execution, then quoted if it needs to be. */
export function escapeCsvText(text: string): string {
  const safe = FORMULA_START.test(text) ? `'${text}` : text;
  return /[",\r\n]/.test(safe) ? `"${safe.replace(/"/g, '""')}"` : safe;
}

/** A comment line: one field starting with `#`, line breaks flattened. */
function commentLine(text: string): string {
  return escapeCsvText(`# ${text.replace(/[\r\n]+/g, " ")}`);
}

const fs3 = (v: number | null) => (v === null || !Number.isFinite(v) ? "no valid circle" : v.toFixed(3));

/** "Bishop 1.412; ordinary 1.329 (classical form)": every method the run used, none invented. */
function fsLine(fs: NonNullable<SliceCsvMeta["fs"]>, ordinaryForm: string | undefined): string {
  const parts: string[] = [];
  if (fs.bishop !== undefined) parts.push(`Bishop ${fs3(fs.bishop)}`);
  if (fs.fellenius !== undefined)
    parts.push(`ordinary ${fs3(fs.fellenius)}${ordinaryForm ? ` (${ordinaryForm} form)` : ""}`);
  return `FS: ${parts.join("; ")}`;
}

/** The FS of each method a run used, keyed as the CSV header wants it. */
export function runFs(
  methods: readonly SliceMethod[],
  run: { fsBishop: number | null; fsFellenius: number | null },
): NonNullable<SliceCsvMeta["fs"]> {
  return {
    ...(methods.includes("bishop") ? { bishop: run.fsBishop } : {}),
    ...(methods.includes("fellenius") ? { fellenius: run.fsFellenius } : {}),
  };
}

function metaLines(meta: SliceCsvMeta): string[] {
  const lines = [`Caution: ${CAUTION_TEXT}`];
  if (meta.title) lines.push(`Run: ${meta.title}`);
  if (meta.section) lines.push(`Section: ${meta.section}`);
  if (meta.loadCase) lines.push(`Load case: ${meta.loadCase}`);
  if (meta.runAt) lines.push(`Run at: ${meta.runAt}`);
  if (meta.engineVersion) lines.push(`Engine version: ${meta.engineVersion}`);
  lines.push(
    `Slice forces by: ${meta.method === "bishop" ? "Bishop's simplified method" : "ordinary method of slices"}`,
  );
  if (meta.fs && (meta.fs.bishop !== undefined || meta.fs.fellenius !== undefined))
    lines.push(fsLine(meta.fs, meta.ordinaryForm));
  if (meta.staged) {
    lines.push(`Staged rapid drawdown, ${VARIANT_TEXT[meta.staged.variant]}; the FS above is the final stage's`);
    for (const m of ["bishop", "fellenius"] as const)
      if (meta.staged.stages[m] !== undefined)
        lines.push(
          `Stages, ${m === "bishop" ? "Bishop" : "ordinary"}: ${stageLine(meta.staged.stages[m], meta.staged.variant)}`,
        );
  }
  if (meta.requiredFs !== undefined) lines.push(`Required FS: ${meta.requiredFs.toFixed(2)}`);
  if (meta.circle)
    lines.push(
      `Circle: centre (${meta.circle.xc.toFixed(2)}, ${meta.circle.yc.toFixed(2)}) m, radius ${meta.circle.r.toFixed(2)} m`,
    );
  lines.push("Units: lengths m, forces kN per metre run, pressures kPa, angles degrees");
  return lines;
}

/**
 * The slice table with its leading comment lines.
 * @returns CSV text with CRLF line ends and no byte-order mark
 */
export function sliceTableToCsv(rows: readonly SliceRow[], meta: SliceCsvMeta): string {
  const cols = sliceColumns(meta.method, isStagedSlices(rows));
  const out = metaLines(meta).map(commentLine);
  out.push(cols.map((c) => escapeCsvText(columnHeader(c))).join(","));
  for (const s of numberSlices(rows)) {
    out.push(
      cols
        .map((c) => {
          const v = c.value(s, meta.method);
          // Numbers come from our own formatting and may start with "-": only text is escaped.
          return typeof v === "string" ? escapeCsvText(v) : formatCell(c, v);
        })
        .join(","),
    );
  }
  return out.join("\r\n") + "\r\n";
}

/** A file name for the download, made of safe characters only. */
export function sliceCsvFileName(title: string | undefined, method: SliceMethod): string {
  const base =
    (title ?? "run")
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, "-")
      .replace(/^-+|-+$/g, "")
      .slice(0, 60) || "run";
  return `${base}-slices-${method === "bishop" ? "bishop" : "ordinary"}.csv`;
}
