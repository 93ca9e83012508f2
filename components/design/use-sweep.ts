"use client";

import { useCallback, useEffect, useRef, useState } from "react";
import {
  runWholeSweep,
  type EmbankmentParams,
  type RequiredFs,
  type StoredSweep,
  type SweepSettings,
} from "@/lib/design";
import { ENGINE_VERSION, type Material } from "@/lib/stability";
import { ApiClientError, fetchJson } from "@/lib/client/fetch-json";
import type { PreviewCheck } from "@/lib/run-records/compare-preview";
import { startWorkerPool, type WorkerPool } from "./worker-pool";

export type SweepWhere = "browser" | "server";

export type SweepRunState =
  | { status: "idle" }
  | { status: "running"; where: SweepWhere; done: number; total: number; startedAt: number }
  | { status: "cancelled" }
  | { status: "failed"; message: string }
  | { status: "done"; where: SweepWhere; elapsedMs: number; workers: number; keptMessage: string | null };

interface UseSweepOptions {
  projectId: number;
  studyId: number;
  materials: Material[];
  /** Called with every finished sweep, kept or not, so the page can show it. */
  onFinished: (sweep: StoredSweep) => void;
}

/** Runs a study's sweep in Web Workers (then keeps it on the server) or on the server itself. */
export function useSweep({ projectId, studyId, materials, onFinished }: UseSweepOptions) {
  const [state, setState] = useState<SweepRunState>({ status: "idle" });
  const pool = useRef<WorkerPool | null>(null);
  const abort = useRef<AbortController | null>(null);
  const cancelled = useRef(false);

  const stopAll = useCallback(() => {
    pool.current?.terminate();
    pool.current = null;
    abort.current?.abort();
    abort.current = null;
  }, []);
  useEffect(() => stopAll, [stopAll]);

  const inBrowser = useCallback(
    async (params: EmbankmentParams, settings: SweepSettings, required: RequiredFs) => {
      const startedAt = performance.now();
      const p = startWorkerPool(params, materials, settings);
      pool.current = p;
      setState({ status: "running", where: "browser", done: 0, total: 1, startedAt });
      const out = await runWholeSweep({
        params,
        settings,
        required,
        execute: p.execute,
        concurrency: p.size,
        onProgress: ({ done, total }) => setState({ status: "running", where: "browser", done, total, startedAt }),
        isCancelled: () => cancelled.current,
      });
      p.terminate();
      pool.current = null;
      if (out.cancelled) return;
      const elapsedMs = Math.round(performance.now() - startedAt);
      const sweep: StoredSweep = {
        settings,
        points: out.points,
        ranOn: "browser",
        elapsedMs,
        workers: p.size,
        engineVersion: ENGINE_VERSION,
        finishedAt: new Date().toISOString(),
      };
      onFinished(sweep);
      let keptMessage: string | null = null;
      try {
        // The server runs the sweep again and keeps its own points; show those when they differ.
        const kept = await fetchJson<{ sweep: StoredSweep; preview: PreviewCheck }>(
          `/api/projects/${projectId}/design/${studyId}/results`,
          { method: "PUT", json: sweep },
        );
        if (kept.preview.status === "differed") {
          onFinished(kept.sweep);
          const n = kept.preview.differences.length + kept.preview.more;
          const values = `${n} value${n === 1 ? "" : "s"}`;
          keptMessage = `The server's own run of the sweep differed in ${values}; its values are kept and shown.`;
        }
      } catch (err) {
        keptMessage =
          err instanceof ApiClientError ? `Not kept: ${err.message}` : "Not kept: the server could not be reached.";
      }
      setState({ status: "done", where: "browser", elapsedMs, workers: p.size, keptMessage });
    },
    [materials, onFinished, projectId, studyId],
  );

  const onServer = useCallback(
    async (settings: SweepSettings) => {
      const startedAt = performance.now();
      const controller = new AbortController();
      abort.current = controller;
      setState({ status: "running", where: "server", done: 0, total: 1, startedAt });
      const response = await fetch(`/api/projects/${projectId}/design/${studyId}/sweep`, {
        method: "POST",
        headers: { "content-type": "application/json" },
        body: JSON.stringify({ settings }),
        signal: controller.signal,
      });
      if (!response.ok || !response.body) {
        const body = await response.json().catch(() => null);
        throw new Error(body?.error?.message ?? `The server answered ${response.status}.`);
      }
      const reader = response.body.pipeThrough(new TextDecoderStream()).getReader();
      let buffer = "";
      for (;;) {
        const { value, done } = await reader.read();
        if (done) break;
        buffer += value;
        let nl: number;
        while ((nl = buffer.indexOf("\n")) >= 0) {
          const line = JSON.parse(buffer.slice(0, nl));
          buffer = buffer.slice(nl + 1);
          if (line.type === "progress")
            setState({ status: "running", where: "server", done: line.done, total: line.total, startedAt });
          else if (line.type === "error") throw new Error(line.message);
          else if (line.type === "done") {
            onFinished(line.sweep as StoredSweep);
            const note =
              line.mode === "in-process"
                ? "The server ran the jobs in its own process (no worker threads were available)."
                : null;
            setState({
              status: "done",
              where: "server",
              elapsedMs: Math.round(performance.now() - startedAt),
              workers: line.sweep.workers,
              keptMessage: note,
            });
          }
        }
      }
      abort.current = null;
    },
    [onFinished, projectId, studyId],
  );

  const start = useCallback(
    async (params: EmbankmentParams, settings: SweepSettings, required: RequiredFs, where: SweepWhere) => {
      stopAll();
      cancelled.current = false;
      try {
        if (where === "browser") await inBrowser(params, settings, required);
        else await onServer(settings);
      } catch (err) {
        if (cancelled.current) return;
        setState({ status: "failed", message: err instanceof Error ? err.message : String(err) });
      }
    },
    [inBrowser, onServer, stopAll],
  );

  const cancel = useCallback(() => {
    cancelled.current = true;
    stopAll();
    setState({ status: "cancelled" });
  }, [stopAll]);

  return { state, start, cancel };
}
