import { LabInputError, ProblemList, collectSourceIds, describeRow, type LabRowRef } from "./lab-input";

/**
 * One reading of a laboratory permeability test. Lengths in mm, time in s, volume in mL.
 * Constant head: `head` is the steady head difference across the specimen and `volume` the water
 * collected in `time`. Falling head: the standpipe head falls from `head` to `headEnd` in `time`.
 */
export interface PermeabilityReading extends LabRowRef {
  head: number;
  headEnd?: number;
  time: number;
  volume?: number;
}

export type PermeabilityMethod = "constant-head" | "falling-head";

export interface PermeabilityInput {
  method: PermeabilityMethod;
  /** Specimen length L along the flow (mm). */
  length: number;
  /** Specimen diameter D (mm). */
  diameter: number;
  /** Standpipe diameter d (mm), falling head only. */
  standpipeDiameter?: number;
  readings: PermeabilityReading[];
}

export interface PermeabilityResult {
  method: PermeabilityMethod;
  /** k of each reading (m/s), in input order. */
  readings: { index: number; specimen?: string; k: number }[];
  /** The design value: the geometric mean of the readings' k (m/s). */
  k: number;
  /** Largest over smallest reading k: a spread above 3 draws a warning. */
  spread: number;
  source: string;
  sourceIds: string[];
  warnings: string[];
}

/** Where the formulas come from, shown beside the result. */
export const PERMEABILITY_SOURCE =
  "Craig's Soil Mechanics, ch. 2 (constant head k = QL/(Aht); falling head k = aL/(At)·ln(h1/h2)); " +
  "the tests themselves as BS 1377-5 and ASTM D5084";

const circle = (diameterMm: number) => (Math.PI * diameterMm * diameterMm) / 4;

/** k (m/s) of one constant-head reading: k = Q·L / (A·h·t) (Darcy's law through the specimen). */
export function constantHeadK(volumeMl: number, lengthMm: number, areaMm2: number, headMm: number, timeS: number) {
  // 1 mL = 1000 mm³; the result in mm/s is divided by 1000 for m/s.
  return (volumeMl * 1000 * lengthMm) / (areaMm2 * headMm * timeS) / 1000;
}

/** k (m/s) of one falling-head reading: k = a·L / (A·t) · ln(h1/h2). */
export function fallingHeadK(
  standpipeAreaMm2: number,
  lengthMm: number,
  areaMm2: number,
  timeS: number,
  h1: number,
  h2: number,
) {
  return ((standpipeAreaMm2 * lengthMm) / (areaMm2 * timeS)) * Math.log(h1 / h2) * 1e-3;
}

/**
 * The coefficient of permeability from constant-head or falling-head readings, each reading
 * worked out with the standard formula and the design value taken as their geometric mean (k
 * spreads over orders of magnitude, so the mean of the logarithms). No temperature correction is
 * applied: readings are taken as at the laboratory's standard temperature.
 * @throws LabInputError listing every bad reading, e.g. "test 2: end head must be below the start head".
 */
export function derivePermeability(input: PermeabilityInput): PermeabilityResult {
  const problems = new ProblemList();
  const readings = input.readings ?? [];
  if (readings.length < 1) problems.add("input", "readings", "at least 1 reading is needed");
  problems.requirePositive("input", "length", "specimen length", input.length);
  problems.requirePositive("input", "diameter", "specimen diameter", input.diameter);
  const falling = input.method === "falling-head";
  if (falling) problems.requirePositive("input", "standpipeDiameter", "standpipe diameter", input.standpipeDiameter);
  readings.forEach((r, i) => {
    const where = describeRow(r, i);
    problems.requirePositive(where, "head", falling ? "start head" : "head", r.head);
    problems.requirePositive(where, "time", "time", r.time);
    if (falling) {
      problems.requirePositive(where, "headEnd", "end head", r.headEnd);
      if (r.headEnd !== undefined && r.headEnd > 0 && r.head > 0 && r.headEnd >= r.head)
        problems.add(where, "headEnd", "end head must be below the start head");
    } else problems.requirePositive(where, "volume", "volume collected", r.volume);
  });
  problems.throwIfAny();

  const area = circle(input.diameter);
  const ks = readings.map((r) =>
    falling
      ? fallingHeadK(circle(input.standpipeDiameter!), input.length, area, r.time, r.head, r.headEnd!)
      : constantHeadK(r.volume!, input.length, area, r.head, r.time),
  );
  if (ks.some((k) => !Number.isFinite(k) || k <= 0))
    throw new LabInputError([{ where: "input", field: "readings", message: "the readings give no finite k" }]);
  const k = Math.exp(ks.reduce((s, v) => s + Math.log(v), 0) / ks.length);
  const spread = Math.max(...ks) / Math.min(...ks);
  const warnings: string[] = [];
  if (spread > 3) warnings.push(`the readings differ by a factor of ${spread.toFixed(1)}: check saturation and leaks`);
  if (falling && k > 1e-4)
    warnings.push("k above 10⁻⁴ m/s: a constant-head test suits such a free-draining soil better");
  if (!falling && k < 1e-7)
    warnings.push("k below 10⁻⁷ m/s: a falling-head or flexible-wall test suits such a fine soil better");
  return {
    method: input.method,
    readings: readings.map((r, i) => ({ index: i + 1, ...(r.specimen ? { specimen: r.specimen } : {}), k: ks[i] })),
    k,
    spread,
    source: PERMEABILITY_SOURCE,
    sourceIds: collectSourceIds(readings),
    warnings,
  };
}
