import { describe, expect, test } from "vitest";
import { createWorkerPool, type PoolWorker } from "@/lib/worker-pool";

type Req = { seq: number; n: number };
type Reply = { seq: number; square: number };

/** An in-process worker that squares a number after a short wait and counts how many it holds at once. */
function squaringWorker(load: { now: number; most: number }): PoolWorker<Req, Reply> {
  const listeners = new Set<(r: Reply) => void>();
  return {
    post: (m) => {
      load.now++;
      load.most = Math.max(load.most, load.now);
      setTimeout(() => {
        load.now--;
        for (const l of [...listeners]) l({ seq: m.seq, square: m.n * m.n });
      }, 5);
    },
    listen: (onReply) => {
      listeners.add(onReply);
      return () => listeners.delete(onReply);
    },
    terminate: () => undefined,
  };
}

describe("createWorkerPool", () => {
  test("answers every request with its own reply and never gives a worker two requests at once", async () => {
    const loads = [0, 1].map(() => ({ now: 0, most: 0 }));
    const pool = createWorkerPool(loads.map(squaringWorker));
    const replies = await Promise.all([1, 2, 3, 4, 5].map((n) => pool.request((seq) => ({ seq, n }))));
    expect(replies.map((r) => r.square)).toEqual([1, 4, 9, 16, 25]);
    for (const load of loads) expect(load.most).toBe(1);
  });

  test("terminating rejects the requests still running or waiting with 'cancelled'", async () => {
    const pool = createWorkerPool([squaringWorker({ now: 0, most: 0 })]);
    const running = pool.request((seq) => ({ seq, n: 2 }));
    const waiting = pool.request((seq) => ({ seq, n: 3 }));
    await pool.terminate();
    await expect(running).rejects.toThrow("cancelled");
    await expect(waiting).rejects.toThrow("cancelled");
  });
});
