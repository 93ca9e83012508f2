/** Probabilistic runs of a kept run (docs/probabilistic.md): plain types shared by server and browser code. */
import type { JobView } from "@/lib/jobs/types";
import type { EngineWarning, MethodProbabilistic, ProbabilisticRunInfo, Vary } from "@/lib/stability";

export type VariedQuantity = "c" | "phi" | "su" | "gamma";

/** The spread a material starts from in the panel, with where each value came from. */
export interface MaterialDefaults {
  materialId: string;
  name: string;
  model: string;
  /** The quantities the run's load case uses for this material. */
  keys: VariedQuantity[];
  /** The material's own values (the means). */
  values: Partial<Record<VariedQuantity, number>>;
  vary: Vary;
  basis: Partial<Record<VariedQuantity | "correlation", string>>;
}

/** What a probabilistic job keeps: compact, without the deterministic search's FS map. */
export interface ProbabilisticOutcome {
  methods: string[];
  /** The deterministic FS per method, as the run's own search found it. */
  deterministicFs: Partial<Record<string, number | null>>;
  probabilistic: Partial<Record<string, MethodProbabilistic | null>>;
  run: ProbabilisticRunInfo;
  warnings: EngineWarning[];
  engineVersion: string;
  elapsedMs: number;
}

/** A stored probabilistic result of a run (db/queries/probabilistic.ts). */
export interface StoredProbabilistic {
  id: number;
  runId: number;
  jobId: number;
  settings: unknown;
  outcome: ProbabilisticOutcome;
  createdByName: string;
  createdAt: string;
}

/** A project's target reliability index and where it came from. */
export interface ReliabilityTarget {
  beta: number;
  defaultBeta: number;
  basis: string;
  reason: string | null;
  updatedByName: string | null;
}

/** What the probabilistic panel of a run reads (GET /api/projects/:id/runs/:runId/probabilistic). */
export interface ProbabilisticPanelData {
  defaults: MaterialDefaults[];
  /** The lowered pool of a drawdown run (the level a spread may be given to), else null. */
  drawdownTo: number | null;
  job: JobView | null;
  stored: StoredProbabilistic | null;
  target: ReliabilityTarget;
}
