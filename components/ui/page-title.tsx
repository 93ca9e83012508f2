export function PageTitle({
  title,
  kicker,
  children,
}: {
  title: string;
  kicker?: React.ReactNode;
  children?: React.ReactNode;
}) {
  return (
    <div className="mb-6 flex flex-wrap items-end justify-between gap-3 border-b border-rule pb-4">
      <div>
        {kicker ? (
          <div className="mb-1 text-xs font-medium uppercase tracking-wide text-ink-faint">{kicker}</div>
        ) : null}
        <h1 className="text-2xl font-semibold tracking-tight">{title}</h1>
      </div>
      {children ? <div className="flex items-center gap-2">{children}</div> : null}
    </div>
  );
}
