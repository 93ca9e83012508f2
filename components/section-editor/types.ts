import type { SectionDocument } from "@/lib/stability";
import type { EditorIssue } from "@/lib/editor/issue-paths";
import type { RunSetup } from "@/lib/analysis/run-setup";

export type { EditorIssue };

/** One entry of the project's material library; a region's `material` holds its key. */
export interface MaterialSwatch {
  key: string;
  name: string;
  color: string;
}

export interface SectionEditorProps {
  /** The section being edited; the parent owns it (controlled component). */
  document: SectionDocument;
  /** Called with a new document after every edit, undo and redo. */
  onChange(doc: SectionDocument): void;
  materials: MaterialSwatch[];
  /** Validation errors and warnings to list and mark on the drawing. */
  issues?: EditorIssue[];
  readOnly?: boolean;
  /** Canvas height in px (default 520). */
  height?: number;
  /** Live checking of the drawing; absent, the editor offers none. */
  live?: LiveModeProps;
}

export interface LiveModeProps {
  /** The set-up of the section's last kept run; null: an automatic search of the downstream face. */
  lastRunSetup: RunSetup | null;
  /** Keeps the drawing as a new section version through the usual save. */
  onKeep?: () => void;
  canKeep?: boolean;
  keepLabel?: string;
}

export type ToolName = "select" | "region" | "phreatic" | "reservoir" | "pan";

/** A pointer event on the canvas, in px relative to the canvas container. */
export interface CanvasPointer {
  type: "down" | "move" | "up" | "dblclick" | "wheel" | "leave";
  sx: number;
  sy: number;
  button: number;
  altKey: boolean;
  shiftKey: boolean;
  deltaY: number;
}
