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

/** What differs between the inputs of two runs, grouped by area: one table row per change, in words. */
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
        <table key={g.area} data-area={g.area} className="w-full text-left">
          <caption className="text-left font-semibold">
            {AREA_TITLE[g.area]} <span className="font-normal text-ink-faint">({g.items.length})</span>
          </caption>
          <thead className="text-xs text-ink-soft">
            <tr>
              <th className="py-1 pr-3 font-normal">Change</th>
              <th className="py-1 pr-3 font-normal">{beforeLabel}</th>
              <th className="py-1 font-normal">{afterLabel}</th>
            </tr>
          </thead>
          <tbody>
            {g.items.map((d, i) => (
              <tr key={`${d.path}-${i}`} className="border-t border-rule align-baseline">
                <td className="py-1 pr-3">
                  {d.before !== undefined || d.after !== undefined ? (d.what ?? d.text) : d.text}
                </td>
                <td className="py-1 pr-3 tabular-nums text-ink-soft">
                  {d.before !== undefined ? <del className="decoration-ink-faint">{d.before}</del> : "—"}
                </td>
                <td className="py-1 tabular-nums">
                  {d.after !== undefined ? <ins className="font-medium no-underline">{d.after}</ins> : "—"}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      ))}
    </section>
  );
}
