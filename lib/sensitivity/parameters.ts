/**
 * The inputs of a kept run an engineer may try other values of: each material's c′, φ′ (or su)
 * and γ, the lowered pool of a drawdown, ru and kh. Each has the run's stored value and a range
 * to move in. Applying values writes only those that differ from the stored ones, so the stored
 * values give back the stored document itself and therefore the stored FS, bit for bit.
 */
import type { Material, SectionDocument } from "@/lib/stability";

export interface InputParameter {
  /** Stable key: "material:<id>:c|phi|su|gamma", "drawdown:to", "water:ru", "loads:kh". */
  key: string;
  /** As the engineer reads it: "φ′ of Clay core". */
  label: string;
  unit: string;
  stored: number;
  min: number;
  max: number;
  step: number;
  /** One standard deviation when the material carries one (its `vary` block), else absent. */
  sd?: number;
}

export type ParameterValues = Readonly<Record<string, number>>;

const round = (v: number, step: number) => Math.round(v / step) * step;
const nameOf = (m: Material) => m.name ?? m.id;

/** The standard deviation a material's `vary` block gives for a quantity, if any (read leniently). */
function sdOf(m: Material, q: "c" | "phi" | "su" | "gamma"): number | undefined {
  const vary = (m as { vary?: Record<string, { sd?: unknown } | undefined> }).vary;
  const sd = vary?.[q]?.sd;
  return typeof sd === "number" && sd > 0 ? sd : undefined;
}

function materialParameters(doc: SectionDocument, m: Material): InputParameter[] {
  if (m.model === "impenetrable") return [];
  const out: InputParameter[] = [];
  const name = nameOf(m);
  const undrainedCase = doc.analysis?.case === "undrained";
  const withSd = (p: InputParameter, q: "c" | "phi" | "su" | "gamma"): InputParameter => {
    const sd = sdOf(m, q);
    return sd === undefined ? p : { ...p, sd };
  };
  if (m.model === "undrained" || (undrainedCase && m.su !== undefined && !m.freeDraining)) {
    const su = m.su!;
    out.push(
      withSd(
        {
          key: `material:${m.id}:su`,
          label: `su of ${name}`,
          unit: "kPa",
          stored: su,
          ...span(su * 0.5, su * 1.5, 0.5),
        },
        "su",
      ),
    );
  } else {
    out.push(
      withSd(
        {
          key: `material:${m.id}:c`,
          label: `c′ of ${name}`,
          unit: "kPa",
          stored: m.c,
          ...span(0, Math.max(2 * m.c, m.c + 20), 0.5),
        },
        "c",
      ),
      withSd(
        {
          key: `material:${m.id}:phi`,
          label: `φ′ of ${name}`,
          unit: "°",
          stored: m.phi,
          ...span(Math.max(0, m.phi - 10), Math.min(50, m.phi + 10), 0.5),
        },
        "phi",
      ),
    );
  }
  out.push(
    withSd(
      {
        key: `material:${m.id}:gamma`,
        label: `γ of ${name}`,
        unit: "kN/m³",
        stored: m.gamma,
        ...span(m.gamma * 0.8, m.gamma * 1.2, 0.1),
      },
      "gamma",
    ),
  );
  return out;
}

/** A range on a step grid that always contains the stored value (the caller adds it). */
function span(min: number, max: number, step: number) {
  return { min: round(min, step), max: round(max, step), step };
}

/** Every input of a run's document the what-if panel and the sensitivity study may change. */
export function inputParameters(doc: SectionDocument): InputParameter[] {
  const out = doc.materials.flatMap((m) => materialParameters(doc, m));
  const dd = doc.analysis?.case === "drawdown" ? doc.analysis.drawdown : undefined;
  if (dd) {
    const drop = Math.max(dd.from - dd.to, 1);
    out.push({
      key: "drawdown:to",
      label: "pool after drawdown",
      unit: "m",
      stored: dd.to,
      ...span(dd.to - drop / 2, dd.from, 0.1),
    });
  }
  // ru stands in for a phreatic line, never beside one.
  if (!doc.water?.phreatic) {
    out.push({ key: "water:ru", label: "ru", unit: "", stored: doc.water?.ru ?? 0, ...span(0, 0.6, 0.01) });
  }
  out.push({ key: "loads:kh", label: "kh", unit: "", stored: doc.loads?.kh ?? 0, ...span(0, 0.3, 0.01) });
  // The stored value always lies inside its range, whatever the rounding did.
  return out.map((p) => ({ ...p, min: Math.min(p.min, p.stored), max: Math.max(p.max, p.stored) }));
}

/** The document with the given values; values equal to the stored ones change nothing. */
export function withParameters(doc: SectionDocument, params: readonly InputParameter[], values: ParameterValues) {
  let out: SectionDocument = doc;
  for (const p of params) {
    const v = values[p.key];
    if (v === undefined || Object.is(v, p.stored)) continue;
    out = applyOne(out, p, v);
  }
  return out;
}

function applyOne(doc: SectionDocument, p: InputParameter, v: number): SectionDocument {
  const [kind, id, q] = p.key.split(":");
  if (kind === "material") {
    return {
      ...doc,
      materials: doc.materials.map((m) => {
        if (m.id !== id || m.model === "impenetrable") return m;
        if (q === "gamma") {
          // γsat moves with γ so the pair stays in proportion.
          const f = v / m.gamma;
          return m.gammaSat === undefined ? { ...m, gamma: v } : { ...m, gamma: v, gammaSat: m.gammaSat * f };
        }
        return { ...m, [q]: v };
      }),
    };
  }
  if (p.key === "drawdown:to" && doc.analysis?.drawdown)
    return { ...doc, analysis: { ...doc.analysis, drawdown: { ...doc.analysis.drawdown, to: v } } };
  if (p.key === "water:ru") return { ...doc, water: { ...doc.water, ru: v } };
  if (p.key === "loads:kh") return { ...doc, loads: { ...doc.loads, kh: v } };
  throw new Error(`unknown input ${p.key}`);
}

const fmt = (p: InputParameter, v: number) => {
  const digits = p.step >= 1 ? 0 : p.step >= 0.1 ? 1 : 2;
  return `${v.toFixed(digits)}${p.unit === "°" ? "°" : p.unit ? ` ${p.unit}` : ""}`;
};

/** The change in words: "φ′ of Clay core 24.0° → 22.0°: FS 1.310 → 1.220". */
export function describeChange(p: InputParameter, value: number, fsStored: number, fsNow: number): string {
  return `${p.label} ${fmt(p, p.stored)} → ${fmt(p, value)}: FS ${fsStored.toFixed(3)} → ${fsNow.toFixed(3)}`;
}

/** Every changed input in words, then the FS they give together; null when nothing changed. */
export function describeChanges(
  params: readonly InputParameter[],
  values: ParameterValues,
  fsStored: number,
  fsNow: number,
): string | null {
  const changed = params.filter((p) => values[p.key] !== undefined && !Object.is(values[p.key], p.stored));
  if (changed.length === 0) return null;
  if (changed.length === 1) return describeChange(changed[0], values[changed[0].key], fsStored, fsNow);
  const parts = changed.map((p) => `${p.label} ${fmt(p, p.stored)} → ${fmt(p, values[p.key])}`);
  return `${parts.join(", ")}: FS ${fsStored.toFixed(3)} → ${fsNow.toFixed(3)}`;
}
