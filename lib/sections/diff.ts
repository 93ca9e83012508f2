/**
 * What differs between two section documents, in words an engineer reads: used for the one-line
 * summary of a saved version and for the input diff when runs are compared.
 * Pure: no framework or database imports.
 */
import type { Material, SectionDocument } from "@/lib/stability";
import type { StoredSection } from "./water-conditions";
import { countOf, withUnit } from "@/lib/format";
import { ANALYSIS_SETTING_WORDS, analysisSettingWords, modelWords } from "@/lib/vocabulary";

export type DiffArea = "materials" | "geometry" | "water" | "loads" | "analysis";

export interface Difference {
  area: DiffArea;
  /** Where, in document terms: `materials[fill].phi`, `regions[2]`, `analysis.grid`. */
  path: string;
  text: string;
  /** What changed without its values ("fill: φ′"), for tables that show before and after in columns. */
  what?: string;
  before?: string;
  after?: string;
}

const MATERIAL_KEYS: { key: string; label: string; unit: string }[] = [
  { key: "model", label: "model", unit: "" },
  { key: "gamma", label: "γ", unit: "kN/m³" },
  { key: "gammaSat", label: "γsat", unit: "kN/m³" },
  { key: "c", label: "c′", unit: "kPa" },
  { key: "phi", label: "φ′", unit: "°" },
  { key: "su", label: "su", unit: "kPa" },
  { key: "suGradient", label: "su gradient", unit: "kPa/m" },
  { key: "suDatum", label: "su datum", unit: "m" },
  { key: "freeDraining", label: "free-draining", unit: "" },
];

const show = (v: unknown, unit = "") =>
  v === undefined || v === null
    ? "—"
    : typeof v === "boolean"
      ? v
        ? "yes"
        : "no"
      : withUnit(typeof v === "number" ? +v.toFixed(4) : String(v), unit);
/** A material setting's value: the model in words, the rest with its unit. */
const showSetting = (key: string, v: unknown, unit: string) =>
  key === "model" && typeof v === "string" ? modelWords(v) : show(v, unit);
const same = (a: unknown, b: unknown) => JSON.stringify(a ?? null) === JSON.stringify(b ?? null);

function diffMaterials(a: Material[], b: Material[], out: Difference[]): void {
  const before = new Map(a.map((m) => [m.id, m]));
  const after = new Map(b.map((m) => [m.id, m]));
  for (const [id, m] of after) {
    const old = before.get(id);
    if (!old) {
      out.push({ area: "materials", path: `materials[${id}]`, text: `material '${id}' added` });
      continue;
    }
    for (const { key, label, unit } of MATERIAL_KEYS) {
      const x = (old as Record<string, unknown>)[key];
      const y = (m as Record<string, unknown>)[key];
      if (!same(x, y)) {
        out.push({
          area: "materials",
          path: `materials[${id}].${key}`,
          text: `${id}: ${label} ${showSetting(key, x, unit)} → ${showSetting(key, y, unit)}`,
          what: `${id}: ${label}`,
          before: showSetting(key, x, unit),
          after: showSetting(key, y, unit),
        });
      }
    }
  }
  for (const id of before.keys())
    if (!after.has(id)) out.push({ area: "materials", path: `materials[${id}]`, text: `material '${id}' removed` });
}

function diffRegions(a: SectionDocument, b: SectionDocument, out: Difference[]): void {
  const n = Math.max(a.regions.length, b.regions.length);
  for (let i = 0; i < n; i++) {
    const r0 = a.regions[i];
    const r1 = b.regions[i];
    const label = r1?.name ?? r0?.name ?? `region ${i + 1}`;
    if (!r0)
      out.push({
        area: "geometry",
        path: `regions[${i}]`,
        text: `${label} added (${countOf(r1!.points.length, "point")}, material ${r1!.material})`,
      });
    else if (!r1) out.push({ area: "geometry", path: `regions[${i}]`, text: `${label} removed` });
    else {
      if (r0.material !== r1.material)
        out.push({
          area: "geometry",
          path: `regions[${i}].material`,
          text: `${label}: material ${r0.material} → ${r1.material}`,
          what: `${label}: material`,
          before: r0.material,
          after: r1.material,
        });
      if (!same(r0.points, r1.points)) {
        const moved =
          r0.points.length === r1.points.length ? r1.points.filter((p, j) => !same(p, r0.points[j])).length : null;
        out.push({
          area: "geometry",
          path: `regions[${i}].points`,
          text:
            moved !== null
              ? `${label}: ${countOf(moved, "point")} moved`
              : `${label}: ${r0.points.length} → ${r1.points.length} points`,
        });
      }
    }
  }
}

function diffWater(a: SectionDocument, b: SectionDocument, out: Difference[]): void {
  const wa = a.water ?? {};
  const wb = b.water ?? {};
  if (!same(wa.phreatic, wb.phreatic)) {
    out.push({
      area: "water",
      path: "water.phreatic",
      text: !wa.phreatic ? "phreatic line added" : !wb.phreatic ? "phreatic line removed" : "phreatic line changed",
    });
  }
  if (!same(wa.ru, wb.ru))
    out.push({
      area: "water",
      path: "water.ru",
      text: `ru ${show(wa.ru)} → ${show(wb.ru)}`,
      what: "ru",
      before: show(wa.ru),
      after: show(wb.ru),
    });
  if (!same(wa.gammaW, wb.gammaW))
    out.push({ area: "water", path: "water.gammaW", text: `γw ${show(wa.gammaW)} → ${show(wb.gammaW)}` });
}

const CONDITION_PART_WORDS = {
  kind: "kind",
  water: "water",
  drawdownTo: "level after drawdown",
  usualFor: "the loading conditions it is proposed for",
} as const;

const renamed = (a: string, b: string) => `water condition “${a}” renamed “${b}”`;

/** Named water conditions by key: added, removed, renamed, or their water or levels changed. */
function diffWaterConditions(a: SectionDocument, b: SectionDocument, out: Difference[]): void {
  const before = new Map(((a as StoredSection).waterConditions ?? []).map((c) => [c.id, c]));
  const after = new Map(((b as StoredSection).waterConditions ?? []).map((c) => [c.id, c]));
  for (const [id, c] of after) {
    const old = before.get(id);
    const path = `waterConditions[${id}]`;
    if (!old) {
      out.push({ area: "water", path, text: `water condition “${c.name}” added` });
      continue;
    }
    if (old.name !== c.name) out.push({ area: "water", path: `${path}.name`, text: renamed(old.name, c.name) });
    const changed = (["kind", "water", "drawdownTo", "usualFor"] as const).filter((k) => !same(old[k], c[k]));
    if (changed.length > 0)
      out.push({
        area: "water",
        path,
        text: `water condition “${c.name}”: ${changed.map((k) => CONDITION_PART_WORDS[k]).join(", ")} changed`,
      });
  }
  for (const [id, c] of before)
    if (!after.has(id))
      out.push({ area: "water", path: `waterConditions[${id}]`, text: `water condition “${c.name}” removed` });
}

function diffLoads(a: SectionDocument, b: SectionDocument, out: Difference[]): void {
  if (!same(a.loads?.surcharges, b.loads?.surcharges))
    out.push({ area: "loads", path: "loads.surcharges", text: "surcharges changed" });
  if (!same(a.loads?.kh, b.loads?.kh))
    out.push({ area: "loads", path: "loads.kh", text: `kh ${show(a.loads?.kh)} → ${show(b.loads?.kh)}` });
}

function diffAnalysis(a: SectionDocument, b: SectionDocument, out: Difference[]): void {
  const x = (a.analysis ?? {}) as Record<string, unknown>;
  const y = (b.analysis ?? {}) as Record<string, unknown>;
  for (const key of new Set([...Object.keys(x), ...Object.keys(y)])) {
    if (!same(x[key], y[key])) {
      const words = (v: unknown) => analysisSettingWords(key, v);
      out.push({
        area: "analysis",
        path: `analysis.${key}`,
        text: `${ANALYSIS_SETTING_WORDS[key] ?? key}: ${words(x[key])} → ${words(y[key])}`,
        what: ANALYSIS_SETTING_WORDS[key] ?? key,
        before: words(x[key]),
        after: words(y[key]),
      });
    }
  }
}

/** Every difference from `a` to `b`, grouped by area in a fixed order. */
export function diffDocuments(a: SectionDocument, b: SectionDocument): Difference[] {
  const out: Difference[] = [];
  diffMaterials(a.materials, b.materials, out);
  diffRegions(a, b, out);
  diffWater(a, b, out);
  diffWaterConditions(a, b, out);
  diffLoads(a, b, out);
  diffAnalysis(a, b, out);
  return out;
}

/** The length of section_versions.summary (db/migrations/002-sections-materials-runs.ts). */
export const SUMMARY_MAX_LENGTH = 300;

/** One line for a version list, e.g. "fill: φ′ 28° → 30°; phreatic line changed". */
export function summarizeChange(a: SectionDocument, b: SectionDocument, max = 3): string {
  const d = diffDocuments(a, b);
  if (d.length === 0) return "No change to the section";
  const head = d
    .slice(0, max)
    .map((x) => x.text)
    .join("; ");
  const text = d.length > max ? `${head}; and ${d.length - max} more` : head;
  // Long region or material names must not make a save fail on the column's length.
  return [...text].length > SUMMARY_MAX_LENGTH ? [...text].slice(0, SUMMARY_MAX_LENGTH - 1).join("") + "…" : text;
}
