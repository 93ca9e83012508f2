/** The largest file one upload may carry: 20 MB (binary megabytes, as file managers show them). */
export const MAX_UPLOAD_BYTES = 20 * 1024 * 1024;

/** Room for the multipart boundaries and the small text fields around the file. */
export const MULTIPART_OVERHEAD_BYTES = 1024 * 1024;

/** A size for people: "512 B", "14.2 KB", "20.0 MB". */
export function formatBytes(bytes: number): string {
  if (!Number.isFinite(bytes) || bytes < 0) throw new Error("bytes must be a non-negative number");
  if (bytes < 1024) return `${bytes} B`;
  if (bytes < 1024 * 1024) return `${(bytes / 1024).toFixed(1)} KB`;
  return `${(bytes / (1024 * 1024)).toFixed(1)} MB`;
}

/** "20 MB", the limit as written in error messages. */
export const MAX_UPLOAD_LABEL = `${MAX_UPLOAD_BYTES / (1024 * 1024)} MB`;
