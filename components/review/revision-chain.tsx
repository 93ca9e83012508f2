import Link from "next/link";
import type { ChainLink } from "@/lib/runs/types";
import { StatusBadge } from "@/components/runs/list/status-badge";

/** The runs this one revises and those revising it, oldest first; the current one is marked. */
export function RevisionChain({
  projectId,
  chain,
  currentId,
}: {
  projectId: number;
  chain: readonly ChainLink[];
  currentId: number;
}) {
  if (chain.length < 2) return null;
  return (
    <section className="panel p-4" aria-labelledby="chain-heading" data-testid="revision-chain">
      <h2 id="chain-heading" className="mb-2 font-semibold">
        Revisions
      </h2>
      <ol className="space-y-1 text-sm">
        {chain.map((r, i) => (
          <li key={r.id} className="flex flex-wrap items-center gap-2">
            <span className="w-6 text-right text-xs text-ink-faint">{i + 1}.</span>
            {r.id === currentId ? (
              <strong aria-current="page">
                Run {r.id}: {r.title} (this run)
              </strong>
            ) : (
              <Link className="text-clay-700 hover:underline" href={`/projects/${projectId}/runs/${r.id}`}>
                Run {r.id}: {r.title}
              </Link>
            )}
            <StatusBadge status={r.status} belowRequired={r.belowRequired} />
          </li>
        ))}
      </ol>
    </section>
  );
}
