import type { CaughtMail } from "@/lib/mail/caught-mail";
import { formatDateTime } from "@/lib/format";

/** Caught messages with their headers; the body opens on demand. */
export function MailLog({ messages }: { messages: readonly CaughtMail[] }) {
  if (messages.length === 0)
    return (
      <p className="panel p-4 text-sm text-ink-faint" data-testid="mail-log">
        No mail has been caught yet.
      </p>
    );
  return (
    <ol className="space-y-2" data-testid="mail-log">
      {messages.map((m) => (
        <li key={m.id} className="panel p-3 text-sm" data-testid="mail-item">
          <details>
            <summary className="cursor-pointer">
              <span className="font-semibold">{m.subject || "(no subject)"}</span>
              <span className="ml-2 text-xs text-ink-soft">to {m.to.join(", ") || m.envelope.to.join(", ")}</span>
            </summary>
            <dl className="mt-2 grid grid-cols-[6rem_1fr] gap-y-1 text-xs">
              <dt className="text-ink-soft">From</dt>
              <dd>{m.from}</dd>
              <dt className="text-ink-soft">To</dt>
              <dd>{m.to.join(", ")}</dd>
              <dt className="text-ink-soft">Delivered to</dt>
              <dd>{m.envelope.to.join(", ")}</dd>
              <dt className="text-ink-soft">Date</dt>
              <dd>{formatDateTime(m.date ?? m.receivedAt)}</dd>
            </dl>
            <pre
              className="mt-2 overflow-x-auto whitespace-pre-wrap rounded bg-paper-sunk p-2 font-mono text-xs"
              data-testid="mail-body"
            >
              {m.text}
            </pre>
          </details>
        </li>
      ))}
    </ol>
  );
}
