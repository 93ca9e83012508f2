"use client";

import { useRouter } from "next/navigation";
import { useCallback, useMemo, useState } from "react";
import {
  compactionSpec,
  DEFAULT_SWEEP,
  embankmentGeometry,
  fillQuantities,
  readSweep,
  recheckPasses,
  sweepSettingsSchema,
  type EmbankmentParams,
  type RequiredFs,
  type StoredSweep,
  type SweepPoint,
  type SweepSettings,
} from "@/lib/design";
import type { CompactionResult } from "@/lib/lab/compaction";
import type { Material } from "@/lib/stability";
import { ApiClientError, fetchJson } from "@/lib/client/fetch-json";
import { Caution } from "@/components/ui/caution";
import { FormBanner } from "@/components/ui/form-message";
import { RunCanvas } from "@/components/runs/result/run-canvas";
import { FsRatioChart } from "./fs-ratio-chart";
import type { LibraryEntry } from "./parameter-inputs";
import { ParametersForm } from "./parameters-form";
import { QuantitiesPanel } from "./quantities-panel";
import { RecommendationPanel } from "./recommendation-panel";
import { SeepagePanel } from "./seepage-panel";
import { SweepControls } from "./sweep-controls";
import { SweepTable } from "./sweep-table";
import { useDesignDraft } from "./use-design-draft";
import { useSweep, type SweepWhere } from "./use-sweep";
import { formatDateTime } from "@/lib/format";

export interface DesignStudioProps {
  projectId: number;
  studyId: number;
  parameters: EmbankmentParams;
  sweep: StoredSweep | null;
  materials: Material[];
  library: LibraryEntry[];
  required: RequiredFs;
  compaction: { materialKey: string; setName: string; result: CompactionResult }[];
  canEdit: boolean;
}

/** The design study: parameters, the generated section, seepage, the sweep and what it recommends. */
/** "on the server on 2026-03-14 09:30 UTC": where and when the kept sweep ran. */
function sweptWhereWhen(sweep: Pick<StoredSweep, "ranOn" | "finishedAt">): string {
  return `${sweep.ranOn === "server" ? "on the server" : "in the browser"} on ${formatDateTime(sweep.finishedAt)}`;
}

export function DesignStudio(props: DesignStudioProps) {
  const { projectId, studyId, materials, required, canEdit } = props;
  const router = useRouter();
  const draft = useDesignDraft(projectId, studyId, props.parameters, materials);
  const [sweep, setSweep] = useState<StoredSweep | null>(props.sweep);
  const [settings, setSettings] = useState<SweepSettings>(props.sweep?.settings ?? DEFAULT_SWEEP);
  const [where, setWhere] = useState<SweepWhere>("browser");
  const [openError, setOpenError] = useState<string | null>(null);
  const [busyPoint, setBusyPoint] = useState<string | null>(null);
  const sweepRun = useSweep({ projectId, studyId, materials, onFinished: setSweep });

  const settingsCheck = sweepSettingsSchema.safeParse(settings);
  const settingsErrors: Record<string, string[]> = {};
  if (!settingsCheck.success)
    for (const i of settingsCheck.error.issues) (settingsErrors[i.path.join(".")] ??= []).push(i.message);

  const reading = useMemo(() => (sweep ? readSweep(sweep.points, required) : null), [sweep, required]);
  const recheck = sweep?.points.filter((p) => p.phase === "recheck") ?? [];
  const recheckOk = reading?.pair && sweep ? recheckPasses(sweep.points, reading.pair, required) : null;
  const sweptParams = draft.saved;
  const pairFillArea = reading?.pair
    ? fillQuantities(
        embankmentGeometry({
          ...sweptParams,
          upstreamSlope: reading.pair.upstream,
          downstreamSlope: reading.pair.downstream,
        }),
        1,
      ).fillArea
    : null;

  const startSweep = useCallback(async () => {
    if (!settingsCheck.success) return;
    const params = draft.dirty ? await draft.save() : draft.saved;
    if (!params) return;
    if (draft.dirty) setSweep(null);
    await sweepRun.start(params, settingsCheck.data, required, where);
  }, [draft, required, settingsCheck, sweepRun, where]);

  const openPoint = useCallback(
    async (point: SweepPoint, target: "run" | "editor") => {
      setOpenError(null);
      setBusyPoint(point.id);
      try {
        const r = await fetchJson<{ location: string }>(`/api/projects/${projectId}/design/${studyId}/open`, {
          method: "POST",
          json: { pointId: point.id, target },
        });
        router.push(r.location);
      } catch (err) {
        setOpenError(err instanceof ApiClientError ? err.message : "Could not reach the server.");
        setBusyPoint(null);
      }
    },
    [projectId, router, studyId],
  );

  const preview = draft.preview;
  const zoning = (draft.params ?? draft.saved).zoning;
  const fillKeys = zoning.kind === "homogeneous" ? [zoning.fill] : [zoning.core, zoning.shell];
  const specs = preview
    ? props.compaction
        .filter((c) => fillKeys.includes(c.materialKey))
        .map((c) => {
          const q = preview.normal.quantities;
          const volume =
            zoning.kind === "homogeneous" ? q.fillVolume : c.materialKey === zoning.core ? q.coreVolume : q.shellVolume;
          return compactionSpec(c.setName, c.materialKey, c.result, volume);
        })
    : [];
  const colours = Object.fromEntries(props.library.map((m) => [m.key, m.color]));
  const blocked = !canEdit
    ? "Your role may look at studies but not run sweeps."
    : !draft.valid
      ? "Fix the parameters marked above first."
      : !settingsCheck.success
        ? "Fix the sweep range."
        : null;

  return (
    <div className="space-y-6">
      <div className="grid gap-6 xl:grid-cols-[minmax(0,5fr)_minmax(0,6fr)]">
        <section className="panel space-y-4 p-4" aria-labelledby="parameters-heading">
          <h2 id="parameters-heading" className="text-lg font-semibold">
            Embankment
          </h2>
          <ParametersForm
            values={draft.values}
            errors={draft.errors}
            library={props.library}
            onChange={draft.onChange}
            disabled={!canEdit}
          />
          {draft.saveError ? <FormBanner kind="error">{draft.saveError}</FormBanner> : null}
          {canEdit ? (
            <div className="flex gap-2">
              <button
                type="button"
                className="btn-quiet"
                disabled={!draft.dirty || !draft.valid}
                onClick={() => void draft.save().then((p) => p && setSweep(null))}
              >
                Save parameters
              </button>
              <button type="button" className="btn-quiet" disabled={!draft.dirty} onClick={draft.reset}>
                Undo changes
              </button>
              {draft.dirty && sweep ? (
                <span className="self-center text-xs text-ink-soft">
                  Saving clears the sweep below, which belongs to the saved parameters.
                </span>
              ) : null}
            </div>
          ) : null}
        </section>
        <section className="space-y-3" aria-labelledby="section-heading">
          <h2 id="section-heading" className="text-lg font-semibold">
            Generated section (normal pool)
          </h2>
          {preview ? (
            <RunCanvas
              document={preview.normal.document}
              materialColors={colours}
              drawdownTo={(draft.params ?? draft.saved).drawdownTo}
              height={360}
              caution={false}
            />
          ) : (
            <p className="text-sm text-alarm-700">Fix the materials above to draw the section.</p>
          )}
          {preview?.normal.warnings
            .filter((w) => w.code.startsWith("W_DESIGN"))
            .map((w) => (
              <p key={w.code} className="text-sm text-clay-700" data-testid="design-warning">
                {w.message}
              </p>
            ))}
          {preview ? (
            <QuantitiesPanel quantities={preview.normal.quantities} specs={specs} fillKeys={fillKeys} />
          ) : null}
        </section>
      </div>
      {preview ? (
        <SeepagePanel
          normal={preview.normal.seepage}
          flood={preview.flood.seepage}
          crestLength={preview.normal.quantities.crestLength}
          values={draft.values}
          errors={draft.errors}
          onChange={draft.onChange}
        />
      ) : null}
      <SweepControls
        settings={settings}
        onSettings={setSettings}
        errors={settingsErrors}
        where={where}
        onWhere={setWhere}
        state={sweepRun.state}
        onStart={() => void startSweep()}
        onCancel={sweepRun.cancel}
        disabled={blocked !== null}
        disabledReason={blocked ?? (draft.dirty ? "The parameters will be saved first." : null)}
      />
      {reading && sweep ? (
        <section className="space-y-4" aria-labelledby="results-heading">
          <h2 id="results-heading" className="text-lg font-semibold">
            What the sweep shows
          </h2>
          <p className="text-xs text-ink-soft">
            Swept {sweptWhereWhen(sweep)} in {(sweep.elapsedMs / 1000).toFixed(1)} s; each face swept with the other as
            entered ({sweptParams.upstreamSlope}:1 upstream, {sweptParams.downstreamSlope}:1 downstream). Required FS
            from the project&apos;s loading conditions.
          </p>
          <RecommendationPanel
            reading={reading}
            recheckOk={recheckOk}
            pairFillArea={pairFillArea}
            enteredFillArea={fillQuantities(embankmentGeometry(sweptParams), 1).fillArea}
            entered={{ upstream: sweptParams.upstreamSlope, downstream: sweptParams.downstreamSlope }}
            crestLength={sweptParams.crestLength}
          />
          <FsRatioChart reading={reading} />
          {openError ? <FormBanner kind="error">{openError}</FormBanner> : null}
          <SweepTable
            reading={reading}
            recheck={recheck}
            crestLength={sweptParams.crestLength}
            canOpen={canEdit}
            busyPoint={busyPoint}
            onOpen={(p, t) => void openPoint(p, t)}
          />
          <Caution />
        </section>
      ) : null}
    </div>
  );
}
