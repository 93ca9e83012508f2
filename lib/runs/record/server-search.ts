/**
 * The server's own search of a run being kept, off the request thread: it runs searchRecord on
 * one of the long-lived engine threads (lib/design/engine-threads.ts), so a large set-up does not
 * stall other users' requests. Without the bundle the search runs in this process after yielding
 * once, and the outcome says so.
 */
import type { EngineFailure, SectionDocument } from "@/lib/stability";
import { engineBundle, onEngineThread } from "@/lib/design/engine-threads";
import { searchRecord, type SearchRecord } from "./search-record";

export interface ServerSearch {
  record: SearchRecord | EngineFailure;
  mode: "thread" | "in-process";
}

/** Runs the whole search of a run's document (the analysis block included) on the server. */
export async function searchOnServer(document: SectionDocument): Promise<ServerSearch> {
  const file = engineBundle();
  if (file) {
    try {
      const reply = await onEngineThread(file, { kind: "record", document });
      if ("record" in reply) return { record: reply.record, mode: "thread" };
      throw new Error("the engine thread answered a search without its record");
    } catch (err) {
      // A bundle built before this module existed cannot run the search (npm run build:engine
      // renews it); the save must not fail for that, so the search runs here instead.
      console.error("[runs] the search thread failed; searching in this process:", err);
    }
  }
  await new Promise((r) => setImmediate(r));
  return { record: searchRecord(document), mode: "in-process" };
}
