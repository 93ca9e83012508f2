/**
 * The one mapping from the codes the engine and the database keep to the words a reader sees, on
 * the pages, in mail and in the PDF report. Engine codes ("steady", "fellenius", "mohr-coulomb",
 * "submitted") never reach a reader; they are looked up here. Pools carry the same names in the
 * designer and in the analysis: the normal pool (the maximum storage pool of USACE EM 1110-2-1902)
 * and the flood pool (its maximum surcharge pool).
 */

/** The two reservoir levels a dam is checked at, as the designer's form names them. */
export const POOL_WORDS = { normal: "normal pool", flood: "flood pool" } as const;

/** Loading conditions of a run (keys of lib/analysis/required-fs.ts). */
export const CONDITION_WORDS = {
  "end-of-construction": "End of construction",
  "steady-seepage": `Long-term steady seepage, ${POOL_WORDS.normal}`,
  "surcharge-pool": `Steady seepage, ${POOL_WORDS.flood}`,
  "drawdown-storage": `Rapid drawdown from the ${POOL_WORDS.normal}`,
  "drawdown-surcharge": `Rapid drawdown from the ${POOL_WORDS.flood}`,
} as const;

/** A loading condition's key in words; an unknown key is shown as it is, with its hyphens dropped. */
export function conditionWords(key: string): string {
  return (CONDITION_WORDS as Record<string, string>)[key] ?? key.replace(/-/g, " ");
}

/** The engine's load cases (how pore pressures and strengths are taken), in words. */
export const LOAD_CASE_WORDS: Record<string, string> = {
  steady: "steady seepage, effective stresses",
  drawdown: "rapid drawdown",
  undrained: "end of construction, undrained strengths",
};

export function loadCaseWords(code: string): string {
  return LOAD_CASE_WORDS[code] ?? code;
}

/** Names of the limit-equilibrium methods as the result views and the report print them. */
export const METHOD_NAME: Record<"bishop" | "fellenius" | "spencer" | "morgenstern-price", string> = {
  bishop: "Bishop's simplified method",
  fellenius: "Ordinary method of slices",
  spencer: "Spencer's method",
  "morgenstern-price": "Morgenstern–Price",
};

/** Short names, for labels on a drawing and table headers. */
export const METHOD_SHORT: Record<"bishop" | "fellenius" | "spencer" | "morgenstern-price", string> = {
  bishop: "Bishop",
  fellenius: "Ordinary",
  spencer: "Spencer",
  "morgenstern-price": "Morgenstern–Price",
};

export function methodName(code: string): string {
  return (METHOD_NAME as Record<string, string>)[code] ?? code;
}

/** The face of the dam a slip surface comes out on. */
export const FACE_WORDS: Record<string, string> = { upstream: "Upstream", downstream: "Downstream" };

/** "Upstream face"; lower case with `inSentence`. */
export function faceWords(code: string, inSentence = false): string {
  const w = `${FACE_WORDS[code] ?? code} face`;
  return inSentence ? w.toLowerCase() : w;
}

/** Material strength models, as the library's form offers them. */
export const MODEL_LABELS = {
  "mohr-coulomb": "Drained strength (c′, φ′)",
  undrained: "Undrained strength (su, φ = 0)",
  impenetrable: "Impenetrable (no slip through it)",
} as const;

/** Shorter model names, for narrow table columns such as the report's. */
export const MODEL_SHORT = {
  "mohr-coulomb": "Drained (c′, φ′)",
  undrained: "Undrained (su)",
  impenetrable: "Impenetrable",
} as const;

export function modelWords(code: string): string {
  return (MODEL_LABELS as Record<string, string>)[code] ?? code;
}

/** Short labels of a run's review status, for its badge and the runs filter. */
export const STATUS_LABELS = {
  draft: "Draft",
  submitted: "Awaiting review",
  returned: "Returned",
  approved: "Signed off",
} as const;

/** Words for a status in sentences, mail and the report (the badge and filter use STATUS_LABELS). */
export const STATUS_WORDS = {
  draft: "draft",
  submitted: "awaiting review",
  returned: "returned with comments",
  approved: "signed off",
} as const;

/** Settings of the engine's `analysis` block, as the run set-up form names them. */
export const ANALYSIS_SETTING_WORDS: Record<string, string> = {
  case: "Load case",
  methods: "Methods",
  slices: "Slices per circle",
  direction: "Slip direction",
  grid: "Grid of centres",
  radii: "Radii",
  drawdown: "Drawdown",
  ordinaryForm: "Ordinary method's form",
  refine: "Refine around the best centres",
  lowestCount: "Lowest circles kept per method",
  minDepth: "Least slip-mass depth",
};

const DIRECTION_WORDS: Record<string, string> = {
  auto: "found from the section",
  left: "towards the left",
  right: "towards the right",
};

const DRAWDOWN_METHOD_WORDS: Record<string, string> = {
  effective: "effective-stress method",
  staged: "staged total-stress method",
};

const num = (v: unknown) => (typeof v === "number" ? String(+v.toFixed(3)) : String(v));

/** One `analysis` setting's value in words ("6 × 5 centres, x 10–40 m, elevation 20–35 m"), never raw JSON. */
export function analysisSettingWords(key: string, value: unknown): string {
  if (value === undefined || value === null) return "—";
  const o = (typeof value === "object" && !Array.isArray(value) ? value : {}) as Record<string, unknown>;
  switch (key) {
    case "case":
      return loadCaseWords(String(value));
    case "methods":
      return Array.isArray(value) ? value.map((m) => methodName(String(m))).join(" and ") : String(value);
    case "direction":
      return DIRECTION_WORDS[String(value)] ?? String(value);
    case "grid":
      return `${num(o.nx)} × ${num(o.ny)} centres, x ${num(o.x1)}–${num(o.x2)} m, elevation ${num(o.y1)}–${num(o.y2)} m`;
    case "radii":
      return "tangentY1" in o
        ? `${num(o.n)} tangent levels, elevation ${num(o.tangentY1)}–${num(o.tangentY2)} m`
        : `${num(o.n)} radii, ${num(o.r1)}–${num(o.r2)} m`;
    case "drawdown":
      return [
        `from ${num(o.from)} m to ${num(o.to)} m`,
        o.method ? (DRAWDOWN_METHOD_WORDS[String(o.method)] ?? String(o.method)) : null,
        o.stagedVariant === "usace-two-stage" ? "two stages (USACE 1970)" : o.stagedVariant ? "three stages" : null,
      ]
        .filter(Boolean)
        .join(", ");
    case "ordinaryForm":
      return value === "effective-weight" ? "effective-weight form" : "classical form";
    case "refine":
      return value ? "yes" : "no";
    case "minDepth":
      return `${num(value)} m`;
    default:
      return typeof value === "object" ? JSON.stringify(value) : num(value);
  }
}
