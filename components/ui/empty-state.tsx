export interface EmptyStateProps {
  title: string;
  children: React.ReactNode;
  action?: React.ReactNode;
}

/** A blank list that says what to do next. */
export function EmptyState({ title, children, action }: EmptyStateProps) {
  return (
    <div
      className="rounded-lg border border-dashed border-rule bg-paper-raised/60 px-6 py-8 text-center"
      data-testid="empty-state"
    >
      <p className="font-medium text-ink">{title}</p>
      <div className="mx-auto mt-1 max-w-prose text-sm text-ink-soft">{children}</div>
      {action ? <div className="mt-4">{action}</div> : null}
    </div>
  );
}
