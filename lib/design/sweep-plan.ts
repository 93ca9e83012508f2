/**
 * The slope sweep's plan (docs/engine.md §9): for each face and the load cases that govern it, a
 * list of H:V ratios to try. The other face keeps the ratio the designer entered; after the
 * sweep, the recommended pair is checked once more as a pair, since the upstream ratio moves
 * the phreatic line that the downstream face sees.
 */
import { z } from "zod";
import type { PoolName } from "./phreatic-line";

export type DesignFace = "upstream" | "downstream";
export type SweepCaseKey = "steady-seepage" | "drawdown-storage" | "drawdown-surcharge";

export interface SweepCase {
  key: SweepCaseKey;
  face: DesignFace;
  /** The pool whose steady seepage line the case starts from. */
  pool: PoolName;
  engineCase: "steady" | "drawdown";
  label: string;
}

/**
 * Downstream: long-term steady seepage at the normal pool. Upstream: rapid drawdown from the normal
 * or the flood pool.
 */
export const SWEEP_CASES: readonly SweepCase[] = [
  {
    key: "steady-seepage",
    face: "downstream",
    pool: "normal",
    engineCase: "steady",
    label: "Downstream, long-term steady seepage (normal pool)",
  },
  {
    key: "drawdown-storage",
    face: "upstream",
    pool: "normal",
    engineCase: "drawdown",
    label: "Upstream, rapid drawdown from the normal pool",
  },
  {
    key: "drawdown-surcharge",
    face: "upstream",
    pool: "flood",
    engineCase: "drawdown",
    label: "Upstream, rapid drawdown from the flood pool",
  },
];

export function sweepCase(key: SweepCaseKey): SweepCase {
  const c = SWEEP_CASES.find((s) => s.key === key);
  if (!c) throw new Error(`unknown sweep case '${key}'`);
  return c;
}

/** How dense each job's search is; the defaults keep a sweep of a few dozen jobs to seconds. */
export const sweepSettingsSchema = z
  .object({
    from: z
      .number({ error: "Enter the steepest ratio to try." })
      .min(1, "Start at 1H:1V or flatter.")
      .max(10, "Start at 10H:1V or steeper."),
    to: z
      .number({ error: "Enter the flattest ratio to try." })
      .min(1, "End at 1H:1V or flatter.")
      .max(10, "End at 10H:1V or steeper."),
    step: z
      .number({ error: "Enter the step between ratios." })
      .min(0.05, "Use a step of at least 0.05.")
      .max(5, "Use a step of at most 5."),
    nx: z.number().int().min(4, "Use at least 4 centres each way.").max(40, "Use at most 40 centres each way."),
    ny: z.number().int().min(4, "Use at least 4 centres each way.").max(40, "Use at most 40 centres each way."),
    radii: z.number().int().min(3, "Use at least 3 radii.").max(30, "Use at most 30 radii."),
    slices: z.number().int().min(20, "Use at least 20 slices.").max(100, "Use at most 100 slices."),
    refine: z.boolean(),
  })
  .superRefine((s, ctx) => {
    if (s.to < s.from)
      ctx.addIssue({
        code: "custom",
        path: ["to"],
        message: `The flattest ratio (${s.to}) must not be below the steepest (${s.from}).`,
      });
    else if (Math.floor((s.to - s.from) / s.step + 1e-9) + 1 > 41)
      ctx.addIssue({
        code: "custom",
        path: ["step"],
        message: "That makes more than 41 ratios per case: use a larger step or a shorter range.",
      });
  });

export type SweepSettings = z.infer<typeof sweepSettingsSchema>;

/** 2:1 to 4:1 in steps of 0.25; 12 × 12 centres × 8 radii, 40 slices, no refinement. */
export const DEFAULT_SWEEP: SweepSettings = {
  from: 2,
  to: 4,
  step: 0.25,
  nx: 12,
  ny: 12,
  radii: 8,
  slices: 40,
  refine: false,
};
/** A finer search for a final check. */
export const FINE_SWEEP: Omit<SweepSettings, "from" | "to" | "step"> = {
  nx: 20,
  ny: 20,
  radii: 12,
  slices: 50,
  refine: true,
};

export interface SweepJob {
  /** Stable id: face, case and both ratios. */
  id: string;
  face: DesignFace;
  caseKey: SweepCaseKey;
  upstreamRatio: number;
  downstreamRatio: number;
  /** "sweep" points vary one face; "recheck" points are the recommended pair. */
  phase: "sweep" | "recheck";
}

/** The ratios of a sweep, rounded to the hundredth so ids and table rows stay tidy. */
export function sweepRatios(s: Pick<SweepSettings, "from" | "to" | "step">): number[] {
  const out: number[] = [];
  const n = Math.floor((s.to - s.from) / s.step + 1e-9);
  for (let i = 0; i <= n; i++) out.push(Math.round((s.from + i * s.step) * 100) / 100);
  return out;
}

export function jobId(
  caseKey: SweepCaseKey,
  upstreamRatio: number,
  downstreamRatio: number,
  phase: SweepJob["phase"],
): string {
  return `${phase}:${caseKey}:u${upstreamRatio.toFixed(2)}:d${downstreamRatio.toFixed(2)}`;
}

/** Every (ratio, face, case) job of a sweep; the face not swept keeps the entered ratio. */
export function planSweep(
  current: { upstreamSlope: number; downstreamSlope: number },
  settings: Pick<SweepSettings, "from" | "to" | "step">,
): SweepJob[] {
  const jobs: SweepJob[] = [];
  for (const c of SWEEP_CASES) {
    for (const n of sweepRatios(settings)) {
      const u = c.face === "upstream" ? n : current.upstreamSlope;
      const d = c.face === "downstream" ? n : current.downstreamSlope;
      jobs.push({
        id: jobId(c.key, u, d, "sweep"),
        face: c.face,
        caseKey: c.key,
        upstreamRatio: u,
        downstreamRatio: d,
        phase: "sweep",
      });
    }
  }
  return jobs;
}

/** The jobs that check a chosen pair of ratios under every case. */
export function planRecheck(pair: { upstream: number; downstream: number }): SweepJob[] {
  return SWEEP_CASES.map((c) => ({
    id: jobId(c.key, pair.upstream, pair.downstream, "recheck"),
    face: c.face,
    caseKey: c.key,
    upstreamRatio: pair.upstream,
    downstreamRatio: pair.downstream,
    phase: "recheck" as const,
  }));
}
