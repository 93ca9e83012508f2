import type { RunComment } from "@/lib/review/types";
import { commentLabel } from "@/lib/review/comment-label";
import { formatDateTime } from "@/lib/format";

export interface CommentListProps {
  comments: readonly RunComment[];
  active?: number | null;
  onSelect?: (n: number) => void;
}

/** Comments in the order written; the number matches the marker on the section. */
export function CommentList({ comments, active = null, onSelect }: CommentListProps) {
  if (comments.length === 0)
    return (
      <p className="text-sm text-ink-faint" data-testid="comment-list">
        No comments yet.
      </p>
    );
  return (
    <ol className="space-y-2" data-testid="comment-list">
      {comments.map((c, i) => (
        <li
          key={c.id}
          className={`rounded-md border p-2 text-sm ${active === i + 1 ? "border-ink bg-paper-sunk" : "border-rule"}`}
          data-testid={`comment-${i + 1}`}
          onClick={() => onSelect?.(i + 1)}
        >
          <div className="mb-0.5 flex flex-wrap gap-x-2 text-xs text-ink-soft">
            <span className="font-semibold text-ink">{commentLabel(c, i)}</span>
            <span>{c.authorName}</span>
            <span>{formatDateTime(c.createdAt)}</span>
          </div>
          <p className="whitespace-pre-wrap break-words">{c.body}</p>
        </li>
      ))}
    </ol>
  );
}
