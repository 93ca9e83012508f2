import { RowReader, finish, readCsvTable, type CsvParseResult, type CsvProblem } from "./csv-read";
import { polygonArea } from "@/lib/plane-geometry";
import { writeCsv } from "./csv-write";
import type { Point, SectionRegion } from "./section-types";
import { countOf } from "@/lib/format";

export const GEOMETRY_COLUMNS = ["region", "material", "x", "y"] as const;

export interface GeometryCsvOptions {
  /** Material ids the section defines; a region naming another id is a problem. */
  knownMaterialIds?: readonly string[];
}

interface RegionDraft {
  label: string;
  material: string;
  firstRow: number;
  materialRow: number;
  /** A row of this region had a problem, so its point count says nothing new. */
  incomplete: boolean;
  points: { row: number; p: Point }[];
}

/**
 * Parses a geometry CSV: header `region,material,x,y`, one row per polygon vertex in order, the rows
 * of one region together, the material required on each region's first row (optional after it).
 * Returns `regions` shaped as docs/engine-io.md's document ({material, points}[]), first point not repeated.
 */
export function parseGeometryCsv(text: string, options: GeometryCsvOptions = {}): CsvParseResult<SectionRegion[]> {
  const problems: CsvProblem[] = [];
  const warnings: CsvProblem[] = [];
  const table = readCsvTable(text, GEOMETRY_COLUMNS, ["region", "material", "x", "y"], problems, warnings);
  if (!table) return finish([], [], problems, warnings);

  const drafts: RegionDraft[] = [];
  const seen = new Map<string, RegionDraft>();
  for (const row of table.rows) {
    const r = new RowReader(table, row, problems);
    const label = r.text("region");
    const x = r.number("x");
    const y = r.number("y");
    if (label === "") {
      r.problem("region", "The region name is missing.");
      const last = drafts[drafts.length - 1];
      if (last) last.incomplete = true;
      continue;
    }
    let current = drafts[drafts.length - 1];
    if (!current || current.label !== label) {
      const earlier = seen.get(label);
      if (earlier) {
        r.problem(
          "region",
          `Region '${label}' continues here after other regions (it began on row ${earlier.firstRow}): keep each region's rows together.`,
        );
        earlier.incomplete = true;
        continue;
      }
      current = {
        label,
        material: r.text("material"),
        firstRow: r.rowNumber,
        materialRow: r.rowNumber,
        incomplete: false,
        points: [],
      };
      if (current.material === "") r.problem("material", `Region '${label}' needs a material on its first row.`);
      drafts.push(current);
      seen.set(label, current);
    } else if (r.has("material") && r.text("material") !== current.material) {
      r.problem(
        "material",
        `Material '${r.text("material")}' differs from '${current.material}' given for region '${label}' on row ${current.materialRow}.`,
      );
    }
    if (x !== null && y !== null) current.points.push({ row: r.rowNumber, p: [x, y] });
    else current.incomplete = true;
  }

  const known = options.knownMaterialIds ? new Set(options.knownMaterialIds) : null;
  const regions = drafts.map((d) => closeRegion(d, warnings, problems, known));
  return finish(regions, table.rows, problems, warnings);
}

function closeRegion(
  d: RegionDraft,
  warnings: CsvProblem[],
  problems: CsvProblem[],
  known: Set<string> | null,
): SectionRegion {
  const kept: { row: number; p: Point }[] = [];
  for (const v of d.points) {
    const prev = kept[kept.length - 1];
    if (prev && prev.p[0] === v.p[0] && prev.p[1] === v.p[1]) {
      warnings.push({
        row: v.row,
        column: null,
        message: `Row ${v.row} repeats the previous point of region '${d.label}'; it was dropped.`,
      });
    } else kept.push(v);
  }
  if (kept.length > 1) {
    const first = kept[0].p;
    const last = kept[kept.length - 1];
    if (last.p[0] === first[0] && last.p[1] === first[1]) {
      kept.pop();
      warnings.push({
        row: last.row,
        column: null,
        message: `Row ${last.row} repeats the first point of region '${d.label}'; regions close by themselves, so it was dropped.`,
      });
    }
  }
  const at = (message: string): CsvProblem => ({ row: d.firstRow, column: "region", message });
  if (known && d.material !== "" && !known.has(d.material)) {
    problems.push({
      row: d.materialRow,
      column: "material",
      message: `Region '${d.label}' uses material '${d.material}', which the section does not define.`,
    });
  }
  const region: SectionRegion = { name: d.label, material: d.material, points: kept.map((v) => v.p) };
  if (d.incomplete) return region;
  if (kept.length < 3)
    problems.push(at(`Region '${d.label}' has ${countOf(kept.length, "point")}; a region needs at least 3.`));
  else if (polygonArea(kept.map((v) => v.p)) < 1e-6)
    problems.push(at(`Region '${d.label}' has no area: its points lie on one line.`));
  return region;
}

/**
 * Writes regions as a geometry CSV, the material on every row. Rows are labelled `labels[i]`, else
 * the region's own name, else "R1", "R2", …; names that repeat fall back to the numbering.
 */
export function geometryToCsv(regions: readonly SectionRegion[], labels?: readonly string[]): string {
  const own = regions.map((r, i) => r.name?.trim() || `R${i + 1}`);
  const names = labels
    ? regions.map((_, i) => labels[i] ?? `R${i + 1}`)
    : new Set(own).size === own.length
      ? own
      : regions.map((_, i) => `R${i + 1}`);
  // Equal labels would merge two regions (or split one) when the file is read back.
  if (new Set(names).size !== names.length) throw new Error("region labels must be unique");
  const rows = regions.flatMap((region, i) => {
    return region.points.map(([x, y]) => [names[i], region.material, x, y]);
  });
  return writeCsv(GEOMETRY_COLUMNS, rows);
}
