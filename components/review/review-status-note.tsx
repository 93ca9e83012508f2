import type { ReviewRecord } from "@/lib/review/types";
import { formatDateTime } from "@/lib/format";

const at = (iso: string | null) => (iso ? formatDateTime(iso) : "");

/** One sentence on where the review stands, with the reviewer's note. */
export function ReviewStatusNote({ record }: { record: ReviewRecord }) {
  const box = "rounded-md border-l-4 px-4 py-2 text-sm";
  switch (record.status) {
    case "approved":
      if (record.belowRequiredReason)
        return (
          <div
            className={`${box} border-dashed border-alarm-600 bg-alarm-50`}
            data-testid="review-status-note"
            data-status="approved-below"
          >
            <strong>
              <span aria-hidden="true">▲ </span>Signed off — below the required FS
            </strong>{" "}
            by {record.reviewedByName} on {at(record.reviewedAt)}. The factor of safety does not meet the required
            value; the reviewer accepted it on purpose. The run and its inputs are frozen; a change needs a revision.
            <p className="mt-1 whitespace-pre-wrap">
              Reason for signing off below the required FS: {record.belowRequiredReason}
            </p>
            {record.reviewNote ? (
              <p className="mt-1 whitespace-pre-wrap">Reviewer&apos;s note: {record.reviewNote}</p>
            ) : null}
          </div>
        );
      return (
        <div className={`${box} border-moss-600 bg-moss-50`} data-testid="review-status-note">
          <strong>Signed off</strong> by {record.reviewedByName} on {at(record.reviewedAt)}. The run and its inputs are
          frozen; a change needs a revision.
          {record.reviewNote ? (
            <p className="mt-1 whitespace-pre-wrap">Reviewer&apos;s note: {record.reviewNote}</p>
          ) : null}
        </div>
      );
    case "returned":
      return (
        <div className={`${box} border-alarm-600 bg-alarm-50`} data-testid="review-status-note">
          <strong>Returned with comments</strong> by {record.reviewedByName} on {at(record.reviewedAt)}. Revise it as a
          new run and submit that one.
          {record.reviewNote ? (
            <p className="mt-1 whitespace-pre-wrap">Reviewer&apos;s note: {record.reviewNote}</p>
          ) : null}
        </div>
      );
    case "submitted":
      return (
        <div className={`${box} border-clay-500 bg-clay-50`} data-testid="review-status-note">
          <strong>Awaiting review</strong> since {at(record.submittedAt)}, submitted by {record.submittedByName}.
        </div>
      );
    default:
      return (
        <div className={`${box} border-rule bg-paper-raised`} data-testid="review-status-note">
          <strong>Draft.</strong> Its author submits it for review when it is ready; until then it can be renamed or
          deleted.
        </div>
      );
  }
}
