"use client";

import { ProgressBar } from "@/components/ui/progress-bar";
import { useScatterStudy } from "@/components/runs/kept/use-scatter-study";
import { ScatterStudyForm } from "@/components/runs/kept/scatter-study-form";
import { ScatterStudyResults } from "@/components/runs/kept/scatter-study-results";

interface ScatterStudyPanelProps {
  projectId: number;
  runId: number;
  canRun: boolean;
}

/**
 * The run's scatter study: spreads on the soil's strength and weight (and a drawdown's lowered
 * pool), sampled on the server's queue workers; pf and β against the project's target.
 */
export function ScatterStudyPanel({ projectId, runId, canRun }: ScatterStudyPanelProps) {
  const { data, state, fields, submit, cancel } = useScatterStudy(projectId, runId);
  const running = state.status === "running" ? state : null;
  const pct = running && running.job.total > 0 ? Math.round((100 * running.job.done) / running.job.total) : 0;
  return (
    <section className="panel space-y-3 p-3" data-testid="scatter-study" aria-labelledby="scatter-title">
      <h2 id="scatter-title" className="text-sm font-semibold">
        Scatter study: probability of failure and reliability index
      </h2>
      {state.status === "loading" ? <p className="text-xs text-ink-soft">Reading the defaults…</p> : null}
      {data && canRun ? (
        <ScatterStudyForm
          defaults={data.defaults}
          drawdownTo={data.drawdownTo}
          fields={fields}
          busy={running !== null}
          onSubmit={submit}
        />
      ) : null}
      {running ? (
        <div className="space-y-1" data-testid="scatter-progress" data-state={running.job.state}>
          <div className="flex items-center gap-3">
            <ProgressBar percent={pct} label="Probabilistic run progress" />
            <span className="text-sm tabular-nums" data-testid="scatter-progress-text">
              {running.job.state === "queued"
                ? "waiting for a worker"
                : `${running.job.done.toLocaleString("en-US")} of ${running.job.total.toLocaleString("en-US")} samples`}
            </span>
            {canRun ? (
              <button type="button" className="btn-quiet" onClick={() => void cancel()}>
                Cancel
              </button>
            ) : null}
          </div>
          {running.notice ? (
            <p className="text-xs text-alarm-700" data-testid="scatter-notice">
              {running.notice}
            </p>
          ) : null}
        </div>
      ) : null}
      {state.status === "cancelled" ? (
        <p className="text-sm text-ink-soft" data-testid="scatter-cancelled">
          The probabilistic run was cancelled; nothing was kept.
        </p>
      ) : null}
      {state.status === "failed" ? (
        <p className="text-sm text-alarm-700" data-testid="scatter-failed" role="alert">
          {state.message}
        </p>
      ) : null}
      {data?.stored ? (
        <ScatterStudyResults stored={data.stored} target={data.target} />
      ) : data && !running ? (
        <p className="text-xs text-ink-faint">No probabilistic result is kept for this run yet.</p>
      ) : null}
    </section>
  );
}
