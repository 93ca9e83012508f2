import type { SectionDocument } from "../../lib/stability";
import { computeFilterSeepage } from "../../lib/stability/seepage";

/**
 * The demo cross-section, invented: a 12 m homogeneous compacted-clay embankment (3H:1V
 * upstream, 2.5H:1V downstream, 6 m crest at 18.0 m) on 6 m of silty clay over rock, with a
 * 12 m gravel blanket drain at the downstream toe and the normal pool at 16.0 m.
 * The phreatic line is the Kozeny–Casagrande line for that drain, treating the foundation as
 * much less permeable than the fill (stated on the section so the engineer can change it).
 */
export const DEMO_POOL = { normal: 16, flood: 17, drawdownTo: 8 };

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

export function buildDemoSection(materials: SectionDocument["materials"] = DEMO_MATERIALS): SectionDocument {
  const seepage = computeFilterSeepage({
    baseElevation: 6,
    poolElevation: DEMO_POOL.normal,
    upstreamFace: { toe: UPSTREAM_TOE, crest: UPSTREAM_CREST },
    filterStartX: 80,
    downstreamFace: { crest: DOWNSTREAM_CREST, toe: DOWNSTREAM_TOE },
    permeability: 5e-9,
    gammaSat: fillGammaSat(materials),
  });
  if (!seepage.ok) throw new Error(`demo seepage line failed: ${seepage.limits.map((l) => l.message).join("; ")}`);
  const line: [number, number][] = [[0, DEMO_POOL.normal]];
  for (const [x, y] of seepage.construction.waterLine) {
    if (x > line[line.length - 1][0] + 1e-6) line.push([+x.toFixed(3), +y.toFixed(3)]);
  }
  line.push([110, 6]);
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
    water: { gammaW: 9.81, phreatic: line },
  };
}
