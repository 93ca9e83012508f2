/**
 * Engine issue paths in the numbering the side panel shows. The engine names places the way its
 * document does, counting from zero (`regions[2].points[4]`, "edges 0–1 and 4–5"); a reader sees
 * "Region 3, vertex 5" and "the edges between vertices 1–2 and 5–6". Every page, API answer and
 * report that shows an engine issue passes it through here, and only here.
 */
import type { Issue } from "@/lib/stability";
import { ANALYSIS_SETTING_WORDS } from "@/lib/vocabulary";

/** Field names of the document, as the material form and the panels label them. */
const FIELD_WORDS: Record<string, string> = {
  gamma: "γ",
  gammaSat: "γsat",
  c: "c′",
  phi: "φ′",
  su: "su",
  suGradient: "su gradient",
  suDatum: "su datum",
  cR: "cR",
  phiR: "φR",
  id: "key",
  name: "name",
  model: "strength model",
  material: "material",
  points: "outline",
  gammaW: "γw",
  ru: "ru",
  q: "q",
};

/** Names the document gives its items, so a place reads "Region 3 (Core)" when the region has a name. */
export interface PlaceNames {
  regions?: readonly (string | undefined)[];
  materials?: readonly (string | undefined)[];
}

const PLACE =
  /(regions|materials|loads\.surcharges|water\.phreatic|waterConditions)\[(\d+)\]((?:\.[A-Za-z]+(?:\[\d+\])?)*)/g;

function field(rest: string, owner: "region" | "phreatic" | "other"): string {
  const parts: string[] = [];
  for (const m of rest.matchAll(/\.([A-Za-z]+)(?:\[(\d+)\])?/g)) {
    const [, key, index] = m;
    if (key === "points" && index !== undefined) parts.push(`${owner === "region" ? "vertex" : "point"} ${+index + 1}`);
    else parts.push(FIELD_WORDS[key] ?? key);
  }
  return parts.length > 0 ? `, ${parts.join(", ")}` : "";
}

/** One engine path in words: `regions[2].points[4]` → "Region 3, vertex 5"; "" stays "the section". */
export function placeWords(path: string, names: PlaceNames = {}): string {
  if (path === "" || path === "_") return "The section";
  const text = path.replace(PLACE, (_all, list: string, i: string, rest: string) => {
    const n = +i + 1;
    const named = (name: string | undefined) => (name ? ` (${name})` : "");
    switch (list) {
      case "regions":
        return `Region ${n}${named(names.regions?.[+i])}${field(rest, "region")}`;
      case "materials":
        return `Material ${n}${named(names.materials?.[+i])}${field(rest, "other")}`;
      case "loads.surcharges":
        return `Surcharge ${n}${field(rest, "other")}`;
      case "waterConditions":
        return `Water condition ${n}${field(rest, "other")}`;
      default:
        return `Phreatic line, point ${n}${field(rest, "phreatic")}`;
    }
  });
  if (text !== path) return text;
  if (path === "water.phreatic") return "Phreatic line";
  const [head, setting, ...more] = path.split(".");
  if (head === "analysis" && setting)
    return [`Analysis settings, ${(ANALYSIS_SETTING_WORDS[setting] ?? setting).toLowerCase()}`, ...more].join(", ");
  // Other paths (water.gammaW): their names, in words where the form has words for them.
  return path
    .split(".")
    .map((k) => FIELD_WORDS[k] ?? k)
    .join(", ");
}

/** An engine message with its paths, edge numbers and primes as the panels write them. */
export function messageWords(message: string, names: PlaceNames = {}): string {
  return message
    .replace(
      /\bedges (\d+)–(\d+) and (\d+)–(\d+)/g,
      (_m, a: string, b: string, c: string, d: string) =>
        `the edges between vertices ${+a + 1}–${+b + 1} and ${+c + 1}–${+d + 1}`,
    )
    .replace(PLACE, (p) => placeWords(p, names))
    .replace(/(^|[^A-Za-z0-9_])(cR|φR|c|φ)'/g, "$1$2′");
}

/** The names a document gives its regions and materials, for placeWords and messageWords. */
export function placeNamesOf(doc: unknown): PlaceNames {
  // The document may be any shape here: it is often the one being refused.
  const d = (typeof doc === "object" && doc !== null ? doc : {}) as Record<string, unknown>;
  const names = (list: unknown, pick: (o: Record<string, unknown>) => unknown) =>
    Array.isArray(list)
      ? list.map((o) => {
          const v = typeof o === "object" && o !== null ? pick(o as Record<string, unknown>) : undefined;
          return typeof v === "string" ? v : undefined;
        })
      : undefined;
  return { regions: names(d.regions, (r) => r.name), materials: names(d.materials, (m) => m.name ?? m.id) };
}

/** An issue with its message in words; its path stays as it is, for tools that select the place. */
export function issueInWords<T extends Issue>(issue: T, names: PlaceNames = {}): T {
  return { ...issue, message: messageWords(issue.message, names) };
}
