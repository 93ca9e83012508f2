"use client";

import Link from "next/link";
import { useMemo, useState } from "react";
import type { RunDetail } from "@/lib/runs/types";
import type { GridSearchSuccess, SectionDocument, SliceRow } from "@/lib/stability";
import type { RunSetup } from "@/lib/analysis/run-setup";
import { loadingCondition, type LoadingConditionKey } from "@/lib/analysis/required-fs";
import { materialPalette } from "@/lib/sections/material-palette";
import { documentToDraw, runSeepage, seepageUsedText, waterUsedText } from "@/lib/runs/view/water-used";
import { downloadText, slug } from "@/lib/client/download";
import { RunCanvas } from "@/components/runs/result/run-canvas";
import { FsSummary } from "@/components/runs/result/fs-summary";
import { SliceTable } from "@/components/runs/result/slice-table";
import { runFs } from "@/lib/runs/view/slice-csv";
import { stagedView } from "@/lib/runs/view/staged-view";
import { StatusBadge } from "@/components/runs/list/status-badge";
import { PinnedCanvas } from "@/components/review/pinned-canvas";
import type { PinMarker } from "@/lib/review/pin-markers";
import { formatDateTime } from "@/lib/format";
import { conditionWords, faceWords } from "@/lib/vocabulary";
import { WhatIfPanel } from "@/components/runs/kept/what-if-panel";
import { SensitivityPanel } from "@/components/runs/kept/sensitivity-panel";
import { ScatterStudyPanel } from "@/components/runs/kept/scatter-study-panel";
import { MethodComparison } from "@/components/runs/result/method-comparison";
import { IntersliceTable } from "@/components/runs/result/interslice-table";
import { useSolutionChoice } from "@/components/runs/result/use-solution-choice";
import type { RigorousRunPart } from "@/lib/runs/record/rigorous-part";

type Method = "bishop" | "fellenius";
export type StoredResult = GridSearchSuccess & { setup: RunSetup; rigorous?: RigorousRunPart };
export type StoredSlices = Partial<Record<Method, { slices: SliceRow[]; minMAlpha: number | null }>>;

export interface RunViewProps {
  run: RunDetail;
  canRevise: boolean;
  /** Numbered comment markers drawn over the section. */
  markers?: readonly PinMarker[];
  /** While true a click on the section reports its coordinates through onPlace. */
  placing?: boolean;
  onPlace?: (point: { x: number; y: number }) => void;
  activePin?: number | null;
  onSelectPin?: (n: number) => void;
  /** Extra links or buttons beside the view's own. */
  actions?: React.ReactNode;
  /** Shown beside the drawing on wide screens (the reviewer's checklist and decision). */
  aside?: React.ReactNode;
  /** Shown under the FS summary, beside the aside, above the slice table. */
  children?: React.ReactNode;
  /** Whether the slice table starts unfolded (default true). */
  slicesOpen?: boolean;
}

/** A kept run exactly as it was saved: its frozen section, settings, critical circles and slices. */
export function RunView({
  run,
  canRevise,
  markers = [],
  placing,
  onPlace,
  activePin,
  onSelectPin,
  actions,
  aside,
  children,
  slicesOpen = true,
}: RunViewProps) {
  const result = run.result as StoredResult;
  const tables = run.sliceTables as StoredSlices;
  const doc = run.document as SectionDocument;
  const methods = result.methods.filter((m) => result.results[m]);
  const [method, setMethod] = useState<Method>(methods[0] ?? "bishop");
  const colors = Object.fromEntries(materialPalette(doc.materials).map((m) => [m.key, m.color]));
  const drawdownTo = doc.analysis?.drawdown?.to;
  const condition = loadingCondition(run.loadingCondition as LoadingConditionKey);
  const staged = useMemo(() => stagedView(result, doc, run.engineVersion), [result, doc, run.engineVersion]);
  const seepage = runSeepage(run);
  const drawnDoc = useMemo(() => documentToDraw(doc, seepage), [doc, seepage]);
  const solution = useSolutionChoice(result.rigorous);

  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-center gap-x-4 gap-y-1 text-sm text-ink-soft" data-testid="run-meta">
        <StatusBadge status={run.status} belowRequired={run.belowRequiredReason !== null} />
        <span>{condition?.label ?? conditionWords(run.loadingCondition)}</span>
        <span>{faceWords(run.face)}</span>
        <span data-testid="run-water">Water: {waterUsedText(run)}</span>
        {seepage ? <span data-testid="run-water-seepage">Pore pressures {seepageUsedText(seepage)}</span> : null}
        <span>
          {run.sectionName} v{run.sectionVersion}
        </span>
        <span>
          by {run.authorName}, {formatDateTime(run.createdAt)}
        </span>
        <span>engine {run.engineVersion}</span>
        {run.revisesRunId ? (
          <Link className="text-clay-600 hover:underline" href={`/projects/${run.projectId}/runs/${run.revisesRunId}`}>
            revises run {run.revisesRunId}
          </Link>
        ) : null}
      </div>
      <div className="flex flex-wrap items-center gap-2">
        {methods.length > 1 ? (
          <div
            className="inline-flex overflow-hidden rounded-md border border-rule text-sm"
            role="group"
            aria-label="Method shown"
          >
            {methods.map((m) => (
              <button
                key={m}
                type="button"
                onClick={() => setMethod(m)}
                aria-pressed={method === m}
                className={`px-3 py-1 ${method === m ? "bg-ink text-paper" : "bg-paper-raised hover:bg-paper-sunk"}`}
              >
                {m === "bishop" ? "Bishop's simplified" : "Ordinary method"}
              </button>
            ))}
          </div>
        ) : null}
        <button
          type="button"
          className="btn-quiet"
          onClick={() =>
            downloadText(`${slug(run.title)}-section.json`, JSON.stringify(doc, null, 2) + "\n", "application/json")
          }
        >
          Section JSON for the command line
        </button>
        {canRevise ? (
          <Link
            className="btn-quiet"
            href={`/projects/${run.projectId}/sections/${run.sectionId}/runs/new?from=${run.id}`}
          >
            Revise as a new run
          </Link>
        ) : null}
        {actions}
      </div>
      <div className={aside ? "grid items-start gap-4 xl:grid-cols-[minmax(0,1fr)_26rem]" : ""}>
        <div className="min-w-0 space-y-4">
          <PinnedCanvas markers={markers} placing={placing} onPlace={onPlace} active={activePin} onSelect={onSelectPin}>
            <RunCanvas
              caution={false}
              document={drawnDoc}
              materialColors={colors}
              result={result}
              method={method}
              slices={tables[method]?.slices}
              drawdownTo={drawdownTo}
              requiredFs={run.requiredFs}
              grid={doc.analysis?.grid}
              radii={doc.analysis?.radii}
              height={480}
              surface={solution.current?.overlay}
            />
          </PinnedCanvas>
          <FsSummary
            result={result}
            requiredFs={run.requiredFs}
            minMAlpha={{ bishop: tables.bishop?.minMAlpha, fellenius: tables.fellenius?.minMAlpha }}
            staged={staged}
          />
          {result.rigorous ? (
            <MethodComparison
              result={result}
              part={result.rigorous}
              requiredFs={run.requiredFs}
              choices={solution.choices}
              chosen={solution.chosen}
              onChoose={solution.setChosen}
            />
          ) : null}
          {solution.current ? <IntersliceTable choice={solution.current} /> : null}
          <WhatIfPanel
            document={doc}
            storedFs={Object.fromEntries(methods.map((m) => [m, result.results[m]!.fs]))}
            engineVersion={run.engineVersion}
          />
          {methods[0] ? (
            <SensitivityPanel
              runId={run.id}
              projectId={run.projectId}
              title={run.title}
              document={doc}
              method={methods[0]}
              baseFs={result.results[methods[0]]!.fs}
              requiredFs={run.requiredFs}
            />
          ) : null}
          <ScatterStudyPanel projectId={run.projectId} runId={run.id} canRun={canRevise} />
          {children}
        </div>
        {aside ? (
          <aside className="space-y-4 xl:sticky xl:top-4" aria-label="Review">
            {aside}
          </aside>
        ) : null}
      </div>
      {tables[method] ? (
        <SliceTable
          defaultOpen={slicesOpen}
          caution={false}
          rows={tables[method]!.slices}
          meta={{
            method,
            title: run.title,
            section: `${run.sectionName} v${run.sectionVersion}`,
            loadCase: condition?.label ?? run.loadingCondition,
            fs: runFs(result.methods, run),
            staged,
            requiredFs: run.requiredFs,
            circle: result.results[method]?.circle,
            ordinaryForm: result.ordinaryForm,
            engineVersion: run.engineVersion,
            runAt: run.createdAt,
          }}
        />
      ) : null}
    </div>
  );
}
