/**
 * The slice table as CSV through the app's one writer (lib/section-io/csv-write.ts: RFC 4180,
 * formula escaping, byte-order mark). Leading lines starting with `#` carry the engineering
 * caution and the run's details.
 */
import { CAUTION_TEXT } from "@/lib/caution";
import {
  columnHeader,
  formatCell,
  isStagedSlices,
  numberSlices,
  sliceColumns,
  type SliceMethod,
} from "./slice-columns";
import { VARIANT_TEXT, stageLine, type StagedView } from "./staged-view";
import { writeCsv } from "@/lib/section-io/csv-write";
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

/** The slice table with its leading comment lines; numbers keep the table's own formatting. */
export function sliceTableToCsv(rows: readonly SliceRow[], meta: SliceCsvMeta): string {
  const cols = sliceColumns(meta.method, isStagedSlices(rows));
  const body = numberSlices(rows).map((s) =>
    cols.map((c) => {
      const v = c.value(s, meta.method);
      return typeof v === "string" ? v : formatCell(c, v);
    }),
  );
  return writeCsv(cols.map(columnHeader), body, { comments: metaLines(meta) });
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
