import { differenceLine, type PreviewCheck } from "@/lib/runs/record/compare-preview";

/**
 * Said on a kept run whose preview (the browser's search, or a design sweep's point) differed from
 * the server's own search: the run holds the server's result, and the notice lists what differed.
 */
export function PreviewNotice({ check }: { check: PreviewCheck | null }) {
  if (!check || check.status !== "differed") return null;
  const what =
    check.source === "sweep"
      ? "The design sweep's value for this point"
      : "The result computed in the browser when this run was kept";
  return (
    <section
      className="rounded-md border border-clay-500 bg-paper-raised px-4 py-3 text-sm"
      data-testid="preview-notice"
      role="status"
    >
      <p className="font-medium text-ink">
        {what} differed from the server&apos;s own search. This run holds the server&apos;s result.
      </p>
      <ul className="mt-1 list-disc pl-5 text-ink-soft">
        {check.differences.map((d, i) => (
          <li key={i} data-field={d.field}>
            {differenceLine(d)}
          </li>
        ))}
        {check.more > 0 ? <li>and {check.more} more</li> : null}
      </ul>
    </section>
  );
}
