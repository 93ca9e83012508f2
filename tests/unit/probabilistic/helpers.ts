/** Shared helpers for the probabilistic engine tests. */
import { readFileSync } from "node:fs";
import path from "node:path";
import { analyzeCircle, type Circle, type CircleSuccess } from "@/lib/stability";
import { runProbabilistic, type ProbabilisticSuccess } from "@/lib/stability/probabilistic";

export type Doc = Record<string, unknown> & {
  materials: (Record<string, unknown> & { vary?: Record<string, unknown> })[];
  analysis: Record<string, unknown> & { probabilistic: Record<string, unknown> };
};

export const FIXTURE_DIR = path.resolve(__dirname, "fixtures");

/** Reads a fixture from tests/unit/probabilistic/fixtures as a fresh copy. */
export function loadDoc(name: string): Doc {
  return JSON.parse(readFileSync(path.join(FIXTURE_DIR, name), "utf8")) as Doc;
}

/** The same document with other probabilistic settings. */
export function withSettings(doc: Doc, settings: Record<string, unknown>): Doc {
  const d = JSON.parse(JSON.stringify(doc)) as Doc;
  d.analysis.probabilistic = { ...d.analysis.probabilistic, ...settings };
  return d;
}

/** Runs a probabilistic analysis that must succeed. */
export function run(doc: unknown): ProbabilisticSuccess {
  const r = runProbabilistic(doc);
  if (!r.ok) throw new Error(`probabilistic run failed: ${JSON.stringify(r.errors)}`);
  return r;
}

/** One circle by the engine's own slice report; must succeed. */
export function sliceReport(doc: unknown, c: Circle): CircleSuccess {
  const r = analyzeCircle(doc, c);
  if (!r.ok) throw new Error(`circle failed: ${JSON.stringify(r.errors)}`);
  return r;
}

/** Binomial standard error of a share p estimated from n samples. */
export function binomialSe(p: number, n: number): number {
  return Math.sqrt((p * (1 - p)) / n);
}
