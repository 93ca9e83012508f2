/**
 * Keeps live searches from piling up. At most one search runs; a newer request takes the one
 * waiting place and the request it displaces is dropped (never queued behind it). An answer for a
 * state the drawing has moved past is shown as "settling"; only the answer to the newest request
 * is "final". Cancelling stops the running search and clears the display, and any answer that
 * arrives afterwards is ignored, so no stale number is left on screen.
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

  /** A search's answer. Answers of stopped or superseded searches are ignored. */
  answer(id: number, result: Res): void {
    if (id !== this.running) return;
    this.running = null;
    const next = this.waiting;
    this.waiting = null;
    const newest = id === this.generation;
    this.set({ state: newest ? "final" : "settling", generation: this.generation, answered: id, result });
    if (next) {
      this.running = next.id;
      this.runner.start(next.id, next.request);
    }
  }

  /** Stops everything and clears the display. */
  cancel(): void {
    if (this.running !== null) this.runner.stop();
    this.running = null;
    this.waiting = null;
    this.generation++;
    this.set({ state: "off" });
  }

  /** True while a search runs. */
  get busy(): boolean {
    return this.running !== null;
  }

  private set(d: LiveDisplay<Res>) {
    this.display = d;
    this.show(d);
  }
}
