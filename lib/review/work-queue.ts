/**
 * What a person's dashboard lists: runs waiting for their review, runs they returned that came
 * back revised, and the state of their own runs. Pure shapes and helpers; db/queries/work-queue
 * fills them.
 */
import type { RunStatus } from "./status";
import { countOf } from "@/lib/format";

export interface QueueRun {
  id: number;
  projectId: number;
  projectName: string;
  title: string;
  sectionName: string;
  sectionVersion: number;
  loadingCondition: string;
  face: "upstream" | "downstream";
  status: RunStatus;
  fsBishop: number | null;
  fsFellenius: number | null;
  requiredFs: number;
  authorName: string;
  /** When it was submitted (awaiting review), or when it was decided (returned, signed off). */
  since: string | null;
  createdAt: string;
  /** The run this one revises, when that run was returned by the person looking at the queue. */
  revisesReturnedRunId: number | null;
  belowRequired: boolean;
}

/** A run the reviewer returned, with the revision the author submitted since. */
export interface RevisedAfterReturn {
  returned: QueueRun;
  revision: QueueRun;
}

export interface ReviewerQueue {
  awaiting: QueueRun[];
  revised: RevisedAfterReturn[];
}

export interface AuthorWork {
  drafts: QueueRun[];
  /** Returned runs that have no submitted revision yet. */
  returned: QueueRun[];
  signedOff: QueueRun[];
}

export interface WorkCounts {
  /** Runs waiting for this person's review. */
  toReview: number;
  /** This person's returned runs still waiting for a revision. */
  returned: number;
}

const DAY_MS = 86_400_000;

/** Whole days since `since`: 0 on the day it was submitted. */
export function daysWaiting(since: string | null, now: Date = new Date()): number {
  if (!since) return 0;
  return Math.max(0, Math.floor((now.getTime() - new Date(since).getTime()) / DAY_MS));
}

/** "today", "1 day", "4 days". */
export function daysWaitingWords(days: number): string {
  if (days <= 0) return "today";
  return countOf(days, "day");
}
