/**
 * The flow net as data (docs/seepage.md §5): equipotentials at equal head drops (contours of the
 * head, drawn where the soil is saturated) and flow lines at equal flow between them, traced from
 * the entry face through the element velocities v = −K·∇h. Nf and Nd give the practitioner's
 * estimate q ≈ k·ΔH·Nf/Nd beside the computed q.
 */
import type { Boundary } from "./boundary";
import { elementGradient } from "./elements";
import type { FlowState } from "./free-surface";
import { round, sig, type Field } from "./results";
import type { FlowNet, Point, TriMesh } from "./types";

/** Most flow channels drawn: beyond this a drawing is a smear, whatever the cells' shape. */
export const MAX_CHANNELS = 40;
/** Fewest channels drawn, so a net always shows how the water moves. */
export const MIN_DRAWN = 4;

export function buildFlowNet(
  field: Field,
  bc: Boundary,
  state: FlowState,
  nodal: Float64Array,
  q: number,
  headDrops: number,
  /** Length of a tracing step (m): a third of the element size reads smoothly. */
  step: number,
): FlowNet {
  const { mesh, head, material, materials } = field;
  let hIn = -Infinity;
  let hOut = Infinity;
  for (let v = 0; v < nodal.length; v++) {
    if (!state.fixed[v] || Number.isNaN(head[v])) continue;
    if (nodal[v] > 0) hIn = Math.max(hIn, head[v]);
    if (nodal[v] < 0) hOut = Math.min(hOut, head[v]);
  }
  const deltaH = Number.isFinite(hIn) && Number.isFinite(hOut) ? Math.max(0, hIn - hOut) : 0;
  // The reference k is that of the material through which most water moves (Σ area·|v|).
  const carried = new Float64Array(materials.length);
  for (let e = 0; e < material.length; e++) {
    if (material[e] < 0) continue;
    const m = materials[material[e]];
    const [gx, gy] = elementGradient(mesh, head, e);
    carried[material[e]] += area(mesh, e) * state.relative[e] * Math.hypot(m.kx * gx, m.ky * gy);
  }
  let dominant = 0;
  for (let m = 1; m < materials.length; m++) if (carried[m] > carried[dominant]) dominant = m;
  const kRef = Math.sqrt(materials[dominant].kx * materials[dominant].ky);
  const square = deltaH > 0 && kRef > 0 ? Math.round((q * headDrops) / (kRef * deltaH)) : 0;
  const flowChannels = Math.min(MAX_CHANNELS, Math.max(deltaH > 0 && kRef > 0 ? 1 : 0, square));
  const equipotentials: FlowNet["equipotentials"] = [];
  for (let k = 1; k < headDrops && deltaH > 0; k++) {
    const level = hIn - (k * deltaH) / headDrops;
    equipotentials.push({ head: sig(level), lines: contour(field, level) });
  }
  // Where cells cannot be square (a zoned section whose water moves mostly through one zone), the
  // lines still split the flow equally, into at least MIN_DRAWN channels.
  const drawnChannels = deltaH > 0 && q > 0 ? Math.max(MIN_DRAWN, flowChannels) : 0;
  const flowLines = drawnChannels > 1 ? traceFlowLines(field, bc, state, nodal, drawnChannels, step) : [];
  return {
    headDrops,
    deltaH: sig(deltaH),
    kRef: sig(kRef),
    kRefMaterial: materials[dominant].id,
    flowChannels,
    drawnChannels,
    qFlowNet: deltaH > 0 ? sig((kRef * deltaH * flowChannels) / headDrops) : 0,
    equipotentials,
    flowLines,
  };
}

function area(mesh: TriMesh, e: number): number {
  const [a, b, c] = [mesh.tri[3 * e], mesh.tri[3 * e + 1], mesh.tri[3 * e + 2]];
  return ((mesh.x[b] - mesh.x[a]) * (mesh.y[c] - mesh.y[a]) - (mesh.x[c] - mesh.x[a]) * (mesh.y[b] - mesh.y[a])) / 2;
}

/** Head contour at `level` through the saturated part of the pervious elements, joined into polylines. */
function contour(field: Field, level: number): Point[][] {
  const { mesh, head, material } = field;
  const segments: [Point, Point][] = [];
  for (let e = 0; e < material.length; e++) {
    if (material[e] < 0) continue;
    const cut: Point[] = [];
    let wet = false;
    for (let s = 0; s < 3; s++) {
      const a = mesh.tri[3 * e + s];
      const b = mesh.tri[3 * e + ((s + 1) % 3)];
      if (head[a] >= mesh.y[a] || head[b] >= mesh.y[b]) wet = true;
      const fa = head[a] - level;
      const fb = head[b] - level;
      if ((fa < 0 && fb >= 0) || (fa >= 0 && fb < 0)) {
        const t = fa / (fa - fb);
        cut.push([mesh.x[a] + t * (mesh.x[b] - mesh.x[a]), mesh.y[a] + t * (mesh.y[b] - mesh.y[a])]);
      }
    }
    if (wet && cut.length === 2) segments.push([cut[0], cut[1]]);
  }
  return chain(segments);
}

/** Joins segments that share end points (to 1e-9 m) into polylines. */
function chain(segments: [Point, Point][]): Point[][] {
  const key = (p: Point) => `${Math.round(p[0] * 1e6)},${Math.round(p[1] * 1e6)}`;
  const ends = new Map<string, number[]>();
  segments.forEach((s, i) =>
    s.forEach((p) => {
      const k = key(p);
      const list = ends.get(k);
      if (list) list.push(i);
      else ends.set(k, [i]);
    }),
  );
  const used = new Uint8Array(segments.length);
  const lines: Point[][] = [];
  const extend = (line: Point[]) => {
    for (;;) {
      const tail = line[line.length - 1];
      const next = (ends.get(key(tail)) ?? []).find((i) => !used[i]);
      if (next === undefined) return;
      used[next] = 1;
      const [a, b] = segments[next];
      line.push(key(a) === key(tail) ? b : a);
    }
  };
  for (let i = 0; i < segments.length; i++) {
    if (used[i]) continue;
    used[i] = 1;
    const line: Point[] = [segments[i][0], segments[i][1]];
    extend(line);
    line.reverse();
    extend(line);
    lines.push(line.map(([x, y]) => [round(x), round(y)]));
  }
  return lines;
}

/**
 * Flow lines that split the inflow into `channels` equal parts: start points along the entry
 * edges at equal steps of cumulative inflow, each traced element by element downstream.
 */
function traceFlowLines(
  field: Field,
  bc: Boundary,
  state: FlowState,
  nodal: Float64Array,
  channels: number,
  step: number,
): Point[][] {
  const { mesh } = field;
  const entering = (v: number) => state.fixed[v] === 1 && nodal[v] > 0;
  const entry = bc.edges.filter((ed) => ed.open && entering(ed.a) && entering(ed.b));
  // Walk the entry edges in order along the boundary (counter-clockwise), one chain after another.
  const nextOf = new Map<number, (typeof entry)[number]>();
  const hasPrev = new Set<number>();
  for (const ed of entry) {
    nextOf.set(ed.a, ed);
    hasPrev.add(ed.b);
  }
  const chains: (typeof entry)[] = [];
  for (const ed of entry) {
    if (hasPrev.has(ed.a)) continue;
    const list = [ed];
    for (let cur = nextOf.get(ed.b); cur && list.length <= entry.length; cur = nextOf.get(cur.b)) list.push(cur);
    chains.push(list);
  }
  // Each entry node's inflow is split evenly between the entry edges that meet at it.
  const edgesAt = new Map<number, number>();
  for (const ed of entry) for (const v of [ed.a, ed.b]) edgesAt.set(v, (edgesAt.get(v) ?? 0) + 1);
  const edgeShare = (ed: { a: number; b: number }) =>
    nodal[ed.a] / (edgesAt.get(ed.a) ?? 1) + nodal[ed.b] / (edgesAt.get(ed.b) ?? 1);
  let total = 0;
  for (const list of chains) for (const ed of list) total += edgeShare(ed);
  if (total <= 0) return [];
  const velocity = nodalVelocity(field, state);
  let x0 = Infinity;
  let x1 = -Infinity;
  for (const v of mesh.x) [x0, x1] = [Math.min(x0, v), Math.max(x1, v)];
  const maxSteps = Math.ceil((20 * (x1 - x0)) / step);
  const lines: Point[][] = [];
  let cumulative = 0;
  let j = 1;
  for (const list of chains)
    for (const ed of list) {
      const share = edgeShare(ed);
      while (j < channels && cumulative + share >= (j * total) / channels) {
        const t = share > 0 ? ((j * total) / channels - cumulative) / share : 0.5;
        const start: Point = [
          mesh.x[ed.a] + t * (mesh.x[ed.b] - mesh.x[ed.a]),
          mesh.y[ed.a] + t * (mesh.y[ed.b] - mesh.y[ed.a]),
        ];
        lines.push(trace(field, velocity, start, step, maxSteps));
        j++;
      }
      cumulative += share;
    }
  return lines;
}

/** Darcy velocity at each node (m/s): the area-weighted mean of the elements' v = −K·∇h around it. */
function nodalVelocity(field: Field, state: FlowState): Float64Array {
  const { mesh, head, material, materials } = field;
  const v = new Float64Array(mesh.x.length * 2);
  const w = new Float64Array(mesh.x.length);
  for (let e = 0; e < material.length; e++) {
    if (material[e] < 0) continue;
    const m = materials[material[e]];
    const [gx, gy] = elementGradient(mesh, head, e);
    const a = area(mesh, e);
    for (let s = 0; s < 3; s++) {
      const n = mesh.tri[3 * e + s];
      v[2 * n] -= a * m.kx * state.relative[e] * gx;
      v[2 * n + 1] -= a * m.ky * state.relative[e] * gy;
      w[n] += a;
    }
  }
  for (let n = 0; n < w.length; n++)
    if (w[n] > 0) {
      v[2 * n] /= w[n];
      v[2 * n + 1] /= w[n];
    }
  return v;
}

/**
 * Follows the velocity, interpolated linearly from the nodes, in steps of `step` metres (midpoint
 * rule on the direction) until the line leaves the pervious regions, stalls or turns back.
 */
function trace(field: Field, velocity: Float64Array, start: Point, step: number, maxSteps: number): Point[] {
  const { mesh, locator } = field;
  const dirAt = (x: number, y: number): [number, number] | null => {
    const hit = locator.find(x, y);
    if (!hit) return null;
    let vx = 0;
    let vy = 0;
    for (let s = 0; s < 3; s++) {
      const n = mesh.tri[3 * hit.element + s];
      vx += hit.w[s] * velocity[2 * n];
      vy += hit.w[s] * velocity[2 * n + 1];
    }
    const speed = Math.hypot(vx, vy);
    return speed > 0 ? [vx / speed, vy / speed] : null;
  };
  const line: Point[] = [[round(start[0]), round(start[1])]];
  let [x, y] = start;
  let last: [number, number] | null = null;
  for (let i = 0; i < maxSteps; i++) {
    const d1 = dirAt(x, y);
    if (!d1) break;
    const d2 = dirAt(x + 0.5 * step * d1[0], y + 0.5 * step * d1[1]) ?? d1;
    // Converging flow (into a drain, onto an exit) shows as the direction turning back on itself.
    if (last && d2[0] * last[0] + d2[1] * last[1] < -0.5) break;
    const nx = x + step * d2[0];
    const ny = y + step * d2[1];
    if (!locator.find(nx, ny)) {
      line.push([round(nx), round(ny)]);
      break;
    }
    [x, y] = [nx, ny];
    last = d2;
    line.push([round(x), round(y)]);
  }
  return line;
}
