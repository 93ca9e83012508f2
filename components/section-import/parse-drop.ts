import {
  parseGeometryCsv,
  parseMaterialsCsv,
  parsePhreaticCsv,
  detectSectionFile,
  type CsvPreviewRow,
  type CsvProblem,
  type SectionFileKind,
} from "@/lib/section-io";
import { validateSection, type SectionDocument } from "@/lib/stability";
import { countOf } from "@/lib/format";

/** One dropped file after parsing: what it is, what it would change, and every problem found. */
export interface ParsedDrop {
  fileName: string;
  kind: SectionFileKind;
  problems: CsvProblem[];
  warnings: CsvProblem[];
  preview: CsvPreviewRow[];
  columns: string[];
  /** Applies this file's content to a document; absent when the file has problems. */
  apply?: (doc: SectionDocument) => SectionDocument;
  summary: string;
}

const COLUMNS: Record<string, string[]> = {
  geometry: ["region", "material", "x", "y"],
  phreatic: ["x", "y"],
  materials: ["id", "name", "model", "gamma", "gammaSat", "c", "phi", "su", "suGradient", "suDatum"],
};

/** `knownMaterialIds` null: the materials are not checked (their file was dropped but could not be read). */
export function parseDroppedFile(fileName: string, text: string, knownMaterialIds: string[] | null): ParsedDrop {
  const kind = detectSectionFile(fileName, text);
  const base = {
    fileName,
    kind,
    warnings: [] as CsvProblem[],
    preview: [] as CsvPreviewRow[],
    columns: COLUMNS[kind] ?? [],
  };
  switch (kind) {
    case "geometry": {
      const r = parseGeometryCsv(text, knownMaterialIds ? { knownMaterialIds } : {});
      if (!r.ok)
        return {
          ...base,
          problems: r.problems,
          preview: r.preview,
          warnings: r.warnings,
          summary: "Geometry (regions)",
        };
      return {
        ...base,
        problems: [],
        preview: r.preview,
        warnings: r.warnings,
        summary: `Geometry: ${countOf(r.value.length, "region")}, ${r.value.reduce((n, g) => n + g.points.length, 0)} points`,
        apply: (doc) => ({
          ...doc,
          regions: r.value.map((g) => ({
            ...(g.name ? { name: g.name } : {}),
            material: g.material,
            points: g.points.map(([x, y]) => [x, y] as [number, number]),
          })),
        }),
      };
    }
    case "phreatic": {
      const r = parsePhreaticCsv(text);
      if (!r.ok)
        return { ...base, problems: r.problems, preview: r.preview, warnings: r.warnings, summary: "Phreatic line" };
      return {
        ...base,
        problems: [],
        preview: r.preview,
        warnings: r.warnings,
        summary: `Phreatic line: ${countOf(r.value.length, "point")}`,
        apply: (doc) => ({
          ...doc,
          water: { ...(doc.water ?? {}), ru: undefined, phreatic: r.value.map(([x, y]) => [x, y] as [number, number]) },
        }),
      };
    }
    case "materials": {
      const r = parseMaterialsCsv(text);
      if (!r.ok)
        return { ...base, problems: r.problems, preview: r.preview, warnings: r.warnings, summary: "Materials" };
      return {
        ...base,
        problems: [],
        preview: r.preview,
        warnings: r.warnings,
        summary: `Materials: ${r.value.materials.map((m) => m.id).join(", ")}`,
        apply: (doc) => ({
          ...doc,
          materials: r.value.materials.map((m) => ({
            ...m,
            name: r.value.names[m.id] ?? undefined,
          })) as SectionDocument["materials"],
        }),
      };
    }
    case "section-json": {
      let raw: unknown;
      try {
        raw = JSON.parse(text);
      } catch (err) {
        return {
          ...base,
          problems: [{ row: 1, column: null, message: `Not valid JSON: ${err instanceof Error ? err.message : err}` }],
          summary: "Section document",
        };
      }
      const v = validateSection(raw);
      if (!v.ok)
        return {
          ...base,
          problems: v.errors.map((e) => ({ row: 0, column: e.path || null, message: e.message })),
          summary: "Section document",
        };
      return {
        ...base,
        problems: [],
        summary: `Section document: ${countOf(v.section.regions.length, "region")}, ${countOf(v.section.materials.length, "material")}`,
        apply: () => v.section,
      };
    }
    default:
      return {
        ...base,
        problems: [
          {
            row: 1,
            column: null,
            message:
              "Not a section file: expected a geometry CSV (region,material,x,y), a phreatic line CSV (x,y), a materials CSV (id,name,model,…) or a section JSON document.",
          },
        ],
        summary: "Unknown file",
      };
  }
}
