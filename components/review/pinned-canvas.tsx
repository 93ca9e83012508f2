"use client";

import { useEffect, useRef, useState } from "react";
import { toScreen, toWorld, type CanvasView, type PinMarker } from "@/lib/review/pin-markers";

export interface PinnedCanvasProps {
  markers: readonly PinMarker[];
  /** While true, a click on the section drops a pin there instead of panning. */
  placing?: boolean;
  onPlace?: (point: { x: number; y: number }) => void;
  /** The comment whose marker is highlighted. */
  active?: number | null;
  onSelect?: (n: number) => void;
  /** The RunCanvas to draw over. */
  children: React.ReactNode;
}

interface Frame {
  left: number;
  top: number;
  width: number;
  height: number;
  view: CanvasView;
}

/**
 * Numbered comment markers over a RunCanvas, kept in step with its pan and zoom by watching the
 * canvas's data-view; in placing mode a click converts to section coordinates (m).
 */
export function PinnedCanvas({
  markers,
  placing = false,
  onPlace,
  active = null,
  onSelect,
  children,
}: PinnedCanvasProps) {
  const wrapRef = useRef<HTMLDivElement>(null);
  const [frame, setFrame] = useState<Frame | null>(null);

  useEffect(() => {
    const wrap = wrapRef.current;
    const canvas = wrap?.querySelector<HTMLElement>('[data-testid="run-canvas"]');
    if (!wrap || !canvas) return;
    const read = () => {
      const a = wrap.getBoundingClientRect();
      const b = canvas.getBoundingClientRect();
      try {
        const view = JSON.parse(canvas.dataset.view ?? "") as CanvasView;
        setFrame({ left: b.left - a.left, top: b.top - a.top, width: b.width, height: b.height, view });
      } catch {
        setFrame(null);
      }
    };
    read();
    const mo = new MutationObserver(read);
    mo.observe(canvas, { attributes: true, attributeFilter: ["data-view"] });
    const ro = typeof ResizeObserver === "undefined" ? null : new ResizeObserver(read);
    ro?.observe(canvas);
    return () => {
      mo.disconnect();
      ro?.disconnect();
    };
  }, []);

  function place(e: React.MouseEvent<HTMLDivElement>) {
    if (!placing || !frame || !onPlace) return;
    const r = e.currentTarget.getBoundingClientRect();
    const p = toWorld(frame.view, e.clientX - r.left, e.clientY - r.top);
    onPlace({ x: Math.round(p.x * 100) / 100, y: Math.round(p.y * 100) / 100 });
  }

  return (
    <div ref={wrapRef} className="relative">
      {children}
      {frame ? (
        <div
          className={`absolute overflow-hidden ${placing ? "cursor-crosshair bg-clay-500/5 ring-2 ring-inset ring-clay-500" : "pointer-events-none"}`}
          style={{ left: frame.left, top: frame.top, width: frame.width, height: frame.height }}
          onClick={place}
          data-testid="pin-overlay"
          data-placing={placing ? "true" : "false"}
        >
          {placing ? (
            <p className="absolute left-2 top-2 rounded bg-paper-raised/90 px-2 py-0.5 text-xs text-ink">
              Click the place on the section the comment is about
            </p>
          ) : null}
          {markers.map((m) => {
            const s = toScreen(frame.view, m.x, m.y);
            return (
              <button
                key={m.n}
                type="button"
                className={`pointer-events-auto absolute flex h-6 w-6 -translate-y-full items-center justify-center rounded-full rounded-bl-none border-2 text-xs font-semibold shadow ${active === m.n ? "border-ink bg-ink text-paper" : "border-ink bg-paper-raised text-ink"}`}
                style={{ left: s.left, top: s.top }}
                title={m.label}
                aria-label={`Comment ${m.n}: ${m.label}`}
                data-testid={`comment-pin-${m.n}`}
                onClick={(e) => {
                  e.stopPropagation();
                  onSelect?.(m.n);
                }}
              >
                {m.n}
              </button>
            );
          })}
        </div>
      ) : null}
    </div>
  );
}
