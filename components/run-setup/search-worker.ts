"use client";

/**
 * The one way the browser starts a search worker: the run form's preview and the editor's live
 * mode both go through here, so there is a single worker file and a single message contract.
 */
import type { WorkerMessage, WorkerRequest } from "./grid-search.worker";

export type { WorkerMessage, WorkerRequest };

export function createSearchWorker(): Worker {
  return new Worker(new URL("./grid-search.worker.ts", import.meta.url), { type: "module" });
}
