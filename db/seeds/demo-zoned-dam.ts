import type { Knex } from "knex";
import type { SectionDocument } from "../../lib/stability";
import type { StoredSection, WaterCondition } from "../../lib/sections/water-conditions";
import type { SeepageSettingsInput } from "../../lib/section-seepage/types";
import type { MaterialParameters } from "../../lib/materials/parameters";
import { checkAndDeriveLabTest } from "../../lib/materials/lab-derive";
import { suggestedValues } from "../../lib/materials/sources";
import { MATERIAL_COLORS } from "../../lib/materials/palette";
import { toEngineMaterial } from "../../lib/materials/engine-material";
import { seedZonedRun } from "./demo-zoned-run";

/**
 * An invented zoned saddle dam beside the demo embankment, for the seepage view: a clay core
 * between sand-gravel shells, a gravel toe drain, on 6 m of pervious alluvial sand over
 * impervious rock (the bottom of the section). Pool at 23.0 m, tailwater at ground level (6.0 m)
 * downstream of the toe. Conductivities are typical of such zones (common practice, orders of
 * magnitude as in Cedergren, Seepage, Drainage and Flow Nets, quoted from memory); the core's kh
 * comes from an invented falling-head set.
 */
export const ZONED_DAM_NAME = "Saddle dam (zoned), station 0+080";
export const ZONED_POOL = 23;
export const ZONED_TAILWATER = 6;

interface ZonedMaterial {
  key: string;
  name: string;
  color: string;
  notes: string;
  parameters: MaterialParameters;
}

export const ZONED_MATERIALS: ZonedMaterial[] = [
  {
    key: "core",
    name: "Clay core",
    color: MATERIAL_COLORS[5],
    notes: "Rolled clay core of the saddle dam. kh from the falling-head set; kv/kh 0.5 for layered placement.",
    parameters: { model: "mohr-coulomb", gamma: 19.5, gammaSat: 20.5, c: 8, phi: 24, kRatio: 0.5 },
  },
  {
    key: "shell",
    name: "Sand-gravel shell",
    color: MATERIAL_COLORS[2],
    notes: "Upstream and downstream shells and the crest. k typical of a silty sand-gravel fill.",
    parameters: { model: "mohr-coulomb", gamma: 20.5, gammaSat: 21.5, c: 0, phi: 37, k: 5e-6, kRatio: 0.5 },
  },
  {
    key: "toe-drain",
    name: "Gravel toe drain",
    color: MATERIAL_COLORS[4],
    notes: "Graded gravel toe drain with a sand filter face.",
    parameters: { model: "mohr-coulomb", gamma: 20, gammaSat: 21, c: 0, phi: 38, k: 1e-3, freeDraining: true },
  },
  {
    key: "alluvium",
    name: "Alluvial sand foundation",
    color: MATERIAL_COLORS[7],
    notes: "Pervious alluvial sand over rock; kv/kh 0.25 for its bedding.",
    parameters: { model: "mohr-coulomb", gamma: 19, gammaSat: 20, c: 0, phi: 32, k: 1e-6, kRatio: 0.25 },
  },
];

/** Invented falling-head readings on core samples (100 mm × 100 mm specimen, 5 mm standpipe). */
export const CORE_PERMEABILITY_SET = {
  name: "Core borrow, falling head, 3 specimens",
  data: {
    method: "falling-head",
    length: 100,
    diameter: 100,
    standpipeDiameter: 5,
    readings: [
      { specimen: "CB-1", head: 1500, headEnd: 1200, time: 11200 },
      { specimen: "CB-2", head: 1500, headEnd: 1210, time: 10400 },
      { specimen: "CB-3", head: 1400, headEnd: 1130, time: 10900 },
    ],
  },
};

const P = (x: number, y: number): [number, number] => [x, y];

function zonedWaterConditions(): WaterCondition[] {
  return [
    {
      id: "storage-pool",
      name: `Steady seepage, normal pool ${ZONED_POOL.toFixed(1)} m`,
      kind: "steady",
      // A hand-drawn line for the stability check; the seepage view computes the real one.
      water: {
        gammaW: 9.81,
        phreatic: [P(0, ZONED_POOL), P(66, ZONED_POOL), P(76, 14), P(90, 8.5), P(108, 6.2), P(140, 6)],
      },
      usualFor: ["steady-seepage"],
    },
  ];
}

/** The zoned dam as a section document: x from 0 to 140 m, the dam from 10 m to 128 m, crest at 26.0 m. */
export function buildZonedDamSection(materials: SectionDocument["materials"]): StoredSection {
  const waterConditions = zonedWaterConditions();
  return {
    version: 1,
    materials,
    regions: [
      {
        name: "Alluvial foundation",
        material: "alluvium",
        points: [P(0, 0), P(140, 0), P(140, 6), P(128, 6), P(108, 6), P(88, 6), P(60, 6), P(10, 6), P(0, 6)],
      },
      { name: "Upstream shell", material: "shell", points: [P(10, 6), P(60, 6), P(72, 25), P(67, 25)] },
      { name: "Core", material: "core", points: [P(60, 6), P(88, 6), P(76, 25), P(72, 25)] },
      { name: "Toe drain", material: "toe-drain", points: [P(108, 6), P(128, 6), P(125.5, 7), P(108, 7)] },
      {
        name: "Downstream shell",
        material: "shell",
        points: [P(88, 6), P(108, 6), P(108, 7), P(125.5, 7), P(80.5, 25), P(76, 25)],
      },
      {
        name: "Crest",
        material: "shell",
        points: [P(67, 25), P(72, 25), P(76, 25), P(80.5, 25), P(78, 26), P(70, 26)],
      },
    ],
    water: waterConditions[0].water,
    waterConditions,
  };
}

/** The toe drain's base held at atmospheric pressure, a 320 m crest, and the tailwater at ground level. */
export const ZONED_SEEPAGE_SETTINGS: SeepageSettingsInput = {
  drains: [[P(108, 6), P(128, 6)]],
  crestLength: 320,
  tailwater: { side: "right", level: ZONED_TAILWATER },
};

/**
 * Adds the zoned dam to the demo project: its four materials (the core's kh from its falling-head
 * set, recorded as the source), the section, its seepage settings and a kept run on its seepage
 * water. Existing demo records are left as they are. Run inside the caller's transaction.
 */
export async function seedZonedDam(trx: Knex.Transaction, projectId: number, userId: number): Promise<void> {
  const engineMaterials: SectionDocument["materials"] = [];
  for (const m of ZONED_MATERIALS) {
    const parameters: Record<string, unknown> = { ...m.parameters };
    const [materialId] = await trx("materials").insert({
      project_id: projectId,
      key: m.key,
      name: m.name,
      color: m.color,
      parameters: JSON.stringify(parameters),
      sources: "{}",
      notes: m.notes,
      updated_by: userId,
    });
    if (m.key === "core") {
      const outcome = checkAndDeriveLabTest("permeability", CORE_PERMEABILITY_SET.data);
      if (!outcome.ok) throw new Error(`demo permeability set is not valid: ${outcome.problems[0].message}`);
      const [setId] = await trx("lab_test_sets").insert({
        project_id: projectId,
        material_id: materialId,
        kind: "permeability",
        name: CORE_PERMEABILITY_SET.name,
        data: JSON.stringify(outcome.record.data),
        result: JSON.stringify(outcome.record.result),
        created_by: userId,
      });
      parameters.k = suggestedValues(outcome.record)[0].values.k;
      await trx("materials")
        .where({ id: materialId })
        .update({ parameters: JSON.stringify(parameters), sources: JSON.stringify({ k: setId }) });
    }
    // The section carries strengths only, as a saved section does (the engine's schema has no k):
    // the seepage view reads k from the library.
    const engine: Record<string, unknown> = {
      ...toEngineMaterial({ key: m.key, name: m.name, color: m.color, parameters: parameters as MaterialParameters }),
    };
    delete engine.k;
    delete engine.kRatio;
    engineMaterials.push(engine as SectionDocument["materials"][number]);
  }
  const [sectionId] = await trx("sections").insert({
    project_id: projectId,
    name: ZONED_DAM_NAME,
    description:
      "Zoned saddle dam on pervious alluvium: clay core, sand-gravel shells, gravel toe drain. " +
      "Open the seepage view for its flow net.",
    current_version: 1,
    created_by: userId,
  });
  const section = buildZonedDamSection(engineMaterials);
  const [sectionVersionId] = await trx("section_versions").insert({
    section_id: sectionId,
    version: 1,
    document: JSON.stringify(section),
    summary: "First version from the saddle dam drawings",
    created_by: userId,
  });
  await trx("section_seepage").insert({
    section_id: sectionId,
    water_condition_id: "storage-pool",
    settings: JSON.stringify(ZONED_SEEPAGE_SETTINGS),
    updated_by: userId,
  });
  await seedZonedRun(trx, { projectId, sectionId, sectionVersionId, userId, section });
}
