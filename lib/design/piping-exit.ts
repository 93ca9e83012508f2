/**
 * Piping where water actually leaves the section. The basic parabola's gradient of 1 where the
 * top flow line enters the toe drain is a property of the construction, not an exit: water there
 * passes into a filter, whose protection rests on filter criteria, not on i_cr/i. So the drain
 * entry is left out, and the places water can leave the fill unprotected are assessed instead:
 *
 * - the downstream face above the drain: if the phreatic line stays below it, no water leaves
 *   there (the least cover is reported); if it meets the face, water seeps out down the face
 *   below that point, and at the exit the free surface runs tangent to the face, so the gradient
 *   there is sin β of the face (Casagrande 1937, "Seepage through dams"; as taught in Craig's Soil
 *   Mechanics, ch. 2 — from memory), checked against i_cr = (γsat − γw)/γw;
 * - the toe: the drain runs out to the toe, so what reaches it leaves through the drain's outlet.
 *
 * A seepage solution (flow net) would give the gradients inside the fill; until there is one this
 * is what the line alone supports.
 */
import { criticalGradient } from "@/lib/stability";
import type { XY } from "./embankment-geometry";

/** Where the line meets the downstream face, and the check there. */
export interface FaceExit {
  at: XY;
  /** Face angle β from horizontal (degrees) and the exit gradient sin β. */
  faceAngle: number;
  gradient: number;
  factor: number;
  adequate: boolean;
}

export interface PipingAtExits {
  criticalGradient: number;
  required: number;
  /** The downstream face above the drain: the line's least cover below it, or where it comes out. */
  face: { emerges: false; leastCover: number; at: XY } | { emerges: true; exit: FaceExit };
  /** One sentence each on what was assessed and what it found, for the panel. */
  findings: string[];
  /** "none": no unprotected exit; otherwise the face exit's verdict. */
  verdict: "no-unprotected-exit" | "adequate" | "not-adequate";
}

export interface ExitInput {
  /** The phreatic line across the section, x increasing. */
  line: readonly XY[];
  /** Downstream face from the crest down to the toe, x increasing. */
  downstreamFace: readonly XY[];
  /** Elevation of the drain's top, where it meets the face (m). */
  drainTop: number;
  gammaSat: number;
  gammaW?: number;
  required: number;
}

/** y of a polyline (x increasing) at x, held level beyond its ends. */
function yAt(line: readonly XY[], x: number): number {
  if (x <= line[0][0]) return line[0][1];
  for (let i = 1; i < line.length; i++) {
    const [x0, y0] = line[i - 1];
    const [x1, y1] = line[i];
    if (x <= x1) return x1 === x0 ? y1 : y0 + ((y1 - y0) * (x - x0)) / (x1 - x0);
  }
  return line[line.length - 1][1];
}

/** The face above the drain's top: its points from the crest down to the drain, x increasing. */
function faceAboveDrain(face: readonly XY[], drainTop: number): XY[] {
  const out: XY[] = [];
  for (let i = 0; i < face.length; i++) {
    const p = face[i];
    if (p[1] >= drainTop) {
      out.push(p);
      continue;
    }
    const q = face[i - 1];
    if (q && q[1] > drainTop) out.push([q[0] + ((p[0] - q[0]) * (q[1] - drainTop)) / (q[1] - p[1]), drainTop]);
    break;
  }
  return out;
}

const f2 = (v: number) => v.toFixed(2);

/** Assesses piping at the places the line shows water leaving the fill (see the module note). */
export function assessPipingExits(input: ExitInput): PipingAtExits {
  const iCr = criticalGradient(input.gammaSat, input.gammaW ?? 9.81);
  const face = faceAboveDrain(input.downstreamFace, input.drainTop);
  const lo = face[0][0];
  const hi = face[face.length - 1][0];
  const xs = [...face.map((p) => p[0]), ...input.line.map((p) => p[0]).filter((x) => x > lo && x < hi)].sort(
    (a, b) => a - b,
  );
  const cover = (x: number) => yAt(face, x) - yAt(input.line, x);
  // Both are straight between their vertices, so the least cover sits at one of them.
  let least = xs[0];
  for (const x of xs) if (cover(x) < cover(least)) least = x;
  const drainNote = "The line's entry into the toe drain is left out: a drain is protected by filter criteria.";
  const toeNote = "At the toe, seepage leaves through the drain's outlet, not through the fill.";
  if (cover(least) >= -1e-3) {
    const c = Math.max(0, cover(least));
    return {
      criticalGradient: iCr,
      required: input.required,
      face: { emerges: false, leastCover: c, at: [least, yAt(face, least)] },
      verdict: "no-unprotected-exit",
      findings: [
        "Downstream face above the drain: no water leaves it; " +
          `the line stays at least ${f2(c)} m below the face (at x = ${f2(least)} m).`,
        toeNote,
        drainNote,
      ],
    };
  }
  // The first place, from the crest down, where the line reaches the face.
  let i = 1;
  while (i < xs.length && cover(xs[i]) >= 0) i++;
  const xa = xs[i - 1];
  const xb = xs[i];
  const ca = cover(xa);
  const cb = cover(xb);
  const x = ca === cb ? xa : xa + ((xb - xa) * ca) / (ca - cb);
  const seg = face.findIndex((p, k) => k > 0 && p[0] >= x);
  const [p, q] = [face[Math.max(0, seg - 1)], face[Math.max(1, seg)]];
  const beta = Math.atan2(Math.abs(q[1] - p[1]), Math.abs(q[0] - p[0]));
  const gradient = Math.sin(beta);
  const factor = iCr / gradient;
  const exit: FaceExit = {
    at: [x, yAt(face, x)],
    faceAngle: (beta * 180) / Math.PI,
    gradient,
    factor,
    adequate: factor >= input.required,
  };
  return {
    criticalGradient: iCr,
    required: input.required,
    face: { emerges: true, exit },
    verdict: exit.adequate ? "adequate" : "not-adequate",
    findings: [
      `Downstream face above the drain: the line reaches the face at (${f2(exit.at[0])}, ${f2(exit.at[1])}) m, ` +
        "so water seeps out of the fill below that point; " +
        `there the gradient is sin β = ${gradient.toFixed(3)} of the ${exit.faceAngle.toFixed(1)}° face, ` +
        `and i_cr / i = ${factor.toFixed(2)} against the required ${input.required.toFixed(1)}.`,
      toeNote,
      drainNote,
    ],
  };
}
