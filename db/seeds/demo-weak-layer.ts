import type { Knex } from "knex";
import type { SectionDocument } from "../../lib/stability";
import type { StoredSection, WaterCondition } from "../../lib/sections/water-conditions";
import type { RunSetup } from "../../lib/analysis/run-setup";
import { MATERIAL_COLORS } from "../../lib/materials/palette";
import { computeRunRecord } from "../../lib/runs/record/run-record";
import { comparePreview } from "../../lib/runs/record/compare-preview";
import { runRow } from "../../lib/runs/record/run-row";
import { createSectionWithRun } from "../queries/runs";

/**
 * An invented spoil embankment on a clay foundation that holds a thin, slickensided clay seam
 * 1.6 m below the original ground: the case where a slip follows the seam rather than a circle.
 * Strengths are typical of such materials (common practice, values from memory, not a site).
 * x from 0 to 110 m; crest at 20.0 m from 30 to 42 m; downstream face at 2H:1V to the toe at
 * (66, 8); the seam from 6.0 to 6.4 m.
 */
export const WEAK_LAYER_NAME = "Spoil bank over a clay seam, station 1+150";

const P = (x: number, y: number): [number, number] => [x, y];

export const WEAK_LAYER_MATERIALS: SectionDocument["materials"] = [
  {
    id: "spoil",
    name: "Compacted spoil",
    color: MATERIAL_COLORS[2],
    model: "mohr-coulomb",
    gamma: 19.5,
    c: 5,
    phi: 30,
  },
  {
    id: "crust",
    name: "Stiff clay crust",
    color: MATERIAL_COLORS[5],
    model: "mohr-coulomb",
    gamma: 19,
    c: 12,
    phi: 26,
  },
  {
    id: "seam",
    name: "Clay seam (residual)",
    color: MATERIAL_COLORS[7],
    model: "mohr-coulomb",
    gamma: 18,
    c: 0,
    phi: 8,
  },
  { id: "clay", name: "Firm grey clay", color: MATERIAL_COLORS[4], model: "mohr-coulomb", gamma: 19, c: 15, phi: 27 },
];

function weakLayerWaters(): WaterCondition[] {
  return [
    {
      id: "winter-water-table",
      name: "Winter water table at 7.0 m",
      kind: "steady",
      water: { gammaW: 9.81, phreatic: [P(0, 9.5), P(36, 9), P(66, 7.2), P(110, 7)] },
      usualFor: ["steady-seepage"],
    },
  ];
}

/** The section document (its named water inside), ground at 8.0 m either side of the bank. */
export function buildWeakLayerSection(): StoredSection {
  const waterConditions = weakLayerWaters();
  return {
    version: 1,
    materials: WEAK_LAYER_MATERIALS,
    regions: [
      { name: "Firm clay", material: "clay", points: [P(0, 0), P(110, 0), P(110, 6), P(0, 6)] },
      { name: "Clay seam", material: "seam", points: [P(0, 6), P(110, 6), P(110, 6.4), P(0, 6.4)] },
      {
        name: "Clay crust",
        material: "crust",
        points: [P(0, 6.4), P(110, 6.4), P(110, 8), P(66, 8), P(6, 8), P(0, 8)],
      },
      { name: "Spoil bank", material: "spoil", points: [P(6, 8), P(66, 8), P(42, 20), P(30, 20)] },
    ],
    water: waterConditions[0].water,
    waterConditions,
  };
}

/**
 * A surface down through the bank, along the seam and up through the crust beyond the toe: the
 * shape the seam invites (three straight pieces: active wedge, sliding block, passive wedge).
 */
export const WEAK_LAYER_SURFACE: [number, number][] = [P(37, 20), P(48, 6.2), P(72, 6.2), P(80, 8)];

/**
 * The kept run's set-up: all four methods on the downstream face, circles then surfaces of any shape,
 * and the seam surface drawn by hand beside what the search finds.
 */
export function weakLayerSetup(): RunSetup {
  return {
    condition: "steady-seepage",
    waterCondition: "winter-water-table",
    face: "downstream",
    methods: ["bishop", "fellenius", "spencer", "morgenstern-price"],
    interslice: "half-sine",
    search: "surfaces",
    slices: 50,
    ordinaryForm: "classical",
    grid: { x1: 44, y1: 22, x2: 70, y2: 44, nx: 14, ny: 12 },
    radii: { tangentY1: 14, tangentY2: 5, n: 10 },
    refine: true,
    drawdownMethod: "effective",
    requiredFs: 1.5,
    surface: WEAK_LAYER_SURFACE,
  };
}

/**
 * Adds the section and a kept run on it through the save path every run takes (the server's own
 * search, lib/runs/record/run-record.ts). Run inside the caller's transaction.
 */
export async function seedWeakLayer(trx: Knex.Transaction, projectId: number, userId: number): Promise<void> {
  const document = buildWeakLayerSection();
  const setup = weakLayerSetup();
  const record = await computeRunRecord(document, setup, (server) => comparePreview(server, undefined));
  await createSectionWithRun(
    {
      name: WEAK_LAYER_NAME,
      description:
        "Spoil bank on clay with a thin residual-strength seam: compare the critical circle with a surface along the seam.",
      document,
      summary: "First version from the trial pit logs",
    },
    runRow(record, { projectId, userId, title: "Downstream face along the seam, four methods", setup }),
    trx,
  );
}
