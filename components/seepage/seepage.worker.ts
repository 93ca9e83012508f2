/// <reference lib="webworker" />
/**
 * Runs the seepage solver off the main thread. Progress is the free-surface round out of the most
 * rounds allowed; cancelling terminates the worker (the solve is synchronous, so a message could
 * not reach it mid-run), which is what `onRound` returning false does inside one thread.
 */
import { runSeepage, type SeepageDocument, type SeepageIssue, type SeepageSolution } from "@/lib/seepage";

export type SeepageWorkerRequest = { document: SeepageDocument };

/** The mesh and nodal heads, flat, for the colour field and the mesh drawing. */
export interface MeshField {
  x: number[];
  y: number[];
  tri: number[];
  /** Total head per node (m); null at nodes outside the flow domain. */
  head: (number | null)[];
  gammaW: number;
}

export type SeepageWorkerMessage =
  | { type: "progress"; round: number; maxRounds: number }
  | { type: "done"; solution: SeepageSolution; mesh: MeshField; elapsedMs: number }
  | { type: "failed"; errors: SeepageIssue[] }
  | { type: "error"; message: string };

const ctx = self as unknown as DedicatedWorkerGlobalScope;
const post = (m: SeepageWorkerMessage) => ctx.postMessage(m);

ctx.onmessage = (event: MessageEvent<SeepageWorkerRequest>) => {
  const t0 = performance.now();
  try {
    const run = runSeepage(event.data.document, {
      onRound: (round, maxRounds) => {
        post({ type: "progress", round, maxRounds });
        return true;
      },
    });
    if (!run.ok) {
      post({ type: "failed", errors: run.errors });
      return;
    }
    const { mesh, head } = run.model.field;
    post({
      type: "done",
      solution: run.solution,
      mesh: {
        x: Array.from(mesh.x),
        y: Array.from(mesh.y),
        tri: Array.from(mesh.tri),
        head: Array.from(head, (h) => (Number.isFinite(h) ? h : null)),
        gammaW: run.model.problem.gammaW,
      },
      elapsedMs: performance.now() - t0,
    });
  } catch (err) {
    post({ type: "error", message: err instanceof Error ? err.message : String(err) });
  }
};
