/** Section documents for the seepage checks; each builder says which published problem it models. */

type P = [number, number];

export interface SeepageDoc {
  materials: Record<string, unknown>[];
  regions: { material: string; points: P[]; name?: string }[];
  seepage: Record<string, unknown>;
  water?: { gammaW?: number };
}

const soil = (k: number, extra: Record<string, unknown> = {}) => ({
  id: "soil",
  model: "mohr-coulomb",
  gamma: 19,
  gammaSat: 20,
  c: 5,
  phi: 30,
  k,
  ...extra,
});

/** Charny (1951): a rectangular dam L wide and tall enough, on an impervious base, pools h1 and h2. */
export function charnyDam(L: number, h1: number, h2: number, k: number, meshSize: number): SeepageDoc {
  const top = h1 * 1.2;
  return {
    materials: [soil(k)],
    regions: [
      {
        material: "soil",
        points: [
          [0, 0],
          [L, 0],
          [L, top],
          [0, top],
        ],
      },
    ],
    seepage: { pools: [{ side: "left", level: h1 }, ...(h2 > 0 ? [{ side: "right", level: h2 }] : [])], meshSize },
  };
}

/**
 * Kozeny (1931): flow to a horizontal underdrain. Focus at the origin, drain along y = 0 for x ≥ 0;
 * the free surface is y² = y0² − 2·y0·x and the upstream face the confocal parabola
 * y² = 2p(x + p/2), p = H²/y0, an equipotential at head H. q = k·y0.
 */
export function kozenyDam(y0: number, H: number, k: number, meshSize: number): SeepageDoc {
  const p = (H * H) / y0;
  const top = H * 1.2;
  const face: P[] = [];
  const n = 60;
  for (let i = 0; i <= n; i++) {
    const y = (top * i) / n;
    face.push([(y * y) / (2 * p) - p / 2, y]);
  }
  const right = Math.max(2 * y0, 6);
  const points: P[] = [...face, [right, top], [right, 0], [0, 0]];
  return {
    materials: [soil(k)],
    regions: [{ material: "soil", points }],
    seepage: {
      pools: [{ side: "left", level: H }],
      drains: [
        [
          [0, 0],
          [right, 0],
        ],
      ],
      meshSize,
    },
  };
}

/**
 * Harr (1962): a flat impervious floor 2B wide resting on a pervious layer T deep over an
 * impervious base, pools h1 upstream and h2 downstream. The layer runs `reach` beyond each edge.
 */
export function floorOnLayer(B: number, T: number, h1: number, h2: number, k: number, meshSize: number): SeepageDoc {
  // The disturbance under the floor dies out as exp(−πx/T): four depths on each side is far enough.
  const reach = 4 * T;
  const top = Math.max(h1, h2) + 2;
  return {
    materials: [soil(k), { id: "floor", model: "impenetrable", gamma: 24 }],
    regions: [
      {
        material: "soil",
        points: [
          [-B - reach, 0],
          [B + reach, 0],
          [B + reach, T],
          [B, T],
          [-B, T],
          [-B - reach, T],
        ],
      },
      {
        material: "floor",
        points: [
          [-B, T],
          [B, T],
          [B, top],
          [-B, top],
        ],
      },
    ],
    seepage: {
      pools: [
        { side: "left", level: h1 },
        { side: "right", level: h2 },
      ],
      meshSize,
    },
  };
}

/**
 * A homogeneous dam on an impervious base with a horizontal toe filter (Casagrande 1937): 20 m
 * high, crest 12 m, base 32 m, filter the last 6 m of the base, pool at 19 m (so the wetted
 * upstream face projects m = 9.5 m).
 */
export function toeDrainDam(k: number, meshSize: number): SeepageDoc {
  return {
    materials: [soil(k)],
    regions: [
      {
        material: "soil",
        points: [
          [0, 0],
          [32, 0],
          [22, 20],
          [10, 20],
        ],
      },
    ],
    seepage: {
      pools: [{ side: "left", level: 19 }],
      drains: [
        [
          [26, 0],
          [32, 0],
        ],
      ],
      meshSize,
    },
  };
}

/** An invented zoned dam on a pervious foundation: clay core, gravelly shells, toe drain, rock below. */
export function zonedDam(meshSize: number): SeepageDoc {
  return {
    materials: [
      { id: "core", model: "mohr-coulomb", gamma: 19, gammaSat: 20, c: 10, phi: 25, k: 1e-9, kRatio: 0.25 },
      { id: "shell", model: "mohr-coulomb", gamma: 20, gammaSat: 21, c: 0, phi: 36, k: 1e-5 },
      { id: "foundation", model: "mohr-coulomb", gamma: 18, gammaSat: 19, c: 4, phi: 28, k: 1e-7, kRatio: 0.5 },
      { id: "drain", model: "mohr-coulomb", gamma: 20, gammaSat: 21, c: 0, phi: 38, k: 1e-3 },
      { id: "rock", model: "impenetrable", gamma: 23 },
    ],
    regions: [
      {
        name: "Bedrock",
        material: "rock",
        points: [
          [0, -4],
          [120, -4],
          [120, 0],
          [0, 0],
        ],
      },
      {
        name: "Foundation",
        material: "foundation",
        points: [
          [0, 0],
          [120, 0],
          [120, 6],
          [98, 6],
          [84, 6],
          [64, 6],
          [48, 6],
          [20, 6],
          [0, 6],
        ],
      },
      {
        name: "Upstream shell",
        material: "shell",
        points: [
          [20, 6],
          [48, 6],
          [56, 24],
          [54, 24],
        ],
      },
      {
        name: "Core",
        material: "core",
        points: [
          [48, 6],
          [64, 6],
          [60, 24],
          [56, 24],
        ],
      },
      {
        name: "Downstream shell",
        material: "shell",
        points: [
          [64, 6],
          [84, 6],
          [84, 7],
          [96, 7],
          [62, 24],
          [60, 24],
        ],
      },
      {
        name: "Toe drain",
        material: "drain",
        points: [
          [84, 6],
          [98, 6],
          [96, 7],
          [84, 7],
        ],
      },
    ],
    seepage: {
      pools: [
        { side: "left", level: 21 },
        { side: "right", level: 6 },
      ],
      meshSize,
      probes: [
        [58, 10],
        [40, 3],
      ],
      crestLength: 250,
    },
  };
}
