import type { ToolName } from "./types";

export interface ToolInfo {
  name: ToolName;
  label: string;
  /** Single-letter shortcut, lower case. */
  key: string;
  hint: string;
}

/** The editor's tools in toolbar order, with the hint shown while each is active. */
export const TOOLS: readonly ToolInfo[] = [
  {
    name: "select",
    label: "Select and move",
    key: "s",
    hint: "Click a region or a line to select it. Drag a vertex to move it (Alt-drag detaches a shared corner). Double-click an edge to add a vertex.",
  },
  {
    name: "region",
    label: "Draw region",
    key: "r",
    hint: "Click corner by corner. Enter, a double-click or a click on the first corner closes the outline; Escape drops it.",
  },
  {
    name: "phreatic",
    label: "Draw phreatic line",
    key: "w",
    hint: "Click points from left to right across the section. Enter or a double-click finishes; Escape drops it.",
  },
  {
    name: "reservoir",
    label: "Set reservoir level",
    key: "l",
    hint: "Click at the water elevation, on the side of the pool. Water above the ground surface is reservoir water.",
  },
  {
    name: "pan",
    label: "Pan view",
    key: "h",
    hint: "Drag to move the view. Space-drag or the middle button pans with any tool.",
  },
];

export function toolByKey(key: string): ToolInfo | undefined {
  return TOOLS.find((t) => t.key === key.toLowerCase());
}

export function toolInfo(name: ToolName): ToolInfo {
  return TOOLS.find((t) => t.name === name) ?? TOOLS[0];
}
