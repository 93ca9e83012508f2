"use client";

import { placeWords } from "@/lib/issue-words";
import type { EditorIssue } from "./types";
import { countOf } from "@/lib/format";

interface IssueListProps {
  issues: EditorIssue[];
  focused: number | null;
  onPick(index: number): void;
}

/** Validation messages beside the drawing; picking one selects and shows the faulty place. */
export function IssueList({ issues, focused, onPick }: IssueListProps) {
  const errors = issues.filter((i) => i.severity !== "warning").length;
  const warnings = issues.length - errors;
  return (
    <section className="panel p-3" data-testid="issue-list" aria-label="Checks on this section">
      <h3 className="label">Checks</h3>
      {issues.length === 0 ? (
        <p className="text-xs text-moss-700">No problems found in the drawing.</p>
      ) : (
        <>
          <p className="mb-2 text-xs text-ink-soft">
            {countOf(errors, "error")}, {countOf(warnings, "warning")}. Pick one to find it.
          </p>
          <ol className="flex max-h-72 flex-col gap-1 overflow-y-auto">
            {issues.map((issue, i) => {
              const warning = issue.severity === "warning";
              return (
                <li key={`${issue.code}-${issue.path}-${i}`}>
                  <button
                    type="button"
                    data-testid={`issue-${i}`}
                    aria-current={focused === i ? "true" : undefined}
                    onClick={() => onPick(i)}
                    className={`w-full rounded-md border-l-4 px-2 py-1.5 text-left text-xs hover:bg-paper-sunk ${
                      warning ? "border-dashed border-[#c98a00]" : "border-alarm-600"
                    } ${focused === i ? "bg-paper-sunk" : ""}`}
                  >
                    <span className={`mr-1 font-semibold ${warning ? "text-ink" : "text-alarm-700"}`}>
                      {i + 1}. {warning ? "Warning" : "Error"}
                    </span>
                    <span className="text-ink">{issue.message}</span>
                    <span className="mt-0.5 block text-[11px] text-ink-faint">
                      {placeWords(issue.path)}
                      {issue.at ? ` · at (${issue.at[0].toFixed(2)}, ${issue.at[1].toFixed(2)})` : ""}
                    </span>
                  </button>
                </li>
              );
            })}
          </ol>
        </>
      )}
    </section>
  );
}
