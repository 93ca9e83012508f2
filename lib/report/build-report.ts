/**
 * The calculation report of one run as a PDF: what was analysed, how, what it gave against the
 * required FS, the drawing, the slices, the warnings, and where the review stands.
 * Pure: the route gathers the records; this only lays them out.
 */
import type { GridSearchSuccess, Radii, SectionDocument, SliceRow } from "@/lib/stability";
import type { RunSetup } from "@/lib/analysis/run-setup";
import { LOADING_CONDITIONS } from "@/lib/analysis/required-fs";
import { CAUTION_TEXT } from "@/lib/caution";
import { formatFs, verdictOf, verdictWords } from "@/lib/runs/view/verdict";
import { METHOD_NAME, describeWarnings, ordinaryFormText, rejectionList } from "@/lib/runs/view/warning-text";
import { fullChecklist, type ChecklistEntry } from "@/lib/review/checklist";
import { STATUS_WORDS, statusWords, type RunStatus } from "@/lib/review/status";
import type { MaterialSourceRecord } from "@/lib/review/material-sources";
import { ALARM, MOSS, ReportWriter, SOFT, INK } from "./report-writer";
import { drawSection } from "./section-drawing";
import { runSeepage, seepageUsedText, waterUsedText } from "@/lib/runs/view/water-used";
import { writeSliceTable } from "./slice-pages";
import { VARIANT_TEXT, stageCells, stagedView } from "@/lib/runs/view/staged-view";
import { countOf, formatCount, formatDateTime, withUnit } from "@/lib/format";
import { conditionWords, faceWords, MODEL_SHORT } from "@/lib/vocabulary";
import { writeSensitivity, type ReportSensitivity } from "./sensitivity-section";
import { writeProbabilistic, type ReportProbabilistic } from "./probabilistic-section";
import { writeRigorous } from "./rigorous-section";
import type { RigorousRunPart } from "@/lib/runs/record/rigorous-part";

export interface ReportInput {
  projectName: string;
  run: {
    id: number;
    title: string;
    status: RunStatus;
    sectionName: string;
    sectionVersion: number;
    loadingCondition: string;
    waterCondition: { id: string; name: string } | null;
    face: string;
    requiredFs: number;
    fsBishop: number | null;
    fsFellenius: number | null;
    authorName: string;
    createdAt: string;
    engineVersion: string;
    revisesRunId: number | null;
    document: SectionDocument;
    result: GridSearchSuccess & { setup?: RunSetup; rigorous?: RigorousRunPart };
    sliceTables: Partial<Record<"bishop" | "fellenius", { slices: SliceRow[]; minMAlpha: number | null }>>;
  };
  review: {
    submittedByName: string | null;
    submittedAt: string | null;
    reviewedByName: string | null;
    reviewedAt: string | null;
    reviewNote: string | null;
    /** The reviewer's reason when the run was signed off below its required FS. */
    belowRequiredReason?: string | null;
  };
  checklist: readonly ChecklistEntry[];
  comments: readonly { label: string; authorName: string; body: string; createdAt: string }[];
  materials: readonly MaterialSourceRecord[];
  /** True when the sources were frozen at submission; false when read from today's library. */
  sourcesFrozen: boolean;
  generatedAt: string;
  generatedBy: string;
  /** Present when the reader asked for the sensitivity section. */
  sensitivity?: ReportSensitivity;
  /** Present when the run has a kept probabilistic result. */
  probabilistic?: ReportProbabilistic;
}

const day = (iso: string | null) => (iso ? formatDateTime(iso) : "—");
const m2 = (v: number) => v.toFixed(2);
/** A sentence typed by a person, ended with one full stop. */
const withStop = (text: string) => (/[.!?]$/.test(text.trim()) ? text.trim() : `${text.trim()}.`);

function radiiText(r: Radii | undefined): string {
  if (!r) return "—";
  return "tangentY1" in r
    ? `${r.n} tangent levels from ${m2(r.tangentY1)} m to ${m2(r.tangentY2)} m`
    : `${r.n} radii from ${m2(r.r1)} m to ${m2(r.r2)} m`;
}

function writeStatus(w: ReportWriter, input: ReportInput): void {
  const { run, review } = input;
  if (run.status === "approved" && review.belowRequiredReason) {
    const note = review.reviewNote ? ` Reviewer's note: ${review.reviewNote}` : "";
    w.box(
      "Review status: SIGNED OFF — BELOW THE REQUIRED FS, " +
        `by ${review.reviewedByName ?? "—"} on ${day(review.reviewedAt)}`,
      `The factor of safety does not meet the required ${run.requiredFs.toFixed(2)}; ` +
        `the reviewer signed it off on purpose. Reason: ${withStop(review.belowRequiredReason)} ` +
        `Submitted by ${review.submittedByName ?? "—"} on ${day(review.submittedAt)}.${note}`,
      ALARM,
    );
  } else if (run.status === "approved") {
    const note = review.reviewNote ? ` Reviewer's note: ${review.reviewNote}` : "";
    w.box(
      `Review status: SIGNED OFF by ${review.reviewedByName ?? "—"} on ${day(review.reviewedAt)}`,
      `Submitted by ${review.submittedByName ?? "—"} on ${day(review.submittedAt)}.${note}`,
      MOSS,
    );
  } else {
    const detail =
      run.status === "returned"
        ? `Returned by ${review.reviewedByName ?? "—"} on ${day(review.reviewedAt)}: ${review.reviewNote ?? ""}`
        : run.status === "submitted"
          ? `Submitted by ${review.submittedByName ?? "—"} on ${day(review.submittedAt)}; no reviewer has decided yet.`
          : "Not yet submitted for review.";
    w.box(
      `Review status: NOT SIGNED OFF (${STATUS_WORDS[run.status]})`,
      `${detail} This report must not be relied on as a checked calculation.`,
      ALARM,
    );
  }
}

function writeInputs(w: ReportWriter, input: ReportInput): void {
  const { run } = input;
  const doc = run.document;
  const setup = run.result.setup;
  const condition = LOADING_CONDITIONS.find((c) => c.key === run.loadingCondition);
  w.heading("Section and load case");
  w.keyValues([
    ["Section", `${run.sectionName}, version ${run.sectionVersion}`],
    ["Run", `${run.title} (run ${run.id})${run.revisesRunId ? `, revising run ${run.revisesRunId}` : ""}`],
    ["Analysed by", `${run.authorName}, ${day(run.createdAt)}, engine ${run.engineVersion}`],
    ["Loading condition", `${condition?.label ?? conditionWords(run.loadingCondition)}, ${faceWords(run.face, true)}`],
    [
      "Required FS",
      `${run.requiredFs.toFixed(2)}${condition ? ` — default from ${condition.basis}; the project may have set its own value` : ""}`,
    ],
  ]);
  w.heading("Water conditions");
  const water = doc.water;
  const rows: [string, string][] = [["Water condition", waterUsedText(run)]];
  const seepage = runSeepage(run);
  if (seepage) rows.push(["Pore pressures", seepageUsedText(seepage)]);
  if (water?.phreatic?.length) {
    const ys = water.phreatic.map((p) => p[1]);
    rows.push([
      "Phreatic line",
      `${countOf(water.phreatic.length, "point")}, x ${m2(water.phreatic[0][0])} to ${m2(water.phreatic.at(-1)![0])} m, elevation ${m2(Math.min(...ys))} to ${m2(Math.max(...ys))} m`,
    ]);
    if (water.cos2Correction) rows.push(["Pore pressure", "phreatic head reduced by cos² of the line's slope"]);
  }
  if (water?.ru !== undefined) rows.push(["Pore-pressure ratio ru", String(water.ru)]);
  if (doc.analysis?.drawdown)
    rows.push([
      "Drawdown",
      `pool from ${m2(doc.analysis.drawdown.from)} m to ${m2(doc.analysis.drawdown.to)} m (${doc.analysis.drawdown.method ?? "effective"} method)`,
    ]);
  rows.push(["Unit weight of water", `${(water?.gammaW ?? 9.81).toFixed(2)} kN/m³`]);
  if (!water?.phreatic?.length && water?.ru === undefined && !seepage)
    rows.splice(1, 0, ["Water", "dry: no phreatic line and no ru"]);
  w.keyValues(rows);

  w.heading("Method and search settings");
  const g = doc.analysis?.grid;
  w.keyValues([
    [
      "Methods",
      run.result.methods
        .map((m) =>
          m === "fellenius" ? `${METHOD_NAME[m]} (${ordinaryFormText(run.result.ordinaryForm)})` : METHOD_NAME[m],
        )
        .join("; "),
    ],
    ["Slices", String(setup?.slices ?? doc.analysis?.slices ?? "—")],
    [
      "Grid of centres",
      g ? `(${m2(g.x1)}, ${m2(g.y1)}) to (${m2(g.x2)}, ${m2(g.y2)}) m, ${g.nx} × ${g.ny} centres` : "—",
    ],
    ["Radii", radiiText(doc.analysis?.radii)],
    ["Refinement", doc.analysis?.refine ? "finer nested grids around the best centres" : "none"],
    ["Circles", `${formatCount(run.result.circles.tried)} tried, ${formatCount(run.result.circles.valid)} valid`],
    ...rejectionList(run.result.circles.rejected).map((r): [string, string] => ["Rejected", `${r.count} — ${r.text}`]),
  ]);
}

function writeResults(w: ReportWriter, input: ReportInput): void {
  const { run } = input;
  w.heading("Factor of safety against the required value");
  const rows = run.result.methods.map((m) => {
    const r = run.result.results[m];
    const fs = m === "bishop" ? run.fsBishop : run.fsFellenius;
    return [
      METHOD_NAME[m],
      formatFs(fs),
      run.requiredFs.toFixed(2),
      verdictWords(verdictOf(fs, run.requiredFs), run.requiredFs),
      r ? `(${m2(r.circle.xc)}, ${m2(r.circle.yc)}) m, R ${m2(r.circle.r)} m` : "—",
      r ? `${m2(r.entry[0])} to ${m2(r.exit[0])} m` : "—",
    ];
  });
  w.table(
    [
      { header: "Method", width: 120 },
      { header: "FS", width: 40, align: "right" },
      { header: "Required", width: 45, align: "right" },
      { header: "Verdict", width: 110 },
      { header: "Critical circle", width: 120 },
      { header: "Slip from x", width: w.width - 435 },
    ],
    rows,
    8.5,
  );
  writeStages(w, input);
  w.ensure(360);
  w.heading("Section with the critical circles");
  drawSection(w, {
    document: run.document,
    critical: run.result.results,
    grid: run.document.analysis?.grid,
    drawdownTo: run.document.analysis?.drawdown?.to,
  });
  w.paragraph(
    "Regions filled by material; blue line: the pore-water level analysed (after a drawdown, the lowered one); " +
      "light blue: ponded water; faint dashed blue: the line before drawdown (not analysed); dotted blue: pool " +
      "after drawdown; dashed grey rectangle: grid of trial centres; bold arcs: critical slip surfaces with their " +
      "centres marked.",
    { size: 7.5, color: SOFT },
  );
  w.heading("Warnings");
  const warnings = describeWarnings(run.result.warnings);
  if (warnings.length === 0) w.paragraph("The engine raised no warning for this search.");
  for (const wn of warnings)
    w.paragraph(
      `${wn.weight === "check" ? "CHECK" : "Note"}: ${wn.headline}${wn.action ? ` ${wn.action}` : ""}${wn.detail ? ` (${wn.detail})` : ""}`,
      { color: wn.weight === "check" ? ALARM : INK },
    );
}

const modelShort = (model: string) => (MODEL_SHORT as Record<string, string>)[model] ?? model;

function materialRemark(model: string): string {
  return model === "impenetrable"
    ? "no slip surface may enter it; no strength is used"
    : "no value recorded in the section";
}

/** A staged drawdown's factor of safety at each stage, per method; the last row is the run's FS. */
function writeStages(w: ReportWriter, input: ReportInput): void {
  const { run } = input;
  const staged = stagedView(run.result, run.document, run.engineVersion);
  if (!staged) return;
  const methods = run.result.methods.filter((m) => staged.stages[m] !== undefined);
  w.heading(`Staged rapid drawdown: ${VARIANT_TEXT[staged.variant]}`);
  const labels = stageCells({ fs1: null, fs2: null, fs3: null, final: null, switchedSlices: 0 }, staged.variant);
  const cells = methods.map((m) => {
    const f = staged.stages[m];
    return f ? stageCells(f, staged.variant) : null;
  });
  const methodWidth = Math.min(120, (w.width - 270) / Math.max(1, methods.length));
  w.table(
    [
      { header: "Stage", width: w.width - methodWidth * methods.length },
      ...methods.map((m) => ({
        header: m === "bishop" ? "Bishop's simplified" : "Ordinary method",
        width: methodWidth,
        align: "right" as const,
      })),
    ],
    labels.map((row, i) => [
      row.label,
      ...cells.map((c) => {
        const cell = c?.[i];
        if (!cell) return "not available";
        if (cell.fs === null) return `— (${cell.missing})`;
        return cell.note ? `${formatFs(cell.fs)} (${cell.note})` : formatFs(cell.fs);
      }),
    ]),
    8.5,
  );
  w.paragraph(
    "Stage 1 gives the consolidation stresses on each slice base; the undrained strengths of stage 2 follow " +
      "from them. The FS of the run is the final stage's; the slice tables give each base's governing strength.",
    { size: 7.5, color: SOFT },
  );
}

function writeMaterials(w: ReportWriter, input: ReportInput): void {
  w.heading("Materials and where their values come from");
  if (!input.sourcesFrozen)
    w.paragraph(
      "Sources read from the project's library now; they are frozen with the run when it is submitted for review.",
      { size: 8, color: SOFT },
    );
  const rows: string[][] = [];
  for (const m of input.materials) {
    // An impenetrable layer often has no number at all, yet it bounds every slip surface: list it anyway.
    if (m.parameters.length === 0)
      rows.push([`${m.name} (${m.key})`, modelShort(m.model), "—", materialRemark(m.model)]);
    m.parameters.forEach((p, i) =>
      rows.push([
        i === 0 ? `${m.name} (${m.key})` : "",
        i === 0 ? modelShort(m.model) : "",
        `${p.symbol} = ${withUnit(p.value, p.unit)}`,
        p.source ?? (m.inLibrary ? "typed value, no lab set" : "not in the library: value of the section"),
      ]),
    );
    if (m.notes) rows.push(["", "", "Notes", m.notes]);
  }
  w.table(
    [
      { header: "Material", width: 130 },
      { header: "Model", width: 70 },
      { header: "Value", width: 95 },
      { header: "Source", width: w.width - 295 },
    ],
    rows,
    8,
  );
}

function writeReview(w: ReportWriter, input: ReportInput): void {
  w.heading("Review checklist");
  w.table(
    [
      { header: "Item", width: 170 },
      { header: "State", width: 60 },
      { header: "Note", width: w.width - 230 },
    ],
    fullChecklist(input.checklist).map((c) => [
      c.label,
      c.state === "ok" ? "confirmed" : c.state === "concern" ? "CONCERN" : "open",
      c.note,
    ]),
    8,
  );
  w.heading("Review comments");
  if (input.comments.length === 0) w.paragraph("No comments.");
  for (const c of input.comments)
    w.paragraph(`${c.label} — ${c.authorName}, ${day(c.createdAt)}: ${c.body}`, { size: 8.5 });
}

export async function buildRunReport(input: ReportInput): Promise<Uint8Array> {
  const { run } = input;
  const w = await ReportWriter.create(`Calculation report — ${run.title}`);
  w.text("CALCULATION REPORT — SLOPE STABILITY", w.left, w.y - 9, 9, { bold: true, color: SOFT });
  w.y -= 14;
  w.paragraph(run.title, { size: 16, bold: true });
  w.paragraph(`${input.projectName} — ${run.sectionName} v${run.sectionVersion}`, { size: 11 });
  w.paragraph(`Report generated ${day(input.generatedAt)} by ${input.generatedBy}.`, { size: 8, color: SOFT });
  writeStatus(w, input);
  w.cautionBox("Engineering caution", CAUTION_TEXT, ALARM);
  writeInputs(w, input);
  writeResults(w, input);
  writeRigorous(w, run);
  writeMaterials(w, input);
  writeReview(w, input);
  if (input.sensitivity) writeSensitivity(w, input.sensitivity);
  if (input.probabilistic) writeProbabilistic(w, input.probabilistic);
  writeSliceTable(w, run.sliceTables, run.result.methods);
  return w.finish(
    `Scarpline calculation report — run ${run.id}, ` +
      `${statusWords(run.status, Boolean(input.review.belowRequiredReason))} — ${input.projectName}`,
    `Caution: ${CAUTION_TEXT}`,
  );
}
