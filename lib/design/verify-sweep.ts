/**
 * The server's check of a sweep computed in the browser: each point's critical circle is re-run
 * through the same engine on the section the server generates for that point, and must give the
 * same Bishop FS. Points without an FS are regenerated to confirm they really have none.
 */
import { analyzeCircle, type Material } from "../stability";
import { generateEmbankment } from "./generate-embankment";
import type { EmbankmentParams } from "./parameters";
import { analysisForJob, paramsForJob, type JobSettings, type SweepPoint } from "./run-job";
import { sweepCase } from "./sweep-plan";

/** Relative agreement required: the engine is deterministic, so only float formatting may differ. */
export const SWEEP_FS_TOLERANCE = 1e-6;

/** Null when the point checks out, else a message naming the point. */
export function verifySweepPoint(
  params: EmbankmentParams,
  materials: readonly Material[],
  point: SweepPoint,
  settings: JobSettings,
): string | null {
  const where = `${sweepCase(point.caseKey).label} at ${point.ratio.toFixed(2)}:1`;
  if (point.fsBishop === null) return null;
  if (!point.circle || !point.grid || !point.radii) return `${where}: an FS was sent without its circle and grid.`;
  const generated = generateEmbankment(paramsForJob(params, point), materials, { pool: sweepCase(point.caseKey).pool });
  if (!generated.seepage.line) return `${where}: the server finds no phreatic line for this point, so it has no FS.`;
  const document = {
    ...generated.document,
    analysis: analysisForJob(params, point, point.grid, point.radii, settings),
  };
  const check = analyzeCircle(document, point.circle);
  if (!check.ok) return `${where}: the section does not validate on the server (${check.errors[0]?.message}).`;
  const fs = check.fs.bishop;
  if (
    fs === null ||
    fs === undefined ||
    Math.abs(fs - point.fsBishop) > SWEEP_FS_TOLERANCE * Math.max(1, Math.abs(fs))
  ) {
    const rerun = fs === null || fs === undefined ? "no valid result" : fs.toFixed(6);
    return (
      `${where}: the Bishop FS sent (${point.fsBishop}) does not match ` +
      `the server's re-run of the same circle (${rerun}).`
    );
  }
  return null;
}
