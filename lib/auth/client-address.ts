/**
 * The client address a sign-in attempt is counted under. Next.js fills X-Forwarded-For from the socket
 * when the request has none; in production a reverse proxy must set it (overwriting what the client sent),
 * since a client talking to the app directly can choose it.
 */
export function clientAddress(headers: Record<string, unknown>): string {
  const forwarded = headers["x-forwarded-for"];
  const first = (Array.isArray(forwarded) ? forwarded[0] : forwarded)?.toString().split(",")[0]?.trim();
  return first ? first.slice(0, 64) : "unknown";
}
