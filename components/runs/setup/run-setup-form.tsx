"use client";

import { useRouter } from "next/navigation";
import { useMemo, useState } from "react";
import { useForm } from "react-hook-form";
import type { RunSetup } from "@/lib/analysis/run-setup";
import { documentForRun, waterConditionForRun } from "@/lib/analysis/run-setup";
import { directionForFace } from "@/lib/analysis/face";
import { suggestGrid } from "@/lib/analysis/auto-grid";
import { loadingCondition, type LoadingConditionKey } from "@/lib/analysis/required-fs";
import type { SectionDocument } from "@/lib/stability";
import {
  findWaterCondition,
  pickWaterCondition,
  poolBefore,
  waterConditionsOf,
  withWater,
} from "@/lib/sections/water-conditions";
import { ConditionFields, GridFields, MethodFields } from "@/components/runs/setup/setup-fields";
import { WaterConditionField } from "@/components/runs/setup/water-condition-field";
import { fromRunSetup, runSetupResolver, type RunSetupInput } from "@/components/runs/setup/form-values";
import { useGridSearch } from "@/components/runs/setup/use-grid-search";
import { SearchProgress } from "@/components/runs/setup/search-progress";
import { SearchOutcome } from "@/components/runs/setup/search-outcome";
import { RunCanvas } from "@/components/runs/result/run-canvas";
import { SeepageWaterField } from "@/components/runs/setup/seepage-water-field";
import { attachSeepage, type SeepageInputs } from "@/lib/seepage-stability/attach";
import { SurfaceField } from "@/components/runs/setup/surface-field";
import { useSolutionChoice } from "@/components/runs/result/use-solution-choice";
import { analyzeDrawnSurface, checkDrawnSurface, rigorousPart } from "@/lib/runs/record/rigorous-part";
import { groundLine } from "@/lib/runs/view/section-outline";
import { addClick, moveVertex, type DrawState } from "@/lib/runs/view/surface-draw";
import type { SurfaceOverlay } from "@/lib/runs/view/surface-overlay";

export interface RunSetupFormProps {
  projectId: number;
  section: { id: number; name: string; version: number };
  document: SectionDocument;
  requiredFs: Record<LoadingConditionKey, number>;
  initial?: RunSetup;
  revisesRunId?: number;
  materialColors?: Record<string, string>;
  /** Conductivities and saved seepage settings per water condition id, for water from seepage. */
  seepageInputs?: Record<string, SeepageInputs>;
}

function defaults(doc: SectionDocument, requiredFs: Record<LoadingConditionKey, number>): RunSetupInput {
  const face = "downstream";
  const g = suggestGrid(doc, directionForFace(doc, face));
  return {
    condition: "steady-seepage",
    waterCondition: pickWaterCondition(doc, "steady-seepage").id,
    fromSeepage: false,
    face,
    methods: ["bishop", "fellenius"],
    interslice: "half-sine",
    search: "circles",
    slices: 50,
    ordinaryForm: "classical",
    grid: g.grid,
    radiusMode: "tangent",
    tangentY1: g.radii.tangentY1,
    tangentY2: g.radii.tangentY2,
    r1: 10,
    r2: 30,
    radiusCount: g.radii.n,
    refine: true,
    drawdownMethod: "effective",
    drawdownFrom: undefined,
    drawdownTo: undefined,
    requiredFs: requiredFs["steady-seepage"],
  };
}

/** A revised run's water, unless the section no longer has it: then its loading condition's usual one. */
function withKnownWater(doc: SectionDocument, v: RunSetupInput): RunSetupInput {
  if (v.waterCondition && findWaterCondition(doc, v.waterCondition)) return v;
  return { ...v, waterCondition: pickWaterCondition(doc, v.condition).id };
}

export function RunSetupForm({
  projectId,
  section,
  document: doc,
  requiredFs,
  initial,
  revisesRunId,
  materialColors,
  seepageInputs,
}: RunSetupFormProps) {
  const router = useRouter();
  const form = useForm<RunSetupInput, unknown, RunSetup>({
    resolver: runSetupResolver,
    defaultValues: initial ? withKnownWater(doc, fromRunSetup(initial)) : defaults(doc, requiredFs),
    mode: "onBlur",
  });
  const search = useGridSearch();
  const [setup, setSetup] = useState<RunSetup | null>(null);
  const values = form.watch();
  const [draw, setDraw] = useState<DrawState>(() => ({ points: initial?.surface ?? [], finished: true }));
  const [drawing, setDrawing] = useState(false);

  function setSurface(next: DrawState) {
    setDraw(next);
    form.setValue("surface", next.finished && next.points.length >= 2 ? next.points : undefined);
  }

  function placeGrid(face = values.face) {
    const g = suggestGrid(doc, directionForFace(doc, face));
    form.setValue("grid", g.grid, { shouldValidate: true });
    form.setValue("radiusMode", "tangent");
    form.setValue("tangentY1", g.radii.tangentY1);
    form.setValue("tangentY2", g.radii.tangentY2);
    form.setValue("radiusCount", g.radii.n);
  }

  /** A drawdown starts from the chosen water's pool and, for a drawdown water, goes to its lowered pool. */
  function onWater(id: string, key: LoadingConditionKey = values.condition) {
    form.setValue("waterCondition", id);
    const water = findWaterCondition(doc, id);
    if (!water || loadingCondition(key).engineCase !== "drawdown") return;
    const from = poolBefore(doc, water.water);
    if (from !== null) form.setValue("drawdownFrom", from);
    if (water.drawdownTo !== undefined) form.setValue("drawdownTo", water.drawdownTo);
  }

  function onCondition(key: string) {
    const c = loadingCondition(key as LoadingConditionKey);
    form.setValue("requiredFs", requiredFs[c.key]);
    onWater(pickWaterCondition(doc, c.key).id, c.key);
    if (c.faces !== "both" && c.faces !== values.face) {
      form.setValue("face", c.faces);
      placeGrid(c.faces);
    }
  }

  const [seepageError, setSeepageError] = useState<string | null>(null);
  // The document the last search ran on (seepage attached when asked), for the preview's rigorous part.
  const [searchedDoc, setSearchedDoc] = useState<SectionDocument | null>(null);
  const onRun = form.handleSubmit((valid) => {
    // A refused surface already shows its reason beside the drawing; no factor is computed for it.
    if (surfaceCheck && !surfaceCheck.ok) return;
    setDrawing(false);
    setSeepageError(null);
    let runDoc = doc;
    if (valid.waterSource === "seepage") {
      // The same section the server attaches on save (lib/runs/record/seepage-section.ts), so both solve alike.
      const water = waterConditionForRun(doc, valid);
      const inputs = seepageInputs?.[water.id];
      const attached = inputs ? attachSeepage(doc, water, inputs) : null;
      if (!attached?.ok) {
        setSeepageError(
          attached ? attached.errors.map((e) => e.message).join(" ") : "This water has no seepage settings.",
        );
        return;
      }
      runDoc = attached.section;
    }
    setSetup(valid);
    const searched = documentForRun(runDoc, valid);
    setSearchedDoc(searched);
    search.start(searched);
  });

  const gridForCanvas = Number.isFinite(values.grid?.x1) ? values.grid : undefined;
  const radiiForCanvas = useMemo(
    () =>
      values.radiusMode === "tangent"
        ? { tangentY1: values.tangentY1, tangentY2: values.tangentY2, n: values.radiusCount }
        : { r1: values.r1, r2: values.r2, n: values.radiusCount },
    [values.radiusMode, values.tangentY1, values.tangentY2, values.r1, values.r2, values.radiusCount],
  );
  const done = search.state.status === "done" ? search.state.message : null;
  const running = search.state.status === "running";
  const drawdownTo = loadingCondition(values.condition).engineCase === "drawdown" ? values.drawdownTo : undefined;
  // The canvas shows the water the run will analyse, not whichever line the editor last drew.
  const chosenWater = useMemo(() => {
    try {
      return waterConditionForRun(doc, {
        condition: values.condition,
        waterCondition: values.waterCondition || undefined,
      });
    } catch {
      return null;
    }
  }, [doc, values.condition, values.waterCondition]);
  const shownDoc = useMemo(() => (chosenWater ? withWater(doc, chosenWater.water) : doc), [doc, chosenWater]);
  const ground = useMemo(() => groundLine(doc), [doc]);
  const surfaceCheck = useMemo(
    () => (draw.finished && draw.points.length >= 2 ? checkDrawnSurface(shownDoc, draw.points) : null),
    [shownDoc, draw],
  );
  // The rigorous part of the preview, built as the save builds it (lib/runs/record/rigorous-part.ts).
  const part = useMemo(() => {
    if (!done || !setup || !searchedDoc || !done.result.ok) return undefined;
    const drawn = setup.surface ? analyzeDrawnSurface(searchedDoc, setup.surface) : null;
    return rigorousPart(searchedDoc, done.result, drawn) ?? undefined;
  }, [done, setup, searchedDoc]);
  const solution = useSolutionChoice(part);
  // The searched solution is drawn only while the surface on the canvas is still the one searched.
  const searchedThisSurface =
    done !== null && JSON.stringify(setup?.surface ?? []) === JSON.stringify(draw.finished ? draw.points : []);
  const drawnOverlay: SurfaceOverlay | undefined =
    draw.points.length > 1
      ? {
          line: draw.points,
          sides: [],
          thrust: [],
          marks:
            surfaceCheck && !surfaceCheck.ok && surfaceCheck.at
              ? [{ at: surfaceCheck.at, n: 1, text: "where the surface is refused" }]
              : [],
          label: "Drawn slip surface",
        }
      : undefined;

  return (
    <div className="grid gap-4 xl:grid-cols-[22rem_1fr]">
      <form onSubmit={onRun} className="panel space-y-5 self-start p-4" noValidate data-testid="run-setup-form">
        <ConditionFields form={form} onCondition={onCondition}>
          <WaterConditionField
            doc={doc}
            conditions={waterConditionsOf(doc)}
            loadingCondition={values.condition}
            value={chosenWater?.id ?? ""}
            onChange={(id) => onWater(id)}
          />
          <SeepageWaterField
            checked={values.fromSeepage}
            available={Boolean(seepageInputs) && chosenWater?.kind !== "construction"}
            seepageHref={
              chosenWater
                ? `/projects/${projectId}/sections/${section.id}/seepage?condition=${encodeURIComponent(chosenWater.id)}`
                : null
            }
            error={seepageError}
            onChange={(on) => form.setValue("fromSeepage", on)}
          />
        </ConditionFields>
        <MethodFields form={form} />
        <GridFields form={form} onSuggest={() => placeGrid()} />
        <button type="submit" className="btn-primary w-full" disabled={running}>
          {running ? "Searching…" : "Run the search"}
        </button>
        <p className="text-xs text-ink-faint">
          The search runs in your browser as a preview; when you keep the run, the server runs the same search again and
          keeps its own result.
        </p>
      </form>
      <div className="min-w-0 space-y-3">
        <SurfaceField
          points={draw.points}
          finished={draw.finished}
          drawing={drawing}
          onDrawing={setDrawing}
          onTyped={(points) => setSurface({ points, finished: true })}
          onClear={() => setSurface({ points: [], finished: true })}
          check={surfaceCheck}
        />
        <SearchProgress state={search.state} onCancel={search.cancel} />
        <RunCanvas
          document={shownDoc}
          materialColors={materialColors}
          grid={gridForCanvas}
          radii={radiiForCanvas}
          onGridChange={
            running
              ? undefined
              : (grid, radii) => {
                  form.setValue("grid", grid, { shouldValidate: true });
                  if ("tangentY1" in radii) {
                    form.setValue("radiusMode", "tangent");
                    form.setValue("tangentY1", radii.tangentY1);
                    form.setValue("tangentY2", radii.tangentY2);
                  } else {
                    form.setValue("radiusMode", "range");
                    form.setValue("r1", radii.r1);
                    form.setValue("r2", radii.r2);
                  }
                }
          }
          result={done?.result.ok ? done.result : undefined}
          slices={done?.critical.bishop?.slices ?? done?.critical.fellenius?.slices}
          drawdownTo={drawdownTo}
          requiredFs={values.requiredFs}
          height={460}
          caution={false}
          surface={drawing ? undefined : (searchedThisSurface && solution.current?.overlay) || drawnOverlay}
          drawing={
            drawing
              ? {
                  points: draw.points,
                  onClick: (x, y, mpp) => setSurface(addClick(draw, x, y, ground, 8 * mpp)),
                  onMove: (i, x, y) => setSurface({ ...draw, points: moveVertex(draw.points, i, x, y, ground) }),
                }
              : undefined
          }
        />
        {done && setup ? (
          <SearchOutcome
            projectId={projectId}
            section={section}
            setup={setup}
            outcome={done}
            rigorous={part}
            solution={solution}
            revisesRunId={revisesRunId}
            materials={doc.materials}
            onSaved={(id) => router.push(`/projects/${projectId}/runs/${id}`)}
          />
        ) : null}
      </div>
    </div>
  );
}
