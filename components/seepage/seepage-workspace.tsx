"use client";

import { useMemo, useState } from "react";
import Link from "next/link";
import type { SectionDocument } from "@/lib/stability";
import { poolLevels, type WaterCondition } from "@/lib/sections/water-conditions";
import type { MaterialConductivity, SeepageSettingsInput } from "@/lib/section-seepage/types";
import { buildSeepageDocument } from "@/lib/section-seepage/document";
import { settingsFromForm, settingsToForm, type SeepageSettingsForm } from "@/lib/section-seepage/settings-form";
import { drainsToText } from "@/lib/section-seepage/drain-text";
import { checkDrains } from "@/lib/section-seepage/check-drains";
import { groundProfile } from "@/lib/analysis/ground-profile";
import { elevationAt } from "@/lib/plane-geometry";
import { ApiClientError, fetchJson } from "@/lib/client/fetch-json";
import { FormBanner } from "@/components/ui/form-message";
import { FlowNetView } from "./flow-net-view";
import { MeshLayer, WaterLayer, fieldRange, type FieldColour } from "./seepage-layers";
import { SeepageSettingsFields } from "./seepage-settings-fields";
import { SeepageProgress } from "./seepage-progress";
import { SeepageResults } from "./seepage-results";
import { useSeepageRun } from "./use-seepage-run";

export interface SeepageWorkspaceProps {
  projectId: number;
  sectionId: number;
  section: SectionDocument;
  condition: WaterCondition;
  conductivities: MaterialConductivity[];
  settings: SeepageSettingsInput;
  canEdit: boolean;
}

/** A point clicked on the drawing, to a tenth of a metre (drains are set out to that). */
const tenth = (v: number) => Math.round(v * 10) / 10;

/** The seepage view of one section under one water condition: settings, the drain tool, the solve and its flow net. */
export function SeepageWorkspace(props: SeepageWorkspaceProps) {
  const { projectId, sectionId, section, condition, conductivities, canEdit } = props;
  const [form, setForm] = useState<SeepageSettingsForm>(() => settingsToForm(props.settings));
  const [fields, setFields] = useState<Record<string, string[]>>({});
  const [banner, setBanner] = useState<{ kind: "error" | "ok"; text: string } | null>(null);
  const [drawing, setDrawing] = useState<[number, number][] | null>(null);
  const [colour, setColour] = useState<FieldColour>("head");
  const [showMesh, setShowMesh] = useState(false);
  const run = useSeepageRun();

  const parsed = useMemo(() => settingsFromForm(form), [form]);
  const settings = parsed.ok ? parsed.settings : null;
  const built = useMemo(
    () => (settings ? buildSeepageDocument(section, condition, conductivities, settings) : null),
    [section, condition, conductivities, settings],
  );
  const ground = useMemo(() => groundProfile(section), [section]);
  const extent = {
    minX: ground[0]?.[0] ?? 0,
    maxX: ground.at(-1)?.[0] ?? 0,
    groundAt: (x: number) => elevationAt(ground, x),
  };
  const pools = built?.ok ? (built.document.seepage.pools ?? []) : [];
  const conditionPools = useMemo(() => poolLevels(section, condition.water), [section, condition]);
  // The section drawn at true scale, the drawing no taller than the section needs.
  const span = extent.maxX - extent.minX;
  const rise =
    Math.max(...section.regions.flatMap((r) => r.points.map((p) => p[1]))) -
    Math.min(...section.regions.flatMap((r) => r.points.map((p) => p[1])));
  const height = span > 0 ? Math.round(Math.min(520, Math.max(220, (960 * rise) / span + 90))) : 420;
  const done = run.state.status === "done" ? run.state : null;

  function solve() {
    setBanner(null);
    if (!parsed.ok) {
      setFields(parsed.fields);
      return;
    }
    setFields({});
    if (built && !built.ok) {
      setBanner({ kind: "error", text: built.errors.map((e) => e.message).join(" ") });
      return;
    }
    if (built?.ok) run.start(built.document);
  }

  async function save() {
    setBanner(null);
    if (!parsed.ok) {
      setFields(parsed.fields);
      return;
    }
    try {
      await fetchJson(`/api/projects/${projectId}/sections/${sectionId}/seepage/${condition.id}`, {
        method: "PUT",
        json: { settings: parsed.settings },
      });
      setFields({});
      setBanner({ kind: "ok", text: "Seepage settings saved for this water condition." });
    } catch (err) {
      if (err instanceof ApiClientError) {
        // The server names each drain point (settings.drains[0][1]); the form shows them under the drains box.
        const mapped: Record<string, string[]> = {};
        for (const [k, v] of Object.entries(err.fields)) {
          const key = k.replace(/^settings\./, "").replace(/^drains.*/, "drains");
          (mapped[key] ??= []).push(...v);
        }
        setFields(mapped);
        setBanner({ kind: "error", text: err.message });
      } else throw err;
    }
  }

  /** A drain point must lie in pervious material, the rule the save and the solver apply. */
  function pickDrainPoint(x: number, y: number) {
    if (!drawing) return;
    const p: [number, number] = [tenth(x), tenth(y)];
    const problems = Object.values(checkDrains(section, { drains: [[p, p]] })).flat();
    if (problems.length > 0) {
      setBanner({ kind: "error", text: `(${p[0]}, ${p[1]}) is not in pervious material: click inside the section.` });
      return;
    }
    setBanner(null);
    setDrawing([...drawing, p]);
  }

  /** A pool's mark dragged on the drawing: its level goes into the typed field, saved with the settings. */
  function dragPool(side: "left" | "right", level: number) {
    setForm((f) => ({ ...f, [side === "left" ? "poolLeft" : "poolRight"]: String(level) }));
  }

  function finishDrain() {
    if (drawing && drawing.length >= 2) {
      const current = settings?.drains ?? [];
      setForm({ ...form, drains: drainsToText([...current, drawing]) });
    }
    setDrawing(null);
  }

  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-center gap-3 text-sm">
        <label className="flex items-center gap-2">
          Colour
          <select
            className="field w-auto"
            value={colour}
            onChange={(e) => setColour(e.target.value as FieldColour)}
            aria-label="Colour the section by"
          >
            <option value="head">Total head</option>
            <option value="pressure">Pore pressure</option>
            <option value="none">No colour</option>
          </select>
        </label>
        <label className="flex items-center gap-2">
          <input type="checkbox" checked={showMesh} onChange={(e) => setShowMesh(e.target.checked)} />
          Show the mesh
        </label>
        {drawing ? (
          <span className="flex items-center gap-2" data-testid="drain-tool">
            Click along the drain ({drawing.length} point{drawing.length === 1 ? "" : "s"}).
            <button type="button" className="btn-quiet" onClick={finishDrain} disabled={drawing.length < 2}>
              Add this drain
            </button>
            <button type="button" className="btn-quiet" onClick={() => setDrawing(null)}>
              Discard
            </button>
          </span>
        ) : (
          <button type="button" className="btn-quiet" onClick={() => setDrawing([])}>
            Draw a drain
          </button>
        )}
        {done && colour !== "none" ? <Legend range={fieldRange(done.mesh, colour)} colour={colour} /> : null}
      </div>
      <FlowNetView
        materials={section.materials}
        regions={section.regions}
        solution={done?.solution ?? null}
        caption={false}
        height={height}
        onPick={drawing ? pickDrainPoint : undefined}
        layers={(view) => (
          <>
            {done ? <MeshLayer view={view} mesh={done.mesh} colour={colour} showMesh={showMesh} /> : null}
            <WaterLayer
              view={view}
              pools={pools}
              drains={settings?.drains ?? []}
              drawing={drawing}
              extent={extent}
              onPoolDrag={drawing ? undefined : dragPool}
            />
          </>
        )}
      />
      {banner ? <FormBanner kind={banner.kind}>{banner.text}</FormBanner> : null}
      <SeepageProgress state={run.state} onCancel={run.cancel} />
      <div className="flex flex-wrap gap-2">
        <button
          type="button"
          className="btn-primary"
          onClick={solve}
          disabled={run.state.status === "running"}
          data-testid="seepage-solve"
        >
          Solve the seepage
        </button>
        {canEdit ? (
          <button type="button" className="btn-quiet" onClick={save}>
            Save settings
          </button>
        ) : null}
        <Link href={`/projects/${projectId}/materials`} className="btn-quiet">
          Conductivities in the materials library
        </Link>
      </div>
      <SeepageSettingsFields
        form={form}
        onChange={setForm}
        fields={fields}
        // buildSeepageDocument adds the tailwater object itself; it has its own fields below.
        pools={pools.filter((p) => p !== settings?.tailwater)}
        conditionPools={conditionPools}
      />
      {done ? <SeepageResults solution={done.solution} elapsedMs={done.elapsedMs} /> : null}
    </div>
  );
}

function Legend({ range, colour }: { range: { min: number; max: number; unit: string }; colour: FieldColour }) {
  return (
    <span className="flex items-center gap-2 text-xs text-ink-soft" data-testid="field-legend">
      {colour === "head" ? "Head" : "Pore pressure"} {range.min.toFixed(1)}
      <span
        className="inline-block h-2.5 w-24 rounded-sm"
        style={{ background: "linear-gradient(to right, rgb(235,242,250), rgb(45,102,190))" }}
      />
      {range.max.toFixed(1)} {range.unit}
      {colour === "pressure" ? " (grey: above the phreatic surface)" : ""}
    </span>
  );
}
