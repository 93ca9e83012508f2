/**
 * Keeps live searches from piling up. At most one search runs; a newer request takes the one
 * waiting place and the request it displaces is dropped (never queued behind it). An answer for a
 * state the drawing has moved past is shown as "settling"; only the full answer to the newest
 * request is "final". Cancelling stops the running search and clears the display, and any answer
 * that arrives afterwards is ignored, so no stale number is left on screen.
 *
 * Coarse first: a runner may answer a request twice, first from a coarse pass (shown as
 * "settling") and then from the full set-up. After the coarse answer the runner is free for the
 * next request at once; sending one tells it to drop the full pass of the older state (a full
 * answer that still comes is shown only if nothing newer has been shown).
 */
export type LiveDisplay<Res> =
  | { state: "off" }
  | { state: "waiting"; generation: number }
  | { state: "settling" | "final"; generation: number; answered: number; result: Res };

export interface LiveRunner<Req> {
  /** Starts a search; the caller later reports its answer through LiveScheduler.answer(id, …). */
  start(id: number, request: Req): void;
  /** Stops the running search for good (e.g. terminates the worker). */
  stop(): void;
}

export class LiveScheduler<Req, Res> {
  private generation = 0;
  private running: number | null = null;
  /** A request whose coarse answer came and whose full answer may still come. */
  private fine: number | null = null;
  /** The request of the answer on screen (0 none). */
  private shownId = 0;
  private waiting: { id: number; request: Req } | null = null;
  private display: LiveDisplay<Res> = { state: "off" };

  constructor(
    private readonly runner: LiveRunner<Req>,
    private readonly show: (d: LiveDisplay<Res>) => void,
  ) {}

  /** The newest state of the drawing; returns its generation. */
  request(request: Req): number {
    const id = ++this.generation;
    if (this.running === null) {
      this.running = id;
      this.runner.start(id, request);
    } else {
      this.waiting = { id, request };
    }
    this.set(
      this.display.state === "settling" || this.display.state === "final"
        ? { ...this.display, state: "settling", generation: id }
        : { state: "waiting", generation: id },
    );
    return id;
  }

  /**
   * A search's answer: the full set-up's (`full`, the default) or a coarse pass's. Answers of
   * stopped or superseded searches are ignored, and so is any answer older than the one shown.
   */
  answer(id: number, result: Res, full = true): void {
    if (id === this.fine && full) {
      this.fine = null;
      if (id >= this.shownId) this.showAnswer(id, result, true);
      return;
    }
    if (id !== this.running) return;
    this.running = null;
    this.fine = full ? null : id;
    this.showAnswer(id, result, full);
    const next = this.waiting;
    this.waiting = null;
    if (next) {
      this.running = next.id;
      this.runner.start(next.id, next.request);
    }
  }

  private showAnswer(id: number, result: Res, full: boolean) {
    this.shownId = id;
    const final = full && id === this.generation;
    this.set({ state: final ? "final" : "settling", generation: this.generation, answered: id, result });
  }

  /** Stops everything and clears the display. */
  cancel(): void {
    if (this.running !== null || this.fine !== null) this.runner.stop();
    this.running = null;
    this.fine = null;
    this.shownId = 0;
    this.waiting = null;
    this.generation++;
    this.set({ state: "off" });
  }

  /** True while a search runs, or a coarse answer's full pass may still come. */
  get busy(): boolean {
    return this.running !== null || this.fine !== null;
  }

  private set(d: LiveDisplay<Res>) {
    this.display = d;
    this.show(d);
  }
}
