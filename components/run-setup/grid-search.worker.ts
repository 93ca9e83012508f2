/// <reference lib="webworker" />
/**
 * Runs the engine's grid search off the main thread so the page stays responsive.
 * Cancelling terminates the worker; the search itself is synchronous and cannot be interrupted.
 */
import { analyzeCircle, runGridSearch, type CircleSuccess, type SectionDocument } from "@/lib/stability";

export type WorkerRequest = { doc: SectionDocument };
export type WorkerMessage =
  | { type: "progress"; fraction: number }
  | {
      type: "done";
      result: ReturnType<typeof runGridSearch>;
      critical: Partial<Record<"bishop" | "fellenius", CircleSuccess>>;
      elapsedMs: number;
    }
  | { type: "error"; message: string };

const ctx = self as unknown as DedicatedWorkerGlobalScope;
const post = (m: WorkerMessage) => ctx.postMessage(m);

ctx.onmessage = (event: MessageEvent<WorkerRequest>) => {
  const t0 = performance.now();
  try {
    let last = 0;
    const result = runGridSearch(event.data.doc, {
      onProgress: (fraction) => {
        // Throttle messages: a fine grid reports thousands of rows.
        if (fraction - last >= 0.01 || fraction >= 1) {
          last = fraction;
          post({ type: "progress", fraction });
        }
      },
    });
    const critical: Partial<Record<"bishop" | "fellenius", CircleSuccess>> = {};
    if (result.ok) {
      for (const method of result.methods) {
        const best = result.results[method];
        if (!best) continue;
        const one = analyzeCircle(event.data.doc, best.circle);
        if (one.ok) critical[method] = one;
      }
    }
    post({ type: "done", result, critical, elapsedMs: performance.now() - t0 });
  } catch (err) {
    post({ type: "error", message: err instanceof Error ? err.message : String(err) });
  }
};
