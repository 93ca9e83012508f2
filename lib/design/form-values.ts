/**
 * The parameters form keeps what the designer types (strings, so a half-typed "2." survives);
 * these helpers turn the typed values into parameters for embankmentParamsSchema and back.
 * Keys are the schema's dotted paths, so the schema's field errors land on the right input.
 */
import type { EmbankmentParams } from "./parameters";

export type FormValues = Record<string, string>;

/** Numeric fields with their labels and units, in the order the form shows them. */
export const NUMBER_FIELDS = {
  crestElevation: { label: "Crest elevation", unit: "m" },
  crestWidth: { label: "Crest width", unit: "m" },
  foundationTop: { label: "Foundation level (top)", unit: "m" },
  foundationThickness: { label: "Foundation thickness", unit: "m" },
  baseThickness: { label: "Base drawn below it", unit: "m" },
  upstreamSlope: { label: "Upstream slope", unit: "H:1V" },
  downstreamSlope: { label: "Downstream slope", unit: "H:1V" },
  drainLength: { label: "Toe drain length", unit: "m" },
  drainThickness: { label: "Toe drain thickness", unit: "m" },
  normalPool: { label: "Normal pool", unit: "m" },
  floodPool: { label: "Flood pool", unit: "m" },
  drawdownTo: { label: "Drawdown to", unit: "m" },
  minFreeboard: { label: "Least freeboard", unit: "m" },
  fillPermeability: { label: "Fill permeability kh", unit: "m/s" },
  anisotropy: { label: "kv/kh", unit: "–" },
  crestLength: { label: "Crest length", unit: "m" },
  requiredPipingFactor: { label: "Required factor against piping", unit: "–" },
  "upstreamBerm.elevation": { label: "Upstream berm elevation", unit: "m" },
  "upstreamBerm.width": { label: "Upstream berm width", unit: "m" },
  "downstreamBerm.elevation": { label: "Downstream berm elevation", unit: "m" },
  "downstreamBerm.width": { label: "Downstream berm width", unit: "m" },
  "zoning.coreTopWidth": { label: "Core top width", unit: "m" },
  "zoning.coreSlope": { label: "Core side slope", unit: "H:1V" },
} as const;

export type NumberField = keyof typeof NUMBER_FIELDS;

const str = (v: number | undefined) => (v === undefined ? "" : String(v));

/** "x, y" per line, the way the hand-drawn line is typed. */
export function lineToText(line: readonly [number, number][] | null): string {
  return line ? line.map(([x, y]) => `${x}, ${y}`).join("\n") : "";
}

/** Reads "x, y" lines; a line that is not two numbers becomes NaN so the schema reports it. */
export function textToLine(text: string): [number, number][] | null {
  const rows = text
    .split(/\r?\n/)
    .map((r) => r.trim())
    .filter(Boolean);
  if (rows.length === 0) return null;
  return rows.map((r) => {
    const parts = r
      .split(/[\s,;]+/)
      .filter(Boolean)
      .map(Number);
    return parts.length === 2 ? [parts[0], parts[1]] : [NaN, NaN];
  });
}

export function toFormValues(p: EmbankmentParams): FormValues {
  const v: FormValues = {};
  for (const key of Object.keys(NUMBER_FIELDS) as NumberField[]) {
    const [head, tail] = key.split(".");
    const holder = tail ? (p as unknown as Record<string, Record<string, number> | null>)[head] : null;
    v[key] = tail ? str(holder?.[tail]) : str((p as unknown as Record<string, number>)[key]);
  }
  v["upstreamBerm.on"] = p.upstreamBerm ? "on" : "";
  v["downstreamBerm.on"] = p.downstreamBerm ? "on" : "";
  v["zoning.kind"] = p.zoning.kind;
  v["zoning.fill"] = p.zoning.kind === "homogeneous" ? p.zoning.fill : p.zoning.shell;
  v["zoning.core"] = p.zoning.kind === "zoned" ? p.zoning.core : "";
  v["zoning.shell"] = p.zoning.kind === "zoned" ? p.zoning.shell : "";
  if (p.zoning.kind === "homogeneous") {
    v["zoning.coreTopWidth"] = "4";
    v["zoning.coreSlope"] = "0.5";
  }
  v.foundationMaterial = p.foundationMaterial;
  v.baseMaterial = p.baseMaterial;
  v.drainMaterial = p.drainMaterial;
  v.foundationImpervious = p.foundationImpervious ? "on" : "";
  v["handLines.normal"] = lineToText(p.handLines.normal);
  v["handLines.flood"] = lineToText(p.handLines.flood);
  return v;
}

/** A typed number, or undefined when blank so the schema's "Enter …" message shows. */
function num(text: string | undefined): number | undefined {
  if (text === undefined || text.trim() === "") return undefined;
  return Number(text.trim().replace(",", "."));
}

/** The raw parameters object to hand to embankmentParamsSchema.safeParse. */
export function fromFormValues(v: FormValues): unknown {
  const berm = (side: "upstream" | "downstream") =>
    v[`${side}Berm.on`] ? { elevation: num(v[`${side}Berm.elevation`]), width: num(v[`${side}Berm.width`]) } : null;
  const zoning =
    v["zoning.kind"] === "zoned"
      ? {
          kind: "zoned",
          core: v["zoning.core"],
          shell: v["zoning.shell"],
          coreTopWidth: num(v["zoning.coreTopWidth"]),
          coreSlope: num(v["zoning.coreSlope"]),
        }
      : { kind: "homogeneous", fill: v["zoning.fill"] };
  const plain = Object.fromEntries(
    (Object.keys(NUMBER_FIELDS) as NumberField[]).filter((k) => !k.includes(".")).map((k) => [k, num(v[k])]),
  );
  return {
    ...plain,
    upstreamBerm: berm("upstream"),
    downstreamBerm: berm("downstream"),
    zoning,
    foundationMaterial: v.foundationMaterial,
    baseMaterial: v.baseMaterial,
    drainMaterial: v.drainMaterial,
    foundationImpervious: v.foundationImpervious === "on",
    handLines: { normal: textToLine(v["handLines.normal"] ?? ""), flood: textToLine(v["handLines.flood"] ?? "") },
  };
}
