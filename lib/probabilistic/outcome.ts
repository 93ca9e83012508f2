/** What a probabilistic job keeps of the engine's answer: the figures, not the deterministic FS map. */
import { ENGINE_VERSION, type ProbabilisticSuccess } from "@/lib/stability";
import type { ProbabilisticOutcome } from "./types";

export function toOutcome(r: ProbabilisticSuccess, elapsedMs: number): ProbabilisticOutcome {
  return {
    methods: [...r.methods],
    deterministicFs: Object.fromEntries(r.methods.map((m) => [m, r.results[m]?.fs ?? null])),
    probabilistic: r.probabilistic,
    run: r.probabilisticRun,
    warnings: r.warnings,
    engineVersion: ENGINE_VERSION,
    elapsedMs,
  };
}
