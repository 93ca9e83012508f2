"use client";

import { ProgressBar } from "@/components/ui/progress-bar";
import type { SeepageRunState } from "./use-seepage-run";
import { messageWords, placeWords } from "@/lib/issue-words";

/** Free-surface rounds as progress, with cancel; the input problems a solve found, each with its place. */
export function SeepageProgress({ state, onCancel }: { state: SeepageRunState; onCancel: () => void }) {
  if (state.status === "running") {
    const pct = Math.round((state.round / Math.max(1, state.maxRounds)) * 100);
    return (
      <div className="panel flex items-center gap-3 px-3 py-2" data-testid="seepage-progress">
        <ProgressBar percent={pct} label="Seepage solve progress" />
        <span className="text-sm tabular-nums">
          round {state.round} of at most {state.maxRounds}
        </span>
        <button type="button" className="btn-quiet" onClick={onCancel}>
          Cancel
        </button>
      </div>
    );
  }
  if (state.status === "cancelled") return <p className="text-sm text-ink-soft">Solve cancelled; nothing was kept.</p>;
  if (state.status === "failed") return <p className="text-sm text-alarm-700">The solve failed: {state.message}</p>;
  if (state.status === "invalid")
    return (
      <ul className="list-disc pl-5 text-sm text-alarm-700" data-testid="seepage-errors">
        {state.errors.map((e, i) => (
          <li key={i}>
            {messageWords(e.message)} <span className="text-xs">({placeWords(e.path)})</span>
          </li>
        ))}
      </ul>
    );
  return null;
}
