/** The methods' names as the engine's own messages use them (sentence case, to open a sentence). */
import type { AnalysisMethod } from "./schema";

export const METHOD_LABEL: Record<AnalysisMethod, string> = {
  bishop: "Bishop's simplified method",
  fellenius: "The ordinary method",
  spencer: "Spencer's method",
  "morgenstern-price": "The Morgenstern–Price method",
};
