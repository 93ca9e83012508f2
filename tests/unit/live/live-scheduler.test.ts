/**
 * The live scheduler with a real in-process search as its runner: searches answer on a later
 * turn, as a worker does. Checked: requests never queue (a displaced one never runs), the newest
 * answer is the one left as "final", and after a cancel no number is shown and late answers are
 * ignored.
 */
import { describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import path from "node:path";
import fc from "fast-check";
import type { GridSearchSuccess, SectionDocument } from "@/lib/stability";
import { coarseDocument } from "@/lib/live/coarse-pass";
import { LiveScheduler, type LiveDisplay } from "@/lib/live/live-scheduler";
import { searchRecord } from "@/lib/runs/record/search-record";

const base = JSON.parse(
  readFileSync(path.resolve(__dirname, "../../fixtures/sections/three-material-embankment.json"), "utf8"),
) as SectionDocument;
base.analysis = {
  ...base.analysis!,
  grid: { x1: 55, y1: 25, x2: 85, y2: 45, nx: 5, ny: 4 },
  radii: { tangentY1: 10, tangentY2: 1, n: 3 },
  refine: false,
};

/** The embankment with the core's φ′ set, so each request has its own FS. */
function withPhi(phi: number): SectionDocument {
  return { ...base, materials: base.materials.map((m) => (m.id === "core" ? { ...m, phi } : m)) };
}

function harness() {
  const started: number[] = [];
  const shown: LiveDisplay<number>[] = [];
  let stopped = 0;
  const pending = new Map<number, ReturnType<typeof setTimeout>>();
  const s: LiveScheduler<SectionDocument, number> = new LiveScheduler<SectionDocument, number>(
    {
      start(id, doc) {
        started.push(id);
        pending.set(
          id,
          setTimeout(() => {
            const r = searchRecord(doc);
            s.answer(id, r.ok ? (r.result as GridSearchSuccess).results.bishop!.fs : NaN);
          }, 1),
        );
      },
      stop() {
        stopped++;
      },
    },
    (d) => shown.push(d),
  );
  const settle = () => new Promise((r) => setTimeout(r, 30));
  return { s, started, shown, settle, stopped: () => stopped };
}

const fsOf = (phi: number) => {
  const r = searchRecord(withPhi(phi));
  if (!r.ok) throw new Error("search failed");
  return r.result.results.bishop!.fs;
};

describe("LiveScheduler", () => {
  it("runs the first and the newest of a burst, never the ones in between, and ends final on the newest", async () => {
    const h = harness();
    const phis = [20, 21, 22, 23, 24];
    for (const phi of phis) h.s.request(withPhi(phi));
    expect(h.started).toEqual([1]);
    for (let i = 0; i < 20 && h.shown.at(-1)?.state !== "final"; i++) await h.settle();
    expect(h.started).toEqual([1, 5]);
    const last = h.shown.at(-1)!;
    expect(last.state).toBe("final");
    if (last.state === "final") expect(Object.is(last.result, fsOf(24))).toBe(true);
    // The first answer was shown only as settling, since the drawing had moved on.
    const first = h.shown.find((d) => d.state === "settling" && d.answered === 1);
    expect(first).toBeDefined();
  });

  it("after a cancel shows nothing and ignores the answer still on its way", async () => {
    const h = harness();
    h.s.request(withPhi(22));
    h.s.cancel();
    expect(h.stopped()).toBe(1);
    await h.settle();
    await h.settle();
    expect(h.shown.at(-1)).toEqual({ state: "off" });
  });

  it("never leaves a number other than the newest request's as final (random bursts and cancels)", async () => {
    await fc.assert(
      fc.asyncProperty(
        fc.array(fc.oneof(fc.integer({ min: 18, max: 30 }), fc.constant(-1)), { minLength: 1, maxLength: 6 }),
        async (steps) => {
          const h = harness();
          let newest: number | null = null;
          for (const step of steps) {
            if (step < 0) {
              h.s.cancel();
              newest = null;
            } else {
              h.s.request(withPhi(step));
              newest = step;
            }
            if (step % 2 === 0) await h.settle();
          }
          for (let i = 0; i < 20 && h.s.busy; i++) await h.settle();
          const last = h.shown.at(-1)!;
          if (newest === null) expect(last.state).toBe("off");
          else {
            expect(last.state).toBe("final");
            if (last.state === "final") expect(Object.is(last.result, fsOf(newest))).toBe(true);
          }
        },
      ),
      { numRuns: 15 },
    );
  });
});

/**
 * A runner that answers as the live worker does (components/runs/setup/grid-search.worker.ts):
 * a coarse pass first (lib/live/coarse-pass.ts, answered as not full), then the full set-up unless
 * a newer request started meanwhile; with `late` the full pass of an older request had already
 * begun and still answers after the newer one's coarse answer.
 */
function coarseHarness(late = false) {
  const shown: LiveDisplay<number>[] = [];
  let newest = 0;
  const s: LiveScheduler<SectionDocument, number> = new LiveScheduler<SectionDocument, number>(
    {
      start(id, doc) {
        newest = id;
        setTimeout(() => {
          const c = coarseDocument(doc);
          const r = searchRecord(c ?? doc);
          s.answer(id, r.ok ? -(r.result as GridSearchSuccess).results.bishop!.fs : NaN, false);
          setTimeout(
            () => {
              if (newest !== id && !late) return;
              const f = searchRecord(doc);
              s.answer(id, f.ok ? (f.result as GridSearchSuccess).results.bishop!.fs : NaN);
            },
            late ? 12 : 4,
          );
        }, 1);
      },
      stop() {},
    },
    (d) => shown.push(d),
  );
  return { s, shown, settle: () => new Promise((r) => setTimeout(r, 30)) };
}

/** A set-up big enough for a coarse pass (coarse answers carry −FS here, to tell them apart). */
function bigger(phi: number): SectionDocument {
  const d = withPhi(phi);
  return {
    ...d,
    analysis: {
      ...d.analysis!,
      grid: { ...d.analysis!.grid!, nx: 12, ny: 12 },
      radii: { tangentY1: 10, tangentY2: 1, n: 12 },
    },
  };
}

describe("LiveScheduler with a coarse pass first", () => {
  it("shows the coarse answer as settling and the full set-up's answer as final", async () => {
    const h = coarseHarness();
    h.s.request(bigger(24));
    for (let i = 0; i < 20 && h.shown.at(-1)?.state !== "final"; i++) await h.settle();
    const coarse = h.shown.find((d) => d.state === "settling" && d.answered === 1);
    expect(coarse && coarse.state === "settling" && coarse.result < 0).toBe(true);
    const last = h.shown.at(-1)!;
    expect(last.state).toBe("final");
    const full = searchRecord(bigger(24));
    if (last.state === "final" && full.ok) expect(Object.is(last.result, full.result.results.bishop!.fs)).toBe(true);
  });

  it("never leaves an older state's answer, or a coarse one, as the last shown (random bursts, late full passes)", async () => {
    await fc.assert(
      fc.asyncProperty(
        fc.array(fc.integer({ min: 18, max: 30 }), { minLength: 1, maxLength: 5 }),
        fc.boolean(),
        async (phis, late) => {
          const h = coarseHarness(late);
          for (const [i, phi] of phis.entries()) {
            h.s.request(bigger(phi));
            if (i % 2 === 0) await new Promise((r) => setTimeout(r, 3));
          }
          for (let i = 0; i < 30 && (h.s.busy || h.shown.at(-1)?.state !== "final"); i++) await h.settle();
          const last = h.shown.at(-1)!;
          expect(last.state).toBe("final");
          const full = searchRecord(bigger(phis.at(-1)!));
          if (last.state === "final" && full.ok)
            expect(Object.is(last.result, full.result.results.bishop!.fs)).toBe(true);
          // Answers on screen never go back to an older state.
          const answered = h.shown.flatMap((d) => (d.state === "settling" || d.state === "final" ? [d.answered] : []));
          for (let i = 1; i < answered.length; i++) expect(answered[i]).toBeGreaterThanOrEqual(answered[i - 1]);
        },
      ),
      { numRuns: 10 },
    );
  });
});
