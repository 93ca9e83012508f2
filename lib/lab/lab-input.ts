/**
 * Shared shapes and checks for lab test sets: every row may carry an `id` (the stored test's id)
 * and a `specimen` label, and every derived number keeps the ids of the rows it came from so a
 * reviewer can trace it back.
 */

/** Fields every lab input row may carry. */
export interface LabRowRef {
  /** Id of the stored test row (database or import), kept so results point back to their source. */
  id?: string;
  /** The lab's label for the specimen, e.g. "S-3" or "BH2 4.5 m". */
  specimen?: string;
}

/** A plotted point that remembers where it came from (`index` is 1-based, as the user numbers tests). */
export interface SourcedPoint {
  x: number;
  y: number;
  index: number;
  id?: string;
  specimen?: string;
}

/** One problem found in the input: `where` is "test 3 (S-3)" or "input". */
export interface LabProblem {
  where: string;
  field: string;
  message: string;
}

/**
 * Thrown for bad lab input. `message` reads like "test 3: normal stress must be positive";
 * `problems` lists every fault found, not only the first.
 */
export class LabInputError extends Error {
  readonly problems: LabProblem[];
  constructor(problems: LabProblem[]) {
    super(problems.map((p) => `${p.where}: ${p.message}`).join("; "));
    this.name = "LabInputError";
    this.problems = problems;
  }
}

/** "test 3" or "test 3 (S-3)"; `index` is 0-based in code, shown 1-based. */
export function describeRow(row: LabRowRef, index: number, noun = "test"): string {
  const label = row.specimen?.trim();
  return label ? `${noun} ${index + 1} (${label})` : `${noun} ${index + 1}`;
}

/** Collects problems so a whole test set is checked before anything is thrown. */
export class ProblemList {
  readonly items: LabProblem[] = [];

  add(where: string, field: string, message: string): void {
    this.items.push({ where, field, message });
  }

  /** Adds a problem unless `value` is a finite number; returns whether it is one. */
  requireFinite(where: string, field: string, label: string, value: unknown): value is number {
    if (typeof value === "number" && Number.isFinite(value)) return true;
    this.add(where, field, `${label} must be a finite number`);
    return false;
  }

  requirePositive(where: string, field: string, label: string, value: unknown): boolean {
    if (!this.requireFinite(where, field, label, value)) return false;
    if (value > 0) return true;
    this.add(where, field, `${label} must be positive`);
    return false;
  }

  requireNonNegative(where: string, field: string, label: string, value: unknown): boolean {
    if (!this.requireFinite(where, field, label, value)) return false;
    if (value >= 0) return true;
    this.add(where, field, `${label} must not be negative`);
    return false;
  }

  throwIfAny(): void {
    if (this.items.length > 0) throw new LabInputError(this.items);
  }
}

/** Ids of the rows that carry one, in input order (rows without an id are skipped). */
export function collectSourceIds(rows: readonly LabRowRef[]): string[] {
  return rows.flatMap((r) => (r.id === undefined ? [] : [r.id]));
}

/** A point with the row's id and specimen copied over (only when present, so JSON stays tidy). */
export function sourcedPoint(row: LabRowRef, index: number, x: number, y: number): SourcedPoint {
  const point: SourcedPoint = { x, y, index: index + 1 };
  if (row.id !== undefined) point.id = row.id;
  if (row.specimen !== undefined) point.specimen = row.specimen;
  return point;
}

export const DEG_PER_RAD = 180 / Math.PI;
