"use client";

import type { SearchState } from "@/components/runs/setup/use-grid-search";

export function SearchProgress({ state, onCancel }: { state: SearchState; onCancel: () => void }) {
  if (state.status === "running") {
    const pct = Math.round(state.fraction * 100);
    return (
      <div className="panel flex items-center gap-3 px-3 py-2" data-testid="search-progress">
        <div
          className="h-2 flex-1 overflow-hidden rounded bg-paper-sunk"
          role="progressbar"
          aria-label="Search progress"
          aria-valuemin={0}
          aria-valuemax={100}
          aria-valuenow={pct}
        >
          <div className="h-full bg-clay-500 transition-[width]" style={{ width: `${pct}%` }} />
        </div>
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
