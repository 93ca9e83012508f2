/**
 * The project's runs as CSV, one row per run, through the app's one writer
 * (lib/section-io/csv-write.ts), with a leading `#` caution line as the slice CSV has.
 */
import { CAUTION_TEXT } from "@/lib/caution";
import { LOADING_CONDITIONS } from "@/lib/analysis/required-fs";
import { writeCsv } from "@/lib/section-io/csv-write";
import { verdictOf } from "@/lib/runs/view/verdict";
import { statusWords, type RunStatus } from "@/lib/review/status";

export interface RunCsvRow {
  id: number;
  title: string;
  sectionName: string;
  sectionVersion: number;
  loadingCondition: string;
  face: string;
  methods: string[];
  requiredFs: number;
  fsBishop: number | null;
  fsFellenius: number | null;
  status: RunStatus;
  authorName: string;
  createdAt: string;
  reviewedByName: string | null;
  reviewedAt: string | null;
  revisesRunId: number | null;
  /** The reviewer's reason when the run was signed off below its required FS. */
  belowRequiredReason?: string | null;
}

const HEADERS = [
  "Run",
  "Title",
  "Section",
  "Section version",
  "Loading condition",
  "Face",
  "Methods",
  "Required FS",
  "FS Bishop",
  "FS ordinary",
  "Meets required FS",
  "Status",
  "Author",
  "Run at (UTC)",
  "Decided by",
  "Decided at (UTC)",
  "Revises run",
];

const fs3 = (v: number | null) => (v === null ? "" : v.toFixed(3));

function meets(r: RunCsvRow): string {
  const fss = [r.fsBishop, r.fsFellenius].filter((v): v is number => v !== null);
  if (fss.length === 0) return "";
  return fss.every((v) => verdictOf(v, r.requiredFs) === "pass") ? "yes" : "no";
}

export function runsToCsv(rows: readonly RunCsvRow[], projectName: string): string {
  const body = rows.map((r) => [
    String(r.id),
    r.title,
    r.sectionName,
    String(r.sectionVersion),
    LOADING_CONDITIONS.find((c) => c.key === r.loadingCondition)?.label ?? r.loadingCondition,
    r.face,
    r.methods.join(" "),
    r.requiredFs.toFixed(2),
    fs3(r.fsBishop),
    fs3(r.fsFellenius),
    meets(r),
    statusWords(r.status, Boolean(r.belowRequiredReason)),
    r.authorName,
    r.createdAt,
    r.reviewedByName ?? "",
    r.reviewedAt ?? "",
    r.revisesRunId ? String(r.revisesRunId) : "",
  ]);
  return writeCsv(HEADERS, body, { comments: [`Caution: ${CAUTION_TEXT}`, `Project: ${projectName}`] });
}
