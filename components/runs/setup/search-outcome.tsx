"use client";

import { useState } from "react";
import type { RunSetup } from "@/lib/analysis/run-setup";
import { ApiClientError, fetchJson } from "@/lib/client/fetch-json";
import { watchJob } from "@/lib/client/watch-job";
import type { JobView } from "@/lib/jobs/types";
import { FormBanner } from "@/components/ui/form-message";
import { FsSummary } from "@/components/runs/result/fs-summary";
import { SliceTable } from "@/components/runs/result/slice-table";
import type { WorkerMessage } from "@/components/runs/setup/grid-search.worker";
import { loadingCondition } from "@/lib/analysis/required-fs";
import { userIssue } from "@/lib/runs/view/engine-issue-text";
import { runFs } from "@/lib/runs/view/slice-csv";
import { stagedFromResult } from "@/lib/runs/view/staged-view";
import { countOf } from "@/lib/format";
import type { RigorousRunPart } from "@/lib/runs/record/rigorous-part";
import { MethodComparison } from "@/components/runs/result/method-comparison";
import { IntersliceTable } from "@/components/runs/result/interslice-table";
import type { useSolutionChoice } from "@/components/runs/result/use-solution-choice";

export interface SearchOutcomeProps {
  projectId: number;
  section: { id: number; name: string; version: number };
  setup: RunSetup;
  outcome: Extract<WorkerMessage, { type: "done" }>;
  revisesRunId?: number;
  onSaved: (runId: number) => void;
  /** Spencer and Morgenstern–Price on the critical circle and every method on the drawn surface. */
  rigorous?: RigorousRunPart;
  solution?: ReturnType<typeof useSolutionChoice>;
  /** The analysed document's materials, to name them in errors. */
  materials?: readonly { id: string; name?: string }[];
}

/** The result of a finished search, before it is kept: read it, name it, save it. */
export function SearchOutcome({
  projectId,
  section,
  setup,
  outcome,
  revisesRunId,
  onSaved,
  materials = [],
  rigorous,
  solution,
}: SearchOutcomeProps) {
  const { result, critical } = outcome;
  const [title, setTitle] = useState(`${loadingCondition(setup.condition).label}, ${setup.face} face`);
  const [error, setError] = useState<string | null>(null);
  const [saving, setSaving] = useState(false);
  // A large search is kept by a queue worker; the page says so while it waits.
  const [queued, setQueued] = useState<string | null>(null);

  if (!result.ok) {
    return (
      <div className="panel p-4 text-sm" data-testid="search-errors">
        <p className="font-semibold text-alarm-700">The section cannot be analysed as it is:</p>
        <ul className="mt-1 list-disc pl-5">
          {result.errors.map((e, i) => {
            const u = userIssue(e, materials);
            return (
              <li key={i} data-code={e.code}>
                {u.where ? `${u.where}: ` : ""}
                {u.message}
              </li>
            );
          })}
        </ul>
      </div>
    );
  }

  async function save() {
    setSaving(true);
    setError(null);
    try {
      const body = await fetchJson<{ run: { id: number } } | { job: JobView }>(`/api/projects/${projectId}/runs`, {
        method: "POST",
        json: { sectionId: section.id, sectionVersion: section.version, title, setup, result, revisesRunId },
      });
      if ("run" in body) return onSaved(body.run.id);
      setQueued(body.job.notice ?? "This search is large: the server runs it on its job queue before keeping it…");
      const ended = await watchJob(projectId, body.job.id, {
        onView: (job) =>
          setQueued(
            job === null
              ? "The server does not answer just now; the search goes on and this page keeps trying…"
              : (job.notice ?? "This search is large: the server runs it on its job queue before keeping it…"),
          ),
      });
      setQueued(null);
      if (ended?.state === "done") return onSaved((ended.result as { runId: number }).runId);
      setError(ended?.error ?? "The server's search was cancelled; nothing was kept.");
      setSaving(false);
    } catch (err) {
      setQueued(null);
      setError(err instanceof ApiClientError ? err.message : "Could not reach the server.");
      setSaving(false);
    }
  }

  const method = result.methods.includes("bishop") && critical.bishop ? "bishop" : "fellenius";
  return (
    <div className="space-y-3" data-testid="search-outcome">
      <p className="text-xs text-ink-faint">
        {countOf(result.circles.tried, "circle")} in {(outcome.elapsedMs / 1000).toFixed(2)} s
      </p>
      <FsSummary
        result={result}
        requiredFs={setup.requiredFs}
        minMAlpha={{ bishop: critical.bishop?.minMAlpha, fellenius: critical.fellenius?.minMAlpha }}
      />
      {rigorous && solution ? (
        <MethodComparison
          result={result}
          part={rigorous}
          requiredFs={setup.requiredFs}
          choices={solution.choices}
          chosen={solution.chosen}
          onChoose={solution.setChosen}
        />
      ) : null}
      {solution?.current ? <IntersliceTable choice={solution.current} /> : null}
      <div className="panel flex flex-wrap items-end gap-3 p-3">
        <div className="min-w-64 flex-1">
          <label className="label" htmlFor="run-title">
            Name of the run
          </label>
          <input id="run-title" className="field" value={title} onChange={(e) => setTitle(e.target.value)} />
        </div>
        <button type="button" className="btn-primary" onClick={save} disabled={saving || title.trim().length < 3}>
          {saving ? "Saving…" : "Keep this run"}
        </button>
      </div>
      {queued ? (
        <p className="text-sm text-ink-soft" role="status" data-testid="run-queued">
          {queued}
        </p>
      ) : null}
      {error ? <FormBanner kind="error">{error}</FormBanner> : null}
      {critical[method] ? (
        <SliceTable
          caution={false}
          rows={critical[method]!.slices}
          meta={{
            title,
            section: `${section.name} v${section.version}`,
            method,
            fs: runFs(result.methods, {
              fsBishop: result.results.bishop?.fs ?? null,
              fsFellenius: result.results.fellenius?.fs ?? null,
            }),
            staged: stagedFromResult(result),
          }}
        />
      ) : null}
    </div>
  );
}
