/**
 * Invented sections for stability runs on seepage water (docs/seepage.md §6): a homogeneous
 * embankment, 10 m high with 2.5H:1V faces and a 6 m crest, on impenetrable rock.
 */

type P = [number, number];

export interface StabilityDoc {
  version: 1;
  materials: Record<string, unknown>[];
  regions: { material: string; points: P[] }[];
  seepage?: Record<string, unknown>;
  water?: Record<string, unknown>;
  analysis: Record<string, unknown>;
}

const FILL = { id: "fill", model: "mohr-coulomb", gamma: 19, gammaSat: 20, c: 8, phi: 30, k: 1e-6 };
const ROCK = { id: "rock", model: "impenetrable", gamma: 24 };

/** The downstream face's search: centres over the right-hand face, circles tangent between 1 and 7 m. */
export const DOWNSTREAM_SEARCH = {
  case: "steady",
  methods: ["bishop", "fellenius"],
  slices: 40,
  grid: { x1: 44, y1: 14, x2: 64, y2: 30, nx: 9, ny: 9 },
  radii: { tangentY1: 1, tangentY2: 7, n: 7 },
};

/** The upstream face's search, the mirror image of DOWNSTREAM_SEARCH about x = 28. */
export const UPSTREAM_SEARCH = {
  ...DOWNSTREAM_SEARCH,
  grid: { x1: -8, y1: 14, x2: 12, y2: 30, nx: 9, ny: 9 },
};

/** The embankment: toes at x = 0 and 56, crest from 25 to 31 at y = 10; rock from x = −10 to 66 below y = 0. */
export function homogeneousDam(extra: Partial<StabilityDoc> = {}): StabilityDoc {
  return {
    version: 1,
    materials: [FILL, ROCK],
    regions: [
      {
        material: "rock",
        points: [
          [-10, -3],
          [66, -3],
          [66, 0],
          [56, 0],
          [0, 0],
          [-10, 0],
        ],
      },
      {
        material: "fill",
        points: [
          [0, 0],
          [56, 0],
          [31, 10],
          [25, 10],
        ],
      },
    ],
    analysis: DOWNSTREAM_SEARCH,
    ...extra,
  };
}
