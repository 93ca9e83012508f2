/**
 * Default required minimum factors of safety per loading condition, after U.S. Army Corps of
 * Engineers EM 1110-2-1902 (2003), Table 3-1: end of construction 1.3 (published); long-term
 * steady seepage at maximum storage pool 1.5 (from memory); maximum surcharge pool 1.4 (from
 * memory); rapid drawdown 1.1–1.3 (range published; 1.3 from maximum storage pool and 1.1 from
 * maximum surcharge pool, the split from memory). Local codes and the engineer of record govern;
 * projects may change each value with a stated reason. The guideline's maximum storage and maximum
 * surcharge pools are called the normal and the flood pool here, as in the designer (lib/vocabulary.ts).
 */
import { CONDITION_WORDS } from "@/lib/vocabulary";

export const LOADING_CONDITIONS = [
  {
    key: "end-of-construction",
    label: CONDITION_WORDS["end-of-construction"],
    engineCase: "undrained",
    faces: "both",
    requiredFs: 1.3,
    basis: "USACE EM 1110-2-1902 (2003), Table 3-1",
  },
  {
    key: "steady-seepage",
    label: CONDITION_WORDS["steady-seepage"],
    engineCase: "steady",
    faces: "downstream",
    requiredFs: 1.5,
    basis: "USACE EM 1110-2-1902 (2003), Table 3-1 (value from memory)",
  },
  {
    key: "surcharge-pool",
    label: CONDITION_WORDS["surcharge-pool"],
    engineCase: "steady",
    faces: "downstream",
    requiredFs: 1.4,
    basis: "USACE EM 1110-2-1902 (2003), Table 3-1 (value from memory)",
  },
  {
    key: "drawdown-storage",
    label: CONDITION_WORDS["drawdown-storage"],
    engineCase: "drawdown",
    faces: "upstream",
    requiredFs: 1.3,
    basis: "USACE EM 1110-2-1902 (2003), Table 3-1 (1.1–1.3 published; split from memory)",
  },
  {
    key: "drawdown-surcharge",
    label: CONDITION_WORDS["drawdown-surcharge"],
    engineCase: "drawdown",
    faces: "upstream",
    requiredFs: 1.1,
    basis: "USACE EM 1110-2-1902 (2003), Table 3-1 (1.1–1.3 published; split from memory)",
  },
] as const;

export type LoadingConditionKey = (typeof LOADING_CONDITIONS)[number]["key"];
export const LOADING_CONDITION_KEYS = LOADING_CONDITIONS.map((c) => c.key) as [
  LoadingConditionKey,
  ...LoadingConditionKey[],
];

export const GUIDANCE_NOTE =
  "Defaults follow one published guideline; local codes and the engineer of record decide the values that apply. " +
  "The normal and flood pools are what that guideline calls the maximum storage and maximum surcharge pools.";

export function loadingCondition(key: LoadingConditionKey) {
  return LOADING_CONDITIONS.find((c) => c.key === key)!;
}
