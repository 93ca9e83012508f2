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
import type { PreviewCheck } from "@/lib/runs/record/compare-preview";
import type { JobView } from "@/lib/jobs/types";
import { watchJob } from "@/lib/client/watch-job";
import { startWorkerPool, type WorkerPool } from "./worker-pool";

export type SweepWhere = "browser" | "server";

export type SweepRunState =
  | { status: "idle" }
  | {
      status: "running";
      where: SweepWhere;
      done: number;
      total: number;
      startedAt: number;
      /** Why a server sweep is not moving as usual (queue down, a retry, the server restarting). */
      notice?: string | null;
    }
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

const UNREACHABLE =
  "The server does not answer just now; the sweep goes on on the queue's workers and this page keeps trying.";

/**
 * Runs a study's sweep in Web Workers (then keeps it on the server) or as a job on the server's
 * queue, polled until it ends; a page opened while such a job runs picks it up again.
 */
export function useSweep({ projectId, studyId, materials, onFinished }: UseSweepOptions) {
  const [state, setState] = useState<SweepRunState>({ status: "idle" });
  const pool = useRef<WorkerPool | null>(null);
  const abort = useRef<AbortController | null>(null);
  const job = useRef<number | null>(null);
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
        const kept = await fetchJson<{ sweep: StoredSweep; preview: PreviewCheck } | { job: JobView }>(
          `/api/projects/${projectId}/design/${studyId}/results`,
          { method: "PUT", json: sweep },
        );
        if ("job" in kept) {
          keptMessage =
            kept.job.notice ??
            "The server's own run of this sweep is still waiting on its queue; " +
              "the study keeps its values when it ends.";
        } else if (kept.preview.status === "differed") {
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

  /** Follows a server sweep's job until it ends (lib/client/watch-job.ts). */
  const followJob = useCallback(
    async (jobId: number, startedAt: number) => {
      const controller = new AbortController();
      abort.current = controller;
      job.current = jobId;
      const ended = await watchJob(projectId, jobId, {
        signal: controller.signal,
        onView: (view) => {
          if (view === null) setState((s) => (s.status === "running" ? { ...s, notice: UNREACHABLE } : s));
          else if (view.state === "queued" || view.state === "running")
            setState({
              status: "running",
              where: "server",
              done: view.done,
              total: Math.max(1, view.total),
              startedAt,
              notice: view.notice,
            });
        },
      });
      job.current = null;
      if (abort.current === controller) abort.current = null;
      if (!ended) return;
      if (ended.state === "failed") throw new Error(ended.error ?? "The sweep failed on the server.");
      if (ended.state === "cancelled") return setState({ status: "cancelled" });
      const sweep = ended.result as StoredSweep;
      onFinished(sweep);
      setState({ status: "done", where: "server", elapsedMs: sweep.elapsedMs, workers: 1, keptMessage: null });
    },
    [onFinished, projectId],
  );

  const onServer = useCallback(
    async (settings: SweepSettings) => {
      const startedAt = performance.now();
      setState({ status: "running", where: "server", done: 0, total: 1, startedAt });
      const { job: queued } = await fetchJson<{ job: JobView }>(`/api/projects/${projectId}/design/${studyId}/sweep`, {
        method: "POST",
        json: { settings },
      });
      if (cancelled.current) {
        // Cancelled while the job was being made: it must not run on without anyone waiting for it.
        await fetchJson(`/api/projects/${projectId}/jobs/${queued.id}`, { method: "DELETE" });
        return;
      }
      setState({ status: "running", where: "server", done: 0, total: 1, startedAt, notice: queued.notice });
      await followJob(queued.id, startedAt);
    },
    [projectId, studyId, followJob],
  );

  // A page opened (or reloaded) while the study's sweep runs on the queue follows that job.
  useEffect(() => {
    let stale = false;
    fetchJson<{ job: JobView | null }>(`/api/projects/${projectId}/design/${studyId}/sweep`)
      .then(async ({ job: latest }) => {
        if (stale || !latest || (latest.state !== "queued" && latest.state !== "running")) return;
        const startedAt = performance.now();
        setState({
          status: "running",
          where: "server",
          done: latest.done,
          total: Math.max(1, latest.total),
          startedAt,
        });
        await followJob(latest.id, startedAt);
      })
      .catch((err: unknown) => {
        if (!stale && err instanceof Error && !(err instanceof ApiClientError && err.status === 403))
          setState({ status: "failed", message: err.message });
      });
    return () => {
      stale = true;
    };
  }, [projectId, studyId, followJob]);

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
    // A queued sweep goes on without this page unless the server is told to stop it.
    if (job.current !== null)
      void fetchJson(`/api/projects/${projectId}/jobs/${job.current}`, { method: "DELETE" }).catch(() => undefined);
    job.current = null;
    stopAll();
    setState({ status: "cancelled" });
  }, [projectId, stopAll]);

  return { state, start, cancel };
}
