import type { RunComment } from "./types";

/** Comments are numbered 1…n in the order written; the canvas markers carry the same numbers. */
export function commentLabel(c: Pick<RunComment, "pin" | "slice">, index: number): string {
  const n = `#${index + 1}`;
  if (c.pin) return `${n} at x = ${c.pin.x.toFixed(1)} m, y = ${c.pin.y.toFixed(1)} m`;
  if (c.slice) return `${n} on slice ${c.slice.number} (${c.slice.method === "bishop" ? "Bishop" : "ordinary method"})`;
  return n;
}
