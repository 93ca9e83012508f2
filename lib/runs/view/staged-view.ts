/**
 * What a staged rapid drawdown (docs/engine.md §7(b)) shows beyond one FS: each stage's factor of
 * safety per method and the procedure used. A fresh search carries them; a kept run whose stored
 * result lost them gets them again from its frozen document and critical circle through the same
 * engine, which is deterministic (the server's check of every kept run relies on the same).
 */
import { ENGINE_VERSION, analyzeCircle, type Circle, type SectionDocument, type StageFs } from "@/lib/stability";

export type StagedVariant = "three-stage" | "usace-two-stage";
type Method = "bishop" | "fellenius";

export interface StagedView {
  variant: StagedVariant;
  stages: Partial<Record<Method, StageFs | null>>;
}

export const VARIANT_TEXT: Record<StagedVariant, string> = {
  "three-stage": "three stages after Duncan, Wright & Wong (1990)",
  "usace-two-stage": "two stages after the US Army Corps of Engineers (1970)",
};

interface ResultLike {
  methods: readonly Method[];
  results: Partial<Record<Method, { circle: Circle; stages?: StageFs } | null>>;
  stagedVariant?: StagedVariant;
}

/** True when the document asks for a staged drawdown. */
export function isStagedDocument(doc: SectionDocument): boolean {
  return doc.analysis?.case === "drawdown" && doc.analysis.drawdown?.method === "staged";
}

/**
 * The stages of a run, or null when it is not a staged drawdown.
 * @param engineVersion the engine that made the result; stages are recomputed only by that same engine
 */
export function stagedView(result: ResultLike, doc: SectionDocument, engineVersion: string): StagedView | null {
  if (!isStagedDocument(doc)) return null;
  const variant: StagedVariant = result.stagedVariant ?? doc.analysis?.drawdown?.stagedVariant ?? "three-stage";
  const stages: StagedView["stages"] = {};
  for (const m of result.methods) {
    const r = result.results[m];
    if (!r) continue;
    if (r.stages) {
      stages[m] = r.stages;
      continue;
    }
    if (engineVersion !== ENGINE_VERSION) {
      stages[m] = null;
      continue;
    }
    const again = analyzeCircle(doc, r.circle);
    stages[m] = again.ok ? (again.stages?.[m] ?? null) : null;
  }
  return { variant, stages };
}

/** The stages a fresh search result carries itself; null when it has none (not staged). */
export function stagedFromResult(result: ResultLike): StagedView | null {
  const stages: StagedView["stages"] = {};
  for (const m of result.methods) {
    const f = result.results[m]?.stages;
    if (f) stages[m] = f;
  }
  if (Object.keys(stages).length === 0) return null;
  return { variant: result.stagedVariant ?? "three-stage", stages };
}

export interface StageCell {
  stage: "1" | "2" | "3" | "final";
  label: string;
  fs: number | null;
  /** Why there is no number, in words; null when there is one. */
  missing: string | null;
  /** A short remark beside the number (stage 3: how many slices took the drained strength). */
  note?: string | null;
}

/** The four rows of a method's stages with their meaning, for the panel, the CSV and the PDF. */
export function stageCells(f: StageFs, variant: StagedVariant): StageCell[] {
  const two = variant === "usace-two-stage";
  return [
    {
      stage: "1",
      label: "Stage 1: before drawdown, effective stress (consolidation)",
      fs: f.fs1,
      missing: f.fs1 === null ? "nothing drives the mass at the full pool" : null,
    },
    {
      stage: "2",
      label: "Stage 2: pool lowered, undrained strength of low-permeability soil",
      fs: f.fs2,
      missing: f.fs2 === null ? "no valid result" : null,
    },
    {
      stage: "3",
      label: "Stage 3: drained strength where it is the lower",
      fs: f.fs3,
      note: f.fs3 !== null ? `${f.switchedSlices} slice${f.switchedSlices === 1 ? "" : "s"} drained` : null,
      missing: f.fs3 !== null ? null : two ? "not used: two stages" : "no slice drained",
    },
    { stage: "final", label: "Result (the FS of the run)", fs: f.final, missing: f.final === null ? "none" : null },
  ];
}

/** One line per method for text exports: "stage 1 1.912; stage 2 1.204; stage 3 1.260; final 1.260". */
export function stageLine(f: StageFs | null | undefined, variant: StagedVariant): string {
  if (!f) return "stages not available";
  return stageCells(f, variant)
    .map((c) => {
      const name = c.stage === "final" ? "final" : `stage ${c.stage}`;
      return `${name} ${c.fs === null ? `— (${c.missing})` : c.fs.toFixed(3)}`;
    })
    .join("; ");
}
