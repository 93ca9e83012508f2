import { parseDecimal } from "@/lib/section-io";
import { drainsFromText, drainsToText } from "./drain-text";
import { seepageSettingsInputSchema, type SeepageSettingsInput } from "./types";

/** The seepage settings as a form holds them: numbers as typed. */
export interface SeepageSettingsForm {
  drains: string;
  meshSize: string;
  crestLength: string;
  headDrops: string;
  tailwaterSide: "" | "left" | "right";
  tailwaterLevel: string;
  /** Pool levels set here; blank keeps the water condition's. */
  poolLeft: string;
  poolRight: string;
}

const text = (v: number | undefined) => (v === undefined ? "" : String(v));

export function settingsToForm(s: SeepageSettingsInput): SeepageSettingsForm {
  return {
    drains: drainsToText(s.drains),
    meshSize: text(s.meshSize),
    crestLength: text(s.crestLength),
    headDrops: text(s.headDrops),
    tailwaterSide: s.tailwater?.side ?? "",
    tailwaterLevel: text(s.tailwater?.level),
    poolLeft: text(s.pools?.left),
    poolRight: text(s.pools?.right),
  };
}

export type SettingsFromForm =
  { ok: true; settings: SeepageSettingsInput } | { ok: false; fields: Record<string, string[]> };

/** Settings from the form, or field errors keyed by the form's field names. */
export function settingsFromForm(f: SeepageSettingsForm): SettingsFromForm {
  const fields: Record<string, string[]> = {};
  const num = (key: keyof SeepageSettingsForm, label: string): number | undefined => {
    const t = f[key].trim();
    if (t === "") return undefined;
    const n = parseDecimal(t);
    if (n.ok) return n.value;
    fields[key] = [`${label}: ${n.message}`];
    return undefined;
  };
  const drains = drainsFromText(f.drains);
  if (!drains.ok) fields.drains = drains.problems;
  const level = num("tailwaterLevel", "Tailwater level");
  if (f.tailwaterSide !== "" && level === undefined && !fields.tailwaterLevel)
    fields.tailwaterLevel = ["Give the tailwater level (m), or choose no tailwater."];
  const raw = {
    drains: drains.ok ? drains.drains : [],
    meshSize: num("meshSize", "Element size"),
    crestLength: num("crestLength", "Crest length"),
    headDrops: num("headDrops", "Head drops"),
    tailwater: f.tailwaterSide !== "" && level !== undefined ? { side: f.tailwaterSide, level } : undefined,
    pools: poolsOf(num("poolLeft", "Left pool level"), num("poolRight", "Right pool level")),
  };
  if (Object.keys(fields).length > 0) return { ok: false, fields };
  const parsed = seepageSettingsInputSchema.safeParse(raw);
  if (parsed.success) return { ok: true, settings: parsed.data };
  for (const issue of parsed.error.issues) (fields[String(issue.path[0] ?? "_")] ??= []).push(issue.message);
  return { ok: false, fields };
}

/** The pools set in the view, or undefined when both sides keep the water condition's. */
function poolsOf(left: number | undefined, right: number | undefined): SeepageSettingsInput["pools"] {
  if (left === undefined && right === undefined) return undefined;
  return { ...(left !== undefined ? { left } : {}), ...(right !== undefined ? { right } : {}) };
}
