import type { RunEvent } from "@/lib/review/types";
import { STATUS_WORDS, type RunStatus } from "@/lib/review/status";
import { formatDateTime } from "@/lib/format";

const KIND_WORDS: Record<string, string> = {
  status: "Status",
  comment: "Comment",
  checklist: "Checklist",
  renamed: "Renamed",
  "mail-sent": "Notice sent",
  "mail-failed": "Notice failed",
  "mail-skipped": "No notice",
};

const at = (iso: string) => formatDateTime(iso);

function what(e: RunEvent): string {
  if (e.kind === "status" && e.toStatus) {
    const to = STATUS_WORDS[e.toStatus as RunStatus] ?? e.toStatus;
    return `${STATUS_WORDS[(e.fromStatus ?? "draft") as RunStatus]} → ${to}${e.note ? `: ${e.note}` : ""}`;
  }
  return e.note;
}

/** Every status change, comment, checklist entry and notice of a run, oldest first, with who and when. */
export function AuditTrail({ events }: { events: readonly RunEvent[] }) {
  return (
    <section className="panel p-4" aria-labelledby="audit-heading" data-testid="audit-trail">
      <h2 id="audit-heading" className="mb-2 font-semibold">
        Audit trail
      </h2>
      {events.length === 0 ? (
        <p className="text-sm text-ink-faint">Nothing has happened to this run since it was saved.</p>
      ) : (
        <ol className="space-y-1.5 text-sm">
          {events.map((e) => (
            <li
              key={e.id}
              className="grid grid-cols-[10rem_7rem_1fr] gap-2 border-t border-rule pt-1.5 first:border-t-0 first:pt-0"
              data-testid={`audit-${e.kind}`}
            >
              <span className="text-xs text-ink-soft tabular-nums">{at(e.createdAt)}</span>
              <span className={`text-xs font-medium ${e.kind === "mail-failed" ? "text-alarm-700" : "text-ink-soft"}`}>
                {KIND_WORDS[e.kind] ?? e.kind}
              </span>
              <span className="break-words">
                {e.actorName ? <strong className="font-medium">{e.actorName}: </strong> : null}
                {what(e)}
              </span>
            </li>
          ))}
        </ol>
      )}
    </section>
  );
}
