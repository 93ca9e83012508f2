/**
 * `Content-Disposition: attachment` carrying the original file name. Old clients read the
 * quoted ASCII `filename`; current ones read `filename*`, which keeps any Unicode name intact
 * (RFC 6266, with the RFC 8187 encoding).
 */
export function attachmentDisposition(fileName: string): string {
  const fallback = fileName.replace(/[^\x20-\x7e]|["\\]/g, "_");
  const encoded = encodeURIComponent(fileName).replace(
    /['()*]/g,
    (c) => `%${c.charCodeAt(0).toString(16).toUpperCase()}`,
  );
  return `attachment; filename="${fallback}"; filename*=UTF-8''${encoded}`;
}

/**
 * The name to keep for an uploaded file: its last path part (some browsers send a full path),
 * without control characters, trimmed. Null when nothing usable is left.
 */
export function cleanFileName(raw: string): string | null {
  const lastPart = raw.split(/[\\/]/).pop() ?? "";
  const cleaned = lastPart.replace(/[\u0000-\u001f\u007f]/g, "").trim();
  return cleaned.length > 0 && cleaned !== "." && cleaned !== ".." ? cleaned : null;
}
