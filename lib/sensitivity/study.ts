/**
 * A sensitivity study of one run: the tornado of every input and the FS line along one input,
 * with its crossing of the required FS. The FS of a trial document comes from the caller (the
 * browser's worker, or the server's own search for the PDF), so both use this one routine.
 */
import type { SectionDocument } from "@/lib/stability";
import { writeCsv } from "@/lib/section-io/csv-write";
import { withParameters, type InputParameter } from "./parameters";
import {
  bisectTarget,
  bracketTarget,
  sweepValues,
  tornadoBar,
  tornadoOrder,
  variedValues,
  type TornadoBar,
  type Variation,
} from "./sensitivity";

export type FsOf = (doc: SectionDocument) => Promise<number | null>;

/** Every input that can move, each down and up with the others held; largest swing first. */
export async function tornadoStudy(
  doc: SectionDocument,
  params: readonly InputParameter[],
  variation: Variation,
  fsOf: FsOf,
): Promise<TornadoBar[]> {
  const bars: TornadoBar[] = [];
  for (const p of params) {
    const range = variedValues(p, variation);
    if (!range) continue;
    const fsLow = await fsOf(withParameters(doc, params, { [p.key]: range.low }));
    const fsHigh = await fsOf(withParameters(doc, params, { [p.key]: range.high }));
    bars.push(tornadoBar(p, range, fsLow, fsHigh));
  }
  return tornadoOrder(bars);
}

export interface SweepStudy {
  key: string;
  label: string;
  unit: string;
  points: { x: number; fs: number | null }[];
  requiredFs: number;
  /** The input's value at which FS equals the required FS, or null when the range never reaches it. */
  crossing: number | null;
}

/** FS at n values across one input's range, then the required-FS crossing to a tenth of the input's step. */
export async function sweepStudy(
  doc: SectionDocument,
  params: readonly InputParameter[],
  p: InputParameter,
  n: number,
  requiredFs: number,
  fsOf: FsOf,
): Promise<SweepStudy> {
  const at = (x: number) => fsOf(withParameters(doc, params, { [p.key]: x }));
  const points: SweepStudy["points"] = [];
  for (const x of sweepValues(p.min, p.max, n)) points.push({ x, fs: await at(x) });
  const bracket = bracketTarget(points, requiredFs);
  const crossing = bracket ? await bisectTarget(at, bracket.lo, bracket.hi, requiredFs, p.step / 10) : null;
  return { key: p.key, label: p.label, unit: p.unit, points, requiredFs, crossing };
}

/** The study as CSV through the project's one CSV writer: one row per tornado bar, then the line's points. */
export function sensitivityCsv(baseFs: number, bars: readonly TornadoBar[], sweep: SweepStudy | null): string {
  const rows: (string | number | null)[][] = [["base", "", null, null, baseFs, baseFs, 0]];
  for (const b of bars) rows.push(["tornado", b.label, b.low, b.high, b.fsLow, b.fsHigh, b.swing]);
  if (sweep) {
    for (const pt of sweep.points) rows.push(["line", sweep.label, pt.x, null, pt.fs, null, null]);
    rows.push(["required FS reached", sweep.label, sweep.crossing, null, sweep.requiredFs, null, null]);
  }
  return writeCsv(["part", "input", "value_low", "value_high", "fs_low", "fs_high", "swing"], rows);
}
