"use client";

import Link from "next/link";
import { useRouter } from "next/navigation";
import { useMemo, useState } from "react";
import type { RunSummary } from "@/lib/runs/types";
import { criticalRunIds, governingFs } from "@/lib/runs/record/critical-cases";
import { LOADING_CONDITIONS, loadingCondition, type LoadingConditionKey } from "@/lib/analysis/required-fs";
import { PassMark, StatusBadge } from "@/components/runs/list/status-badge";
import { formatDateTime } from "@/lib/format";
import { BELOW_REQUIRED_LABEL, RUN_STATUSES, STATUS_LABELS } from "@/lib/review/status";

type SortKey = "createdAt" | "fs" | "title" | "condition" | "author";

const conditionLabel = (key: string) => LOADING_CONDITIONS.find((c) => c.key === key)?.label ?? key;

export function RunsTable({ projectId, runs }: { projectId: number; runs: RunSummary[] }) {
  const router = useRouter();
  const [filters, setFilters] = useState({
    condition: "",
    face: "",
    method: "",
    status: "",
    author: "",
    text: "",
    maxFs: "",
  });
  const [sort, setSort] = useState<{ key: SortKey; dir: 1 | -1 }>({ key: "createdAt", dir: -1 });
  const [picked, setPicked] = useState<number[]>([]);
  const critical = useMemo(() => criticalRunIds(runs), [runs]);
  const authors = [...new Set(runs.map((r) => r.authorName))].sort();

  const shown = useMemo(() => {
    const maxFs = filters.maxFs ? Number(filters.maxFs) : null;
    const list = runs.filter(
      (r) =>
        (!filters.condition || r.loadingCondition === filters.condition) &&
        (!filters.face || r.face === filters.face) &&
        (!filters.method || r.methods.includes(filters.method)) &&
        (!filters.status ||
          r.status === filters.status ||
          (filters.status === "approved-below" && r.status === "approved" && r.belowRequiredReason !== null)) &&
        (!filters.author || r.authorName === filters.author) &&
        (!filters.text || `${r.title} ${r.sectionName}`.toLowerCase().includes(filters.text.toLowerCase())) &&
        (maxFs === null || (governingFs(r) ?? Infinity) <= maxFs),
    );
    const value = (r: RunSummary): string | number => {
      switch (sort.key) {
        case "fs":
          return governingFs(r) ?? Infinity;
        case "title":
          return r.title.toLowerCase();
        case "condition":
          return conditionLabel(r.loadingCondition);
        case "author":
          return r.authorName;
        default:
          return r.createdAt;
      }
    };
    return [...list].sort((a, b) => (value(a) < value(b) ? -sort.dir : value(a) > value(b) ? sort.dir : 0));
  }, [runs, filters, sort]);

  const header = (key: SortKey, label: string, cls = "") => (
    <th
      className={`px-2 py-2 ${cls}`}
      aria-sort={sort.key === key ? (sort.dir === 1 ? "ascending" : "descending") : "none"}
    >
      <button
        type="button"
        className="uppercase tracking-wide hover:text-ink"
        onClick={() => setSort((s) => ({ key, dir: s.key === key ? (-s.dir as 1 | -1) : 1 }))}
      >
        {label}
        {sort.key === key ? (sort.dir === 1 ? " ▲" : " ▼") : ""}
      </button>
    </th>
  );
  const select = (name: keyof typeof filters, label: string, options: [string, string][]) => (
    <label className="text-xs text-ink-soft">
      {label}
      <select
        className="field mt-0.5 py-1"
        value={filters[name]}
        onChange={(e) => setFilters({ ...filters, [name]: e.target.value })}
        aria-label={`Filter by ${label.toLowerCase()}`}
      >
        <option value="">All</option>
        {options.map(([v, l]) => (
          <option key={v} value={v}>
            {l}
          </option>
        ))}
      </select>
    </label>
  );
  const toggle = (id: number) =>
    setPicked((p) => (p.includes(id) ? p.filter((x) => x !== id) : p.length >= 4 ? p : [...p, id]));

  return (
    <div className="space-y-3">
      <div className="panel grid grid-cols-2 gap-2 p-3 md:grid-cols-4 xl:grid-cols-7">
        {select(
          "condition",
          "Loading condition",
          LOADING_CONDITIONS.map((c) => [c.key, c.label]),
        )}
        {select("face", "Face", [
          ["upstream", "Upstream"],
          ["downstream", "Downstream"],
        ])}
        {select("method", "Method", [
          ["bishop", "Bishop"],
          ["fellenius", "Ordinary"],
        ])}
        {select("status", "Status", [
          ...RUN_STATUSES.map((s): [string, string] => [
            s,
            s === "approved" ? `${STATUS_LABELS[s]} (any)` : STATUS_LABELS[s],
          ]),
          ["approved-below", BELOW_REQUIRED_LABEL],
        ])}
        {select(
          "author",
          "Author",
          authors.map((a) => [a, a]),
        )}
        <label className="text-xs text-ink-soft">
          FS at most
          <input
            className="field mt-0.5 py-1"
            type="number"
            step="0.05"
            value={filters.maxFs}
            onChange={(e) => setFilters({ ...filters, maxFs: e.target.value })}
          />
        </label>
        <label className="text-xs text-ink-soft">
          Search
          <input
            className="field mt-0.5 py-1"
            value={filters.text}
            onChange={(e) => setFilters({ ...filters, text: e.target.value })}
            placeholder="name or section"
          />
        </label>
      </div>
      <div className="flex items-center gap-3">
        <button
          type="button"
          className="btn-primary"
          disabled={picked.length < 2}
          onClick={() => router.push(`/projects/${projectId}/runs/compare?ids=${picked.join(",")}`)}
          data-testid="compare-button"
        >
          Compare {picked.length >= 2 ? `${picked.length} runs` : "(pick 2 to 4)"}
        </button>
        <span className="text-xs text-ink-faint">★ marks the lowest FS for each loading condition and face.</span>
      </div>
      <table className="w-full rounded-lg border border-rule bg-paper-raised text-sm" data-testid="runs-table">
        <thead className="bg-paper-sunk text-left text-xs text-ink-soft">
          <tr>
            <th className="px-2 py-2">
              <span className="sr-only">Pick</span>
            </th>
            {header("title", "Run")}
            <th className="px-2 py-2 uppercase tracking-wide">Section</th>
            {header("condition", "Condition")}
            <th className="px-2 py-2 uppercase tracking-wide">Face</th>
            {header("fs", "FS (Bishop / ordinary)", "text-right")}
            <th className="px-2 py-2 text-right uppercase tracking-wide">Required</th>
            <th className="px-2 py-2 uppercase tracking-wide">Status</th>
            {header("author", "Author")}
            {header("createdAt", "Date")}
          </tr>
        </thead>
        <tbody>
          {shown.map((r) => (
            <tr
              key={r.id}
              className={`border-t border-rule ${critical.has(r.id) ? "bg-clay-50" : ""}`}
              data-critical={critical.has(r.id) ? "true" : undefined}
            >
              <td className="px-2 py-1.5">
                <input
                  type="checkbox"
                  aria-label={`Pick ${r.title} to compare`}
                  checked={picked.includes(r.id)}
                  onChange={() => toggle(r.id)}
                />
              </td>
              <td className="px-2 py-1.5">
                {critical.has(r.id) ? (
                  <span title="Critical case for its condition and face" aria-label="critical case">
                    ★{" "}
                  </span>
                ) : null}
                <Link href={`/projects/${projectId}/runs/${r.id}`} className="hover:text-clay-600">
                  {r.title}
                </Link>
              </td>
              <td className="px-2 py-1.5 text-ink-soft">
                {r.sectionName} v{r.sectionVersion}
              </td>
              <td className="px-2 py-1.5">
                {loadingCondition(r.loadingCondition as LoadingConditionKey)?.label ?? r.loadingCondition}
              </td>
              <td className="px-2 py-1.5 capitalize">{r.face}</td>
              <td className="px-2 py-1.5 text-right">
                <PassMark fs={r.fsBishop} required={r.requiredFs} /> /{" "}
                <PassMark fs={r.fsFellenius} required={r.requiredFs} />
              </td>
              <td className="px-2 py-1.5 text-right tabular-nums">{r.requiredFs.toFixed(2)}</td>
              <td className="px-2 py-1.5">
                <StatusBadge status={r.status} belowRequired={r.belowRequiredReason !== null} />
              </td>
              <td className="px-2 py-1.5">{r.authorName}</td>
              <td className="px-2 py-1.5 tabular-nums text-ink-soft">{formatDateTime(r.createdAt)}</td>
            </tr>
          ))}
          {shown.length === 0 ? (
            <tr>
              <td colSpan={10} className="px-3 py-6 text-center text-ink-soft">
                No run matches these filters.
              </td>
            </tr>
          ) : null}
        </tbody>
      </table>
    </div>
  );
}
