import "server-only";
import { fetchReliabilityTargetRow } from "@/db/queries/probabilistic";
import { DEFAULT_TARGET_BETA, TARGET_BASIS } from "./targets";
import type { ReliabilityTarget } from "./types";

/** The project's target β: its own with the reason, or the default with its basis. */
export async function readReliabilityTarget(projectId: number): Promise<ReliabilityTarget> {
  const own = await fetchReliabilityTargetRow(projectId);
  return {
    beta: own?.beta ?? DEFAULT_TARGET_BETA,
    defaultBeta: DEFAULT_TARGET_BETA,
    basis: TARGET_BASIS,
    reason: own?.reason ?? null,
    updatedByName: own?.updatedByName ?? null,
  };
}
