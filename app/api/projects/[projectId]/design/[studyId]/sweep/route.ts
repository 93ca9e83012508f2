import { z } from "zod";
import { apiRoute, parseJson } from "@/lib/api/handler";
import { sweepSettingsSchema, type StoredSweep } from "@/lib/design";
import { runSweepOnServer } from "@/lib/design/thread-sweep";
import { ENGINE_VERSION } from "@/lib/stability";
import { saveDesignSweep } from "@/db/queries/design-studies";
import { fetchDesignContext } from "@/lib/design/design-context";
import { requireStudy } from "../../study-access";

type Ctx = { params: Promise<{ projectId: string; studyId: string }> };

const runSweepSchema = z.object({ settings: sweepSettingsSchema });

/** One line of the streamed answer (NDJSON): progress while the jobs run, then the outcome. */
export type SweepStreamLine =
  | { type: "progress"; done: number; total: number }
  | { type: "done"; sweep: StoredSweep; mode: "threads" | "in-process" }
  | { type: "error"; message: string };

/**
 * Runs the study's sweep on the server, in worker threads, streaming progress as lines of JSON,
 * and keeps the result. Closing the request cancels the jobs not yet started.
 */
export const POST = apiRoute(async (request: Request, { params }: Ctx) => {
  const { study, projectId } = await requireStudy(params, "design.sweep");
  const { settings } = await parseJson(request, runSweepSchema);
  const context = await fetchDesignContext(projectId);
  const encoder = new TextEncoder();
  let closed = false;
  const stream = new ReadableStream<Uint8Array>({
    async start(controller) {
      const send = (line: SweepStreamLine) => {
        if (!closed) controller.enqueue(encoder.encode(JSON.stringify(line) + "\n"));
      };
      try {
        const out = await runSweepOnServer({
          params: study.parameters,
          materials: context.materials,
          settings,
          required: context.required,
          onProgress: (p) => send({ type: "progress", done: p.done, total: p.total }),
          isCancelled: () => closed || request.signal.aborted,
        });
        if (out.cancelled) return;
        const sweep: StoredSweep = {
          settings,
          points: out.points,
          ranOn: "server",
          elapsedMs: out.elapsedMs,
          workers: out.workers,
          engineVersion: ENGINE_VERSION,
          finishedAt: new Date().toISOString(),
        };
        await saveDesignSweep({ projectId, studyId: study.id, sweep });
        send({ type: "done", sweep, mode: out.mode });
      } catch (err) {
        console.error("[design] server sweep failed", err);
        send({ type: "error", message: "The sweep failed on the server; try again, or run it in the browser." });
      } finally {
        if (!closed) controller.close();
        closed = true;
      }
    },
    cancel() {
      closed = true;
    },
  });
  return new Response(stream, {
    headers: { "content-type": "application/x-ndjson; charset=utf-8", "cache-control": "no-store" },
  });
});
