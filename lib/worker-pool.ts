/**
 * The one worker pool of the app, for Web Workers in the browser and node:worker_threads on the
 * server alike: each worker takes one request at a time, requests wait for a free worker, and a
 * reply is matched to its request by `seq`. Terminating the pool rejects whatever is waiting.
 */

/** What the pool needs of a worker; the browser and the server each adapt theirs. */
export interface PoolWorker<Request, Reply> {
  post(message: Request): void;
  /** Listens for replies and for the worker failing; returns the function that stops listening. */
  listen(onReply: (reply: Reply) => void, onFailure: (error: Error) => void): () => void;
  terminate(): unknown;
}

export interface WorkerPool<Request, Reply> {
  size: number;
  /** Sends the request made for this sequence number to the next free worker; resolves with its reply. */
  request(make: (seq: number) => Request): Promise<Reply>;
  /** Stops every worker; requests still running or waiting reject with "cancelled". */
  terminate(): Promise<void>;
}

export function createWorkerPool<Request, Reply extends { seq: number }>(
  workers: readonly PoolWorker<Request, Reply>[],
): WorkerPool<Request, Reply> {
  const idle = [...workers];
  const waiting: ((w: PoolWorker<Request, Reply>) => void)[] = [];
  const rejectors = new Set<(e: Error) => void>();
  let seq = 0;
  let stopped = false;
  const take = () =>
    new Promise<PoolWorker<Request, Reply>>((resolve) =>
      idle.length ? resolve(idle.pop() as PoolWorker<Request, Reply>) : waiting.push(resolve),
    );
  const give = (w: PoolWorker<Request, Reply>) => {
    const next = waiting.shift();
    if (next) next(w);
    else idle.push(w);
  };

  const request = async (make: (seq: number) => Request): Promise<Reply> => {
    const w = await take();
    const mine = ++seq;
    try {
      return await new Promise<Reply>((resolve, reject) => {
        if (stopped) return reject(new Error("cancelled"));
        rejectors.add(reject);
        const stop = w.listen(
          (reply) => {
            if (reply.seq !== mine) return;
            stop();
            rejectors.delete(reject);
            resolve(reply);
          },
          (error) => {
            stop();
            rejectors.delete(reject);
            reject(error);
          },
        );
        w.post(make(mine));
      });
    } finally {
      give(w);
    }
  };

  const terminate = async () => {
    stopped = true;
    for (const reject of rejectors) reject(new Error("cancelled"));
    rejectors.clear();
    await Promise.all(workers.map((w) => w.terminate()));
  };

  return { size: workers.length, request, terminate };
}
