/**
 * The server's check of a result computed in the browser: each method's critical circle is
 * re-run through the same engine and must give the same FS. The slice tables that are stored
 * come from this server run, never from the client.
 */
import { analyzeCircle, ENGINE_VERSION, type SectionDocument, type SliceRow } from "../stability";
import type { StoredSearchResult } from "./result-schema";

/** Relative agreement required; the engine is deterministic, so only float formatting may differ. */
export const FS_TOLERANCE = 1e-6;

export interface VerifiedCircle {
  method: "bishop" | "fellenius";
  fs: number;
  slices: SliceRow[];
  minMAlpha: number | null;
}

export type VerifyOutcome = { ok: true; circles: VerifiedCircle[] } | { ok: false; message: string; field: string };

export function verifyCriticalCircles(doc: SectionDocument, result: StoredSearchResult): VerifyOutcome {
  if (result.engineVersion !== ENGINE_VERSION) {
    return {
      ok: false,
      field: "result.engineVersion",
      message: `The result came from engine ${result.engineVersion}; this server runs ${ENGINE_VERSION}. Run the search again.`,
    };
  }
  const circles: VerifiedCircle[] = [];
  for (const method of result.methods) {
    const claimed = result.results[method];
    if (!claimed) continue;
    const check = analyzeCircle(doc, claimed.circle);
    if (!check.ok)
      return {
        ok: false,
        field: `result.results.${method}`,
        message: `The section does not validate: ${check.errors[0]?.message}`,
      };
    const fs = check.fs[method];
    if (fs === null || Math.abs(fs - claimed.fs) > FS_TOLERANCE * Math.max(1, Math.abs(fs))) {
      return {
        ok: false,
        field: `result.results.${method}.fs`,
        message: `The ${method === "bishop" ? "Bishop" : "ordinary-method"} FS sent (${claimed.fs}) does not match the server's re-run of the same circle (${fs === null ? "no valid result" : fs.toFixed(6)}). Nothing was saved.`,
      };
    }
    circles.push({ method, fs, slices: check.slices, minMAlpha: check.minMAlpha ?? null });
  }
  if (circles.length === 0)
    return {
      ok: false,
      field: "result.results",
      message: "The search found no valid circle; there is nothing to save.",
    };
  return { ok: true, circles };
}
