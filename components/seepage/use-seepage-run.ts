"use client";

import { useCallback, useEffect, useRef, useState } from "react";
import type { SeepageDocument, SeepageIssue, SeepageSolution } from "@/lib/seepage";
import type { MeshField, SeepageWorkerMessage } from "./seepage.worker";

export type SeepageRunState =
  | { status: "idle" }
  | { status: "running"; round: number; maxRounds: number }
  | { status: "cancelled" }
  | { status: "invalid"; errors: SeepageIssue[] }
  | { status: "failed"; message: string }
  | { status: "done"; solution: SeepageSolution; mesh: MeshField; elapsedMs: number };

/** Runs a seepage solve in a Web Worker, with the free-surface round as progress and a cancel. */
export function useSeepageRun() {
  const worker = useRef<Worker | null>(null);
  const [state, setState] = useState<SeepageRunState>({ status: "idle" });

  const stop = useCallback(() => {
    worker.current?.terminate();
    worker.current = null;
  }, []);

  useEffect(() => stop, [stop]);

  const start = useCallback(
    (document: SeepageDocument) => {
      stop();
      const w = new Worker(new URL("./seepage.worker.ts", import.meta.url), { type: "module" });
      worker.current = w;
      setState({ status: "running", round: 0, maxRounds: 1 });
      w.onmessage = (event: MessageEvent<SeepageWorkerMessage>) => {
        const m = event.data;
        if (m.type === "progress") {
          setState({ status: "running", round: m.round, maxRounds: m.maxRounds });
          return;
        }
        if (m.type === "done") setState({ status: "done", solution: m.solution, mesh: m.mesh, elapsedMs: m.elapsedMs });
        else if (m.type === "failed") setState({ status: "invalid", errors: m.errors });
        else setState({ status: "failed", message: m.message });
        stop();
      };
      w.onerror = (e) => {
        setState({ status: "failed", message: e.message || "The seepage solve stopped unexpectedly." });
        stop();
      };
      w.postMessage({ document });
    },
    [stop],
  );

  const cancel = useCallback(() => {
    stop();
    setState({ status: "cancelled" });
  }, [stop]);

  return { state, start, cancel };
}
