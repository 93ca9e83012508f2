/** A small mark saying which lab test set a parameter came from. */
export function SourceBadge({ setId, href }: { setId: number | undefined; href?: string }) {
  if (setId === undefined) return null;
  const cls = "ml-1 inline-block rounded-sm bg-moss-50 px-1 py-px align-middle text-[10px] font-medium text-moss-700";
  const text = `from lab test set ${setId}`;
  return href ? (
    <a
      href={href}
      className={`${cls} hover:underline`}
      title={`Derived from lab test set ${setId}`}
      data-testid="source-badge"
    >
      {text}
    </a>
  ) : (
    <span className={cls} title={`Derived from lab test set ${setId}`} data-testid="source-badge">
      {text}
    </span>
  );
}
