import { ApiError } from "./errors";

/** The largest JSON body any route reads: a real section or run set-up is a few hundred KB at most. */
export const MAX_JSON_BYTES = 2 * 1024 * 1024;
export const MAX_JSON_LABEL = "2 MiB";

const SAFE_METHODS = new Set(["GET", "HEAD", "OPTIONS"]);

const foreign = () =>
  new ApiError(403, "foreign_origin", "This request came from another site and was refused.", {
    _: ["Send state-changing requests from the Scarpline pages themselves."],
  });

/** The hosts (host:port) the app answers as: the one the request was sent to, and APP_URL / NEXTAUTH_URL. */
function ownHosts(request: Request): Set<string> {
  const hosts = new Set<string>();
  const host = request.headers.get("host");
  if (host) hosts.add(host.toLowerCase());
  for (const url of [process.env.APP_URL, process.env.NEXTAUTH_URL]) {
    if (!url) continue;
    try {
      hosts.add(new URL(url).host.toLowerCase());
    } catch {
      /* a malformed setting adds no host; lib/env.ts reports it */
    }
  }
  return hosts;
}

/**
 * Refuses a state-changing request sent by a page of another origin (a same-site page on another port
 * included). Browsers send Origin on every cross-origin POST/PUT/PATCH/DELETE, and Sec-Fetch-Site where
 * they do not; a request with neither comes from a program, not from a browser a visitor was lured into.
 */
export function refuseForeignOrigin(request: Request): void {
  if (SAFE_METHODS.has(request.method.toUpperCase())) return;
  const origin = request.headers.get("origin");
  if (origin !== null) {
    let host: string;
    try {
      host = new URL(origin).host.toLowerCase();
    } catch {
      throw foreign(); // "null" (sandboxed frames, file pages) and anything unparseable
    }
    if (!ownHosts(request).has(host)) throw foreign();
    return;
  }
  const site = request.headers.get("sec-fetch-site");
  if (site !== null && site !== "same-origin" && site !== "none") throw foreign();
}

/** JSON routes read only application/json: a text/plain or form body is how a cross-site form posts. */
export function requireJsonContentType(request: Request): void {
  const type = (request.headers.get("content-type") ?? "").split(";")[0].trim().toLowerCase();
  if (type !== "application/json") {
    const message = `Send the body as application/json (it came as ${type || "no content type"}).`;
    throw new ApiError(415, "unsupported_media_type", message, { _: [message] });
  }
}

export function tooLarge(limitLabel: string, declared: number | null): ApiError {
  const size = declared === null ? "" : ` (${declared} bytes)`;
  const message = `The request body${size} is larger than the ${limitLabel} this route accepts.`;
  return new ApiError(413, "body_too_large", message, { _: [message] });
}

/**
 * Reads a body as text without ever holding more than `limit` bytes: a declared Content-Length over
 * the limit is refused before reading, and a body without one is counted while it streams in.
 */
export async function readCappedText(request: Request, limit: number, limitLabel: string): Promise<string> {
  const declared = request.headers.get("content-length");
  if (declared !== null && Number(declared) > limit) throw tooLarge(limitLabel, Number(declared));
  if (!request.body) return "";
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let seen = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    seen += value.byteLength;
    if (seen > limit) {
      await reader.cancel().catch(() => undefined);
      throw tooLarge(limitLabel, null);
    }
    chunks.push(value);
  }
  return Buffer.concat(chunks).toString("utf8");
}
