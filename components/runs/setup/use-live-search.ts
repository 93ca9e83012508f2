"use client";

import { useEffect, useRef, useState } from "react";
import type { SectionDocument } from "@/lib/stability";
import { LiveScheduler, type LiveDisplay } from "@/lib/live/live-scheduler";
import { liveOutcome, type LiveOutcome } from "@/lib/live/live-ghosts";
import { createSearchWorker, type WorkerMessage } from "@/components/runs/setup/search-worker";

export interface LiveAnswer {
  outcome: LiveOutcome;
  elapsedMs: number;
  /** From the drawing changing to this answer being shown (ms). */
  latencyMs: number;
}

/**
 * Re-runs the search whenever the document changes while `doc` is not null. Requests go out at
 * most once per animation frame; one long-lived worker runs them, a coarse pass first and the full
 * set-up once the drawing rests (see LiveScheduler for how stale ones are dropped). A null
 * document cancels: the worker is terminated and nothing shows.
 */
export function useLiveSearch(doc: SectionDocument | null): LiveDisplay<LiveAnswer> {
  const [display, setDisplay] = useState<LiveDisplay<LiveAnswer>>({ state: "off" });
  const worker = useRef<Worker | null>(null);
  const changedAt = useRef(new Map<number, number>());
  const scheduler = useRef<LiveScheduler<SectionDocument, LiveAnswer> | null>(null);
  const frame = useRef<number | null>(null);
  const latest = useRef<{ doc: SectionDocument; at: number } | null>(null);
  // The document of the newest request: until the next frame sends a changed one, the shown answer is not final.
  const [sent, setSent] = useState<SectionDocument | null>(null);

  /** The scheduler, made on first use inside an effect (refs are not touched during render). */
  const schedulerOf = (): LiveScheduler<SectionDocument, LiveAnswer> => {
    if (scheduler.current == null) {
      scheduler.current = new LiveScheduler<SectionDocument, LiveAnswer>(
        {
          start(id, request) {
            if (!worker.current) {
              const w = createSearchWorker();
              w.onmessage = (e: MessageEvent<WorkerMessage>) => {
                const m = e.data;
                if (m.type === "progress" || m.id === undefined) return;
                const full = m.type !== "done" || m.full !== false;
                const at = changedAt.current.get(m.id) ?? performance.now();
                // Requests displaced before they ran never answer; their clocks go with this one,
                // whose own clock stays until its full answer.
                for (const id of changedAt.current.keys())
                  if (id < m.id || (id === m.id && full)) changedAt.current.delete(id);
                const outcome: LiveOutcome =
                  m.type === "done"
                    ? liveOutcome(m.result)
                    : { ghosts: [], problem: `The search stopped: ${m.message}`, circlesTried: 0 };
                scheduler.current?.answer(
                  m.id,
                  { outcome, elapsedMs: m.type === "done" ? m.elapsedMs : 0, latencyMs: performance.now() - at },
                  full,
                );
              };
              worker.current = w;
            }
            worker.current.postMessage({ doc: request, id, progress: false, coarse: true });
          },
          stop() {
            worker.current?.terminate();
            worker.current = null;
            changedAt.current.clear();
          },
        },
        setDisplay,
      );
    }
    return scheduler.current;
  };

  useEffect(() => {
    const s = schedulerOf();
    if (!doc) {
      latest.current = null;
      if (frame.current !== null) cancelAnimationFrame(frame.current);
      frame.current = null;
      s.cancel();
      return;
    }
    // The first change since the last request sets the clock for the latency figure.
    latest.current = { doc, at: latest.current?.at ?? performance.now() };
    if (frame.current !== null) return;
    frame.current = requestAnimationFrame(() => {
      frame.current = null;
      const next = latest.current;
      if (!next) return;
      latest.current = null;
      setSent(next.doc);
      const id = s.request(next.doc);
      changedAt.current.set(id, next.at);
    });
  }, [doc]);

  useEffect(
    () => () => {
      if (frame.current !== null) cancelAnimationFrame(frame.current);
      scheduler.current?.cancel();
      worker.current?.terminate();
      worker.current = null;
    },
    [],
  );

  if (display.state === "final" && doc !== sent) return { ...display, state: "settling" };
  return display;
}
