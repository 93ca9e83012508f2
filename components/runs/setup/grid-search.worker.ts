/// <reference lib="webworker" />
/**
 * Runs the search off the main thread so the page stays responsive. It calls the same routine
 * the server runs when the run is kept (lib/runs/record/search-record.ts), so the preview and the
 * kept run agree exactly. Cancelling terminates the worker; the search itself is synchronous.
 */
import type { CircleSuccess, GridSearchResult, SectionDocument } from "@/lib/stability";
import { searchRecord } from "@/lib/runs/record/search-record";

/** `id` is echoed on the answer so a long-lived worker's caller can tell which request it answers. */
export type WorkerRequest = { doc: SectionDocument; id?: number; progress?: boolean };
export type WorkerMessage =
  | { type: "progress"; fraction: number }
  | {
      type: "done";
      id?: number;
      result: GridSearchResult;
      critical: Partial<Record<"bishop" | "fellenius", CircleSuccess>>;
      elapsedMs: number;
    }
  | { type: "error"; message: string; id?: number };

const ctx = self as unknown as DedicatedWorkerGlobalScope;
const post = (m: WorkerMessage) => ctx.postMessage(m);

ctx.onmessage = (event: MessageEvent<WorkerRequest>) => {
  const t0 = performance.now();
  const { id, progress = true } = event.data;
  try {
    let last = 0;
    const record = searchRecord(event.data.doc, {
      onProgress: (fraction) => {
        // Throttle messages: a fine grid reports thousands of rows.
        if (progress && (fraction - last >= 0.01 || fraction >= 1)) {
          last = fraction;
          post({ type: "progress", fraction });
        }
      },
    });
    const elapsedMs = performance.now() - t0;
    if (record.ok) post({ type: "done", id, result: record.result, critical: record.critical, elapsedMs });
    else post({ type: "done", id, result: record, critical: {}, elapsedMs });
  } catch (err) {
    post({ type: "error", id, message: err instanceof Error ? err.message : String(err) });
  }
};
