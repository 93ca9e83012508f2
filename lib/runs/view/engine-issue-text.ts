/**
 * Engine errors in the user's words. The engine names materials by their place in the document
 * ("materials[0]") and speaks in document keys (freeDraining: true); a user knows the material by
 * its name and the library's fields. Translated here, at the edge where errors are shown, so the
 * engine's own messages stay exact for the command line and the API.
 */
import { messageWords, placeWords } from "@/lib/issue-words";

export interface IssueLike {
  code: string;
  path: string;
  message: string;
}

export interface UserIssue {
  /** Where, in words: "Material 'Clay core'" or the document path when it names no material. */
  where: string;
  message: string;
}

const MATERIAL_PATH = /^materials\[(\d+)\](.*)$/;

/** What each engine code says to a user when it can say it better than the engine's text. */
const PLAIN: Record<string, string> = {
  "r-envelope-missing":
    "needs an R envelope (cR, φR) for staged drawdown. Enter cR (kPa) and φR (°) from consolidated-undrained " +
    "triaxial tests (a CU set in the materials library gives both), or mark the material free-draining if it " +
    "drains as fast as the pool falls.",
};

/** One engine issue, with its material named and, for known codes, a message in plain words. */
export function userIssue(issue: IssueLike, materials: readonly { id: string; name?: string }[]): UserIssue {
  const m = MATERIAL_PATH.exec(issue.path);
  const material = m ? materials[Number(m[1])] : undefined;
  // Places other than a material read in the panels' numbering (lib/issue-words.ts).
  if (!material) return { where: placeWords(issue.path), message: messageWords(issue.message) };
  const field = placeWords(`materials[0]${m![2]}`).replace(/^Material 1,? ?/, "");
  const where = `Material '${material.name ?? material.id}'${field ? `, ${field}` : ""}`;
  return { where, message: PLAIN[issue.code] ?? messageWords(issue.message) };
}
