"use client";

import { CAUTION_TEXT } from "@/lib/caution";
import type { LiveDisplay } from "@/lib/live/live-scheduler";
import type { LiveSetup } from "@/lib/live/live-setup";
import { METHOD_SHORT } from "@/lib/runs/view/warning-text";
import type { LiveAnswer } from "@/components/runs/setup/use-live-search";
import { countOf } from "@/lib/format";

interface LiveBarProps {
  on: boolean;
  onToggle(): void;
  display: LiveDisplay<LiveAnswer>;
  setup: LiveSetup | null;
  circles: number;
  /** Keeps the drawing as a new section version through the usual save; absent when read-only. */
  onKeep?: () => void;
  canKeep: boolean;
  keepLabel?: string;
}

const STATE_WORDS = { waiting: "searching…", settling: "settling…", final: "final" } as const;

/** Turns live checking on and off and says what the live search found and whether it is settled. */
export function LiveBar({ on, onToggle, display, setup, circles, onKeep, canKeep, keepLabel }: LiveBarProps) {
  const answer = display.state === "settling" || display.state === "final" ? display.result : null;
  return (
    <div className="panel flex flex-col gap-2 p-3 text-sm" data-testid="live-bar">
      <div className="flex flex-wrap items-center gap-3">
        <button type="button" className={on ? "btn-primary" : "btn-quiet"} onClick={onToggle} aria-pressed={on}>
          {on ? "End live check" : "Live check"}
        </button>
        {on && setup ? (
          <span className="text-xs text-ink-faint">
            {setup.source === "last-run" ? "Search of the last run" : "Automatic search of the downstream face"} ·{" "}
            {countOf(circles, "circle")}
          </span>
        ) : (
          <span className="text-xs text-ink-faint">The factor of safety follows the drawing as you drag.</span>
        )}
        {on ? (
          <output
            data-testid="live-badge"
            data-state={display.state}
            data-generation={display.state === "off" ? undefined : display.generation}
            data-answered={answer ? (display as { answered: number }).answered : undefined}
            data-latency-ms={answer ? answer.latencyMs.toFixed(1) : undefined}
            data-search-ms={answer ? answer.elapsedMs.toFixed(1) : undefined}
            data-fs={
              answer
                ? JSON.stringify(Object.fromEntries(answer.outcome.ghosts.map((g) => [g.method, g.fs])))
                : undefined
            }
            aria-live="polite"
            className={`ml-auto rounded-md border px-2 py-1 font-mono text-xs ${
              display.state === "final" ? "border-ink bg-paper-raised" : "border-dashed border-rule text-ink-soft"
            }`}
          >
            {answer
              ? answer.outcome.ghosts.map((g) => `${METHOD_SHORT[g.method]} ${g.fs.toFixed(3)}`).join(" · ") || "no FS"
              : ""}
            {display.state !== "off" ? ` — ${STATE_WORDS[display.state]}` : ""}
          </output>
        ) : null}
        {on && onKeep ? (
          <button type="button" className="btn-quiet" onClick={onKeep} disabled={!canKeep} data-testid="live-keep">
            {keepLabel ?? "Keep as new version"}
          </button>
        ) : null}
      </div>
      {on && answer?.outcome.problem ? <p className="text-xs text-alarm-700">{answer.outcome.problem}</p> : null}
      {on ? (
        <p className="text-xs text-ink-faint">
          A preview: nothing is stored until the drawing is kept as a new version and run. {CAUTION_TEXT}
        </p>
      ) : null}
    </div>
  );
}
