import Link from "next/link";
import type { RunSummary } from "@/lib/runs/types";
import { conditionWords, FACE_WORDS } from "@/lib/vocabulary";
import { StatusBadge } from "@/components/runs/list/status-badge";

const fmt = (v: number | null) => (v === null ? "—" : v.toFixed(3));

/** A compact list of the project's latest runs; the full, filterable list is on the runs page. */
export function ProjectRuns({ runs }: { runs: RunSummary[] }) {
  return (
    <table
      className="w-full overflow-hidden rounded-lg border border-rule bg-paper-raised text-sm"
      data-testid="run-list"
    >
      <thead className="bg-paper-sunk text-left text-xs uppercase tracking-wide text-ink-soft">
        <tr>
          <th className="px-3 py-2">Run</th>
          <th className="px-3 py-2">Section</th>
          <th className="px-3 py-2">Loading condition</th>
          <th className="px-3 py-2">Face</th>
          <th className="px-3 py-2 text-right">FS Bishop</th>
          <th className="px-3 py-2">Status</th>
        </tr>
      </thead>
      <tbody>
        {runs.slice(0, 20).map((r) => (
          <tr key={r.id} className="border-t border-rule">
            <td className="px-3 py-2">
              <Link className="hover:text-clay-600" href={`/projects/${r.projectId}/runs/${r.id}`}>
                {r.title}
              </Link>
            </td>
            <td className="px-3 py-2">
              {r.sectionName} v{r.sectionVersion}
            </td>
            <td className="px-3 py-2">{conditionWords(r.loadingCondition)}</td>
            <td className="px-3 py-2">{FACE_WORDS[r.face] ?? r.face}</td>
            <td className="px-3 py-2 text-right tabular-nums">{fmt(r.fsBishop)}</td>
            <td className="px-3 py-2">
              <StatusBadge status={r.status} belowRequired={r.belowRequiredReason !== null} />
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
