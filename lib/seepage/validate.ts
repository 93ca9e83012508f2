/**
 * Turns a section document into a checked seepage problem, or lists every problem with where it
 * is. Conductivities: k is horizontal (m/s), kRatio = kv/kh (default 1).
 */
import { polylineDistance, insidePolygon, signedArea } from "./geometry";
import { fmt, fromZod, issue } from "./issues";
import { estimateNodes } from "./mesh";
import { seepageDocumentSchema } from "./schema";
import type { FlowMaterial, Point, SeepageIssue, SeepageProblem } from "./types";

export const DEFAULT_GAMMA_W = 9.81;
/** Largest mesh a run may build: keeps a run in the browser within memory and about a second. */
export const MAX_NODES = 50_000;
/** Nodes the default mesh size aims at. */
export const DEFAULT_NODE_TARGET = 3000;
export const DEFAULT_HEAD_DROPS = 12;

export type ProblemOutcome = { ok: true; problem: SeepageProblem } | { ok: false; errors: SeepageIssue[] };

export function buildProblem(doc: unknown, maxNodes = MAX_NODES): ProblemOutcome {
  const parsed = seepageDocumentSchema.safeParse(doc);
  if (!parsed.success) return { ok: false, errors: fromZod(parsed.error.issues) };
  const d = parsed.data;
  const errors: SeepageIssue[] = [];
  const index = new Map<string, number>();
  d.materials.forEach((m, i) => {
    if (index.has(m.id))
      errors.push(issue("duplicate-material", `materials[${i}].id`, `Material id "${m.id}" is used twice.`));
    else index.set(m.id, i);
  });
  const used = new Set<number>();
  const regions = d.regions.map((r, i) => {
    const m = index.get(r.material);
    if (m === undefined)
      errors.push(
        issue(
          "unknown-material",
          `regions[${i}].material`,
          `Region ${i} names material "${r.material}", which is not in materials.`,
        ),
      );
    else used.add(m);
    if (Math.abs(signedArea(r.points)) <= 0)
      errors.push(issue("empty-region", `regions[${i}].points`, `Region ${i} encloses no area.`));
    return { material: m ?? 0, points: r.points as Point[] };
  });
  const noFlow = new Set(d.seepage.noFlow ?? []);
  (d.seepage.noFlow ?? []).forEach((id, i) => {
    if (!index.has(id))
      errors.push(
        issue("unknown-material", `seepage.noFlow[${i}]`, `seepage.noFlow names "${id}", which is not in materials.`),
      );
  });
  const materials: FlowMaterial[] = d.materials.map((m, i) => {
    const pervious = m.model !== "impenetrable" && !noFlow.has(m.id);
    if (pervious && m.k === undefined && used.has(i))
      errors.push(
        issue(
          "missing-conductivity",
          `materials[${i}].k`,
          `Material "${m.id}" has no hydraulic conductivity k (m/s); a seepage run needs k for every ` +
            `material that is not impenetrable.`,
        ),
      );
    const k = pervious ? (m.k ?? 0) : 0;
    const gammaSat = m.gammaSat ?? m.gamma;
    return { id: m.id, pervious, kx: k, ky: k * (m.kRatio ?? 1), gammaSat: gammaSat ?? null };
  });
  const s = d.seepage;
  const pools = s.pools ?? [];
  const drains = (s.drains ?? []) as Point[][];
  if (pools.length === 0 && drains.length === 0)
    errors.push(
      issue("no-water", "seepage", "A seepage run needs at least one pool or drain to drive or take the flow."),
    );
  if (pools.length === 2 && pools[0].side === pools[1].side)
    errors.push(issue("duplicate-pool", "seepage.pools[1].side", `Two pools stand on the ${pools[0].side} side.`));

  const perviousPolys = regions.filter((r) => materials[r.material]?.pervious).map((r) => r.points);
  const inPervious = (p: Point) =>
    perviousPolys.some(
      (poly) => insidePolygon(p[0], p[1], poly) || polylineDistance(p[0], p[1], [...poly, poly[0]]) < 1e-6,
    );
  const inAny = (p: Point) =>
    regions.some(
      (r) => insidePolygon(p[0], p[1], r.points) || polylineDistance(p[0], p[1], [...r.points, r.points[0]]) < 1e-6,
    );
  drains.forEach((line, i) =>
    line.forEach((p, j) => {
      if (inPervious(p)) return;
      errors.push(
        issue(
          "drain-outside",
          `seepage.drains[${i}][${j}]`,
          inAny(p)
            ? `Drain ${i} point ${fmt(p)} lies inside impenetrable material; drains must run through pervious regions.`
            : `Drain ${i} point ${fmt(p)} lies outside the section's regions.`,
        ),
      );
    }),
  );
  const probes = (s.probes ?? []) as Point[];
  probes.forEach((p, i) => {
    if (!inPervious(p))
      errors.push(issue("probe-outside", `seepage.probes[${i}]`, `Probe ${fmt(p)} lies outside the pervious regions.`));
  });
  if (errors.length) return { ok: false, errors };

  const filled = regions.map((r) => materials[r.material].pervious);
  const polygons = regions.map((r) => r.points);
  let perviousArea = 0;
  for (const poly of perviousPolys) perviousArea += Math.abs(signedArea(poly));
  if (perviousArea === 0)
    return {
      ok: false,
      errors: [issue("no-pervious-region", "regions", "Every region is impenetrable: no water can flow.")],
    };
  const meshSize = s.meshSize ?? Math.sqrt((perviousArea * 2) / Math.sqrt(3) / DEFAULT_NODE_TARGET);
  const estimate = estimateNodes({ polygons, filled, h: meshSize });
  if (estimate > maxNodes) {
    let needed = meshSize * Math.sqrt(estimate / maxNodes);
    while (estimateNodes({ polygons, filled, h: needed }) > maxNodes) needed *= 1.05;
    needed = ceilTwoFigures(needed);
    return {
      ok: false,
      errors: [
        issue(
          "mesh-too-large",
          "seepage.meshSize",
          `A mesh size of ${meshSize} m would make about ${estimate} nodes, more than the limit of ${maxNodes}; ` +
            `use a mesh size of at least ${needed} m.`,
        ),
      ],
    };
  }
  return {
    ok: true,
    problem: {
      materials,
      regions,
      pools,
      drains,
      meshSize,
      probes,
      gammaW: d.water?.gammaW ?? DEFAULT_GAMMA_W,
      crestLength: s.crestLength ?? null,
      headDrops: s.headDrops ?? DEFAULT_HEAD_DROPS,
      maxNodes,
    },
  };
}

/** Rounds up to two significant figures, so the size suggested in a message is sure to fit. */
function ceilTwoFigures(v: number): number {
  const scale = 10 ** (Math.floor(Math.log10(v)) - 1);
  return Number((Math.ceil(v / scale) * scale).toPrecision(2));
}
