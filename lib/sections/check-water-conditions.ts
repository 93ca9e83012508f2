/**
 * Checks a section's named water conditions before it is stored: their shape, one usual water
 * per loading condition, no reservoir in a construction water, a drawdown's lowered pool, and
 * each water block by the engine's own rules (reported at waterConditions[i].water…).
 */
import { z } from "zod";
import { validateSection, type Issue, type SectionDocument } from "@/lib/stability";
import { loadingCondition } from "@/lib/analysis/required-fs";
import { poolBefore, poolLevels, waterConditionSchema, withWater, type WaterCondition } from "./water-conditions";

const listSchema = z.array(waterConditionSchema).max(20, "At most 20 water conditions per section.");

function joinPath(parts: ReadonlyArray<PropertyKey>): string {
  return parts.map((p) => (typeof p === "number" ? `[${p}]` : `.${String(p)}`)).join("");
}

/**
 * @returns the parsed conditions (undefined when the document has none) and every problem found
 */
export function checkWaterConditions(doc: SectionDocument): { conditions?: WaterCondition[]; errors: Issue[] } {
  const raw = (doc as { waterConditions?: unknown }).waterConditions;
  if (raw === undefined) return { errors: [] };
  const parsed = listSchema.safeParse(raw);
  if (!parsed.success) {
    return {
      errors: parsed.error.issues.map((i) => ({
        code: "water-condition-shape",
        path: `waterConditions${joinPath(i.path)}`,
        message: i.message,
      })),
    };
  }
  const conditions = parsed.data;
  const errors: Issue[] = [];
  const at = (i: number, rest = "") => `waterConditions[${i}]${rest}`;
  const ids = new Map<string, number>();
  const usual = new Map<string, number>();
  conditions.forEach((c, i) => {
    const label = `Water condition “${c.name}”`;
    if (ids.has(c.id))
      errors.push({
        code: "water-condition-duplicate",
        path: at(i, ".id"),
        message: `${label}: key “${c.id}” is used twice.`,
      });
    ids.set(c.id, i);
    for (const key of c.usualFor) {
      const first = usual.get(key);
      if (first !== undefined) {
        errors.push({
          code: "water-condition-usual-twice",
          path: at(i, ".usualFor"),
          message:
            `${label}: “${loadingCondition(key).label}” already takes “${conditions[first].name}” ` +
            "as its usual water; keep one.",
        });
      } else usual.set(key, i);
    }
    const pools = poolLevels(doc, c.water);
    if (c.kind === "construction" && (pools.left !== null || pools.right !== null)) {
      errors.push({
        code: "water-condition-construction-pool",
        path: at(i, ".water.phreatic"),
        message:
          `${label}: construction water has no reservoir, but the line stands above the ground at the ` +
          `${pools.left !== null ? "left" : "right"} edge. Lower it to the ground or use an ru value.`,
      });
    }
    if (c.kind === "drawdown") {
      const before = poolBefore(doc, c.water);
      if (before === null) {
        errors.push({
          code: "water-condition-drawdown-pool",
          path: at(i, ".water.phreatic"),
          message: `${label}: a drawdown starts from a pool, but the line stands above the ground at neither edge.`,
        });
      }
      if (c.drawdownTo === undefined) {
        errors.push({
          code: "water-condition-drawdown-to",
          path: at(i, ".drawdownTo"),
          message: `${label}: enter the pool level after drawdown (m).`,
        });
      } else if (before !== null && c.drawdownTo > before) {
        errors.push({
          code: "water-condition-drawdown-to",
          path: at(i, ".drawdownTo"),
          message:
            `${label}: the pool after drawdown (${c.drawdownTo.toFixed(2)} m) is above ` +
            `the pool before it (${before.toFixed(2)} m).`,
        });
      }
    }
    const engine = validateSection(withWater(doc, c.water));
    if (!engine.ok) {
      for (const e of engine.errors.filter((x) => x.path === "water" || x.path.startsWith("water.")))
        errors.push({ ...e, path: at(i, `.${e.path}`), message: `${label}: ${e.message}` });
    }
  });
  return { conditions, errors };
}
