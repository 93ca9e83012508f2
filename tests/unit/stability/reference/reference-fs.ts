/**
 * A slow, plain reference implementation of the ordinary method of slices (Fellenius 1936,
 * classical form) and Bishop's simplified method (Bishop 1955) for one circle, written from
 * the textbook equations independently of the engine (docs/engine.md §3, §4): thin uniform
 * slices, the soil column found by cutting every region polygon with a vertical line, no strip
 * table, no break merging, no exact-arc corrections. It exists to check the engine on random
 * sections; it is far too slow for a search.
 */
import type { SectionDocument } from "@/lib/stability";

type Pt = readonly [number, number];

/** The factors of the governing piece per method (null when no piece gives one). */
export interface ReferenceResult {
  bishop: number | null;
  fellenius: number | null;
}

interface Slice {
  xm: number;
  b: number;
  W: number;
  V: number;
  u: number;
  c: number;
  tanPhi: number;
  sinA: number;
  cosA: number;
  l: number;
  /** Ponded water's push on the top (positive toward +x) and its arm yc − y about the centre. */
  Fw: number;
  armW: number;
  /** Seismic force kh·W (in the sliding direction) and its arm about the centre. */
  Hs: number;
  armS: number;
}

/** Where the vertical line at x crosses a polygon's edges, as elevations from the top down. */
function crossings(points: ReadonlyArray<Pt>, x: number): number[] {
  const ys: number[] = [];
  for (let i = 0; i < points.length; i++) {
    const [x1, y1] = points[i];
    const [x2, y2] = points[(i + 1) % points.length];
    // Half-open in x, so a vertex on the line is counted once; vertical edges never.
    if (x1 === x2 || x < Math.min(x1, x2) || x >= Math.max(x1, x2)) continue;
    ys.push(y1 + ((y2 - y1) * (x - x1)) / (x2 - x1));
  }
  return ys.sort((a, b) => b - a);
}

/** The column at x: solid layers (top, bottom, material id) from the top down. */
function column(doc: SectionDocument, x: number): { top: number; bot: number; mat: string }[] {
  const out: { top: number; bot: number; mat: string }[] = [];
  for (const r of doc.regions) {
    const ys = crossings(r.points, x);
    for (let i = 0; i + 1 < ys.length; i += 2) out.push({ top: ys[i], bot: ys[i + 1], mat: r.material });
  }
  return out.sort((a, b) => b.top - a.top);
}

function polyline(line: ReadonlyArray<Pt>, x: number): number {
  if (x <= line[0][0]) return line[0][1];
  for (let i = 0; i + 1 < line.length; i++) {
    const [x1, y1] = line[i];
    const [x2, y2] = line[i + 1];
    if (x <= x2) return y1 + ((y2 - y1) * (x - x1)) / (x2 - x1);
  }
  return line[line.length - 1][1];
}

/**
 * FS of circle (xc, yc, r) by both methods: each piece of soil above the arc (its ends found by
 * bisection) in uniform thin slices, n of them over the circle's full width.
 * The section must be valid (validateSection), steady case, Mohr–Coulomb or undrained materials.
 */
export function referenceFactors(doc: SectionDocument, xc: number, yc: number, r: number, n = 2000): ReferenceResult {
  const gw = doc.water?.gammaW ?? 9.81;
  const line = doc.water?.phreatic;
  const ru = doc.water?.ru;
  const kh = doc.loads?.kh ?? 0;
  const mats = new Map(doc.materials.map((m) => [m.id, m]));
  let xmin = Infinity;
  let xmax = -Infinity;
  for (const reg of doc.regions)
    for (const [x] of reg.points) {
      xmin = Math.min(xmin, x);
      xmax = Math.max(xmax, x);
    }
  const groundAt = (x: number) => column(doc, x)[0]?.top ?? -Infinity;
  const arc = (x: number) => yc - Math.sqrt(Math.max(0, r * r - (x - xc) ** 2));
  const above = (x: number) => x > xmin && x < xmax && groundAt(x) > arc(x);
  // Piece ends: sample the circle's width finely, plus every vertex and, on every edge, the
  // point where the arc runs parallel to it (ground − arc is concave along an edge, so a thin
  // lens cut from one edge peaks there and is not missed); then bisect each change of sign.
  const lo = xc - r;
  const step = (2 * r) / n;
  const samples: number[] = [];
  for (let i = 0; i < n; i++) samples.push(lo + (i + 0.5) * step);
  for (const reg of doc.regions)
    reg.points.forEach(([x1, y1], i) => {
      const [x2, y2] = reg.points[(i + 1) % reg.points.length];
      samples.push(x1);
      if (x1 === x2) return;
      const k = (y2 - y1) / (x2 - x1);
      const xt = xc + (k * r) / Math.sqrt(1 + k * k);
      if (xt > Math.min(x1, x2) && xt < Math.max(x1, x2)) samples.push(xt);
    });
  const pts = samples.filter((x) => x > lo && x < xc + r).sort((a, b) => a - b);
  const ends: number[] = [];
  let prevIn = above(pts[0]);
  if (prevIn) ends.push(lo);
  for (let i = 1; i < pts.length; i++) {
    const now = above(pts[i]);
    if (now !== prevIn) {
      let a = pts[i - 1];
      let b = pts[i];
      while (b - a > 1e-10) {
        const m = (a + b) / 2;
        if (above(m) === prevIn) a = m;
        else b = m;
      }
      ends.push((a + b) / 2);
      prevIn = now;
    }
  }
  if (prevIn) ends.push(xc + r);
  // Each piece in uniform thin slices, as many per metre as the whole circle has.
  const pieces: Slice[][] = [];
  for (let p = 0; p + 1 < ends.length; p += 2) {
    const [xa, xb] = [ends[p], ends[p + 1]];
    const m = Math.max(40, Math.ceil((xb - xa) / step));
    const b = (xb - xa) / m;
    const piece: Slice[] = [];
    for (let i = 0; i < m; i++) {
      const xl = xa + i * b;
      const xr = xl + b;
      // A slice whose base changes material is cut where it changes (found by bisection).
      const ml = baseMaterial(xl + 1e-9);
      if (ml === baseMaterial(xr - 1e-9)) {
        piece.push(slice(xl, xl + b / 2, b, arc(xl + b / 2)));
        continue;
      }
      let a = xl;
      let z = xr;
      while (z - a > 1e-10) {
        const mid = (a + z) / 2;
        if (baseMaterial(mid) === ml) a = mid;
        else z = mid;
      }
      const xs = (a + z) / 2;
      piece.push(slice(xl, (xl + xs) / 2, xs - xl, arc((xl + xs) / 2)));
      piece.push(slice(xs, (xs + xr) / 2, xr - xs, arc((xs + xr) / 2)));
    }
    pieces.push(piece);
  }

  function baseMaterial(x: number): string {
    const ya = arc(x);
    const col = column(doc, x);
    for (const layer of col) if (layer.bot <= ya) return layer.mat;
    return col[col.length - 1]?.mat ?? "";
  }

  function slice(xl: number, xm: number, b: number, ya: number): Slice {
    const col = column(doc, xm);
    const yw = line ? polyline(line, xm) : -Infinity;
    let w = 0;
    let wy = 0;
    let baseMat = col[col.length - 1].mat;
    for (const layer of col) {
      if (layer.top <= ya) break;
      const lo = Math.max(layer.bot, ya);
      const m = mats.get(layer.mat)!;
      const g = m.gamma ?? 0;
      const gs = m.model === "impenetrable" ? g : (m.gammaSat ?? g);
      // The part of the layer above the water line weighs γ, the part below it γsat.
      const split = Math.min(layer.top, Math.max(lo, yw));
      const dry = layer.top - split;
      const wet = split - lo;
      w += g * dry + gs * wet;
      wy += g * dry * (layer.top + split) * 0.5 + gs * wet * (split + lo) * 0.5;
      if (layer.bot <= ya) {
        baseMat = layer.mat;
        break;
      }
    }
    const W = w * b;
    const yg = col[0].top;
    // Ponded water: its weight on the slice top and its push on the sloping top surface.
    const ygL = groundAt(xl + 1e-9);
    const ygR = groundAt(xl + b - 1e-9);
    const depth = Math.max(0, yw - yg);
    const Ww = gw * depth * b;
    const Fw = gw * depth * (ygR - ygL);
    let Q = 0;
    for (const s of doc.loads?.surcharges ?? []) Q += s.q * Math.max(0, Math.min(xl + b, s.x2) - Math.max(xl, s.x1));
    const m = mats.get(baseMat)!;
    let c = 0;
    let tanPhi = 0;
    let u = 0;
    if (m.model === "undrained") {
      c = m.su + (m.suGradient ?? 0) * Math.max(0, (m.suDatum ?? 0) - ya);
    } else if (m.model === "mohr-coulomb") {
      c = m.c;
      tanPhi = Math.tan((m.phi * Math.PI) / 180);
      if (line) u = gw * Math.max(0, yw - ya);
      else if (ru !== undefined) u = (ru * W) / b;
    }
    const sinA = (xc - xm) / r;
    const cosA = (yc - ya) / r;
    const Hs = kh * W;
    return {
      xm,
      b,
      W,
      V: W + Ww + Q,
      u,
      c,
      tanPhi,
      sinA,
      cosA,
      l: b / cosA,
      Fw,
      armW: yc - yg,
      Hs,
      armS: w > 0 ? yc - wy / w : 0,
    };
  }

  let bishop: number | null = null;
  let fellenius: number | null = null;
  for (const piece of pieces) {
    const ya = (s: Slice) => yc - s.cosA * r;
    const left = piece[0];
    const right = piece[piece.length - 1];
    const dy = ya(right) - ya(left);
    // Ends within 1 µm are level (docs/engine.md §3): tried both ways.
    const dirs = Math.abs(dy) <= 1e-6 ? [1, -1] : [dy < 0 ? 1 : -1];
    for (const dir of dirs) {
      const f = pieceFactors(piece, dir, r);
      if (f.fellenius !== null && (fellenius === null || f.fellenius < fellenius)) fellenius = f.fellenius;
      if (f.bishop !== null && (bishop === null || f.bishop < bishop)) bishop = f.bishop;
    }
  }
  return { bishop, fellenius };
}

/** Both methods on one piece sliding toward +x (dir 1) or −x (dir −1). */
function pieceFactors(piece: Slice[], dir: number, r: number): ReferenceResult {
  let D = 0;
  let res = 0;
  for (const s of piece) {
    const sin = dir * s.sinA;
    D += s.V * sin + (dir * s.Fw * s.armW + s.Hs * s.armS) / r;
    if (s.tanPhi === 0) {
      res += s.c * s.l;
      continue;
    }
    // Classical ordinary method: every force but the base forces, resolved normal to the base.
    const N = s.V * s.cosA - (dir * s.Fw + s.Hs) * sin - s.u * s.l;
    res += s.c * s.l + Math.max(0, N) * s.tanPhi;
  }
  if (!(D > 0) || res > 1e4 * D) return { bishop: null, fellenius: null };
  const fellenius = res / D;
  let F = fellenius > 0 ? fellenius : 1;
  for (let it = 0; it < 2000; it++) {
    let sum = 0;
    for (const s of piece) {
      const sin = dir * s.sinA;
      if (s.tanPhi === 0) {
        sum += s.c * s.l;
        continue;
      }
      const ma = s.cosA + (sin * s.tanPhi) / F;
      const N = (s.V - s.u * s.b - (s.c * s.b * sin) / (s.cosA * F)) / ma;
      sum += N < 0 ? s.c * s.l : (s.c * s.b + (s.V - s.u * s.b) * s.tanPhi) / ma;
    }
    const Fn = sum / D;
    if (Math.abs(Fn - F) < 1e-13 * Fn) {
      F = Fn;
      break;
    }
    F = 0.5 * (F + Fn);
  }
  const minMa = Math.min(...piece.map((s) => s.cosA + (dir * s.sinA * s.tanPhi) / F));
  return { bishop: minMa > 0 ? F : null, fellenius };
}
