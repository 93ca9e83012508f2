/** Problems in the input as { code, path, message }, with paths that read like `regions[2].points[4]`. */
import type { z } from "zod";
import type { SeepageIssue } from "./types";

export function issue(code: string, path: string, message: string): SeepageIssue {
  return { code, path, message };
}

/** `["regions", 2, "points"]` → `regions[2].points`. */
export function joinPath(parts: ReadonlyArray<PropertyKey>): string {
  let out = "";
  for (const p of parts) {
    if (typeof p === "number") out += `[${p}]`;
    else out += out === "" ? String(p) : `.${String(p)}`;
  }
  return out;
}

/** zod's issues in the same form; a missing key says so plainly. */
export function fromZod(issues: ReadonlyArray<z.core.$ZodIssue>): SeepageIssue[] {
  return issues.map((zi) => {
    const path = joinPath(zi.path);
    const where = path === "" ? "The document" : path;
    if (zi.code === "invalid_type" && /received undefined/.test(zi.message)) {
      return issue("missing-key", path, `${where} is missing.`);
    }
    return issue(zi.code === "invalid_type" ? "wrong-type" : "invalid-value", path, `${where}: ${zi.message}.`);
  });
}

/** A point as "(12.0, 4.5)" in messages. */
export function fmt(p: readonly [number, number]): string {
  return `(${round(p[0])}, ${round(p[1])})`;
}

function round(v: number): string {
  return String(Math.round(v * 1000) / 1000);
}
