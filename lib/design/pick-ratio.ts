/**
 * Reading the sweep: n* for each face and case is the smallest H:V ratio for which FS ≥ FSreq
 * at n and at every larger n tried (docs/engine.md §9), so a lucky dip below a failing ratio is never
 * recommended. Each face takes the flattest n* of its cases; the pair is then rechecked.
 */
import type { SweepPoint } from "./run-job";
import { SWEEP_CASES, type DesignFace, type SweepCaseKey } from "./sweep-plan";

export type RequiredFs = Record<SweepCaseKey, number>;

/**
 * The steepest passing ratio of one case's points, or null when the flattest ratio tried fails
 * (or no point has a result). A point without an FS counts as failing.
 */
export function steepestPassingRatio(
  points: readonly { ratio: number; fs: number | null }[],
  required: number,
): number | null {
  const sorted = [...points].sort((a, b) => a.ratio - b.ratio);
  let answer: number | null = null;
  for (let i = sorted.length - 1; i >= 0; i--) {
    const fs = sorted[i].fs;
    if (fs === null || !(fs >= required)) break;
    answer = sorted[i].ratio;
  }
  return answer;
}

export interface CaseReading {
  caseKey: SweepCaseKey;
  face: DesignFace;
  required: number;
  /** n* of this case, or null when no ratio in the range passes from there on. */
  steepest: number | null;
  /** The case's sweep points, flattest last. */
  points: SweepPoint[];
}

export interface FaceChoice {
  face: DesignFace;
  /** The flattest n* among the face's cases (null when any case has none in the range). */
  ratio: number | null;
  governing: SweepCaseKey | null;
  /** Fill area (m³/m) at this face's ratio with the other face as entered. */
  fillArea: number | null;
}

export interface SweepReading {
  cases: CaseReading[];
  faces: Record<DesignFace, FaceChoice>;
  pair: { upstream: number; downstream: number } | null;
}

/** Reads the sweep's points against the required FS of each case. */
export function readSweep(points: readonly SweepPoint[], required: RequiredFs): SweepReading {
  const sweep = points.filter((p) => p.phase === "sweep");
  const cases: CaseReading[] = SWEEP_CASES.map((c) => {
    const own = sweep.filter((p) => p.caseKey === c.key).sort((a, b) => a.ratio - b.ratio);
    return {
      caseKey: c.key,
      face: c.face,
      required: required[c.key],
      steepest: own.length
        ? steepestPassingRatio(
            // A minimum still on the grid's edge is not a settled FS: it cannot count as passing.
            own.map((p) => ({ ratio: p.ratio, fs: p.gridEdge ? null : p.fsBishop })),
            required[c.key],
          )
        : null,
      points: own,
    };
  });
  const faceChoice = (face: DesignFace): FaceChoice => {
    const own = cases.filter((c) => c.face === face);
    if (own.some((c) => c.steepest === null)) {
      return { face, ratio: null, governing: own.find((c) => c.steepest === null)?.caseKey ?? null, fillArea: null };
    }
    const governing = own.reduce((a, b) => ((b.steepest as number) > (a.steepest as number) ? b : a));
    const ratio = governing.steepest as number;
    const at = governing.points.find((p) => p.ratio === ratio);
    return { face, ratio, governing: governing.caseKey, fillArea: at?.fillArea ?? null };
  };
  const faces = { upstream: faceChoice("upstream"), downstream: faceChoice("downstream") };
  const pair =
    faces.upstream.ratio !== null && faces.downstream.ratio !== null
      ? { upstream: faces.upstream.ratio, downstream: faces.downstream.ratio }
      : null;
  return { cases, faces, pair };
}

/** Whether every recheck point of the pair meets its required FS; null until all have run. */
export function recheckPasses(
  points: readonly SweepPoint[],
  pair: { upstream: number; downstream: number },
  required: RequiredFs,
): boolean | null {
  const own = points.filter(
    (p) => p.phase === "recheck" && p.upstreamRatio === pair.upstream && p.downstreamRatio === pair.downstream,
  );
  if (own.length < SWEEP_CASES.length) return null;
  return own.every((p) => p.fsBishop !== null && p.fsBishop >= required[p.caseKey]);
}
