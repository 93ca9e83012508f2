/**
 * Reads the `path` of a validation issue (`regions[2].points[4]`, `water.phreatic[1]`,
 * `materials[0].phi`) into what the editor can select.
 */
import type { Issue } from "@/lib/stability";

export type IssueTarget =
  | { kind: "region"; region: number; vertex: number | null }
  | { kind: "phreatic"; vertex: number | null }
  | { kind: "material"; material: number }
  | { kind: "other" };

const REGION = /^regions\[(\d+)\](?:\.points(?:\[(\d+)\])?)?/;
const PHREATIC = /^water\.phreatic(?:\[(\d+)\])?/;
const MATERIAL = /^materials\[(\d+)\]/;

export function parseIssuePath(path: string): IssueTarget {
  const region = REGION.exec(path);
  if (region)
    return { kind: "region", region: Number(region[1]), vertex: region[2] !== undefined ? Number(region[2]) : null };
  const phreatic = PHREATIC.exec(path);
  if (phreatic) return { kind: "phreatic", vertex: phreatic[1] !== undefined ? Number(phreatic[1]) : null };
  const material = MATERIAL.exec(path);
  if (material) return { kind: "material", material: Number(material[1]) };
  return { kind: "other" };
}

/** A validation issue as the editor lists it; without a severity it counts as an error. */
export type EditorIssue = Issue & { severity?: "error" | "warning" };

/** Errors then warnings from validateSection's result, tagged for the editor's list. */
export function collectIssues(result: { errors?: readonly Issue[]; warnings: readonly Issue[] }): EditorIssue[] {
  return [
    ...(result.errors ?? []).map((i): EditorIssue => ({ ...i, severity: "error" })),
    ...result.warnings.map((i): EditorIssue => ({ ...i, severity: "warning" })),
  ];
}
