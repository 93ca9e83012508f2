import type { Knex } from "knex";
import { checkAndDeriveLabTest } from "../../lib/materials/lab-derive";
import { suggestedValues, type ParameterSources } from "../../lib/materials/sources";
import type { LabTestKind, LabTestRecord } from "../../lib/materials/lab-kinds";
import type { MaterialParameters, ParameterKey } from "../../lib/materials/parameters";
import { IMPENETRABLE_COLOR, MATERIAL_COLORS } from "../../lib/materials/palette";

/**
 * The demo embankment's materials library, with invented lab results for the fill and the
 * foundation. Parameters that come from a set are the values lib/lab derives from it (rounded as
 * "use these values" rounds them), so the demo shows the same trail a user's own work leaves.
 */

interface DemoSet {
  kind: LabTestKind;
  name: string;
  data: unknown;
  /** Parameters this set supplies to its material. */
  uses: ParameterKey[];
}

interface DemoMaterial {
  key: string;
  name: string;
  color: string;
  notes: string;
  /** Values not taken from a set (su of the fill, say, from a design assumption). */
  parameters: MaterialParameters;
  sets: DemoSet[];
}

const DEMO: DemoMaterial[] = [
  {
    key: "fill",
    name: "Compacted clay fill",
    color: MATERIAL_COLORS[0],
    notes:
      "Embankment shell and core, placed in 250 mm layers. su for end of construction is a design assumption pending UU tests on placed fill.",
    parameters: { model: "mohr-coulomb", gamma: 19, gammaSat: 20, c: 10, phi: 26, su: 60, cR: 22, phiR: 15 },
    sets: [
      {
        kind: "direct-shear",
        name: "Borrow area A, shear box, 60 mm, remoulded at optimum",
        data: {
          tests: [
            { specimen: "DS-1", normalStress: 50, shearStress: 35.1 },
            { specimen: "DS-2", normalStress: 100, shearStress: 57.9 },
            { specimen: "DS-3", normalStress: 200, shearStress: 108.4 },
            { specimen: "DS-4", normalStress: 300, shearStress: 155.6 },
          ],
        },
        uses: ["c", "phi"],
      },
      {
        kind: "triaxial-cu",
        name: "Borrow area A, CU triaxial with pore pressures, 38 mm",
        data: {
          space: "s-t",
          backPressure: 200,
          specimens: [
            { specimen: "CU-1", cellPressure: 250, deviatorStress: 113, porePressure: 200 },
            { specimen: "CU-2", cellPressure: 320, deviatorStress: 196, porePressure: 220 },
            { specimen: "CU-3", cellPressure: 450, deviatorStress: 361, porePressure: 250 },
          ],
        },
        uses: [],
      },
      {
        kind: "compaction",
        name: "Borrow area A, standard compaction, 5 points",
        data: {
          specificGravity: 2.7,
          acceptancePercent: 95,
          points: [
            { specimen: "P-1", moistureContent: 11, dryDensity: 1.56 },
            { specimen: "P-2", moistureContent: 14, dryDensity: 1.63 },
            { specimen: "P-3", moistureContent: 17, dryDensity: 1.66 },
            { specimen: "P-4", moistureContent: 20, dryDensity: 1.63 },
            { specimen: "P-5", moistureContent: 23, dryDensity: 1.55 },
          ],
        },
        uses: ["gamma", "gammaSat"],
      },
      {
        kind: "atterberg",
        name: "Borrow area A, bulk sample",
        data: { specimen: "AL-1", liquidLimit: 42, plasticLimit: 20, waterContent: 18 },
        uses: [],
      },
    ],
  },
  {
    key: "foundation",
    name: "Silty clay foundation",
    color: MATERIAL_COLORS[1],
    notes:
      "Alluvial silty clay under the footprint. Undrained strength from field vanes in two probes; the datum is the original ground at 6.00 m.",
    parameters: {
      model: "mohr-coulomb",
      gamma: 18,
      gammaSat: 18.5,
      c: 4,
      phi: 24,
      su: 35,
      suGradient: 1.5,
      suDatum: 6,
      cR: 15,
      phiR: 13,
    },
    sets: [
      {
        kind: "undrained",
        name: "Field vane, probes FV-1 and FV-2",
        data: {
          source: "vane",
          model: "linear",
          groundElevation: 6,
          vaneCorrectionFactor: 1,
          tests: [
            { specimen: "FV-1 1.0 m", depth: 1, su: 36 },
            { specimen: "FV-2 2.0 m", depth: 2, su: 38.5 },
            { specimen: "FV-1 3.0 m", depth: 3, su: 39 },
            { specimen: "FV-2 4.5 m", depth: 4.5, su: 42 },
            { specimen: "FV-1 6.0 m", depth: 6, su: 44.5 },
          ],
        },
        uses: ["su", "suGradient", "suDatum"],
      },
    ],
  },
  {
    key: "drain",
    name: "Gravel toe drain",
    // Sand-yellow, not the palette's light blue: on a section a blue drain reads as ponded water.
    color: MATERIAL_COLORS[2],
    notes: "Clean graded gravel; drains freely, so it keeps its drained strength in every case.",
    parameters: { model: "mohr-coulomb", gamma: 20, gammaSat: 21, c: 0, phi: 36, freeDraining: true },
    sets: [],
  },
  {
    key: "rock",
    name: "Mudstone bedrock",
    color: IMPENETRABLE_COLOR,
    notes: "No slip surface is taken through the bedrock.",
    parameters: { model: "impenetrable" },
    sets: [],
  },
];

function deriveDemo(set: DemoSet): LabTestRecord {
  const outcome = checkAndDeriveLabTest(set.kind, set.data);
  if (!outcome.ok)
    throw new Error(`demo lab set '${set.name}' is not valid: ${outcome.problems.map((p) => p.message).join("; ")}`);
  return outcome.record;
}

/**
 * Inserts the demo library into `projectId`: fill, foundation, drain and rock, with the lab test
 * sets of the fill and the foundation and each derived parameter's source recorded.
 * Run inside the caller's transaction; it assumes the project has no materials yet.
 */
export async function seedDemoMaterials(
  trx: Knex | Knex.Transaction,
  projectId: number,
  userId: number,
): Promise<void> {
  for (const m of DEMO) {
    const [materialId] = await trx("materials").insert({
      project_id: projectId,
      key: m.key,
      name: m.name,
      color: m.color,
      parameters: JSON.stringify(m.parameters),
      sources: "{}",
      notes: m.notes,
      updated_by: userId,
    });
    const parameters: Record<string, unknown> = { ...m.parameters };
    const sources: ParameterSources = {};
    for (const set of m.sets) {
      const record = deriveDemo(set);
      const [setId] = await trx("lab_test_sets").insert({
        project_id: projectId,
        material_id: materialId,
        kind: set.kind,
        name: set.name,
        data: JSON.stringify(record.data),
        result: JSON.stringify(record.result),
        created_by: userId,
      });
      const offered = Object.assign({}, ...suggestedValues(record).map((s) => s.values)) as Partial<
        Record<ParameterKey, number>
      >;
      for (const key of set.uses) {
        parameters[key] = offered[key];
        sources[key] = setId;
      }
    }
    await trx("materials")
      .where({ id: materialId })
      .update({ parameters: JSON.stringify(parameters), sources: JSON.stringify(sources) });
  }
}
