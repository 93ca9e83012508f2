import { ProblemList, type LabRowRef } from "./lab-input";

/** Atterberg limits of one sample (all water contents in %). */
export interface AtterbergInput extends LabRowRef {
  liquidLimit: number;
  /** Plastic limit; omit when the sample could not be rolled (then non-plastic). */
  plasticLimit?: number;
  /** Natural water content, for the liquidity index. */
  waterContent?: number;
  /** The lab reported the sample as non-plastic. */
  nonPlastic?: boolean;
}

/** Fine-grained group read from the plasticity chart (inorganic groups only). */
export type PlasticityGroup = "CL" | "CH" | "ML" | "MH" | "CL-ML" | "NP";

export interface AtterbergResult {
  liquidLimit: number;
  plasticLimit: number | null;
  /** PI = LL − PL (%); 0 when non-plastic. */
  plasticityIndex: number;
  /** LI = (w − PL)/PI; null without w or when non-plastic. */
  liquidityIndex: number | null;
  /** PI on the A-line, 0.73·(LL − 20), and the U-line, 0.9·(LL − 8), at this LL. */
  aLinePI: number;
  uLinePI: number;
  /** A hint, not a classification: D2487 also needs the grading and an organic check. */
  hint: { group: PlasticityGroup; explanation: string };
  sourceIds: string[];
  warnings: string[];
}

/** A-line of the plasticity chart (PI, %): PI = 0.73·(LL − 20) (Casagrande; ASTM D2487 Fig. 3). */
export function aLine(liquidLimit: number): number {
  return 0.73 * (liquidLimit - 20);
}

/** U-line, the upper limit of natural soils seen so far (PI, %): PI = 0.9·(LL − 8) (ASTM D2487 Fig. 3). */
export function uLine(liquidLimit: number): number {
  return 0.9 * (liquidLimit - 8);
}

const ORGANIC_NOTE =
  "Organic silts and clays (OL, OH) cannot be told from the limits alone: ASTM D2487 compares the liquid limit after oven drying (ratio below 0.75).";

/**
 * Plasticity index, liquidity index and the fine-grained group the limits point to on the
 * plasticity chart, by the rules of ASTM D2487 (fine-grained soils, inorganic):
 * LL < 50: PI > 7 on or above the A-line → CL; PI 4–7 on or above it → CL-ML; PI < 4 or below → ML.
 * LL ≥ 50: on or above the A-line → CH; below → MH. PL ≥ LL or no PL → NP (ASTM D4318).
 * @throws LabInputError, e.g. "sample: liquid limit must be positive".
 */
export function classifyAtterbergLimits(input: AtterbergInput): AtterbergResult {
  const where = input.specimen ? `sample (${input.specimen})` : "sample";
  const problems = new ProblemList();
  problems.requirePositive(where, "liquidLimit", "liquid limit", input.liquidLimit);
  if (input.plasticLimit !== undefined)
    problems.requireNonNegative(where, "plasticLimit", "plastic limit", input.plasticLimit);
  if (input.waterContent !== undefined)
    problems.requireNonNegative(where, "waterContent", "water content", input.waterContent);
  problems.throwIfAny();

  const ll = input.liquidLimit;
  const pl = input.plasticLimit ?? null;
  const warnings: string[] = [];
  const a = aLine(ll);
  const u = uLine(ll);
  const base = {
    liquidLimit: ll,
    plasticLimit: pl,
    aLinePI: a,
    uLinePI: u,
    sourceIds: input.id === undefined ? [] : [input.id],
    warnings,
  };

  if (input.nonPlastic === true || pl === null || pl >= ll) {
    const why =
      input.nonPlastic === true
        ? "the lab reported the sample as non-plastic"
        : pl === null
          ? "no plastic limit was found"
          : `the plastic limit (${pl}) is not below the liquid limit (${ll})`;
    return {
      ...base,
      plasticityIndex: 0,
      liquidityIndex: null,
      hint: { group: "NP", explanation: `Non-plastic: ${why}. Classify by grading (silt or sand).` },
    };
  }

  const pi = ll - pl;
  const li = input.waterContent === undefined ? null : (input.waterContent - pl) / pi;
  if (pi > u + 1e-9)
    warnings.push(
      `PI ${fmt(pi)} lies above the U-line (${fmt(u)} at LL ${fmt(ll)}): natural soils rarely plot there; check the limits`,
    );
  if (ll > 120) warnings.push(`LL ${fmt(ll)} is beyond the usual chart (up to about 100–120)`);
  return { ...base, plasticityIndex: pi, liquidityIndex: li, hint: pickGroup(ll, pi, a) };
}

function pickGroup(ll: number, pi: number, a: number): AtterbergResult["hint"] {
  const onOrAbove = pi >= a - 1e-9;
  const position = `PI ${fmt(pi)} is ${onOrAbove ? "on or above" : "below"} the A-line (${fmt(Math.max(a, 0))} at LL ${fmt(ll)})`;
  let group: PlasticityGroup;
  let words: string;
  if (ll >= 50) {
    group = onOrAbove ? "CH" : "MH";
    words = onOrAbove ? "fat clay" : "elastic silt";
  } else if (onOrAbove && pi > 7) {
    [group, words] = ["CL", "lean clay"];
  } else if (onOrAbove && pi >= 4) {
    [group, words] = ["CL-ML", "silty clay (hatched zone, PI 4–7)"];
  } else {
    [group, words] = ["ML", "silt"];
  }
  const range = ll >= 50 ? "LL ≥ 50" : "LL < 50";
  return { group, explanation: `${group}, ${words}: ${range}; ${position}. ${ORGANIC_NOTE}` };
}

function fmt(v: number): string {
  return Number.isInteger(v) ? String(v) : v.toFixed(1);
}
