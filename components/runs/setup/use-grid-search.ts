"use client";

import { useCallback, useEffect, useRef, useState } from "react";
import type { SectionDocument } from "@/lib/stability";
import { createSearchWorker, type WorkerMessage } from "@/components/runs/setup/search-worker";

export type SearchState =
  | { status: "idle" }
  | { status: "running"; fraction: number; startedAt: number }
  | { status: "cancelled" }
  | { status: "failed"; message: string }
  | { status: "done"; message: Extract<WorkerMessage, { type: "done" }> };

/** Runs the grid search in a Web Worker with progress and cancel. */
export function useGridSearch() {
  const worker = useRef<Worker | null>(null);
  const [state, setState] = useState<SearchState>({ status: "idle" });

  const stop = useCallback(() => {
    worker.current?.terminate();
    worker.current = null;
  }, []);

  useEffect(() => stop, [stop]);

  const start = useCallback(
    (doc: SectionDocument) => {
      stop();
      const w = createSearchWorker();
      worker.current = w;
      const startedAt = performance.now();
      setState({ status: "running", fraction: 0, startedAt });
      w.onmessage = (event: MessageEvent<WorkerMessage>) => {
        const m = event.data;
        if (m.type === "progress") setState({ status: "running", fraction: m.fraction, startedAt });
        else if (m.type === "error") {
          setState({ status: "failed", message: m.message });
          stop();
        } else {
          setState({ status: "done", message: m });
          stop();
        }
      };
      w.onerror = (e) => {
        setState({ status: "failed", message: e.message || "The search stopped unexpectedly." });
        stop();
      };
      w.postMessage({ doc });
    },
    [stop],
  );

  const cancel = useCallback(() => {
    stop();
    setState({ status: "cancelled" });
  }, [stop]);

  const reset = useCallback(() => setState({ status: "idle" }), []);

  return { state, start, cancel, reset };
}
