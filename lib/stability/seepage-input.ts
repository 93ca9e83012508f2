/**
 * The input checks of the basic-parabola construction (seepage.ts): the two faces read from their
 * forms, the numbers in range, each problem reported with its code and the fix.
 */
import type { DownstreamFace, Point, SeepageInput, UpstreamFace } from "./seepage";

/** m: faces and levels within a millimetre count as equal (docs/engine.md §1 snapping). */
export const TOL = 1e-3;
export const HAND_DRAWN = "Draw the phreatic line by hand for this section.";

export function upstreamFacePoints(
  face: UpstreamFace,
  error: (code: string, message: string) => void,
): [Point, Point] | null {
  let toe: Point;
  let crest: Point;
  if ("points" in face) {
    if (face.points.length < 2 || !face.points.every(isPoint))
      return refuse(error, "E_SEEP_INPUT", "The upstream face needs at least two points with finite coordinates.");
    toe = face.points[0];
    crest = face.points[face.points.length - 1];
    const off = face.points.slice(1, -1).some((p) => distanceToLine(p, toe, crest) > TOL);
    if (off)
      return refuse(
        error,
        "E_SEEP_FACE_NOT_PLANE",
        `The upstream face is not one plane (berms or bends): the entry correction assumes a plane face. ${HAND_DRAWN}`,
      );
  } else if ("slopeHV" in face) {
    if (
      !isPoint(face.toe) ||
      !(face.slopeHV > 0) ||
      !Number.isFinite(face.slopeHV) ||
      !Number.isFinite(face.crestElevation)
    ) {
      return refuse(
        error,
        "E_SEEP_INPUT",
        "The upstream face needs a toe point, a positive H:V slope and a crest elevation.",
      );
    }
    toe = face.toe;
    crest = [toe[0] + face.slopeHV * (face.crestElevation - toe[1]), face.crestElevation];
  } else {
    if (!isPoint(face.toe) || !isPoint(face.crest))
      return refuse(error, "E_SEEP_INPUT", "The upstream face needs toe and crest points with finite coordinates.");
    toe = face.toe;
    crest = face.crest;
  }
  if (!(crest[1] > toe[1]) || crest[0] < toe[0]) {
    return refuse(
      error,
      "E_SEEP_FACE_DIRECTION",
      "The upstream face must rise to the right from its toe (reservoir on the left): mirror the section.",
    );
  }
  return [toe, crest];
}

export function downstreamFacePoints(
  face: DownstreamFace,
  error: (code: string, message: string) => void,
): Point[] | null {
  const points = "points" in face ? face.points : [face.crest, face.toe];
  if (points.length < 2 || !points.every(isPoint))
    return refuse(error, "E_SEEP_INPUT", "The downstream face needs at least two points with finite coordinates.");
  for (let i = 1; i < points.length; i++) {
    if (!(points[i][0] > points[i - 1][0]))
      return refuse(
        error,
        "E_SEEP_INPUT",
        `Downstream face point ${i + 1} is not right of point ${i}: list it from the crest to the toe.`,
      );
  }
  return points;
}

export function checkNumbers(input: SeepageInput, error: (code: string, message: string) => void): void {
  const finite = (v: unknown) => typeof v === "number" && Number.isFinite(v);
  if (!finite(input.baseElevation)) error("E_SEEP_INPUT", "The base elevation must be a finite number.");
  if (!finite(input.poolElevation)) error("E_SEEP_INPUT", "The pool elevation must be a finite number.");
  if (input.filterStartX !== undefined && input.filterStartX !== null && !finite(input.filterStartX))
    error("E_SEEP_INPUT", "The filter's start x must be a finite number.");
  if (!(finite(input.permeability) && input.permeability > 0))
    error("E_SEEP_INPUT", "The permeability k must be a positive number (m/s).");
  const ratio = input.anisotropyRatio ?? 1;
  if (!(finite(ratio) && ratio > 0)) error("E_SEEP_INPUT", "The anisotropy ratio kv/kh must be a positive number.");
  const gw = input.gammaW ?? 9.81;
  if (!(finite(gw) && gw >= 9.7 && gw <= 10.3)) error("E_SEEP_INPUT", "γw must lie between 9.7 and 10.3 kN/m³.");
  if (!(finite(input.gammaSat) && input.gammaSat > gw && input.gammaSat <= 30))
    error("E_SEEP_INPUT", "γsat must be above γw and at most 30 kN/m³.");
  if (input.crestLength !== undefined && !(finite(input.crestLength) && input.crestLength > 0))
    error("E_SEEP_INPUT", "The crest length must be a positive number (m).");
  const req = input.requiredPipingFactor ?? 3;
  if (!(finite(req) && req > 0)) error("E_SEEP_INPUT", "The required piping factor must be a positive number.");
  const net = input.flowNet;
  if (net && ![net.equipotentialDrops, net.lastElementLength, net.headLoss ?? 1].every((v) => finite(v) && v > 0)) {
    error("E_SEEP_INPUT", "The flow net's Nd, Δl and H must be positive numbers.");
  }
}

function refuse(error: (code: string, message: string) => void, code: string, message: string): null {
  error(code, message);
  return null;
}

function isPoint(p: unknown): p is Point {
  return Array.isArray(p) && p.length === 2 && p.every((v) => typeof v === "number" && Number.isFinite(v));
}

function distanceToLine(p: Point, a: Point, b: Point): number {
  const len = Math.hypot(b[0] - a[0], b[1] - a[1]);
  return Math.abs((b[0] - a[0]) * (p[1] - a[1]) - (b[1] - a[1]) * (p[0] - a[0])) / len;
}

export function f2(v: number): string {
  return v.toFixed(2);
}
