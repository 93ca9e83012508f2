const STYLES: Record<string, { label: string; cls: string; mark: string }> = {
  draft: { label: "Draft", cls: "border-rule text-ink-soft", mark: "○" },
  submitted: { label: "Awaiting review", cls: "border-clay-500 text-clay-700", mark: "◐" },
  returned: { label: "Returned", cls: "border-alarm-600 text-alarm-700", mark: "↺" },
  approved: { label: "Signed off", cls: "border-moss-600 text-moss-700", mark: "●" },
  // Never the green dot of a plain sign-off: a dashed outline, a warning triangle and the words.
  "approved-below": {
    label: "Signed off — below the required FS",
    cls: "border-dashed border-alarm-600 bg-alarm-50 text-alarm-700",
    mark: "▲",
  },
};

/**
 * Status with a shape as well as a colour, so it reads in grey print.
 * @param belowRequired the run was signed off although its FS is below the required value
 */
export function StatusBadge({ status, belowRequired = false }: { status: string; belowRequired?: boolean }) {
  const s = (status === "approved" && belowRequired ? STYLES["approved-below"] : STYLES[status]) ?? STYLES.draft;
  return (
    <span
      className={`inline-flex items-center gap-1 rounded border px-1.5 py-0.5 text-xs ${s.cls}`}
      data-testid="run-status"
      data-status={status === "approved" && belowRequired ? "approved-below" : status}
    >
      <span aria-hidden="true">{s.mark}</span>
      {s.label}
    </span>
  );
}

export function PassMark({ fs, required }: { fs: number | null; required: number }) {
  if (fs === null) return <span className="text-ink-faint">—</span>;
  const pass = fs >= required;
  return (
    <span className={pass ? "text-moss-700" : "text-alarm-700"}>
      <span className="tabular-nums">{fs.toFixed(3)}</span> <span aria-hidden="true">{pass ? "✓" : "✕"}</span>
      <span className="sr-only">
        {pass ? "meets" : "below"} the required {required}
      </span>
    </span>
  );
}
