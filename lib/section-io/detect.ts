/**
 * Tells which of the section files a dropped file is, from its name and first line, so one drop
 * area takes all of them.
 */
export type SectionFileKind = "geometry" | "phreatic" | "materials" | "section-json" | "unknown";

export function detectSectionFile(name: string, text: string): SectionFileKind {
  const lower = name.toLowerCase();
  const trimmed = text.replace(/^\uFEFF/, "").trimStart();
  if (lower.endsWith(".json") || trimmed.startsWith("{")) return "section-json";
  const header = (trimmed.split(/\r?\n/, 1)[0] ?? "")
    .toLowerCase()
    .split(/[;,]/)
    .map((c) => c.trim());
  // A header that is nearly right (x,elev) is still told apart, so its parser can name the missing column.
  if (header.includes("region")) return "geometry";
  if (header.includes("model") || (header.includes("id") && header.includes("phi"))) return "materials";
  if (header.length >= 2 && header[0] === "x") return "phreatic";
  return "unknown";
}
