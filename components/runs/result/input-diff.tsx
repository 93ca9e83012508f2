import type { DiffArea, Difference } from "@/lib/sections/diff";
import { groupDifferences } from "@/lib/runs/view/diff-groups";

export interface InputDiffProps {
  differences: readonly Difference[];
  /** Names of the two sides, e.g. the two runs' titles. */
  beforeLabel?: string;
  afterLabel?: string;
}

const AREA_TITLE: Record<DiffArea, string> = {
  materials: "Materials",
  geometry: "Geometry",
  water: "Water",
  loads: "Loads",
  analysis: "Analysis settings",
};

/** What differs between the inputs of two runs, grouped by area. */
export function InputDiff({ differences, beforeLabel = "first run", afterLabel = "second run" }: InputDiffProps) {
  const groups = groupDifferences(differences);
  if (groups.length === 0) {
    return (
      <p className="panel p-3 text-sm text-ink-soft" data-testid="input-diff">
        The inputs are the same: {beforeLabel} and {afterLabel} differ only in when they were run.
      </p>
    );
  }
  return (
    <section className="panel space-y-3 p-3 text-sm" data-testid="input-diff">
      <h3 className="text-xs font-medium uppercase tracking-wide text-ink-soft">
        What changed from {beforeLabel} to {afterLabel}
      </h3>
      {groups.map((g) => (
        <div key={g.area} data-area={g.area}>
          <h4 className="font-semibold">
            {AREA_TITLE[g.area]} <span className="font-normal text-ink-faint">({g.items.length})</span>
          </h4>
          <ul className="mt-1 space-y-0.5">
            {g.items.map((d, i) => (
              <li key={`${d.path}-${i}`} className="flex flex-wrap items-baseline gap-x-2">
                <span>{d.text}</span>
                {d.before !== undefined || d.after !== undefined ? (
                  <span className="text-xs tabular-nums text-ink-soft">
                    <del className="decoration-ink-faint">{d.before ?? "—"}</del> →{" "}
                    <ins className="no-underline font-medium text-ink">{d.after ?? "—"}</ins>
                  </span>
                ) : null}
                <code className="text-[11px] text-ink-faint">{d.path}</code>
              </li>
            ))}
          </ul>
        </div>
      ))}
    </section>
  );
}
