"use client";

import { ProgressBar } from "@/components/ui/progress-bar";
import type { SearchState } from "@/components/runs/setup/use-grid-search";

export function SearchProgress({ state, onCancel }: { state: SearchState; onCancel: () => void }) {
  if (state.status === "running") {
    const pct = Math.round(state.fraction * 100);
    return (
      <div className="panel flex items-center gap-3 px-3 py-2" data-testid="search-progress">
        <ProgressBar percent={pct} label="Search progress" />
        <span className="w-12 text-right text-sm tabular-nums">{pct} %</span>
        <button type="button" className="btn-quiet" onClick={onCancel}>
          Cancel
        </button>
      </div>
    );
  }
  if (state.status === "cancelled")
    return (
      <p className="text-sm text-ink-soft" data-testid="search-cancelled">
        Search cancelled; nothing was kept.
      </p>
    );
  if (state.status === "failed")
    return (
      <p className="text-sm text-alarm-700" data-testid="search-failed">
        The search failed: {state.message}
      </p>
    );
  return null;
}
