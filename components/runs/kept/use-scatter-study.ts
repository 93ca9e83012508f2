"use client";

import { useCallback, useEffect, useRef, useState } from "react";
import type { JobView } from "@/lib/jobs/types";
import type { ProbabilisticPanelData } from "@/lib/probabilistic/types";
import type { ProbabilisticRequest } from "@/lib/probabilistic/request";
import { ApiClientError, fetchJson } from "@/lib/client/fetch-json";
import { watchJob } from "@/lib/client/watch-job";

export type StudyState =
  | { status: "loading" }
  | { status: "idle" }
  | { status: "running"; job: JobView; notice: string | null }
  | { status: "cancelled" }
  | { status: "failed"; message: string };

const UNREACHABLE =
  "The server does not answer just now; the run goes on on the queue's workers and this page keeps trying.";

/**
 * The probabilistic panel's data and job: loads the defaults and the latest result, starts a job,
 * follows it (a page reloaded while it runs picks it up again) and cancels it.
 */
export function useScatterStudy(projectId: number, runId: number) {
  const url = `/api/projects/${projectId}/runs/${runId}/probabilistic`;
  const [data, setData] = useState<ProbabilisticPanelData | null>(null);
  const [state, setState] = useState<StudyState>({ status: "loading" });
  const [fields, setFields] = useState<Record<string, string[]>>({});
  const abort = useRef<AbortController | null>(null);

  const follow = useCallback(
    async (job: JobView) => {
      abort.current?.abort();
      const controller = new AbortController();
      abort.current = controller;
      setState({ status: "running", job, notice: job.notice });
      try {
        const ended = await watchJob(projectId, job.id, {
          signal: controller.signal,
          onView: (v) =>
            setState((s) =>
              v === null
                ? s.status === "running"
                  ? { ...s, notice: UNREACHABLE }
                  : s
                : v.state === "queued" || v.state === "running"
                  ? { status: "running", job: v, notice: v.notice }
                  : s,
            ),
        });
        if (!ended) return;
        if (ended.state === "failed") return setState({ status: "failed", message: ended.error ?? "The run failed." });
        if (ended.state === "cancelled") return setState({ status: "cancelled" });
        setData(await fetchJson<ProbabilisticPanelData>(url));
        setState({ status: "idle" });
      } catch (err) {
        setState({ status: "failed", message: err instanceof Error ? err.message : String(err) });
      }
    },
    [projectId, url],
  );

  useEffect(() => {
    let live = true;
    fetchJson<ProbabilisticPanelData>(url)
      .then((d) => {
        if (!live) return;
        setData(d);
        if (d.job && (d.job.state === "queued" || d.job.state === "running")) void follow(d.job);
        else setState({ status: "idle" });
      })
      .catch(
        (err) => live && setState({ status: "failed", message: err instanceof Error ? err.message : String(err) }),
      );
    return () => {
      live = false;
      abort.current?.abort();
    };
  }, [url, follow]);

  const submit = useCallback(
    async (request: ProbabilisticRequest) => {
      setFields({});
      try {
        const { job } = await fetchJson<{ job: JobView }>(url, { method: "POST", json: request });
        void follow(job);
      } catch (err) {
        if (err instanceof ApiClientError) {
          setFields(err.fields);
          setState({ status: "failed", message: err.message });
        } else setState({ status: "failed", message: "The server could not be reached; nothing was queued." });
      }
    },
    [url, follow],
  );

  const cancel = useCallback(async () => {
    if (state.status !== "running") return;
    await fetchJson(`/api/projects/${projectId}/jobs/${state.job.id}`, { method: "DELETE" }).catch(() => undefined);
  }, [projectId, state]);

  return { data, state, fields, submit, cancel };
}
