import type { MaterialSourceRecord } from "./material-sources";
import type { RunStatus } from "./status";

// A run's review: its trail, its comments and who moved it (db/queries/review.ts fills them from rows).

/** One line of a run's audit trail. `actorName` is null for what the system did (mail). */
export interface RunEvent {
  id: number;
  kind: string;
  fromStatus: RunStatus | null;
  toStatus: RunStatus | null;
  note: string;
  actorName: string | null;
  createdAt: string;
}

export interface RunComment {
  id: number;
  authorId: number;
  authorName: string;
  body: string;
  pin: { x: number; y: number } | null;
  slice: { number: number; method: "bishop" | "fellenius" } | null;
  createdAt: string;
}

/** Who moved the run through review, and the material sources frozen when it was submitted. */
export interface ReviewRecord {
  status: RunStatus;
  authorId: number;
  submittedByName: string | null;
  submittedAt: string | null;
  reviewedById: number | null;
  reviewedByName: string | null;
  reviewedAt: string | null;
  reviewNote: string | null;
  /** Set when the run was signed off below its required FS: the reviewer's reason. */
  belowRequiredReason: string | null;
  materialSources: MaterialSourceRecord[] | null;
}
