/**
 * What a solved flow field reports (docs/seepage.md §4): the flow in and out, the phreatic
 * surface, heads at probes, exit gradients with their piping factors and the uplift under
 * structures. Heads in m, pressures in kPa, flows in m³/s per metre of section.
 */
import { FACE, POOL, DRAIN, type Boundary } from "./boundary";
import { elementGradient } from "./elements";
import { reactions, type FlowState } from "./free-surface";
import type { Locator } from "./locate";
import type { ExitGradient, FlowMaterial, Point, TriMesh, Uplift } from "./types";

export interface Field {
  mesh: TriMesh;
  head: Float64Array;
  /** Material index of each element, −1 where impenetrable. */
  material: Int32Array;
  materials: FlowMaterial[];
  locator: Locator;
  gammaW: number;
}

/** Inflow and outflow summed over the prescribed nodes, and each node's net inflow. */
export function flows(state: FlowState): { qIn: number; qOut: number; nodal: Float64Array } {
  const nodal = new Float64Array(state.head.length);
  reactions(state.pattern, state.values, state.head, state.fixed, nodal);
  let qIn = 0;
  let qOut = 0;
  for (const r of nodal) {
    if (r > 0) qIn += r;
    else qOut -= r;
  }
  return { qIn, qOut, nodal };
}

/** Total head at a point (m), or null outside the pervious regions. */
export function headAt(field: Field, x: number, y: number): number | null {
  const hit = field.locator.find(x, y);
  if (!hit) return null;
  const t = field.mesh.tri;
  const e = hit.element;
  return hit.w[0] * field.head[t[3 * e]] + hit.w[1] * field.head[t[3 * e + 1]] + hit.w[2] * field.head[t[3 * e + 2]];
}

/**
 * The phreatic surface as one line across the section: at each station the highest point where
 * the pressure changes from positive below to negative above; where the whole column is
 * saturated, the head at its top (so a pool's level where it stands on the ground).
 */
export function phreaticLine(field: Field, step: number): Point[] {
  const { mesh, head, material } = field;
  let x0 = Infinity;
  let x1 = -Infinity;
  for (let e = 0; e < material.length; e++)
    if (material[e] >= 0)
      for (let s = 0; s < 3; s++) {
        x0 = Math.min(x0, mesh.x[mesh.tri[3 * e + s]]);
        x1 = Math.max(x1, mesh.x[mesh.tri[3 * e + s]]);
      }
  const stations = Math.max(2, Math.ceil((x1 - x0) / step) + 1);
  const columns = columnIndex(field, x0, x1, stations);
  const out: Point[] = [];
  for (let k = 0; k < stations; k++) {
    const x = x0 + ((x1 - x0) * k) / (stations - 1);
    let best = -Infinity;
    let top = -Infinity;
    let topHead = NaN;
    let bottom = Infinity;
    let bottomHead = NaN;
    for (const e of columns[k]) {
      const seg = verticalCut(mesh, head, e, x);
      if (!seg) continue;
      const [ya, ha, yb, hb] = seg;
      const pa = ha - ya;
      const pb = hb - yb;
      if (pa >= 0 && pb < 0) best = Math.max(best, ya + (pa / (pa - pb)) * (yb - ya));
      if (yb > top) [top, topHead] = [yb, hb];
      if (ya < bottom) [bottom, bottomHead] = [ya, ha];
    }
    let y = best;
    if (!Number.isFinite(y)) y = topHead >= top ? topHead : bottomHead;
    if (Number.isFinite(y)) out.push([round(x), round(y)]);
  }
  return simplify(out);
}

/** For each station, the elements whose x-range holds it. */
function columnIndex(field: Field, x0: number, x1: number, stations: number): number[][] {
  const { mesh, material } = field;
  const cols: number[][] = Array.from({ length: stations }, () => []);
  const dx = (x1 - x0) / (stations - 1);
  for (let e = 0; e < material.length; e++) {
    if (material[e] < 0) continue;
    const t = mesh.tri.subarray(3 * e, 3 * e + 3);
    const a = Math.min(mesh.x[t[0]], mesh.x[t[1]], mesh.x[t[2]]);
    const b = Math.max(mesh.x[t[0]], mesh.x[t[1]], mesh.x[t[2]]);
    for (let k = Math.max(0, Math.ceil((a - x0) / dx - 1e-9)); k <= Math.min(stations - 1, (b - x0) / dx + 1e-9); k++)
      cols[k].push(e);
  }
  return cols;
}

/** Where the vertical line at x cuts element e: [y low, head there, y high, head there], or null. */
function verticalCut(mesh: TriMesh, head: Float64Array, e: number, x: number): [number, number, number, number] | null {
  const ys: number[] = [];
  const hs: number[] = [];
  for (let s = 0; s < 3; s++) {
    const a = mesh.tri[3 * e + s];
    const b = mesh.tri[3 * e + ((s + 1) % 3)];
    const xa = mesh.x[a];
    const xb = mesh.x[b];
    if (xa === xb) continue;
    const t = (x - xa) / (xb - xa);
    if (t < -1e-12 || t > 1 + 1e-12) continue;
    ys.push(mesh.y[a] + t * (mesh.y[b] - mesh.y[a]));
    hs.push(head[a] + t * (head[b] - head[a]));
  }
  if (ys.length < 2) return null;
  let lo = 0;
  let hi = 0;
  for (let i = 1; i < ys.length; i++) {
    if (ys[i] < ys[lo]) lo = i;
    if (ys[i] > ys[hi]) hi = i;
  }
  return [ys[lo], hs[lo], ys[hi], hs[hi]];
}

function simplify(line: Point[]): Point[] {
  if (line.length < 3) return line;
  const out: Point[] = [line[0]];
  for (let i = 1; i < line.length - 1; i++) {
    const a = out[out.length - 1];
    const b = line[i];
    const c = line[i + 1];
    const cross = (b[0] - a[0]) * (c[1] - a[1]) - (b[1] - a[1]) * (c[0] - a[0]);
    if (Math.abs(cross) > 1e-6 * Math.hypot(c[0] - a[0], c[1] - a[1])) out.push(b);
  }
  out.push(line[line.length - 1]);
  return out;
}

/**
 * Stretches of the ground or sides where water leaves the section (edges with a prescribed,
 * outflowing node at either end, so a lone exit node at a toe still counts), each with its
 * largest element gradient |∇h| and the factor against piping i_cr / i, where
 * i_cr = (γsat − γw)/γw of the material there.
 */
export function exitGradients(field: Field, bc: Boundary, state: FlowState, nodal: Float64Array): ExitGradient[] {
  const { mesh, head, gammaW } = field;
  const leaving = (v: number) =>
    state.fixed[v] === 1 && nodal[v] < 0 && (bc.kind[v] === FACE || bc.kind[v] === POOL || bc.kind[v] === DRAIN);
  const exitEdges = bc.edges.filter((ed) => ed.open && (leaving(ed.a) || leaving(ed.b)));
  // Join edges that share a node into stretches (union–find over nodes).
  const parent = new Map<number, number>();
  const root = (v: number): number => {
    let r = v;
    while (parent.get(r) !== r) r = parent.get(r) as number;
    parent.set(v, r);
    return r;
  };
  for (const ed of exitEdges) {
    if (!parent.has(ed.a)) parent.set(ed.a, ed.a);
    if (!parent.has(ed.b)) parent.set(ed.b, ed.b);
    parent.set(root(ed.a), root(ed.b));
  }
  const groups = new Map<number, typeof exitEdges>();
  for (const ed of exitEdges) {
    const r = root(ed.a);
    const list = groups.get(r);
    if (list) list.push(ed);
    else groups.set(r, [ed]);
  }
  const out: ExitGradient[] = [];
  for (const list of groups.values()) {
    let best = list[0];
    let bestI = -1;
    const uses = new Map<number, number>();
    for (const ed of list) {
      const [gx, gy] = elementGradient(mesh, head, ed.element);
      const i = Math.hypot(gx, gy);
      if (i > bestI) [bestI, best] = [i, ed];
      for (const v of [ed.a, ed.b]) uses.set(v, (uses.get(v) ?? 0) + 1);
    }
    // The stretch's two ends are the nodes used by one edge only.
    const ends = [...uses].filter(([, c]) => c === 1).map(([v]) => v);
    if (ends.length < 2) ends.splice(0, ends.length, list[0].a, list[0].b);
    const [from, to] = ends
      .map((v): Point => [round(mesh.x[v]), round(mesh.y[v])])
      .sort((p, q) => p[0] - q[0] || p[1] - q[1]);
    const mat = field.materials[field.material[best.element]];
    const iCritical = mat.gammaSat === null ? null : (mat.gammaSat - gammaW) / gammaW;
    out.push({
      x: round((mesh.x[best.a] + mesh.x[best.b]) / 2),
      y: round((mesh.y[best.a] + mesh.y[best.b]) / 2),
      i: sig(bestI),
      from,
      to,
      material: mat.id,
      iCritical: iCritical === null ? null : sig(iCritical),
      pipingFactor: iCritical === null || bestI === 0 ? null : sig(iCritical / bestI),
    });
  }
  return out.sort((a, b) => a.x - b.x);
}

/** Water pressure on the underside of each impenetrable region that rests on pervious soil. */
export function upliftUnder(field: Field, bc: Boundary, regionOf: Int32Array): Uplift[] {
  const { mesh, head, gammaW } = field;
  const byRegion = new Map<number, [number, number][]>();
  for (const ed of bc.edges) {
    if (ed.open || ed.against < 0) continue;
    // Underside: the structure lies above the soil, so the soil's outward normal points up (x falls a→b).
    if (!(mesh.x[ed.b] < mesh.x[ed.a])) continue;
    const r = regionOf[ed.against];
    const list = byRegion.get(r);
    if (list) list.push([ed.b, ed.a]);
    else byRegion.set(r, [[ed.b, ed.a]]);
  }
  const out: Uplift[] = [];
  for (const [region, list] of byRegion) {
    const p = (v: number) => Math.max(0, gammaW * (head[v] - mesh.y[v]));
    list.sort((s, t) => mesh.x[s[0]] - mesh.x[t[0]]);
    let force = 0;
    const pts: [number, number, number][] = [];
    for (const [a, b] of list) {
      force += ((p(a) + p(b)) / 2) * (mesh.x[b] - mesh.x[a]);
      if (pts.length === 0) pts.push([round(mesh.x[a]), round(mesh.y[a]), sig(p(a))]);
      pts.push([round(mesh.x[b]), round(mesh.y[b]), sig(p(b))]);
    }
    out.push({ region, points: pts, force: sig(force) });
  }
  return out.sort((a, b) => a.region - b.region);
}

/** Millimetre rounding for coordinates in the output. */
export function round(v: number): number {
  return Math.round(v * 1000) / 1000;
}

/** Six significant figures for computed values in the output. */
export function sig(v: number): number {
  return v === 0 ? 0 : Number(v.toPrecision(6));
}
