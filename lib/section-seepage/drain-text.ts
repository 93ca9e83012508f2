/**
 * Drains typed as text: one drain per line, its points as "x y" pairs separated by semicolons,
 * e.g. "108 6; 128 6". The numbers are metres; a decimal comma is refused with the fix.
 */
import { parseDecimal } from "@/lib/section-io";

type Point = [number, number];

export function drainsToText(drains: readonly Point[][]): string {
  return drains.map((d) => d.map(([x, y]) => `${x} ${y}`).join("; ")).join("\n");
}

export type DrainTextOutcome = { ok: true; drains: Point[][] } | { ok: false; problems: string[] };

export function drainsFromText(text: string): DrainTextOutcome {
  const problems: string[] = [];
  const drains: Point[][] = [];
  const lines = text.split(/\r?\n/).filter((l) => l.trim() !== "");
  lines.forEach((line, i) => {
    const points: Point[] = [];
    const before = problems.length;
    line.split(";").forEach((pair, j) => {
      const parts = pair.trim().split(/\s+/).filter(Boolean);
      const where = `Drain ${i + 1}, point ${j + 1}`;
      if (parts.length !== 2) {
        problems.push(`${where}: write x and y separated by a space ("108 6"), got "${pair.trim()}".`);
        return;
      }
      const [x, y] = parts.map(parseDecimal);
      if (!x.ok || !y.ok) {
        problems.push(`${where}: ${!x.ok ? x.message : ""}${!x.ok && !y.ok ? " " : ""}${!y.ok ? y.message : ""}`);
        return;
      }
      points.push([x.value, y.value]);
    });
    if (problems.length === before && points.length === 1)
      problems.push(`Drain ${i + 1}: a drain needs at least 2 points.`);
    drains.push(points);
  });
  return problems.length > 0 ? { ok: false, problems } : { ok: true, drains };
}
