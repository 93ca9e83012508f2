/// <reference lib="webworker" />
/**
 * Runs the search off the main thread so the page stays responsive. It calls the same routine
 * the server runs when the run is kept (lib/runs/record/search-record.ts), so the preview and the
 * kept run agree exactly. Cancelling terminates the worker; the search itself is synchronous.
 * Live mode asks for a coarse pass first (lib/live/coarse-pass.ts): its answer comes at once, and
 * the full search follows only if no newer request arrives within SETTLE_MS.
 */
import { runGridSearch, type CircleSuccess, type GridSearchResult, type SectionDocument } from "@/lib/stability";
import { coarseDocument } from "@/lib/live/coarse-pass";
import { searchRecord } from "@/lib/runs/record/search-record";

/**
 * `id` is echoed on the answer so a long-lived worker's caller can tell which request it answers;
 * `coarse` asks for a coarse answer (full: false) before the full one.
 */
export type WorkerRequest = { doc: SectionDocument; id?: number; progress?: boolean; coarse?: boolean };
export type WorkerMessage =
  | { type: "progress"; fraction: number }
  | {
      type: "done";
      id?: number;
      result: GridSearchResult;
      critical: Partial<Record<"bishop" | "fellenius", CircleSuccess>>;
      elapsedMs: number;
      /** False for a coarse pass's answer. */
      full?: boolean;
    }
  | { type: "error"; message: string; id?: number };

const ctx = self as unknown as DedicatedWorkerGlobalScope;
const post = (m: WorkerMessage) => ctx.postMessage(m);

/**
 * How long the drawing must rest before the full set-up runs (ms): while a hand drags, the next
 * state comes sooner than this, so a running full pass never holds up the next coarse answer.
 */
const SETTLE_MS = 150;
/** The newest request received: a coarse pass's full search is dropped once a newer one came. */
let newest: number | undefined;

ctx.onmessage = async (event: MessageEvent<WorkerRequest>) => {
  const { id, progress = true, coarse = false } = event.data;
  newest = id;
  const rough = coarse ? coarseDocument(event.data.doc) : null;
  if (rough) {
    const t = performance.now();
    try {
      const result = runGridSearch(rough);
      post({ type: "done", id, result, critical: {}, elapsedMs: performance.now() - t, full: false });
    } catch (err) {
      post({ type: "error", id, message: err instanceof Error ? err.message : String(err) });
      return;
    }
    await new Promise((resolve) => setTimeout(resolve, SETTLE_MS));
    if (newest !== id) return;
  }
  const t0 = performance.now();
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
    if (record.ok) post({ type: "done", id, result: record.result, critical: record.critical, elapsedMs, full: true });
    else post({ type: "done", id, result: record, critical: {}, elapsedMs, full: true });
  } catch (err) {
    post({ type: "error", id, message: err instanceof Error ? err.message : String(err) });
  }
};
