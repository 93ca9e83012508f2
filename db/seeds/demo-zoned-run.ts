import type { Knex } from "knex";
import type { SectionDocument } from "../../lib/stability";
import type { RunSetup } from "../../lib/analysis/run-setup";
import { findWaterCondition } from "../../lib/sections/water-conditions";
import { conductivitiesOf } from "../../lib/section-seepage/conductivities";
import { attachSeepage } from "../../lib/seepage-stability/attach";
import { computeRunRecord } from "../../lib/runs/record/run-record";
import { comparePreview } from "../../lib/runs/record/compare-preview";
import { runRow } from "../../lib/runs/record/run-row";
import { fetchMaterialsOfProject } from "../queries/materials";
import { fetchSeepageSettings } from "../queries/section-seepage";
import { createRun } from "../queries/runs";

export const ZONED_RUN_TITLE = "Downstream face, steady seepage, pore pressures from the seepage solution";

/**
 * Keeps one run on the demo zoned dam whose pore pressures come from its seepage solution, made
 * by the same path as a run kept in the app: the condition's seepage block and the library's k
 * attached to the stored section, then the server's own search (computeRunRecord) and row.
 * Run inside the caller's transaction, after the dam, its materials and settings are seeded.
 */
export async function seedZonedRun(
  trx: Knex.Transaction,
  input: { projectId: number; sectionId: number; sectionVersionId: number; userId: number; section: SectionDocument },
): Promise<number> {
  const condition = findWaterCondition(input.section, "storage-pool");
  if (!condition) throw new Error("the zoned dam has no storage-pool water condition");
  const inputs = {
    conductivities: conductivitiesOf(await fetchMaterialsOfProject(input.projectId, trx)),
    settings: await fetchSeepageSettings(input.sectionId, condition.id, trx),
  };
  const attached = attachSeepage(input.section, condition, inputs);
  if (!attached.ok) throw new Error(`the zoned dam's seepage cannot be solved: ${attached.errors[0].message}`);
  const setup: RunSetup = {
    condition: "steady-seepage",
    waterCondition: condition.id,
    waterSource: "seepage",
    face: "downstream",
    methods: ["bishop", "fellenius"],
    slices: 40,
    // Centres over the downstream face (crest edge at x = 80.5 m, toe at 125.5 m), circles tangent from the
    // rock (y = 0) up to 2 m below the crest.
    grid: { x1: 95, y1: 30, x2: 140, y2: 75, nx: 10, ny: 10 },
    radii: { tangentY1: 0.5, tangentY2: 20, n: 8 },
    refine: true,
    drawdownMethod: "effective",
    requiredFs: 1.5,
    ordinaryForm: "classical",
  };
  const record = await computeRunRecord(attached.section, setup, (server) => comparePreview(server, undefined));
  const meta = { projectId: input.projectId, userId: input.userId, title: ZONED_RUN_TITLE, setup };
  return createRun(
    { ...runRow(record, meta), sectionId: input.sectionId, sectionVersionId: input.sectionVersionId },
    trx,
  );
}
