/**
 * The file types a source document may have, and the check that a file's content really is
 * the type its name and MIME type claim (a renamed program is refused). Pure: shared by the
 * upload route and the drop area.
 */

export type FileTypeId = "pdf" | "csv" | "png" | "jpeg" | "webp" | "tiff";

export interface FileTypeSpec {
  id: FileTypeId;
  label: string;
  /** The MIME type stored and served back. */
  contentType: string;
  /** Other MIME types browsers send for the same files (CSV from spreadsheet programs). */
  aliases: readonly string[];
  extensions: readonly string[];
  /** Whether the first bytes of the file look like this type. */
  matches(head: Uint8Array): boolean;
}

/** How many leading bytes `classifyUpload` needs to see. */
export const SNIFF_BYTES = 8192;

/** MIME types that say nothing about the file; the extension decides then. */
const GENERIC_TYPES = new Set(["", "application/octet-stream", "binary/octet-stream"]);

function startsWith(head: Uint8Array, signature: readonly number[], offset = 0): boolean {
  if (head.length < offset + signature.length) return false;
  return signature.every((byte, i) => head[offset + i] === byte);
}

const ascii = (text: string) => [...text].map((c) => c.charCodeAt(0));
const PDF_MAGIC = ascii("%PDF-");

/** PDF readers accept the header anywhere in the first 1024 bytes, after stray bytes from mail gateways. */
function looksLikePdf(head: Uint8Array): boolean {
  const limit = Math.min(head.length, 1024) - PDF_MAGIC.length;
  for (let i = 0; i <= limit; i++) if (startsWith(head, PDF_MAGIC, i)) return true;
  return false;
}

const PNG_MAGIC = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];
const JPEG_MAGIC = [0xff, 0xd8, 0xff];
const TIFF_LITTLE = [0x49, 0x49, 0x2a, 0x00];
const TIFF_BIG = [0x4d, 0x4d, 0x00, 0x2a];

/** Text has no NUL bytes; every binary format here (and programs, archives, old Office files) has some early on. */
function looksLikeText(head: Uint8Array): boolean {
  if (looksLikePdf(head)) return false;
  return !head.includes(0);
}

export const FILE_TYPES: readonly FileTypeSpec[] = [
  { id: "pdf", label: "PDF", contentType: "application/pdf", aliases: [], extensions: [".pdf"], matches: looksLikePdf },
  {
    id: "csv",
    label: "CSV",
    contentType: "text/csv",
    aliases: ["text/plain", "application/vnd.ms-excel", "application/csv"],
    extensions: [".csv"],
    matches: looksLikeText,
  },
  {
    id: "png",
    label: "PNG",
    contentType: "image/png",
    aliases: [],
    extensions: [".png"],
    matches: (h) => startsWith(h, PNG_MAGIC),
  },
  {
    id: "jpeg",
    label: "JPEG",
    contentType: "image/jpeg",
    aliases: ["image/jpg"],
    extensions: [".jpg", ".jpeg"],
    matches: (h) => startsWith(h, JPEG_MAGIC),
  },
  {
    id: "webp",
    label: "WebP",
    contentType: "image/webp",
    aliases: [],
    extensions: [".webp"],
    matches: (h) => startsWith(h, ascii("RIFF")) && startsWith(h, ascii("WEBP"), 8),
  },
  {
    id: "tiff",
    label: "TIFF",
    contentType: "image/tiff",
    aliases: [],
    extensions: [".tif", ".tiff"],
    matches: (h) => startsWith(h, TIFF_LITTLE) || startsWith(h, TIFF_BIG),
  },
];

export const ALLOWED_TYPES_LABEL = "PDF, CSV, PNG, JPEG, WebP or TIFF";

export type Classification = { ok: true; type: FileTypeSpec } | { ok: false; message: string };

/** The lower-case extension with its dot (".pdf"), or "" when the name has none. */
export function extensionOf(name: string): string {
  const dot = name.lastIndexOf(".");
  return dot > 0 ? name.slice(dot).toLowerCase() : "";
}

function normalizeMime(type: string): string {
  return type.split(";")[0].trim().toLowerCase();
}

/**
 * Decides which allowed type a file is, from its name, the MIME type the browser claimed and
 * its first bytes (at least `SNIFF_BYTES` of them, or the whole file if shorter).
 * The claimed type must be allowed, the extension must fit it and the content must match it.
 */
export function classifyUpload(name: string, claimedType: string, head: Uint8Array): Classification {
  const mime = normalizeMime(claimedType);
  const extension = extensionOf(name);
  const byExtension = FILE_TYPES.find((t) => t.extensions.includes(extension));
  const claimed = GENERIC_TYPES.has(mime)
    ? byExtension
    : FILE_TYPES.find((t) => t.contentType === mime || (t.aliases.includes(mime) && t === byExtension));
  if (!claimed) {
    const what = GENERIC_TYPES.has(mime) ? `a ${extension || "file without an extension"}` : `of type ${mime}`;
    return { ok: false, message: `'${name}' is ${what}; only ${ALLOWED_TYPES_LABEL} files are accepted.` };
  }
  if (!claimed.extensions.includes(extension)) {
    return {
      ok: false,
      message: `'${name}' is sent as ${claimed.label} but its name does not end in ${claimed.extensions.join(" or ")}; rename it or send the right file.`,
    };
  }
  if (!claimed.matches(head)) {
    return {
      ok: false,
      message: `'${name}' is named as ${claimed.label} but its content is not ${claimed.label}; only real ${ALLOWED_TYPES_LABEL} files are accepted.`,
    };
  }
  return { ok: true, type: claimed };
}

/**
 * The drop area's `accept` setting. Only the canonical MIME types: the drop area accepts a file
 * when either its type or its extension is listed, so a CSV sent as text/plain still passes.
 */
export function dropzoneAccept(): Record<string, string[]> {
  return Object.fromEntries(FILE_TYPES.map((t) => [t.contentType, [...t.extensions]]));
}
