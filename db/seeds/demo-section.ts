import type { SectionDocument } from "../../lib/stability";
import { computeFilterSeepage } from "../../lib/stability/seepage";
import type { StoredSection, WaterCondition } from "../../lib/sections/water-conditions";

/**
 * The demo cross-section, invented: a 12 m homogeneous compacted-clay embankment (3H:1V
 * upstream, 2.5H:1V downstream, 6 m crest at 18.0 m) on 6 m of silty clay over rock, with a
 * 12 m gravel blanket drain at the downstream toe and the normal pool at 16.0 m.
 * The phreatic line is the Kozeny–Casagrande line for that drain, treating the foundation as
 * much less permeable than the fill (stated on the section so the engineer can change it).
 * Its water conditions are the set a dam file carries (levels invented): steady seepage at the
 * normal and flood pools, end of construction with no reservoir, and a drawdown
 * from each pool.
 */
export const DEMO_POOL = { normal: 16, flood: 17, drawdownTo: 8, constructionGroundwater: 5.5 };

/** The values the demo library derives from its lab sets (db/seeds/demo-materials.ts), for use without a database. */
export const DEMO_MATERIALS: SectionDocument["materials"] = [
  {
    id: "fill",
    name: "Compacted clay fill",
    model: "mohr-coulomb",
    gamma: 19,
    gammaSat: 20,
    c: 10.4,
    phi: 25.9,
    su: 60,
    cR: 22,
    phiR: 15,
  },
  {
    id: "foundation",
    name: "Silty clay foundation",
    model: "mohr-coulomb",
    gamma: 18,
    gammaSat: 18.5,
    c: 4,
    phi: 24,
    su: 34.6,
    suGradient: 1.65,
    suDatum: 6,
    cR: 15,
    phiR: 13,
  },
  {
    id: "drain",
    name: "Gravel blanket drain",
    model: "mohr-coulomb",
    gamma: 20,
    gammaSat: 21,
    c: 0,
    phi: 36,
    freeDraining: true,
  },
  { id: "rock", name: "Mudstone bedrock", model: "impenetrable", gamma: 23 },
];

const UPSTREAM_TOE: [number, number] = [20, 6];
const UPSTREAM_CREST: [number, number] = [56, 18];
const DOWNSTREAM_CREST: [number, number] = [62, 18];
const DOWNSTREAM_TOE: [number, number] = [92, 6];

function fillGammaSat(materials: SectionDocument["materials"]): number {
  const fill = materials.find((m) => m.id === "fill");
  return fill && fill.model !== "impenetrable" ? (fill.gammaSat ?? fill.gamma ?? 20) : 20;
}

/** The Kozeny–Casagrande line through the fill to the drain for a pool level (m), from the left edge to the right. */
function seepageLine(materials: SectionDocument["materials"], pool: number): [number, number][] {
  const seepage = computeFilterSeepage({
    baseElevation: 6,
    poolElevation: pool,
    upstreamFace: { toe: UPSTREAM_TOE, crest: UPSTREAM_CREST },
    filterStartX: 80,
    downstreamFace: { crest: DOWNSTREAM_CREST, toe: DOWNSTREAM_TOE },
    permeability: 5e-9,
    gammaSat: fillGammaSat(materials),
  });
  if (!seepage.ok) throw new Error(`demo seepage line failed: ${seepage.limits.map((l) => l.message).join("; ")}`);
  const line: [number, number][] = [[0, pool]];
  for (const [x, y] of seepage.construction.waterLine) {
    if (x > line[line.length - 1][0] + 1e-6) line.push([+x.toFixed(3), +y.toFixed(3)]);
  }
  line.push([110, 6]);
  return line;
}

function demoWaterConditions(materials: SectionDocument["materials"]): WaterCondition[] {
  const storage = { gammaW: 9.81, phreatic: seepageLine(materials, DEMO_POOL.normal) };
  const surcharge = { gammaW: 9.81, phreatic: seepageLine(materials, DEMO_POOL.flood) };
  const g = DEMO_POOL.constructionGroundwater;
  return [
    {
      id: "storage-pool",
      name: `Steady seepage, normal pool ${DEMO_POOL.normal.toFixed(1)} m`,
      kind: "steady",
      water: storage,
      usualFor: ["steady-seepage"],
    },
    {
      id: "surcharge-pool",
      name: `Steady seepage, flood pool ${DEMO_POOL.flood.toFixed(1)} m`,
      kind: "steady",
      water: surcharge,
      usualFor: ["surcharge-pool"],
    },
    {
      // Fill and foundation carry their undrained strength su at end of construction; the line
      // gives the pore pressures of the free-draining drain and shows there is no reservoir.
      id: "end-of-construction",
      name: `End of construction, no reservoir, groundwater at ${g.toFixed(1)} m`,
      kind: "construction",
      water: {
        gammaW: 9.81,
        phreatic: [
          [0, g],
          [110, g],
        ],
      },
      usualFor: ["end-of-construction"],
    },
    {
      id: "drawdown-storage",
      name: `Rapid drawdown, ${DEMO_POOL.normal.toFixed(1)} m to ${DEMO_POOL.drawdownTo.toFixed(1)} m`,
      kind: "drawdown",
      water: storage,
      drawdownTo: DEMO_POOL.drawdownTo,
      usualFor: ["drawdown-storage"],
    },
    {
      id: "drawdown-surcharge",
      name: `Rapid drawdown, ${DEMO_POOL.flood.toFixed(1)} m to ${DEMO_POOL.drawdownTo.toFixed(1)} m`,
      kind: "drawdown",
      water: surcharge,
      drawdownTo: DEMO_POOL.drawdownTo,
      usualFor: ["drawdown-surcharge"],
    },
  ];
}

export function buildDemoSection(materials: SectionDocument["materials"] = DEMO_MATERIALS): StoredSection {
  const waterConditions = demoWaterConditions(materials);
  return {
    version: 1,
    materials,
    regions: [
      {
        name: "Bedrock",
        material: "rock",
        points: [
          [0, -4],
          [110, -4],
          [110, 0],
          [0, 0],
        ],
      },
      {
        name: "Foundation",
        material: "foundation",
        points: [
          [0, 0],
          [110, 0],
          [110, 6],
          [92, 6],
          [80, 6],
          [20, 6],
          [0, 6],
        ],
      },
      {
        name: "Embankment fill",
        material: "fill",
        points: [
          [20, 6],
          [80, 6],
          [80, 6.5],
          [90.75, 6.5],
          [62, 18],
          [56, 18],
        ],
      },
      {
        name: "Toe drain",
        material: "drain",
        points: [
          [80, 6],
          [92, 6],
          [90.75, 6.5],
          [80, 6.5],
        ],
      },
    ],
    // The water drawn in the editor; each run takes the water of its condition.
    water: waterConditions[0].water,
    waterConditions,
  };
}
