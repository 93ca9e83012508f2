/**
 * How a sweep's preview (the browser's points, or one kept point) compares with the server's own
 * search of the same jobs. The server's values are what a study or a run keeps; these lists say
 * where the preview differed (beyond the tolerance of lib/runs/record/compare-preview.ts).
 */
import type { GridSearchSuccess } from "@/lib/stability";
import { DifferenceList, MISSING, type PreviewCheck } from "@/lib/runs/record/compare-preview";
import type { SweepPoint } from "./run-job";

function comparePoint(d: DifferenceList, sent: SweepPoint, server: SweepPoint): void {
  const at = `points.${server.id}`;
  d.number(`${at}.fsBishop`, sent.fsBishop, server.fsBishop);
  d.number(`${at}.fsOrdinary`, sent.fsOrdinary, server.fsOrdinary);
  d.number(`${at}.circle.xc`, sent.circle?.xc, server.circle?.xc);
  d.number(`${at}.circle.yc`, sent.circle?.yc, server.circle?.yc);
  d.number(`${at}.circle.r`, sent.circle?.r, server.circle?.r);
  if ((sent.error === null) !== (server.error === null))
    d.add(`${at}.error`, sent.error ?? MISSING, server.error ?? MISSING);
}

/** Point by point, by job id: values that differ, points the browser left out or added. */
export function compareSweepPoints(
  sent: { points: readonly SweepPoint[]; engineVersion: string },
  server: { points: readonly SweepPoint[]; engineVersion: string },
): PreviewCheck {
  const d = new DifferenceList();
  if (sent.engineVersion !== server.engineVersion) d.add("engineVersion", sent.engineVersion, server.engineVersion);
  const byId = new Map(sent.points.map((p) => [p.id, p]));
  for (const point of server.points) {
    const mine = byId.get(point.id);
    if (!mine) d.add(`points.${point.id}`, MISSING, point.fsBishop === null ? "no FS" : `FS ${point.fsBishop}`);
    else comparePoint(d, mine, point);
    byId.delete(point.id);
  }
  for (const id of byId.keys()) d.add(`points.${id}`, "a point", `${MISSING} (not a job of this sweep)`);
  return d.check("browser");
}

/** A kept sweep point against the server's search of the same section and grid, when it is opened as a run. */
export function compareKeptPoint(point: SweepPoint, server: GridSearchSuccess): PreviewCheck {
  const d = new DifferenceList();
  d.number("results.bishop.fs", point.fsBishop, server.results.bishop?.fs);
  d.number("results.fellenius.fs", point.fsOrdinary, server.results.fellenius?.fs);
  d.number("results.bishop.circle.xc", point.circle?.xc, server.results.bishop?.circle.xc);
  d.number("results.bishop.circle.yc", point.circle?.yc, server.results.bishop?.circle.yc);
  d.number("results.bishop.circle.r", point.circle?.r, server.results.bishop?.circle.r);
  return d.check("sweep");
}
