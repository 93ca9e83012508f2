/**
 * Target reliability index and the words for a result against it. The levels of expected
 * performance against β are the table of the U.S. Army Corps of Engineers (ETL 1110-2-547, 1997),
 * as reproduced with its probabilities in Kar, "Probabilistic based reliability analysis of a finite
 * soil slope" (presentation, Table 1, "U.S. Army Corps of Engineers, 1997"): β 1.0 hazardous (0.16),
 * 1.5 unsatisfactory (0.07), 2.0 poor (0.023), 2.5 below average (0.006), 3.0 above average (0.001),
 * 4.0 good (0.00003), 5.0 high (0.0000003). The ETL itself was not reached; each probability is
 * computed here as Φ(−β) and checked against the table's rounded values.
 * The default target, β = 3 ("above average"), is the level often quoted for dams (common practice,
 * from memory); projects set their own with a reason, and local codes and the engineer of record govern.
 */
import { formatProbability } from "@/lib/format";
import { normalCdf } from "@/lib/stability";

export const PERFORMANCE_LEVELS = [
  { beta: 1.0, level: "hazardous" },
  { beta: 1.5, level: "unsatisfactory" },
  { beta: 2.0, level: "poor" },
  { beta: 2.5, level: "below average" },
  { beta: 3.0, level: "above average" },
  { beta: 4.0, level: "good" },
  { beta: 5.0, level: "high" },
] as const;

export const DEFAULT_TARGET_BETA = 3.0;
export const TARGET_BASIS =
  "Levels of expected performance against β after the U.S. Army Corps of Engineers (ETL 1110-2-547, 1997); " +
  "the default target β = 3.0 is the 'above average' level.";

/** The probability of unsatisfactory performance that a β stands for, Φ(−β). */
export const pfOfBeta = (beta: number) => normalCdf(-beta);

/** The table's level for a β: the highest level whose β it reaches, or "below hazardous". */
export function performanceLevel(beta: number): { level: string; from: number | null; to: number | null } {
  let at = -1;
  PERFORMANCE_LEVELS.forEach((l, i) => {
    if (beta >= l.beta) at = i;
  });
  if (at < 0) return { level: "below the hazardous level", from: null, to: PERFORMANCE_LEVELS[0].beta };
  return {
    level: PERFORMANCE_LEVELS[at].level,
    from: PERFORMANCE_LEVELS[at].beta,
    to: PERFORMANCE_LEVELS[at + 1]?.beta ?? null,
  };
}

export interface VerdictInput {
  betaNormal: number | null;
  betaLognormal: number | null;
  pf: number | null;
  /** Samples with a factor of safety. */
  valid: number;
  target: number;
}

export interface Verdict {
  /** The β judged: the lower of the normal and lognormal forms. */
  beta: number | null;
  meets: boolean | null;
  level: string | null;
  sentence: string;
}

const pct = (p: number) => formatProbability(p, 1);

/**
 * pf and β against the project's target, in words. The lower of the two forms of β is judged, so
 * the verdict does not rest on assuming either distribution of FS.
 */
export function reliabilityVerdict(v: VerdictInput): Verdict {
  const betas = [v.betaNormal, v.betaLognormal].filter((b): b is number => b !== null && Number.isFinite(b));
  const targetPf = pfOfBeta(v.target);
  if (betas.length === 0)
    return {
      beta: null,
      meets: null,
      level: null,
      sentence: "No reliability index could be computed from these samples.",
    };
  const beta = Math.min(...betas);
  const meets = beta >= v.target;
  const lvl = performanceLevel(beta);
  const range = lvl.from === null ? `β < ${lvl.to}` : lvl.to === null ? `β ≥ ${lvl.from}` : `β ${lvl.from}–${lvl.to}`;
  const pfText =
    v.pf === null
      ? ""
      : v.pf === 0
        ? ` No sample of ${v.valid.toLocaleString("en-US")} failed, so pf is below about 1 in ${v.valid.toLocaleString("en-US")};`
        : ` pf = ${pct(v.pf)} of the samples failed;`;
  const sentence =
    `β = ${beta.toFixed(2)} (the lower of its normal and lognormal forms) is ` +
    `${meets ? "at or above" : "below"} the project's target of ${v.target.toFixed(2)}.` +
    `${pfText} the target stands for pf = Φ(−${v.target.toFixed(2)}) = ${pct(targetPf)}. ` +
    `The USACE table puts this β at "${lvl.level}" expected performance (${range}).`;
  return { beta, meets, level: lvl.level, sentence };
}
