/**
 * Keeping a sweep that ran in the browser: the server runs the whole sweep again from the same
 * settings (worker threads, lib/design/thread-sweep.ts), keeps its own points, and says where the
 * browser's differed. A point without an FS, or with a doctored one, is thereby never kept as sent.
 */
import { ENGINE_VERSION, type Material } from "../stability";
import type { EmbankmentParams } from "./parameters";
import type { RequiredFs } from "./pick-ratio";
import type { StoredSweep } from "./sweep-results";
import { runSweepOnServer } from "./thread-sweep";
import { compareSweepPoints } from "./compare-sweep";
import type { PreviewCheck } from "../run-records/compare-preview";

export interface KeptSweep {
  sweep: StoredSweep;
  check: PreviewCheck;
}

/** The sweep to store (the server's points) and the comparison; null when the request went away. */
export async function recomputeBrowserSweep(o: {
  params: EmbankmentParams;
  materials: Material[];
  required: RequiredFs;
  sent: StoredSweep;
  isCancelled?: () => boolean;
}): Promise<KeptSweep | null> {
  const out = await runSweepOnServer({
    params: o.params,
    materials: o.materials,
    settings: o.sent.settings,
    required: o.required,
    isCancelled: o.isCancelled,
  });
  if (out.cancelled) return null;
  const check = compareSweepPoints(o.sent, { points: out.points, engineVersion: ENGINE_VERSION });
  return { sweep: { ...o.sent, points: out.points, engineVersion: ENGINE_VERSION }, check };
}
