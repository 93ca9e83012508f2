/**
 * Result shapes shared by the grid search and the one-circle report (docs/engine-io.md
 * "Output"). Plain JSON: numbers, arrays, null; never NaN or Infinity.
 */
import type { AnalysisMethod } from "./schema";
import type { XY } from "./rigorous-types";
import type { EngineWarning, Issue } from "./issues";
import { arcY, evaluateCircle } from "./evaluate-circle";
import type { PreparedSection } from "./prepare";
import type { Scratch } from "./scratch";
import { stageSummary, type StageFs } from "./drawdown/staged-report";
import { describeRigorousCircle } from "./rigorous-circle";

/** A trial circle: centre (xc, yc) and radius r, m. */
export interface Circle {
  xc: number;
  yc: number;
  r: number;
}

/** A method's critical (or one of its lowest) circle: FS, circle, entry (upslope end) and exit (toe), m. */
export interface CircleFs {
  fs: number;
  circle: Circle;
  entry: [number, number];
  exit: [number, number];
  /** Direction the mass slides: "right" toward +x, "left" toward −x. */
  direction: "left" | "right";
  /** Staged drawdown only (docs/engine.md §7(b)): this method's FS at each stage; `fs` is the final one. */
  stages?: StageFs;
  /** Spencer and Morgenstern–Price only: λ of the interslice force function at this surface. */
  lambda?: number;
  /** A surfaces search only (docs/engine-io.md): the slip surface, [x, y] (m), x increasing. */
  surface?: XY[];
}

/** Minimum FS over radii at every centre, row by row: values[iy·nx + ix], null where no circle was valid. */
export interface FsMap {
  nx: number;
  ny: number;
  xs: number[];
  ys: number[];
  values: (number | null)[];
}

/** Failure of a run on bad input (docs/engine-io.md "Errors"). */
export interface EngineFailure {
  ok: false;
  errors: Issue[];
  warnings: Issue[];
}

export type MethodRecord<T> = Partial<Record<AnalysisMethod, T>>;

/** Replaces NaN and ±Infinity by null for JSON output. */
export function finiteOrNull(v: number): number | null {
  return Number.isFinite(v) ? v : null;
}

/**
 * Entry and exit of the governing mass of a method for a circle, found by re-evaluating it.
 * Returns null if the circle turns out invalid for that method.
 */
export function describeCircle(P: PreparedSection, S: Scratch, c: Circle, method: AnalysisMethod): CircleFs | null {
  if (method === "spencer" || method === "morgenstern-price") return describeRigorousCircle(P, S, c, method);
  evaluateCircle(P, S, c.xc, c.yc, c.r, true);
  const fs = method === "bishop" ? S.fsB : S.fsO;
  const m = method === "bishop" ? S.govB : S.govO;
  if (!Number.isFinite(fs) || m < 0) return null;
  const xa = S.massA[m];
  const xb = S.massB[m];
  const a: [number, number] = [xa, arcY(c.xc, c.yc, c.r, xa)];
  const b: [number, number] = [xb, arcY(c.xc, c.yc, c.r, xb)];
  const right = (method === "bishop" ? S.dirB : S.dirO) >= 0;
  const out: CircleFs = {
    fs,
    circle: { ...c },
    entry: right ? a : b,
    exit: right ? b : a,
    direction: right ? "right" : "left",
  };
  if (P.staged !== null) out.stages = stageSummary(method === "bishop" ? S.stage.govB : S.stage.govO);
  return out;
}

/** Converts validation issues to result warnings. */
export function issuesToWarnings(issues: ReadonlyArray<Issue>): EngineWarning[] {
  return issues.map((i) => ({ code: i.code, message: i.message }));
}
