import "server-only";
/**
 * The server side of a kept run's probabilistic panel: the defaults (from the lab sets the library
 * records as each material's sources), the latest job and stored result, and the start of a job
 * with its input checked first, so bad input is a 400 naming the field and nothing is queued.
 */
import { ApiError } from "@/lib/api/errors";
import type { RunDetail } from "@/lib/runs/types";
import type { JobView } from "@/lib/jobs/types";
import { readLatestJob } from "@/lib/jobs/read-job";
import { startJob } from "@/lib/jobs/start-job";
import { probabilisticKind, probabilisticSubject } from "@/lib/jobs/probabilistic-job";
import { fetchMaterialsOfProject } from "@/db/queries/materials";
import { fetchLabTestSetsOfProject } from "@/db/queries/lab-tests";
import { fetchLatestProbabilistic } from "@/db/queries/probabilistic";
import { materialDefaults, type BackingSet, type DocMaterial } from "./defaults";
import { probabilisticDocument, requestFieldErrors, UnknownMaterialError, type ProbabilisticRequest } from "./request";
import { readReliabilityTarget } from "./read-target";
import type { MaterialDefaults, ProbabilisticPanelData } from "./types";

interface RunDoc {
  materials: DocMaterial[];
  analysis?: { case?: string; drawdown?: { to?: number } };
}

export async function runDefaults(run: RunDetail): Promise<MaterialDefaults[]> {
  const doc = run.document as RunDoc;
  const [library, sets] = await Promise.all([
    fetchMaterialsOfProject(run.projectId),
    fetchLabTestSetsOfProject(run.projectId),
  ]);
  const setById = new Map(sets.map((s) => [s.id, s]));
  const loadCase = doc.analysis?.case ?? run.loadCase;
  return doc.materials.map((m) => {
    const lib = library.find((l) => l.key === m.id);
    const backing: Partial<Record<"c" | "phi" | "su", BackingSet>> = {};
    for (const key of ["c", "phi", "su"] as const) {
      const id = lib?.sources[key];
      const set = id === undefined ? undefined : setById.get(id);
      if (set) backing[key] = { id: set.id, name: set.name, record: set };
    }
    return materialDefaults(m, loadCase, backing);
  });
}

export async function readProbabilisticPanel(run: RunDetail): Promise<ProbabilisticPanelData> {
  const doc = run.document as RunDoc;
  const [defaults, job, stored, target] = await Promise.all([
    runDefaults(run),
    readLatestJob(run.projectId, probabilisticSubject(run.id)),
    fetchLatestProbabilistic(run.projectId, run.id),
    readReliabilityTarget(run.projectId),
  ]);
  const drawdownTo = doc.analysis?.case === "drawdown" ? (doc.analysis.drawdown?.to ?? null) : null;
  return { defaults, drawdownTo, job, stored, target };
}

/** Checks the request against the run's document (the engine's own checks) and queues the job. */
export async function queueProbabilistic(
  run: RunDetail,
  request: ProbabilisticRequest,
  userId: number,
): Promise<JobView> {
  let document;
  try {
    document = probabilisticDocument(run.document, request);
  } catch (err) {
    if (err instanceof UnknownMaterialError)
      throw new ApiError(400, "invalid_input", err.message, { materials: [err.message] });
    throw err;
  }
  const fields = requestFieldErrors(document);
  if (Object.keys(fields).length > 0) {
    const first = Object.values(fields)[0][0];
    throw new ApiError(400, "invalid_input", `The probabilistic run cannot start: ${first}`, fields);
  }
  return startJob(probabilisticKind, {
    projectId: run.projectId,
    subject: probabilisticSubject(run.id),
    userId,
    input: { runId: run.id, request, document },
  });
}
