/**
 * The project's runs as CSV, one row per run, with the same conventions as the slice CSV
 * (lib/runs/slice-csv.ts): CRLF line ends, a leading `#` caution line, and text cells that a
 * spreadsheet would run as a formula (=, +, -, @) prefixed with a single quote.
 */
import { CAUTION_TEXT } from "../caution";
import { LOADING_CONDITIONS } from "../analysis/required-fs";
import { escapeCsvText } from "../runs/slice-csv";
import { verdictOf } from "../runs/verdict";
import { statusWords, type RunStatus } from "../review/status";

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

/** CSV text with CRLF line ends and no byte-order mark. */
export function runsToCsv(rows: readonly RunCsvRow[], projectName: string): string {
  const out = [
    escapeCsvText(`# Caution: ${CAUTION_TEXT}`),
    escapeCsvText(`# Project: ${projectName.replace(/[\r\n]+/g, " ")}`),
    HEADERS.join(","),
  ];
  for (const r of rows) {
    const text = [
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
    ];
    out.push(text.map(escapeCsvText).join(","));
  }
  return out.join("\r\n") + "\r\n";
}
