"use client";

/**
 * The one way the browser starts a search worker: the run form's preview and the editor's live
 * mode both go through here, so there is a single worker file and a single message contract.
 */
import type { WorkerMessage, WorkerRequest } from "@/components/runs/setup/grid-search.worker";

export type { WorkerMessage, WorkerRequest };

export function createSearchWorker(): Worker {
  return new Worker(new URL("./grid-search.worker.ts", import.meta.url), { type: "module" });
}

/**
 * Searches one document after another on a worker of its own, for studies that need many in a
 * row (sensitivity). close() terminates the worker; a search still running then never answers.
 */
export function searchSequence() {
  let worker: Worker | null = createSearchWorker();
  let next = 0;
  const waiting = new Map<number, (m: WorkerMessage) => void>();
  worker.onmessage = (e: MessageEvent<WorkerMessage>) => {
    const m = e.data;
    if (m.type === "progress" || m.id === undefined) return;
    waiting.get(m.id)?.(m);
    waiting.delete(m.id);
  };
  return {
    search(doc: WorkerRequest["doc"]): Promise<WorkerMessage> {
      if (!worker) return Promise.reject(new Error("The search was stopped."));
      const id = ++next;
      const w = worker;
      return new Promise((resolve) => {
        waiting.set(id, resolve);
        w.postMessage({ doc, id, progress: false } satisfies WorkerRequest);
      });
    },
    close() {
      worker?.terminate();
      worker = null;
      waiting.clear();
    },
  };
}
