"use client";

import Link from "next/link";
import { useState } from "react";
import type { RunDetail } from "@/lib/runs/types";
import type { ReviewState } from "@/lib/review/review-state";
import { pinMarkers } from "@/lib/review/pin-markers";
import { governingFsOf, isBelowRequired } from "@/lib/review/below-required";
import type { SliceRow } from "@/lib/stability";
import { RunView } from "@/components/runs/kept/run-view";
import { AuthorActions } from "./author-actions";
import { ChecklistPanel } from "./checklist-panel";
import { CommentForm } from "./comment-form";
import { CommentList } from "./comment-list";
import { DecisionForm } from "./decision-form";
import { ReviewStatusNote } from "./review-status-note";

export interface ReviewWorkspaceProps {
  run: RunDetail;
  review: ReviewState;
  /** "run": the run page (author's actions); "review": the review page (checklist and decision). */
  mode: "run" | "review";
  canRevise: boolean;
}

type Tables = Partial<Record<"bishop" | "fellenius", { slices: SliceRow[] }>>;

/** A run with its comments pinned over the section, and the review actions the person may take. */
export function ReviewWorkspace({ run, review, mode, canRevise }: ReviewWorkspaceProps) {
  const [placing, setPlacing] = useState(false);
  const [pin, setPin] = useState<{ x: number; y: number } | null>(null);
  const [active, setActive] = useState<number | null>(null);
  const apiBase = `/api/projects/${run.projectId}/runs/${run.id}`;
  const pagePath = `/projects/${run.projectId}/runs/${run.id}`;
  const tables = run.sliceTables as Tables;
  const markers = pinMarkers(review.comments, tables);
  const shown = pin
    ? [...markers, { n: review.comments.length + 1, x: pin.x, y: pin.y, label: "Place of the comment being written" }]
    : markers;
  const sliceCounts = Object.fromEntries(Object.entries(tables).map(([m, t]) => [m, t?.slices.length ?? 0]));
  const reviews = review.may.actions.includes("approve") || review.may.actions.includes("return");
  const openItems = review.checklist.filter((c) => c.state !== "ok").length;

  const links = (
    <>
      <a className="btn-quiet" href={`${apiBase}/report`} target="_blank" rel="noopener" data-testid="report-link">
        Calculation report (PDF)
      </a>
      <a className="btn-quiet" href={`/api/projects/${run.projectId}/runs/export`} download>
        All runs (CSV)
      </a>
      {mode === "run" && reviews ? (
        <Link className="btn-primary" href={`${pagePath}/review`}>
          Review this run
        </Link>
      ) : null}
      {mode === "review" ? (
        <Link className="btn-quiet" href={pagePath}>
          Back to the run
        </Link>
      ) : null}
    </>
  );

  const comments = (
    <section className="panel space-y-3 p-4" aria-labelledby="comments-heading">
      <h2 id="comments-heading" className="font-semibold">
        Comments
      </h2>
      <CommentList comments={review.comments} active={active} onSelect={setActive} />
      {review.may.comment ? (
        <CommentForm
          apiBase={apiBase}
          sliceCounts={sliceCounts}
          pin={pin}
          placing={placing}
          onPlacing={setPlacing}
          onClearPin={() => setPin(null)}
        />
      ) : null}
    </section>
  );

  // The reviewer works beside the drawing: checklist and decision in a column next to it, the
  // comments under it, and the long slice table folded away below.
  const reviewAside =
    mode === "review" ? (
      <>
        <ChecklistPanel
          key={review.checklist.map((c) => `${c.state}:${c.note}`).join("|")}
          apiBase={apiBase}
          items={review.checklist}
          editable={review.may.checklist}
        />
        <DecisionForm
          apiBase={apiBase}
          actions={review.may.actions}
          openItems={openItems}
          belowRequired={isBelowRequired(run) ? { requiredFs: run.requiredFs, lowestFs: governingFsOf(run) } : null}
        />
      </>
    ) : null;

  return (
    <div className="space-y-4">
      <ReviewStatusNote record={review.record} />
      <RunView
        run={run}
        canRevise={canRevise}
        markers={shown}
        placing={placing}
        onPlace={(p) => {
          setPin(p);
          setPlacing(false);
        }}
        activePin={active}
        onSelectPin={setActive}
        actions={links}
        aside={reviewAside}
        slicesOpen={mode !== "review"}
      >
        {mode === "review" ? comments : null}
      </RunView>
      {mode === "run" ? (
        <div className="grid gap-4 lg:grid-cols-2">
          {comments}
          <AuthorActions
            apiBase={apiBase}
            projectId={run.projectId}
            title={run.title}
            may={{
              submit: review.may.actions.includes("submit"),
              rename: review.may.rename,
              delete: review.may.delete,
            }}
          />
        </div>
      ) : null}
    </div>
  );
}
