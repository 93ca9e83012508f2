/**
 * The reviewer's checklist for one run (one load case on one face). Each item is confirmed,
 * flagged as a concern, or left open; a run is signed off only with every item confirmed.
 * Two items get a hint computed from the run itself, which the reviewer still has to confirm.
 */
import { verdictOf } from "@/lib/runs/view/verdict";

export const CHECKLIST_KEYS = ["geometry", "strengths", "water", "grid", "fs"] as const;
export type ChecklistKey = (typeof CHECKLIST_KEYS)[number];
export const CHECK_STATES = ["open", "ok", "concern"] as const;
export type CheckState = (typeof CHECK_STATES)[number];

export interface ChecklistItem {
  key: ChecklistKey;
  label: string;
  /** What the reviewer looks at to tick it. */
  prompt: string;
}

export const CHECKLIST_ITEMS: readonly ChecklistItem[] = [
  {
    key: "geometry",
    label: "Geometry matches the drawings",
    prompt:
      "Outline, crest and toe levels and layer boundaries agree with the issued drawings for this section version.",
  },
  {
    key: "strengths",
    label: "Strengths traced to lab results",
    prompt: "Each material's c′ and φ′ or su comes from a named lab test set or a stated design value.",
  },
  {
    key: "water",
    label: "Water conditions fit the load case",
    prompt: "Phreatic line, pool and drawdown levels are those of the loading condition checked.",
  },
  {
    key: "grid",
    label: "Grid not bounded by its edge",
    prompt: "The lowest FS lies inside the grid of trial centres and the radius range, not on their limits.",
  },
  {
    key: "fs",
    label: "FS against the required value",
    prompt:
      "Each method's FS is compared with the required FS for this loading condition, and the margin is acceptable.",
  },
];

export interface ChecklistEntry {
  key: ChecklistKey;
  state: CheckState;
  note: string;
  updatedByName?: string;
  updatedAt?: string;
}

/** Every item, filled from what was saved; items never touched are open. */
export function fullChecklist(saved: readonly ChecklistEntry[]): (ChecklistItem & ChecklistEntry)[] {
  return CHECKLIST_ITEMS.map((item) => {
    const s = saved.find((e) => e.key === item.key);
    return {
      ...item,
      key: item.key,
      state: s?.state ?? "open",
      note: s?.note ?? "",
      updatedByName: s?.updatedByName,
      updatedAt: s?.updatedAt,
    };
  });
}

/** Items that keep a run from being signed off: open ones and those flagged as a concern. */
export function openChecklistItems(saved: readonly ChecklistEntry[]): ChecklistItem[] {
  return fullChecklist(saved).filter((e) => e.state !== "ok");
}

export interface HintInput {
  warnings: readonly { code: string; message: string }[];
  fs: Partial<Record<"bishop" | "fellenius", number | null>>;
  requiredFs: number;
}

export interface ChecklistHint {
  tone: "good" | "check";
  text: string;
}

const EDGE_CODES = new Set(["minimum-on-grid-edge", "minimum-at-radius-limit"]);
const METHOD_LABEL = { bishop: "Bishop", fellenius: "Ordinary" } as const;

/** What the run itself says about the grid and FS items. */
export function checklistHints(input: HintInput): Partial<Record<ChecklistKey, ChecklistHint>> {
  const edge = input.warnings.filter((w) => EDGE_CODES.has(w.code));
  const grid: ChecklistHint =
    edge.length > 0
      ? { tone: "check", text: edge.map((w) => w.message).join(" ") }
      : { tone: "good", text: "The search found its lowest FS inside the grid and the radius range." };
  const parts: string[] = [];
  let allPass = true;
  for (const m of ["bishop", "fellenius"] as const) {
    const fs = input.fs[m];
    if (fs === undefined || fs === null) continue;
    const v = verdictOf(fs, input.requiredFs);
    if (v !== "pass") allPass = false;
    parts.push(`${METHOD_LABEL[m]} ${fs.toFixed(3)} ${v === "pass" ? "≥" : "<"} ${input.requiredFs.toFixed(2)}`);
  }
  const fs: ChecklistHint =
    parts.length === 0
      ? { tone: "check", text: "No method gave a factor of safety." }
      : {
          tone: allPass ? "good" : "check",
          text: `${parts.join("; ")}${allPass ? "" : " — below the required value"}.`,
        };
  return { grid, fs };
}
